package dev.plumb.ide;

import java.util.List;
import java.util.Random;

/**
 * Random calc documents for the formatter's property test, built from realistic pieces (inputs
 * and definitions with units, clauses and notes, checks, functions, find, sections, narrative,
 * code comments, continued statements, correlation and table blocks) with random blanks between
 * the parts, plus broken and garbage lines. The same seed gives the same documents. Also feeds
 * the parser's reparse property test.
 */
public final class RandomCalc {
    private static final List<String> NAMES = List.of(
        "V", "rho", "ρ_air", "µ", "μ_w", "ΔT", "Re_L", "C_D", "A_front", "q", "F_D", "x2", "_tmp", "L",
        "\uD835\uDF0C_sw", "T_amb", "check", "source", "ν", "d", "end", "table");
    private static final List<String> QUANTITIES = List.of(
        "26 m/s", "8 °C", "1.716e-5 Pa·s", "3.0 m", "1.2", "101 kPa", "1025 kg/m³", "0.9 m", "5mm", "2 m^2",
        "15 °C", "12 degC", "1.5e-6 m²/s", "40 lbf", "105 km/h", "25 deg", "10 %", "5 in", "5in", "2 as",
        "3 ft", "1.08e-3 Pa*s", ".5", "9.81 m/s^2", "4 µm", "2 s⁻¹");
    private static final List<String> EXPRESSIONS = List.of(
        "0.5 * rho * V^2", "p / (R_air * T)", "(a + b)", "-(x)", "sqrt(16 m^2)", "water.rho(15 degC)", "x*y",
        "1 / 2 m", "Cd * A * q", "ρ_air * V * L / µ", "max(a, b, 3 m)", "2^3^2", "-2^2", "a − b", "a × b",
        "cd_sphere(Re)", "b * h", "F_D / 4", "pi * d^2 / 4", "(L)", "((a))*(b)");
    private static final List<String> UNITS = List.of(
        "kg/m³", "kN", "Pa", "°C", "mm", "in", "1/s", "s⁻¹", "µm", "m²", "kg/(m*s)", "J/(kg*K)", "%", "deg");
    private static final List<String> BASES = List.of("frontal", "wetted", "planform", "sideways");
    private static final List<String> NOTES = List.of(
        "\"design gust, site wind brief\"", "\"quote \\\"B\\\" inside\"", "\"über ρ 𝜌 °C\"", "\"# not a comment\"",
        "\"x = 1   in mm\"", "\"\"", "\"  padded  \"", "\"back\\\\slash\"");
    private static final List<String> COMMENTS = List.of(
        "# a code comment", "#tight", "#   spaced   out  ", "# ρ = 1.2 \"in quotes\"", "#");
    private static final List<String> GARBAGE = List.of(
        "= = =", "input = 3", "x = ", "x = 5 m m", "\"unclosed", "check", "x == 3", "5.", "x = 2 m2",
        "(((", "input V = 3 in", "y = 3 in mm as", "z = 1 \"a\" \"b\"", "m = 1 @ 2", "x = 1 in 2",
        "end", "valid 0 < Re < 1", "= 1.2", "AR  Cd", "1  2", "title", "x = ρ²", "a\u00A0= 1", "x\uFEFF= 2");
    private static final List<String> GAPS = List.of("", " ", " ", " ", "  ", "   ", "\t", " \t ", "      ");

    private final Random random;

    public RandomCalc(long seed) {
        random = new Random(seed);
    }

    public String document() {
        StringBuilder doc = new StringBuilder();
        if (random.nextInt(20) == 0) doc.append('\uFEFF');
        String newline = pick(List.of("\n", "\n", "\n", "\r\n", "\r"));
        boolean mixedBreaks = random.nextInt(10) == 0;
        int count = 1 + random.nextInt(25);
        String lastBreak = "";
        for (int i = 0; i < count; i++) {
            for (String line : piece().split("\n", -1)) {
                lastBreak = mixedBreaks ? pick(List.of("\n", "\r\n", "\r")) : newline;
                doc.append(line).append(lastBreak);
            }
        }
        if (random.nextBoolean()) doc.setLength(doc.length() - lastBreak.length());
        return doc.toString();
    }

    /** One or more lines, joined with '\n'. */
    private String piece() {
        int kind = random.nextInt(100);
        String indent = random.nextInt(12) == 0 ? pick(List.of("  ", "    ", "\t")) : "";
        if (kind < 25) return indent + definition(true);
        if (kind < 50) return indent + definition(false);
        if (kind < 55) return "";
        if (kind < 58) return pick(List.of("  ", "\t", " "));
        if (kind < 62) return indent + "#" + pick(List.of(" Inputs from the survey", "  ρ = 1.2", "", " x = 1   in mm"));
        if (kind < 65) return "section" + gap() + "\"Drag on the whip\"";
        if (kind < 67) return "title \"Survey buoy\"";
        if (kind < 71) return indent + "check" + gap() + pick(EXPRESSIONS) + gap() + pick(List.of("<", "<=", "≤", "==", "!="))
            + gap() + pick(QUANTITIES) + optional(gap() + pick(NOTES));
        if (kind < 73) return "drag(Cd, A, q)" + gap() + "=" + gap() + "Cd * A * q" + optional(gap() + pick(NOTES));
        if (kind < 75) return "seek V in 1 mm/s .. 10 m/s where drag = W" + optional(gap() + "in mm/s");
        if (kind < 80) return continued();
        if (kind < 83) return "    " + pick(COMMENTS);
        if (kind < 86) return block();
        if (kind < 88) return "use \"air.plumb\"";
        return indent + garbage();
    }

    private String definition(boolean input) {
        StringBuilder b = new StringBuilder();
        if (input) b.append("input").append(pick(List.of(" ", " ", "  ", "\t")));
        b.append(pick(NAMES)).append(gap()).append('=').append(gap());
        b.append(random.nextBoolean() ? pick(QUANTITIES) : pick(EXPRESSIONS));
        if (!input && random.nextInt(6) == 0) {
            // A piecewise formula, on one line or one piece a line.
            b.append(nonEmptyGap()).append("when").append(nonEmptyGap()).append(pick(EXPRESSIONS)).append(gap())
                .append(pick(List.of("<", "<=", ">"))).append(gap()).append(pick(QUANTITIES));
            b.append(random.nextBoolean() ? nonEmptyGap() + "otherwise" + nonEmptyGap() + pick(QUANTITIES)
                : "\n    = " + pick(QUANTITIES) + " otherwise");
        }
        if (random.nextInt(3) == 0) b.append(nonEmptyGap()).append("in").append(nonEmptyGap()).append(pick(UNITS));
        if (random.nextInt(5) == 0) b.append(nonEmptyGap()).append("as").append(nonEmptyGap()).append(pick(BASES));
        if (random.nextInt(2) == 0) b.append(gap()).append(pick(NOTES));
        if (random.nextInt(6) == 0) b.append(gap()).append(pick(COMMENTS));
        if (random.nextInt(8) == 0) b.append(pick(List.of(" ", "\t", "   ")));
        return b.toString();
    }

    private String continued() {
        return switch (random.nextInt(4)) {
            case 0 -> definition(true) + "\n" + "    " + pick(NOTES);
            case 1 -> pick(NAMES) + " = 0.5 * rho *\n" + pick(List.of("    ", "\t", "  ")) + "V^2" + gap() + "in Pa";
            case 2 -> definition(false) + "\n" + "      " + pick(COMMENTS);
            default -> "check Re > 1e4\n    " + pick(NOTES);
        };
    }

    private String block() {
        if (random.nextBoolean()) {
            return "correlation cd_whip(Re)\n"
                + "    title    \"Drag coefficient of the whip\"\n"
                + "    source" + gap() + "\"Invented for the test\"\n"
                + "    basis    frontal\n"
                + (random.nextInt(5) == 0 ? "    x = 3" + gap() + "in mm\n" : "")
                + "    valid    1e3 <= Re <= 1e5\n"
                + "    =" + gap() + "1.1 + 0.2 * log10(Re / 1e3)\n"
                + (random.nextInt(5) == 0 ? "" : "end");
        }
        return "table cd_plate(AR)\n"
            + "    source \"Invented for the test\"\n"
            + "    AR     Cd\n"
            + "    1      1.18\n"
            + "    5" + gap() + "1.20\n"
            + (random.nextInt(5) == 0 ? "" : "end");
    }

    private String garbage() {
        if (random.nextBoolean()) return pick(GARBAGE);
        String alphabet = "ab =\"#()*^°µρ²\t.5in as\\";
        StringBuilder b = new StringBuilder();
        int n = 1 + random.nextInt(20);
        for (int i = 0; i < n; i++) b.append(alphabet.charAt(random.nextInt(alphabet.length())));
        return b.toString();
    }

    private String optional(String s) {
        return random.nextBoolean() ? s : "";
    }

    private String gap() {
        return pick(GAPS);
    }

    private String nonEmptyGap() {
        String g = gap();
        return g.isEmpty() ? " " : g;
    }

    private <T> T pick(List<T> from) {
        return from.get(random.nextInt(from.size()));
    }
}
