package dev.plumb.stdlib;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Severity;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Assertions on the range and regime warnings of standard-library calls, shared by the library's
 * tests: a call inside its range is quiet; one outside gives exactly one warning whose message
 * names the correlation and shows the numbers a reviewer needs.
 */
final class RangeAssertions {
    private RangeAssertions() {
    }


    static final String OUTSIDE = "range.outside";
    static final String REGIME = "range.regime";

    /** Alternatives for one number a message must show (e.g. the value in SI or as written). */
    static double[] n(double... alternatives) {
        return alternatives;
    }

    static List<Diagnostic> errors(List<Diagnostic> all) {
        return all.stream().filter(d -> d.severity() == Severity.ERROR).toList();
    }

    static List<Diagnostic> withCode(List<Diagnostic> all, String code) {
        return all.stream().filter(d -> d.code().id().equals(code)).toList();
    }

    /** The call evaluates with no error and no warning at all. */
    static void assertClean(String expression) {
        assertCleanDocument("x = " + expression + "\n");
    }

    static void assertCleanDocument(String document) {
        List<Diagnostic> d = StdlibCheck.analyze(document).diagnostics();
        List<Diagnostic> loud = d.stream()
            .filter(x -> x.severity() == Severity.ERROR || x.severity() == Severity.WARNING).toList();
        assertTrue(loud.isEmpty(), () -> document.strip() + ": expected no warning, got " + loud);
    }

    /**
     * The call evaluates without error and gives exactly one range.outside warning, whose
     * message names the correlation and shows each of the numbers (one of each group's
     * alternatives).
     */
    static Diagnostic assertOutsideShowing(String expression, String name, double[]... numbers) {
        return assertOneWarning("x = " + expression + "\n", OUTSIDE, name, numbers);
    }

    static Diagnostic assertOneWarning(String document, String code, String name, double[]... numbers) {
        List<Diagnostic> all = StdlibCheck.analyze(document).diagnostics();
        assertTrue(errors(all).isEmpty(), () -> document.strip() + ": unexpected errors " + all);
        List<Diagnostic> hits = withCode(all, code);
        assertEquals(1, hits.size(), () -> document.strip() + ": expected one " + code + ", got " + all);
        Diagnostic w = hits.get(0);
        assertEquals(Severity.WARNING, w.severity(), w::toString);
        assertTrue(w.message().contains(name), () -> "message should name " + name + ": " + w.message());
        for (double[] group : numbers) assertMentions(w.message(), group);
        return w;
    }

    static void assertNone(String document, String code) {
        List<Diagnostic> all = StdlibCheck.analyze(document).diagnostics();
        assertTrue(errors(all).isEmpty(), () -> document.strip() + ": unexpected errors " + all);
        assertTrue(withCode(all, code).isEmpty(), () -> document.strip() + ": expected no " + code + ", got " + all);
    }

    /** The message shows one of the alternatives, to the 4 significant figures values are shown with. */
    static void assertMentions(String message, double... alternatives) {
        if (!mentionsAny(message, alternatives, 6e-4)) {
            fail("message should show one of " + Arrays.toString(alternatives) + ": " + message);
        }
    }


    /** No range warning and no error at this call, and a finite positive value. */
    static void assertInRange(String call) {
        List<Diagnostic> ds = StdlibCheck.diagnostics(call);
        assertTrue(ds.stream().noneMatch(d -> d.severity() == Severity.ERROR || d.severity() == Severity.WARNING),
            () -> call + ": " + ds);
        double v = StdlibCheck.si(call);
        assertTrue(Double.isFinite(v) && v > 0, call + " = " + v);
    }

    /**
     * Exactly one range.outside warning, and no error. Its message names the correlation, the
     * argument, the bound that was crossed, how far outside (as a factor or a percentage,
     * unless the bound is 0) and each listed alternative.
     */
    static Diagnostic assertOutside(String call, String correlation, double argument, double bound,
                                    String... alternatives) {
        return assertOutside(call, correlation, new double[] {argument}, new double[] {bound}, alternatives);
    }

    /** As above, with the renderings the message may use (e.g. an angle in degrees or radians). */
    static Diagnostic assertOutside(String call, String correlation, double[] argumentForms, double[] boundForms,
                                    String... alternatives) {
        List<Diagnostic> ds = StdlibCheck.diagnostics(call);
        List<Diagnostic> warnings = ds.stream().filter(d -> d.code().id().equals("range.outside")).toList();
        assertEquals(1, warnings.size(), () -> call + ": " + ds);
        assertTrue(ds.stream().noneMatch(d -> d.severity() == Severity.ERROR), () -> call + " is evaluated anyway: " + ds);
        Diagnostic w = warnings.get(0);
        assertEquals(Severity.WARNING, w.severity(), call);
        String m = w.message();
        assertTrue(names(m, correlation), () -> "names " + correlation + ": " + m);
        assertTrue(mentionsAny(m, argumentForms), () -> "gives the argument " + Arrays.toString(argumentForms) + ": " + m);
        assertTrue(mentionsAny(m, boundForms), () -> "gives the bound " + Arrays.toString(boundForms) + ": " + m);
        double argument = argumentForms[0], bound = boundForms[0];
        if (bound != 0 && argument > 0) {
            double[] howFar = {
                argument / bound, bound / argument,
                100 * Math.abs(argument - bound) / bound, 100 * Math.abs(argument - bound) / argument};
            assertTrue(mentionsAny(m, howFar, 0.03), () -> "says how far outside " + Arrays.toString(howFar) + ": " + m);
        }
        for (String alternative : alternatives) {
            assertTrue(names(m, alternative), () -> "offers " + alternative + ": " + m);
        }
        return w;
    }

    /** The message does not name these (use only for names other than the warned correlation). */
    static void assertNotOffered(Diagnostic w, String... names) {
        for (String name : names) {
            assertFalse(names(w.message(), name), () -> "does not offer " + name + ": " + w.message());
        }
    }

    static boolean names(String message, String name) {
        return Pattern.compile("(?<![\\w.])" + Pattern.quote(name) + "(?!\\w)").matcher(message).find();
    }

    private static boolean mentionsAny(String message, double[] values) {
        return mentionsAny(message, values, 1e-3);
    }

    private static boolean mentionsAny(String message, double[] values, double relative) {
        List<Double> found = numbersIn(message);
        for (double v : values) {
            for (double f : found) {
                // A sign may be lost or gained in range notation such as "1e-4-2e5": compare both.
                for (double g : new double[] {f, -f}) {
                    if (v == 0 ? Math.abs(g) < 1e-12 : Math.abs(g - v) <= relative * Math.abs(v)) return true;
                }
            }
        }
        return false;
    }

    private static final String SUPERSCRIPTS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
    private static final Pattern TIMES_TEN = Pattern.compile(
        "(\\d+(?:\\.\\d+)?)\\s*[×x·*]\\s*10(?:\\^\\(?([-+]?\\d+)\\)?|([⁻⁺]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+))");
    private static final Pattern NUMBER = Pattern.compile("(?<![\\w.])-?\\d+(?:\\.\\d+)?(?:[eE][-+]?\\d+)?");

    /** Every number written in a message: plain, e-notation, thousands commas, or a×10ⁿ. */
    static List<Double> numbersIn(String message) {
        String t = message.replace('−', '-').replace("\u2009", "").replace("\u202F", "")
            .replaceAll("(\\d),(\\d{3})(?!\\d)", "$1$2");
        List<Double> out = new ArrayList<>();
        Matcher m = TIMES_TEN.matcher(t);
        StringBuilder rest = new StringBuilder();
        while (m.find()) {
            String exponent = m.group(2);
            if (exponent == null) {
                StringBuilder e = new StringBuilder();
                for (char c : m.group(3).toCharArray()) {
                    if (c == '⁻') e.append('-');
                    else if (c != '⁺') e.append(SUPERSCRIPTS.indexOf(c));
                }
                exponent = e.toString();
            }
            out.add(Double.parseDouble(m.group(1)) * Math.pow(10, Integer.parseInt(exponent)));
            m.appendReplacement(rest, " ");
        }
        m.appendTail(rest);
        Matcher n = NUMBER.matcher(rest);
        while (n.find()) out.add(Double.parseDouble(n.group()));
        return out;
    }
}
