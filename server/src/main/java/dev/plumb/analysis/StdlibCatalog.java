package dev.plumb.analysis;

import dev.plumb.syntax.Expr;

import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** The standard library as a Markdown table: name, what it gives, basis, valid range, source. */
public final class StdlibCatalog {
    private StdlibCatalog() {
    }

    public static String markdown(Stdlib library) {
        StringBuilder b = new StringBuilder();
        b.append("| name | gives | basis | valid | source |\n");
        b.append("| --- | --- | --- | --- | --- |\n");
        for (Map.Entry<String, Binding> e : library.entries().entrySet()) {
            Binding binding = e.getValue();
            if (binding instanceof Binding.CorrelationBinding c) {
                Statement.Correlation def = c.def();
                String params = String.join(", ", def.params().stream().map(p -> p.name().text()).toList());
                row(b, "`" + e.getKey() + "(" + params + ")`", def.title(), basisText(def.basis(), def.flow()), withRegime(c),
                    def.source());
            } else if (binding instanceof Binding.TableBinding t) {
                Statement.Table def = t.def();
                String x = def.param().name().text();
                row(b, "`" + e.getKey() + "(" + x + ")`", gives(t), basisText(def.basis(), def.flow()), validText(binding),
                    def.source());
            }
        }
        return b.toString();
    }

    /** The range a correlation or table column holds in, as written ("1e3 <= Re <= 2e5"); "" for none. */
    /** An entry's `accuracy` as written ("5 %"), or null when it states none. */
    public static String accuracyText(Binding binding) {
        Expr e = binding instanceof Binding.CorrelationBinding c ? c.def().accuracy()
            : binding instanceof Binding.TableBinding t ? t.def().accuracy() : null;
        if (e == null) return null;
        String text = binding instanceof Binding.CorrelationBinding c ? c.scope().text() : ((Binding.TableBinding) binding).scope().text();
        return text.substring(e.span().start(), Math.min(text.length(), e.span().end())).strip();
    }

    public static String validText(Binding binding) {
        if (binding instanceof Binding.CorrelationBinding c) return ranges(c.def().valid(), c.scope().text());
        if (!(binding instanceof Binding.TableBinding t)) return "";
        String x = t.def().param().name().text();
        List<String> valid = new ArrayList<>();
        valid.add(Shown.value(Value.of(t.data().first(), t.data().argument), t.data().argumentUnit, 4) + " ≤ " + x
            + " ≤ " + Shown.value(Value.of(t.data().last(), t.data().argument), t.data().argumentUnit, 4) + " (table)");
        String more = ranges(t.def().valid(), t.scope().text());
        if (!more.isEmpty()) valid.add(more);
        return String.join("; ", valid);
    }

    /**
     * The valid range and, for a boundary-layer formula, the regime condition the call is also
     * warned against, so that "valid to 3e6" is not read without "laminar only below Re_crit".
     */
    static String withRegime(Binding.CorrelationBinding c) {
        String valid = validText(c);
        String regime = regimeText(c);
        if (regime.isEmpty()) return valid;
        return valid.isEmpty() ? regime : valid + "; " + regime;
    }

    /** "laminar: Re ≤ Re_crit (5e5)", "turbulent: Re ≥ Re_crit (5e5)", "tripped: …"; "" for none. */
    static String regimeText(Binding.CorrelationBinding c) {
        Statement.Correlation def = c.def();
        if (def.regime() == null) return "";
        String regime = def.regime().text();
        if (regime.equals("tripped")) return "tripped: turbulent by stimulation, no Re_crit condition";
        String re = def.params().stream().map(p -> p.name().text()).filter(n -> n.startsWith("Re")).findFirst()
            .orElse(null);
        if (re == null) return regime;
        String crit = c.scope().lookup("Re_crit") instanceof Binding.ValueBinding v && v.value().known()
            ? " (" + compact(v.value().si()) + ")" : "";
        return regime + ": " + re + (regime.equals("laminar") ? " ≤ " : " ≥ ") + "Re_crit" + crit;
    }

    /** 5e5 for 500000, as the library writes its ranges; other numbers as they are. */
    private static String compact(double x) {
        if (x >= 1e4 && x == Math.rint(x)) {
            int exponent = (int) Math.floor(Math.log10(x));
            double mantissa = x / Math.pow(10, exponent);
            if (Math.abs(mantissa - Math.rint(mantissa)) < 1e-9) return (long) Math.rint(mantissa) + "e" + exponent;
        }
        return dev.plumb.units.QuantityFormat.number(x, 4);
    }

    /**
     * What a table column gives. A table with one output column gives what its title says; a
     * column of a wider table names itself, its quantity and its unit before the table's title,
     * so that water.rho and water.mu do not read alike.
     */
    public static String gives(Binding.TableBinding t) {
        Statement.Table def = t.def();
        if (def.columns().size() <= 2 || def.title() == null) return def.title();
        String column = t.name().substring(t.name().lastIndexOf('.') + 1);
        Statement.Column col = def.columns().stream().filter(k -> k.name().text().equals(column)).findFirst()
            .orElse(null);
        if (col == null) return def.title();
        String quantity = t.data().result.name() == null ? "" : ", " + t.data().result.name();
        String unit = col.unit() == null ? "" : " in " + col.unit().text();
        return "Column " + column + quantity + unit + ", of the table " + def.name().text() + ": " + def.title();
    }

    /** The physical domain its `domain` lines state ("Re > 0"); "" for none. */
    public static String domainText(Binding binding) {
        if (binding instanceof Binding.CorrelationBinding c) return ranges(c.def().domain(), c.scope().text());
        if (binding instanceof Binding.TableBinding t) return ranges(t.def().domain(), t.scope().text());
        return "";
    }

    private static String ranges(List<Statement.Bound> bounds, String text) {
        List<String> out = new ArrayList<>();
        for (Statement.Bound bound : bounds) {
            out.add(text.substring(bound.span().start(), bound.span().end()).replaceAll("\\s+", " "));
        }
        return String.join("; ", out);
    }

    /** "frontal, crossflow" as the basis line states it; "" for none. */
    public static String basisText(dev.plumb.syntax.Ident basis, dev.plumb.syntax.Ident flow) {
        if (basis == null) return "";
        return flow == null ? basis.text() : basis.text() + ", " + flow.text();
    }

    private static void row(StringBuilder b, String name, String gives, String basis, String valid, String source) {
        b.append("| ").append(name).append(" | ").append(cell(gives)).append(" | ")
            .append(basis).append(" | ").append(cell(valid)).append(" | ")
            .append(cell(source)).append(" |\n");
    }

    private static String cell(String s) {
        return s == null ? "" : s.replace("|", "\\|").replace("\n", " ");
    }
}
