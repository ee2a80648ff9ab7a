package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * Every unit Plumb knows, prefixed forms and other spellings included, against an independent
 * general-purpose units library: pint (Debian's python3-pint, 0.19), driven by
 * {@code pint_factors.py} in the test resources. Where both know a unit, its factor to SI (and
 * the offset of a temperature scale) must agree to 1e-9 relative, and its dimension exactly.
 *
 * <p>CI sets PLUMB_REQUIRE_PINT and installs python3-pint, so there a missing python3 or pint
 * fails the test. Without the variable (a developer's machine) the test is skipped instead.
 */
class PintCrossCheckTest {

    private static final double RELATIVE = 1e-9;

    /**
     * Each of our units (by its first spelling) as pint spells it; null where pint 0.19 has no
     * such unit. Compounds are written in pint's own units, never with our factors.
     */
    private static final Map<String, String> PINT = pintNames();

    /** Prefixes pint 0.19 predates (adopted by the CGPM in 2022); their forms are not compared. */
    private static final Set<String> NEWER_PREFIXES = Set.of("ronna", "quetta", "ronto", "quecto");

    private static Map<String, String> pintNames() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("m", "meter");
        m.put("g", "gram");
        m.put("s", "second");
        m.put("A", "ampere");
        m.put("K", "kelvin");
        m.put("mol", "mole");
        m.put("cd", "candela");
        m.put("rad", "radian");
        m.put("sr", "steradian");
        m.put("Hz", "hertz");
        m.put("N", "newton");
        m.put("Pa", "pascal");
        m.put("J", "joule");
        m.put("W", "watt");
        m.put("C", "coulomb");
        m.put("V", "volt");
        m.put("F", "farad");
        m.put("\u03A9", "ohm");
        m.put("S", "siemens");
        m.put("Wb", "weber");
        m.put("T", "tesla");
        m.put("H", "henry");
        m.put("lm", "lumen");
        m.put("lx", "lux");
        m.put("Bq", "becquerel");
        m.put("Gy", "gray");
        m.put("Sv", "sievert");
        m.put("kat", "katal");
        m.put("°C", "degree_Celsius");
        m.put("min", "minute");
        m.put("h", "hour");
        m.put("d", "day");
        m.put("L", "liter");
        m.put("°", "degree");
        m.put("%", null); // pint 0.19 has no percent
        m.put("ft", "foot");
        m.put("in", "inch");
        m.put("yd", "yard");
        m.put("mi", "mile");
        m.put("nmi", "nautical_mile");
        m.put("mph", "mile_per_hour");
        m.put("kn", "knot");
        m.put("lb", "pound");
        m.put("lbm", "pound");
        m.put("lbf", "force_pound");
        m.put("kgf", "force_kilogram");
        m.put("hp", "horsepower");
        m.put("°F", "degree_Fahrenheit");
        m.put("°R", "degree_Rankine");
        m.put("slug", "slug");
        m.put("oz", "ounce");
        m.put("ton", "short_ton");
        m.put("t", "metric_ton");
        m.put("kip", "kip");
        m.put("dyn", "dyne");
        m.put("plf", "force_pound / foot");
        m.put("klf", "kip / foot");
        m.put("psi", "psi");
        m.put("psia", "psi");
        m.put("ksi", "ksi");
        m.put("psf", "force_pound / foot ** 2");
        m.put("ksf", "kip / foot ** 2");
        m.put("atm", "atmosphere");
        m.put("bar", "bar");
        m.put("Torr", "torr");
        m.put("mmHg", "millimeter_Hg");
        m.put("inHg", "inch_Hg");
        m.put("mmH2O", "millimeter * water * g_0"); // pint's conventional water
        m.put("inH2O", "inch * water * g_0");
        m.put("ftH2O", "foot_H2O");
        m.put("BTU", "Btu_it"); // pint's plain Btu is the ISO one, 1055.056 J
        m.put("kcal", "1000 * international_calorie");
        m.put("Wh", "watt_hour");
        m.put("gal", "gallon");
        m.put("gpm", "gallon / minute");
        m.put("cfm", "foot ** 3 / minute");
        m.put("cfs", "foot ** 3 / second");
        m.put("yr", "julian_year");
        m.put("rpm", "revolutions_per_minute");
        m.put("P", "poise");
        m.put("cP", "centipoise");
        m.put("St", "stokes");
        m.put("cSt", "centistokes");
        return m;
    }

    @Test
    void everyUnitAgreesWithPint() throws Exception {
        Map<String, String> asked = spellingsToAsk();
        Map<String, String[]> answers = askPint(asked);
        UnitRegistry units = UnitRegistry.standard();
        List<String> failures = new ArrayList<>();
        int compared = 0;
        for (Map.Entry<String, String> e : asked.entrySet()) {
            String spelling = e.getKey();
            String[] answer = answers.get(spelling);
            if (answer == null || answer[1].equals("unknown")) {
                failures.add(spelling + " (pint: " + e.getValue() + "): pint does not know it: "
                        + (answer == null ? "no answer" : answer[2]));
                continue;
            }
            Unit ours = assertInstanceOf(UnitResult.Ok.class, units.resolve(spelling), spelling)
                    .unit();
            double pintOffset = Double.parseDouble(answer[1]);
            double pintFactor = Double.parseDouble(answer[2]) - pintOffset;
            double ourOffset = ours.toSi(0);
            double ourFactor = ours.toSi(1) - ourOffset;
            if (!close(ourFactor, pintFactor) || !close(ourOffset, pintOffset)) {
                failures.add(spelling + ": Plumb " + ourFactor + " (offset " + ourOffset
                        + "), pint " + pintFactor + " (offset " + pintOffset + ")");
            }
            String ourDimension = exponents(ours.dimension());
            if (!ourDimension.equals(answer[3])) {
                failures.add(spelling + ": dimension " + ourDimension + " here, " + answer[3]
                        + " in pint");
            }
            compared++;
        }
        System.out.println("PintCrossCheckTest: " + compared + " unit spellings compared with pint");
        assertEquals(List.of(), failures);
        assertTrue(compared >= 800, "too few units compared: " + compared);
    }

    @Test
    void theTableNamesEveryUnit() {
        for (AtomDefinition d : definitions()) {
            String canonical = d.spellings().get(0);
            assertTrue(PINT.containsKey(canonical),
                    canonical + " is missing from the pint table: add pint's name, or null");
        }
    }

    /** Every spelling we know, prefixed forms included, with the pint expression to compare. */
    private static Map<String, String> spellingsToAsk() {
        List<SiPrefixes.Prefix> prefixes = SiPrefixes.all();
        Map<String, String> asked = new LinkedHashMap<>();
        for (AtomDefinition d : definitions()) {
            String pint = PINT.get(d.spellings().get(0));
            if (pint == null) {
                continue;
            }
            for (String spelling : d.spellings()) {
                asked.put(spelling, pint);
            }
            if (!d.prefixable()) {
                continue;
            }
            for (SiPrefixes.Prefix p : prefixes) {
                if (NEWER_PREFIXES.contains(p.name())) {
                    continue;
                }
                for (String spelling : d.spellings()) {
                    // An exact spelling wins over the prefix split; it is checked as itself.
                    asked.putIfAbsent(p.spelling() + spelling, p.name() + pint);
                }
            }
        }
        return asked;
    }

    private static List<AtomDefinition> definitions() {
        List<AtomDefinition> all = new ArrayList<>(LibraryUnits.all());
        all.addAll(TradeUnits.all());
        return all;
    }

    private static boolean close(double ours, double theirs) {
        if (ours == theirs) {
            return true;
        }
        return Math.abs(ours - theirs) <= RELATIVE * Math.max(Math.abs(ours), Math.abs(theirs));
    }

    private static String exponents(Dimension d) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < Dimension.BASE_COUNT; i++) {
            out.add(Integer.toString(d.exponent(i)));
        }
        return String.join(" ", out);
    }

    /** Runs the script once over all spellings; spelling → its answer's fields. */
    private static Map<String, String[]> askPint(Map<String, String> asked) throws Exception {
        String python = pythonWithPint();
        Path script = Files.createTempFile("pint_factors", ".py");
        try (InputStream in = PintCrossCheckTest.class.getResourceAsStream("pint_factors.py")) {
            Files.write(script, in.readAllBytes());
        }
        try {
            ProcessBuilder pb = new ProcessBuilder(python, script.toString());
            pb.environment().put("PYTHONIOENCODING", "utf-8");
            pb.redirectError(ProcessBuilder.Redirect.INHERIT);
            Process process = pb.start();
            try (Writer w = new OutputStreamWriter(process.getOutputStream(), StandardCharsets.UTF_8)) {
                for (Map.Entry<String, String> e : asked.entrySet()) {
                    w.write(e.getKey() + "\t" + e.getValue() + "\n");
                }
            }
            String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!process.waitFor(120, TimeUnit.SECONDS) || process.exitValue() != 0) {
                fail("the pint script failed (" + python + " " + script + "); its errors are above");
            }
            Map<String, String[]> answers = new HashMap<>();
            for (String line : output.split("\n")) {
                if (!line.isEmpty()) {
                    String[] fields = line.split("\t");
                    answers.put(fields[0], fields);
                }
            }
            return answers;
        } finally {
            Files.deleteIfExists(script);
        }
    }

    /**
     * The first of $PLUMB_PYTHON, python3 and /usr/bin/python3 that can import pint (a python3
     * of one's own may not see Debian's packages). None: fail when PLUMB_REQUIRE_PINT is set,
     * else skip.
     */
    private static String pythonWithPint() {
        List<String> candidates = new ArrayList<>();
        String chosen = System.getenv("PLUMB_PYTHON");
        if (chosen != null && !chosen.isBlank()) {
            candidates.add(chosen);
        }
        candidates.add("python3");
        candidates.add("/usr/bin/python3");
        for (String python : candidates) {
            if (importsPint(python)) {
                return python;
            }
        }
        String message = "no python3 that can import pint (tried " + candidates + "): install"
                + " Debian's python3-pint (apt-get install python3-pint), or point PLUMB_PYTHON"
                + " at a python3 that has pint";
        String required = System.getenv("PLUMB_REQUIRE_PINT");
        if (required != null && !required.isBlank()) {
            fail(message + ". PLUMB_REQUIRE_PINT is set, so this check may not be skipped");
        }
        Assumptions.abort(message + "; skipped here since PLUMB_REQUIRE_PINT is not set");
        return null;
    }

    private static boolean importsPint(String python) {
        try {
            Process p = new ProcessBuilder(python, "-c", "import pint")
                    .redirectErrorStream(true).start();
            p.getInputStream().readAllBytes();
            return p.waitFor(60, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }
}
