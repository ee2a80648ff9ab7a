package dev.plumb.ide;

import dev.plumb.present.ValueText;
import dev.plumb.present.CallText;
import dev.plumb.present.SweepText;
import dev.plumb.present.CaseText;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.StdlibCatalog;
import dev.plumb.analysis.Value;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Statement;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.QuantityFormat;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * What hovering over a name shows, as Markdown: a value in its display unit and in SI, its
 * dimension in words, and its formula with the values put in; for a correlation or table its
 * title, source, basis, range and accuracy.
 */
public final class HoverText {
    private HoverText() {
    }

    /** The hover at an offset: over a name used, or over a name where it is defined; null elsewhere. */
    public static String at(Analysis a, int offset) {
        // A calc may come from anyone: its notes and names are shown without their control characters.
        return dev.plumb.diagnostics.Printable.text(markdown(a, offset));
    }

    private static String markdown(Analysis a, int offset) {
        String name = Occurrences.nameAt(a, offset);
        Row.SweepRow sweep = sweepAt(a, offset);
        // Over a sweep, its word or the value it varies shows its table; a result it shows reads as everywhere.
        if (sweep != null && (name == null || name.equals(sweep.varied()))) return sweepTable(a, sweep);
        Row.CaseRow variation = caseAt(a, offset);
        // Over a case's word or its name, the case beside the base; a value it sets reads as everywhere.
        if (variation != null && name == null) return caseTable(a, variation);
        if (name == null) return null;
        Binding b = a.scope().lookup(name);
        if (b instanceof Binding.ValueBinding v) return value(a, name, v);
        Analysis.CallSite call = a.callAt(offset);
        String here = call == null ? "" : "\n\nat this call: " + CallText.arguments(call) + " — " + CallText.standing(call)
            + (call.used() == null ? "" : "\n\nused here: " + call.used());
        if (b instanceof Binding.CorrelationBinding c) return correlation(c) + here;
        if (b instanceof Binding.TableBinding t) return table(t) + here;
        if (b instanceof Binding.FunctionBinding f) {
            return "**" + name + "**(" + String.join(", ", f.def().params().stream().map(p -> p.text()).toList())
                + ") — function" + (f.def().note() == null ? "" : "\n\n" + f.def().note());
        }
        if (b instanceof Binding.BuiltinFunction f) return "**" + f.signature() + "** — built-in function";
        return null;
    }

    /** Rows a hover shows of a sweep's table; `plumb eval` and the report show them all. */
    static final int SWEEP_ROWS_SHOWN = 40;

    private static Row.SweepRow sweepAt(Analysis a, int offset) {
        for (Row r : a.rows()) {
            if (r instanceof Row.SweepRow w && offset >= w.span().start() && offset <= w.span().end()) return w;
        }
        return null;
    }

    private static Row.CaseRow caseAt(Analysis a, int offset) {
        for (Row r : a.rows()) {
            if (r instanceof Row.CaseRow c && offset >= c.span().start() && offset <= c.span().end()) return c;
        }
        return null;
    }

    /** A case as Markdown: what it sets, then each value it changes beside the base, and its checks. */
    private static String caseTable(Analysis a, Row.CaseRow c) {
        int digits = a.settings().significantFigures();
        StringBuilder out = new StringBuilder("**" + CaseText.title(c, digits) + "**\n\n| value | base | this case | ratio |\n"
            + "| --- | --- | --- | --- |\n");
        for (Row.CaseValue v : c.changed()) {
            out.append("| ").append(cell(v.name())).append(" | ").append(cell(ValueText.of(v.base(), v.display(), digits)))
                .append(" | ").append(cell(ValueText.of(v.value(), v.display(), digits))).append(" | ")
                .append(CaseText.ratio(v, digits)).append(" |\n");
        }
        for (Row.CheckRow k : c.checks()) {
            out.append("\n").append(dev.plumb.present.CheckText.mark(k)).append(" `check ").append(k.source()).append("` — ")
                .append(dev.plumb.present.CheckText.detail(k));
        }
        return out.toString().stripTrailing();
    }

    /** The sweep's table as Markdown, its first rows when it has many. */
    private static String sweepTable(Analysis a, Row.SweepRow w) {
        StringBuilder out = new StringBuilder("**" + SweepText.title(w) + "**\n\n");
        List<String> header = SweepText.header(w);
        out.append("| ").append(String.join(" | ", header.stream().map(HoverText::cell).toList())).append(" |\n|");
        out.append(" --- |".repeat(header.size())).append('\n');
        List<dev.plumb.units.Unit> units = SweepText.units(w);
        int digits = a.settings().significantFigures();
        for (int i = 0; i < w.lines().size() && i < SWEEP_ROWS_SHOWN; i++) {
            List<String> cells = SweepText.cells(w, w.lines().get(i), units, digits);
            out.append("| ").append(String.join(" | ", cells.stream().map(HoverText::cell).toList())).append(" |\n");
        }
        if (w.lines().size() > SWEEP_ROWS_SHOWN) {
            out.append("\n… and ").append(w.lines().size() - SWEEP_ROWS_SHOWN).append(" more rows (plumb eval shows them all)");
        }
        return out.toString().stripTrailing();
    }

    /** A table cell: a bar would end it. */
    private static String cell(String text) {
        return text.replace("|", "\\|");
    }

    private static String value(Analysis a, String name, Binding.ValueBinding b) {
        Value v = b.value();
        StringBuilder out = new StringBuilder("**" + name + "**");
        if (!v.known()) return out.append(" — not computed (see the problems reported)").toString();
        Row.ValueRow row = rowOf(a, name, b);
        out.append(" = ").append(row != null ? ValueText.of(a, row) + ValueText.spread(row) : QuantityFormat.format(v.si(),
            b.display() != null ? b.display() : DisplayUnits.defaultFor(v.dimension()), 4));
        out.append("\n\n").append(v.dimension().isDimensionless() ? "a dimensionless number"
            : v.dimension().describe() + "; in SI " + QuantityFormat.format(v.si(), DisplayUnits.defaultFor(v.dimension()), 6));
        if (b.input()) out.append("\n\ninput");
        if (b.basis() != null) out.append("\n\n").append(tagged(b.basis()));
        if (row != null && row.note() != null) out.append("\n\n").append(row.note());
        String formula = row == null ? null : formula(a, row);
        if (formula != null) out.append("\n\n").append(formula);
        if (b.origin() != null) {
            out.append("\n\nfrom ").append(b.origin().correlation());
            if (b.origin().basis() != null) out.append(", ").append(b.origin().basisWords());
            if (b.origin().accuracy() != null) {
                out.append(", ±").append(QuantityFormat.number(b.origin().accuracy() * 100, 3)).append(" %");
            }
        }
        if (row != null && row.spread() != null) {
            out.append("\n\nspread to first order; shares of its variance: ").append(ValueText.shares(row.spread()));
            if (row.spread().sampled() != null) out.append("\n\n").append(ValueText.sampled(row));
        }
        if (row != null && row.modelForm() != null) out.append("\n\n").append(ValueText.modelForm(row));
        if (row != null && row.statement() instanceof dev.plumb.syntax.Statement.Evolve k && a.trajectory(row.name()) != null) {
            dev.plumb.analysis.Trajectory t = a.trajectory(row.name());
            out.append("\n\n").append(dev.plumb.present.TrajectoryText.summary(t));
            if (k.index() > 0) {
                out.append("; the value at the stop, ").append(t.names().get(0)).append(" = ")
                    .append(dev.plumb.present.ValueText.of(dev.plumb.analysis.Value.of(t.end(), t.dimensions().get(0)),
                        t.units().get(0), a.settings().significantFigures()))
                    .append("; `").append(row.name()).append("(TIME)` reads it at another time of the motion");
            }
            for (String visited : t.visited()) out.append("\n- over the motion, ").append(visited);
        }
        if (row != null && row.solution() != null && row.solution().system() != null) {
            dev.plumb.analysis.SystemSolution system = row.solution().system();
            out.append("\n\nsolved by `seek` together ").append(dev.plumb.present.SystemText.summary(system, row.name()));
            for (int i = 0; i < system.residuals().size(); i++) {
                out.append("\n- `").append(system.residuals().get(i).equation()).append("`: ")
                    .append(dev.plumb.present.SystemText.residuals(system).get(i));
            }
        } else if (row != null && row.solution() != null) {
            out.append("\n\nsolved by `seek` in ").append(row.solution().iterations()).append(" iterations");
        }
        if (b.file() != null && !b.file().equals(a.file())) out.append("\n\ndefined in ").append(b.file().getFileName());
        return out.toString();
    }

    /** What an `as` tag says, in words. */
    private static String tagged(String tag) {
        return switch (tag) {
            case "fluid" -> "`as fluid`: the density of the fluid (for dynamic pressure, forces, Reynolds numbers)";
            case "body" -> "`as body`: the density of the body (for its weight; not for dynamic pressure)";
            default -> "`as " + tag + "`: a " + tag + " area";
        };
    }

    private static Row.ValueRow rowOf(Analysis a, String name, Binding.ValueBinding b) {
        if (b.file() == null || !b.file().equals(a.file())) return null;
        for (Row r : a.rows()) {
            if (r instanceof Row.ValueRow v && v.name().equals(name) && v.span().contains(b.span().start())) return v;
        }
        return null;
    }

    /** "`F = Cd * A * q`" then the same with each name replaced by its value. */
    private static String formula(Analysis a, Row.ValueRow row) {
        String text = a.text();
        if (row.formula() == null) return null;
        Span expr = row.formula().span();
        List<Analysis.Reference> inside = new ArrayList<>();
        for (Analysis.Reference r : a.references()) {
            if (r.span().start() >= expr.start() && r.span().end() <= expr.end()) inside.add(r);
        }
        if (inside.isEmpty()) return null;
        inside.sort(Comparator.comparingInt((Analysis.Reference r) -> r.span().start()).reversed());
        StringBuilder substituted = new StringBuilder(text.substring(expr.start(), expr.end()));
        for (Analysis.Reference r : inside) {
            if (!(a.scope().lookup(r.name()) instanceof Binding.ValueBinding vb) || !vb.value().known()) continue;
            String shown = QuantityFormat.format(vb.value().si(),
                vb.display() != null ? vb.display() : DisplayUnits.defaultFor(vb.value().dimension()), 4);
            substituted.replace(r.span().start() - expr.start(), r.span().end() - expr.start(), "(" + shown + ")");
        }
        String original = text.substring(expr.start(), expr.end()).strip().replaceAll("\\s+", " ");
        return "`" + row.name() + " = " + cut(original) + "`\n\n`= " + cut(substituted.toString().strip()
            .replaceAll("\\s+", " ")) + "`";
    }

    private static String cut(String s) {
        int note = s.indexOf('"');
        String t = note > 0 ? s.substring(0, note).strip() : s;
        return t.length() > 200 ? t.substring(0, 197) + "…" : t;
    }

    private static String correlation(Binding.CorrelationBinding c) {
        Statement.Correlation d = c.def();
        StringBuilder out = new StringBuilder("**" + d.name().text() + "**(" + String.join(", ", d.params().stream()
            .map(Statement.Param::written).toList()) + ") — correlation");
        meta(out, d.title(), d.source(), StdlibCatalog.basisText(d.basis(), d.flow()), StdlibCatalog.validText(c));
        domain(out, StdlibCatalog.domainText(c));
        return out.toString();
    }

    private static String table(Binding.TableBinding t) {
        Statement.Table d = t.def();
        StringBuilder out = new StringBuilder("**" + t.name() + "**(" + d.param().name().text() + ") — table");
        meta(out, d.title(), d.source(), StdlibCatalog.basisText(d.basis(), d.flow()), StdlibCatalog.validText(t));
        domain(out, StdlibCatalog.domainText(t));
        return out.toString();
    }

    private static void domain(StringBuilder out, String domain) {
        if (!domain.isEmpty()) out.append("\n\ndomain: ").append(domain).append(" (outside it: an error, nothing computed)");
    }

    private static void meta(StringBuilder out, String title, String source, String basis, String valid) {
        if (title != null) out.append("\n\n").append(title);
        if (source != null) out.append("\n\nsource: ").append(source);
        if (!basis.isEmpty()) out.append("\n\nbasis: ").append(basis);
        if (!valid.isEmpty()) out.append("\n\nvalid: ").append(valid).append(" (checked at every call)");
    }
}
