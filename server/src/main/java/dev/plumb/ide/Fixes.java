package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import dev.plumb.units.DisplayUnits;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Code actions: quick fixes for findings that name their fix (a missing `*`, a close spelling,
 * a correlation valid at the value, the frontal area, a density of the right kind) and refactors
 * on a definition (show it in SI).
 */
public final class Fixes {
    /** One action: a title, whether it fixes a finding, and its edits. */
    public record Action(String title, boolean quickFix, List<Edit> edits, Diagnostic fixes) {
    }

    private static final Pattern DID_YOU_MEAN = Pattern.compile("did you mean ((?:'[^']+'(?: or )?)+)\\?");
    private static final Pattern QUOTED = Pattern.compile("'([^']+)'");
    private static final Pattern WITHIN = Pattern.compile("within range: ([\\w, .]+)$");
    private static final Pattern SUCH_AS = Pattern.compile("such as (\\S+)$");
    private static final Pattern AREA_FIX = Pattern.compile("but ([\\p{L}_][\\p{L}\\p{Nd}_]*) has the shape .*\\(here `([^`]+)`\\)");
    private static final Pattern ROLE = Pattern.compile("takes \\S+ as the density of the (fluid|body), but");
    private static final Pattern EXPRESSION = Pattern.compile("=\\s*(.*?)(\\s+in\\s+\\S+|\\s+as\\s+\\S+|\\s+\"|\\s*$)",
        Pattern.DOTALL);

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
            out.addAll(quickFixes(a, d));
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

    private static List<Action> quickFixes(Analysis a, Diagnostic d) {
        List<Action> out = new ArrayList<>();
        if (d.fix() != null) {
            // A finding that carries its own repair: offered as it is, first.
            out.add(new Action(d.fix().title(), true, List.of(new Edit(d.fix().span().start(), d.fix().span().length(),
                d.fix().text())), d));
        }
        String m = d.message();
        if (d.code() == Code.SYNTAX_ERROR && m.startsWith("missing operator between")) {
            out.add(new Action("Insert '*'", true, List.of(new Edit(d.span().start(), 0, "* ")), d));
        }
        if (d.code() == Code.UNIT_UNKNOWN || d.code() == Code.NAME_UNKNOWN) {
            Matcher mean = DID_YOU_MEAN.matcher(m);
            if (mean.find()) {
                Matcher q = QUOTED.matcher(mean.group(1));
                while (q.find()) {
                    out.add(new Action("Change to '" + q.group(1) + "'", true,
                        List.of(new Edit(d.span().start(), d.span().length(), q.group(1))), d));
                }
            }
        }
        if (d.code() == Code.UNIT_MISMATCH && m.startsWith("`in ")) {
            Matcher such = SUCH_AS.matcher(m);
            if (such.find()) {
                out.add(new Action("Show it in " + such.group(1), true,
                    List.of(new Edit(d.span().start(), d.span().length(), such.group(1))), d));
            }
        }
        if (d.code() == Code.BASIS_AREA) {
            Matcher fix = AREA_FIX.matcher(m);
            if (fix.find()) {
                Edit e = replaceFormula(a, fix.group(1), fix.group(2));
                if (e != null) out.add(new Action("Use the frontal area " + fix.group(2) + " for " + fix.group(1), true,
                    List.of(e), d));
            }
        }
        if (d.code() == Code.BASIS_DENSITY) {
            Matcher role = ROLE.matcher(m);
            if (role.find()) {
                for (String name : densitiesTagged(a, role.group(1))) {
                    out.add(new Action("Use " + name + " (tagged " + role.group(1) + ")", true,
                        List.of(new Edit(d.span().start(), d.span().length(), name)), d));
                }
            }
        }
        if (d.code() == Code.RANGE_OUTSIDE) {
            Matcher w = WITHIN.matcher(m);
            String call = a.text().substring(d.span().start(), d.span().end());
            int paren = call.indexOf('(');
            if (w.find() && paren > 0) {
                for (String alt : w.group(1).split(",\\s*")) {
                    out.add(new Action("Use " + alt.strip() + ", valid here", true,
                        List.of(new Edit(d.span().start(), paren, alt.strip())), d));
                }
            }
        }
        return out;
    }

    /** The document's own densities tagged {@code as TAG}, in source order. */
    private static List<String> densitiesTagged(Analysis a, String tag) {
        List<String> out = new ArrayList<>();
        for (Row r : a.rows()) {
            // A density tag stays on a definition only when its value is a density.
            if (r instanceof Row.ValueRow v && tag.equals(v.basis())) {
                out.add(v.name());
            }
        }
        return out;
    }

    /** Replaces the formula of a definition of this document, keeping its `in`, `as` and note. */
    private static Edit replaceFormula(Analysis a, String name, String formula) {
        for (Row r : a.rows()) {
            if (!(r instanceof Row.ValueRow v) || !v.name().equals(name) || v.input()) continue;
            String statement = a.text().substring(v.span().start(), v.span().end());
            Matcher e = EXPRESSION.matcher(statement);
            if (!e.find()) return null;
            return new Edit(v.span().start() + e.start(1), e.end(1) - e.start(1), formula);
        }
        return null;
    }

    /** "Show in SI": set the definition's `in` unit to the SI unit of its dimension. */
    private static Action showInSi(Analysis a, Row.ValueRow v) {
        if (!v.value().known() || v.value().dimension().isDimensionless()) return null;
        String si = DisplayUnits.defaultFor(v.value().dimension()).symbol();
        if (v.shown().endsWith(" " + si)) return null;
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

    /** Sets (or replaces) a definition's `in UNIT`. */
    private static Action showIn(Analysis a, Row.ValueRow v, String unit, String title) {
        String si = unit;
        String text = a.text();
        int end = v.span().end();
        String statement = text.substring(v.span().start(), end);
        int note = statement.indexOf('"');
        int bodyEnd = note >= 0 ? v.span().start() + note : end;
        Matcher in = Pattern.compile("\\sin\\s+\\S+").matcher(text.substring(v.span().start(), bodyEnd));
        Edit edit;
        if (in.find()) {
            edit = new Edit(v.span().start() + in.start(), in.end() - in.start(), " in " + si);
        } else {
            // `in UNIT` comes before `as TAG` and the note.
            Matcher as = Pattern.compile("\\sas\\s").matcher(text.substring(v.span().start(), bodyEnd));
            int at = as.find() ? v.span().start() + as.start() : bodyEnd;
            while (at > v.span().start() && Character.isWhitespace(text.charAt(at - 1))) at--;
            edit = new Edit(at, 0, " in " + si);
        }
        return new Action(title, false, List.of(edit), null);
    }
}
