package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Fix;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Statement;
import dev.plumb.units.DisplayUnits;
import java.util.ArrayList;
import java.util.List;

/**
 * Code actions: quick fixes for findings that name their fix (a missing `*`, a close spelling,
 * a correlation valid at the value, the frontal area, a density of the right kind) and refactors
 * on a definition (show it in SI).
 */
public final class Fixes {
    /** One action: a title, whether it fixes a finding, and its edits. */
    public record Action(String title, boolean quickFix, List<Edit> edits, Diagnostic fixes, boolean preferred) {
        public Action(String title, boolean quickFix, List<Edit> edits, Diagnostic fixes) {
            this(title, quickFix, edits, fixes, false);
        }
    }


    /** Units an engineer converts to, by the SI unit of their dimension. */
    private static final java.util.Map<String, List<String>> COMMON = java.util.Map.of(
        "N", List.of("kN", "lbf"),
        "Pa", List.of("kPa", "bar", "psi"),
        "m", List.of("mm", "ft"),
        "m/s", List.of("km/h", "knot", "mph"),
        "W", List.of("kW", "hp"),
        "N·m", List.of("kN*m"),
        "kg/m³", List.of("g/L"),
        "Pa·s", List.of("mPa*s", "cP"),
        "m²", List.of("mm^2", "ft^2"),
        "K", List.of("degC", "degF"));

    private Fixes() {
    }

    /** The actions for a range of the document. */
    public static List<Action> at(Analysis a, Span range) {
        List<Action> out = new ArrayList<>();
        for (Diagnostic d : a.diagnostics()) {
            if (d.span().end() < range.start() || d.span().start() > range.end()) continue;
            out.addAll(quickFixes(d));
        }
        for (Row r : a.rows()) {
            if (r instanceof Row.ValueRow v && v.span().start() <= range.end() && range.start() <= v.span().end()) {
                Action si = showInSi(a, v);
                if (si != null) out.add(si);
                out.addAll(conversions(a, v));
            }
        }
        return out;
    }

    /** The repairs the finding carries, as the engine made them: the editor reads no message. */
    private static List<Action> quickFixes(Diagnostic d) {
        List<Action> out = new ArrayList<>();
        for (Fix f : d.fixes()) {
            out.add(new Action(f.title(), true, List.of(new Edit(f.span().start(), f.span().length(), f.text())), d,
                f.preferred()));
        }
        return out;
    }

    /** "Show in SI": set the definition's `in` unit to the SI unit of its dimension. */
    private static Action showInSi(Analysis a, Row.ValueRow v) {
        if (!v.value().known() || v.value().dimension().isDimensionless()) return null;
        String si = DisplayUnits.defaultFor(v.value().dimension()).symbol();
        if (v.display() == null || v.display().symbol().equals(si)) return null;
        return showIn(a, v, si, "Show " + v.name() + " in SI (" + si + ")");
    }

    /** "Convert to kN", "… lbf": the usual units of the value's dimension. */
    private static List<Action> conversions(Analysis a, Row.ValueRow v) {
        if (!v.value().known() || v.value().dimension().isDimensionless()) return List.of();
        String si = DisplayUnits.defaultFor(v.value().dimension()).symbol();
        List<Action> out = new ArrayList<>();
        for (String unit : COMMON.getOrDefault(si, List.of())) {
            Action act = showIn(a, v, unit, "Show " + v.name() + " in " + unit);
            if (act != null) out.add(act);
        }
        return out;
    }

    /** Sets (or replaces) a definition's `in UNIT`: the row says where its unit and its formula are written. */
    private static Action showIn(Analysis a, Row.ValueRow v, String unit, String title) {
        Edit edit;
        if (v.displayUnitWritten() != null) {
            Span written = v.displayUnitWritten().span();
            edit = new Edit(written.start(), written.length(), unit);
        } else if (v.statement() instanceof Statement.Definition d) {
            // `in UNIT` comes right after the formula, before `as TAG` and the note.
            edit = new Edit(d.expr().span().end(), 0, " in " + unit);
        } else if (v.statement() instanceof Statement.Seek s) {
            edit = new Edit(s.rhs().span().end(), 0, " in " + unit);
        } else {
            return null;
        }
        return new Action(title, false, List.of(edit), null);
    }
}
