package dev.plumb.present;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Value;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.QuantityFormat;
import dev.plumb.units.Unit;

/** How a value reads for people: in its display unit, to the analysis's significant figures. */
public final class ValueText {
    private ValueText() {
    }

    /** "1.204 kg/m³"; "?" when the value could not be computed. */
    public static String of(Analysis a, Row.ValueRow row) {
        return of(row.value(), row.display(), a.settings().significantFigures());
    }

    /** A value split for typesetting: the number and the unit symbol ("" for a plain number). */
    public record Parts(String number, String unit) {
    }

    /** As {@link #of(Value, Unit, int)}, in parts; the number is "?" when the value is unknown. */
    public static Parts parts(Value v, Unit unit, int sig) {
        if (!v.known()) return new Parts("?", unit == null ? "" : unit.symbol());
        Unit u = unit == null ? DisplayUnits.defaultFor(v.dimension()) : unit;
        double number = v.difference() && u.isOffsetScale() ? v.si() / u.factor() : u.fromSi(v.si());
        return new Parts(QuantityFormat.number(number, sig), u.symbol());
    }

    /**
     * The value in {@code unit} (SI when null). On an offset scale (°C, °F) a temperature
     * difference reads as a difference, without the offset.
     */
    public static String of(Value v, Unit unit, int sig) {
        if (!v.known()) return "?";
        return QuantityFormat.format(v.si(), unit == null ? DisplayUnits.defaultFor(v.dimension()) : unit, sig,
            v.difference());
    }

    /**
     * " ± 0.31 kN (±11 %)": a value's spread in its display unit, to two significant figures (an
     * uncertainty is quoted to at most two: JCGM 100:2008, 7.2.6), and relative to the value; ""
     * when it has none. A spread is a difference: on a scale with an offset it reads without it.
     */
    public static String spread(Row.ValueRow row) {
        if (row.spread() == null || !row.value().known()) return "";
        Value d = new Value(row.spread().si(), row.value().dimension(), Value.Temperature.DIFFERENCE);
        return " ± " + of(d, row.display(), 2) + (relative(row).isEmpty() ? "" : " (" + relative(row) + ")");
    }

    /**
     * "Monte Carlo: 2.83 kN ± 0.33 kN (mean ± standard deviation, 10000 samples, seed 20261202)";
     * "" without one.
     */
    public static String sampled(Row.ValueRow row) {
        if (row.spread() == null || row.spread().sampled() == null) return "";
        dev.plumb.analysis.Spread.Sampled s = row.spread().sampled();
        Value mean = new Value(s.mean(), row.value().dimension(), row.value().temperature());
        Value sd = new Value(s.sd(), row.value().dimension(), Value.Temperature.DIFFERENCE);
        String failed = s.failed() == 0 ? "" : ", " + s.failed() + " failed";
        return "Monte Carlo: " + of(mean, row.display(), 3) + " ± " + of(sd, row.display(), 2) + " (mean ± standard "
            + "deviation, " + s.samples() + " samples" + failed + ", seed " + s.seed() + ")";
    }

    /**
     * "model form: 0.39 .. 0.47 over 3 valid entries of the family (cd_a 0.42, cd_b 0.39, cd_c 0.47)":
     * how much the choice of formula matters here; through another definition's choice, "model form
     * through Cd: 2.1 kN .. 2.5 kN over 3 valid entries for Cd (cd_a 2.2 kN, …)"; "" without one.
     */
    public static String modelForm(Row.ValueRow row) {
        dev.plumb.analysis.ModelForm m = row.modelForm();
        if (m == null) return "";
        java.util.List<String> each = new java.util.ArrayList<>();
        for (dev.plumb.analysis.ModelForm.Entry e : m.entries()) {
            each.add(e.name() + " " + of(Value.of(e.si(), row.value().dimension()), row.display(), 3));
        }
        String range = of(Value.of(m.low(), row.value().dimension()), row.display(), 3) + " .. "
            + of(Value.of(m.high(), row.value().dimension()), row.display(), 3) + " over " + m.entries().size();
        if (m.through() == null) return "model form: " + range + " valid entries of the family (" + String.join(", ", each) + ")";
        String others = m.others() == 0 ? "" : "; " + m.others() + (m.others() == 1 ? " other definition's" : " other definitions'")
            + " choice of formula reaches it too, with a narrower range";
        return "model form through " + m.through() + ": " + range + " valid entries for " + m.through() + " ("
            + String.join(", ", each) + ")" + others;
    }

    /** "±11 %": the spread relative to the value, the short form; "" without a spread or for a value of zero or on a scale. */
    public static String relative(Row.ValueRow row) {
        if (row.spread() == null || !row.value().known() || row.value().si() == 0 || row.value().point()) return "";
        return "±" + QuantityFormat.number(100 * row.spread().si() / Math.abs(row.value().si()), 2) + " %";
    }

    /** "V 78 %, accuracy of cd_x (Cd) 22 %": each source's share of the value's variance, largest first. */
    public static String shares(dev.plumb.analysis.Spread s) {
        java.util.List<String> out = new java.util.ArrayList<>();
        for (dev.plumb.analysis.Spread.Share sh : s.shares()) {
            out.add(sh.source() + " " + QuantityFormat.number(100 * s.fraction(sh), 2) + " %");
        }
        return String.join(", ", out);
    }
}
