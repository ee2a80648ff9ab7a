package dev.plumb.analysis;

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
                row(b, "`" + e.getKey() + "(" + params + ")`", def.title(), basisText(def.basis(), def.flow()), validText(binding),
                    def.source());
            } else if (binding instanceof Binding.TableBinding t) {
                Statement.Table def = t.def();
                String x = def.param().name().text();
                row(b, "`" + e.getKey() + "(" + x + ")`", def.title(), basisText(def.basis(), def.flow()), validText(binding),
                    def.source());
            }
        }
        return b.toString();
    }

    /** The range a correlation or table column holds in, as written ("1e3 <= Re <= 2e5"); "" for none. */
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
