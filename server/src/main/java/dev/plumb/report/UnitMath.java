package dev.plumb.report;

import dev.plumb.units.UnitRegistry;
import dev.plumb.units.UnitResult;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

/**
 * A unit typeset upright after its number. A unit the registry knows is shown in its symbols
 * ({@code degC} is °C, {@code um} is µm, {@code N*m} is N·m, {@code kg/m^3} is kg/m with the 3
 * raised); one it does not know is shown as written, laid out by the same rules, so that a
 * mistake stays visible. Exponents are set as superscripts, products with a middle dot and
 * quotients with a solidus, as units are printed; brackets keep their size.
 */
final class UnitMath {
    private static final String SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
    private static final char SUPERSCRIPT_MINUS = '⁻';

    private final UnitRegistry registry;

    UnitMath(UnitRegistry registry) {
        this.registry = registry;
    }

    /** A number followed by its unit: a thin space between them, none before % and the angle degree. */
    Fragment quantity(Fragment number, String unitText) {
        if (unitText == null || unitText.isBlank()) return number;
        String shown = shown(unitText);
        String gap = shown.equals("%") || shown.equals("°") ? "" : MathElements.THIN_SPACE;
        String markup = MathElements.row(number.markup(), gap, layout(shown));
        return new Fragment(markup, number.signed() ? Fragment.UNARY : Fragment.SCALED, number.signed());
    }

    /** The unit alone. */
    String of(String unitText) {
        return layout(shown(unitText));
    }

    /** The registry's spelling of a unit it knows, else the text as written. */
    private String shown(String unitText) {
        return registry.resolve(unitText) instanceof UnitResult.Ok ok && !ok.unit().symbol().isEmpty()
            ? ok.unit().symbol() : unitText.strip();
    }

    private static String layout(String unit) {
        List<String> items = new ArrayList<>();
        Deque<Integer> opened = new ArrayDeque<>();
        int i = 0;
        while (i < unit.length()) {
            char c = unit.charAt(i);
            if (Character.isWhitespace(c)) {
                i++;
            } else if (c == '(') {
                opened.push(items.size());
                items.add(MathElements.fixedFence("("));
                i++;
            } else if (c == ')') {
                items.add(MathElements.fixedFence(")"));
                if (!opened.isEmpty()) collapse(items, opened.pop());
                i++;
            } else if (c == '/') {
                items.add(MathElements.mo("/", "0.05", "0.05"));
                i++;
            } else if (c == '*' || c == '·' || c == '⋅') {
                items.add(MathElements.mo("·", "0.1", "0.1"));
                i++;
            } else if (c == '^') {
                i = caretExponent(unit, i + 1, items);
            } else if (c == SUPERSCRIPT_MINUS || SUPERSCRIPT_DIGITS.indexOf(c) >= 0) {
                i = superscriptExponent(unit, i, items);
            } else {
                int end = atomEnd(unit, i);
                String atom = unit.substring(i, end);
                items.add(atom.equals("1") ? MathElements.mn(atom) : MathElements.upright(atom));
                i = end;
            }
        }
        return MathElements.row(items.toArray(String[]::new));
    }

    /** Everything from {@code from} on becomes one item, so that an exponent after ')' raises all of it. */
    private static void collapse(List<String> items, int from) {
        List<String> group = items.subList(from, items.size());
        String row = MathElements.row(group.toArray(String[]::new));
        group.clear();
        items.add(row);
    }

    /** {@code ^2}, {@code ^-1}, {@code ^(-1)}: returns the index after it. */
    private static int caretExponent(String unit, int i, List<String> items) {
        int at = i;
        boolean bracketed = at < unit.length() && unit.charAt(at) == '(';
        if (bracketed) at++;
        boolean negative = at < unit.length() && (unit.charAt(at) == '-' || unit.charAt(at) == '−');
        if (at < unit.length() && "-−+".indexOf(unit.charAt(at)) >= 0) at++;
        int digits = at;
        while (at < unit.length() && unit.charAt(at) >= '0' && unit.charAt(at) <= '9') at++;
        if (at == digits) {
            // No exponent after all: show the caret, so the unreadable unit reads as written.
            items.add(MathElements.mtext("^"));
            return i;
        }
        String exponent = unit.substring(digits, at);
        if (bracketed && at < unit.length() && unit.charAt(at) == ')') at++;
        raise(items, negative, exponent);
        return at;
    }

    /** {@code ³}, {@code ⁻¹}: returns the index after it. */
    private static int superscriptExponent(String unit, int i, List<String> items) {
        boolean negative = unit.charAt(i) == SUPERSCRIPT_MINUS;
        int at = negative ? i + 1 : i;
        StringBuilder exponent = new StringBuilder();
        while (at < unit.length() && SUPERSCRIPT_DIGITS.indexOf(unit.charAt(at)) >= 0) {
            exponent.append(SUPERSCRIPT_DIGITS.indexOf(unit.charAt(at)));
            at++;
        }
        if (exponent.length() == 0) {
            items.add(MathElements.mtext(unit.substring(i, at)));
            return at;
        }
        raise(items, negative, exponent.toString());
        return at;
    }

    private static void raise(List<String> items, boolean negative, String exponent) {
        String power = negative ? MathElements.row(MathElements.mo("−"), MathElements.mn(exponent)) : MathElements.mn(exponent);
        if (items.isEmpty()) {
            items.add(MathElements.sup(MathElements.row(), power));
            return;
        }
        String base = items.remove(items.size() - 1);
        items.add(MathElements.sup(base, power));
    }

    private static int atomEnd(String unit, int i) {
        int at = i;
        while (at < unit.length()) {
            char c = unit.charAt(at);
            boolean special = Character.isWhitespace(c) || "()/*·⋅^".indexOf(c) >= 0
                || c == SUPERSCRIPT_MINUS || SUPERSCRIPT_DIGITS.indexOf(c) >= 0;
            if (special) break;
            at++;
        }
        return at;
    }
}
