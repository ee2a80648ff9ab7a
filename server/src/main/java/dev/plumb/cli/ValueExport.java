package dev.plumb.cli;

import dev.plumb.analysis.Trajectory;
import dev.plumb.present.TrajectoryText;
import dev.plumb.present.UsedValues;
import dev.plumb.present.ValueText;
import dev.plumb.present.CheckText;
import dev.plumb.present.SweepText;
import dev.plumb.present.CaseText;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import java.io.PrintWriter;
import java.util.List;

/**
 * `plumb eval --format json|csv`: every value of a calc for other tools — its name, the line it
 * is defined on, its value in SI and in its display unit, the unit, the dimension in words, and
 * its note; the checks and findings too in JSON.
 */
final class ValueExport {
    private ValueExport() {
    }

    static void json(Analysis a, List<Diagnostic> diagnostics, PrintWriter out) {
        JsonObject root = new JsonObject();
        root.addProperty("path", Location.path(a.file()));
        JsonArray values = new JsonArray();
        JsonArray checks = new JsonArray();
        for (Row r : a.rows()) {
            if (r instanceof Row.ValueRow v) {
                JsonObject o = new JsonObject();
                o.addProperty("name", v.name());
                o.addProperty("line", a.lines().line(v.span().start()));
                o.addProperty("input", v.input());
                if (v.value().known()) {
                    o.addProperty("valueSi", v.value().si());
                    o.addProperty("siUnit", DisplayUnits.defaultFor(v.value().dimension()).symbol());
                    o.addProperty("dimension", v.value().dimension().describe());
                }
                o.addProperty("shown", ValueText.of(a, v));
                Unit display = v.display();
                if (display != null) o.addProperty("unit", display.symbol());
                if (v.note() != null) o.addProperty("note", v.note());
                if (v.origin() != null) o.addProperty("correlation", v.origin().correlation());
                if (v.spread() != null) o.add("spread", spread(v));
                if (v.modelForm() != null) {
                    JsonObject m = new JsonObject();
                    m.addProperty("lowSi", v.modelForm().low());
                    m.addProperty("highSi", v.modelForm().high());
                    if (v.modelForm().through() != null) {
                        m.addProperty("through", v.modelForm().through());
                        m.addProperty("others", v.modelForm().others());
                    }
                    JsonArray entries = new JsonArray();
                    for (dev.plumb.analysis.ModelForm.Entry e : v.modelForm().entries()) {
                        JsonObject x = new JsonObject();
                        x.addProperty("name", e.name());
                        x.addProperty("valueSi", e.si());
                        entries.add(x);
                    }
                    m.add("entries", entries);
                    o.add("modelForm", m);
                }
                values.add(o);
            } else if (r instanceof Row.CheckRow c) {
                JsonObject o = new JsonObject();
                o.addProperty("check", c.source());
                o.addProperty("line", a.lines().line(c.span().start()));
                o.addProperty("verdict", CheckText.word(c));
                o.addProperty("detail", CheckText.detail(c));
                if (c.note() != null) o.addProperty("note", c.note());
                checks.add(o);
            }
        }
        root.add("values", values);
        JsonArray used = new JsonArray();
        for (UsedValues.Used u : UsedValues.of(a)) {
            JsonObject o = new JsonObject();
            o.addProperty("name", u.name());
            o.addProperty("file", UsedValues.relative(a, u.file()));
            o.addProperty("input", u.binding().input());
            if (u.binding().value().known()) {
                o.addProperty("valueSi", u.binding().value().si());
                o.addProperty("siUnit", DisplayUnits.defaultFor(u.binding().value().dimension()).symbol());
                o.addProperty("dimension", u.binding().value().dimension().describe());
            }
            o.addProperty("shown", ValueText.of(u.binding().value(), u.binding().display(), a.settings().significantFigures()));
            if (u.binding().display() != null) o.addProperty("unit", u.binding().display().symbol());
            if (u.binding().note() != null) o.addProperty("note", u.binding().note());
            used.add(o);
        }
        root.add("usedValues", used);
        root.add("checks", checks);
        JsonArray motions = new JsonArray();
        for (Trajectory t : a.trajectories()) motions.add(trajectory(t));
        root.add("trajectories", motions);
        root.add("sweeps", sweeps(a));
        root.add("cases", cases(a));
        JsonArray findings = new JsonArray();
        for (Diagnostic d : diagnostics) findings.add(JsonReport.diagnostic(a, d));
        root.add("diagnostics", findings);
        out.println(new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(root));
    }

    /** A motion: its names, units, how it stopped, and its table (numbers in the units named). */
    private static JsonObject trajectory(Trajectory t) {
        JsonObject o = new JsonObject();
        JsonArray names = new JsonArray();
        JsonArray units = new JsonArray();
        for (int j = 0; j < t.names().size(); j++) {
            names.add(t.names().get(j));
            units.add(t.units().get(j).symbol());
        }
        o.add("names", names);
        o.add("units", units);
        o.addProperty("stopped", t.stop());
        o.addProperty("steps", t.steps());
        JsonArray rows = new JsonArray();
        for (int i = 0; i < t.times().length; i++) {
            JsonArray row = new JsonArray();
            for (int j = 0; j < t.names().size(); j++) row.add(TrajectoryText.number(t, i, j));
            rows.add(row);
        }
        o.add("rows", rows);
        JsonArray visited = new JsonArray();
        t.visited().forEach(visited::add);
        o.add("visited", visited);
        return o;
    }

    /** A motion's table as CSV: a head of names with units, then one row per table time, in those units. */
    static void csvTrajectory(Trajectory t, PrintWriter out) {
        List<String> heads = TrajectoryText.heads(t);
        StringBuilder head = new StringBuilder();
        for (int j = 0; j < heads.size(); j++) head.append(j > 0 ? "," : "").append(quoted(dev.plumb.diagnostics.Printable.line(heads.get(j))));
        out.print(head.append("\r\n"));
        for (int i = 0; i < t.times().length; i++) {
            StringBuilder row = new StringBuilder();
            for (int j = 0; j < heads.size(); j++) row.append(j > 0 ? "," : "").append(TrajectoryText.number(t, i, j));
            out.print(row.append("\r\n"));
        }
    }

    /**
     * Each sweep: the value varied and the results shown, with their units, and per row the
     * value given and each result, in SI and in the column's unit, each check's verdict and the
     * definitions outside a correlation's range there.
     */
    private static JsonArray sweeps(Analysis a) {
        int digits = a.settings().significantFigures();
        JsonArray out = new JsonArray();
        for (Row r : a.rows()) {
            if (!(r instanceof Row.SweepRow w)) continue;
            List<Unit> units = SweepText.units(w);
            JsonObject o = new JsonObject();
            o.addProperty("varied", w.varied());
            o.addProperty("line", a.lines().line(w.span().start()));
            if (units.get(0) != null) o.addProperty("unit", units.get(0).symbol());
            Unit acrossUnit = SweepText.acrossUnit(w, units);
            if (w.across() != null) {
                // A grid: the second value varied, and each row's value of it beside `given`.
                JsonObject across = new JsonObject();
                across.addProperty("name", w.across().name());
                if (acrossUnit != null) across.addProperty("unit", acrossUnit.symbol());
                o.add("across", across);
            }
            JsonArray shown = new JsonArray();
            for (int i = 0; i < w.columns().size(); i++) {
                JsonObject c = new JsonObject();
                c.addProperty("name", w.columns().get(i).name());
                if (units.get(i + 1) != null) c.addProperty("unit", units.get(i + 1).symbol());
                shown.add(c);
            }
            o.add("shown", shown);
            JsonArray checks = new JsonArray();
            w.checks().forEach(checks::add);
            o.add("checks", checks);
            o.addProperty("stopped", w.stopped());
            JsonArray rows = new JsonArray();
            for (Row.SweepLine l : w.lines()) {
                JsonObject row = new JsonObject();
                row.add("given", cell(l.given(), units.get(0), digits));
                if (l.across() != null) row.add("across", cell(l.across(), acrossUnit, digits));
                JsonArray results = new JsonArray();
                for (int i = 0; i < l.results().size(); i++) results.add(cell(l.results().get(i), units.get(i + 1), digits));
                row.add("results", results);
                JsonArray verdicts = new JsonArray();
                l.verdicts().forEach(v -> verdicts.add(v == Row.Verdict.PASSED ? "pass" : v == Row.Verdict.FAILED ? "fail"
                    : v == Row.Verdict.FAILS_AT_BOUND ? "fail at bound" : "not evaluated"));
                row.add("verdicts", verdicts);
                JsonArray outside = new JsonArray();
                l.outside().forEach(outside::add);
                row.add("outsideRange", outside);
                if (l.trouble() != null) row.addProperty("finding", l.trouble());
                rows.add(row);
            }
            o.add("rows", rows);
            out.add(o);
        }
        return out;
    }

    /** A value's spread: in SI, as shown, relative, and each source's share of the variance, largest first. */
    private static JsonObject spread(Row.ValueRow v) {
        JsonObject o = new JsonObject();
        o.addProperty("si", v.spread().si());
        o.addProperty("shown", ValueText.spread(v).strip());
        if (v.value().si() != 0) o.addProperty("relative", v.spread().si() / Math.abs(v.value().si()));
        JsonArray shares = new JsonArray();
        for (dev.plumb.analysis.Spread.Share s : v.spread().shares()) {
            JsonObject x = new JsonObject();
            x.addProperty("source", s.source());
            x.addProperty("kind", s.kind() == dev.plumb.analysis.Spread.Kind.TOLERANCE ? "tolerance" : "accuracy");
            x.addProperty("si", Math.abs(s.si()));
            x.addProperty("share", v.spread().fraction(s));
            shares.add(x);
        }
        o.add("shares", shares);
        dev.plumb.analysis.Spread.Sampled m = v.spread().sampled();
        if (m != null) {
            JsonObject mc = new JsonObject();
            if (Double.isFinite(m.mean())) mc.addProperty("meanSi", m.mean());
            if (Double.isFinite(m.sd())) mc.addProperty("sdSi", m.sd());
            mc.addProperty("samples", m.samples());
            mc.addProperty("failed", m.failed());
            mc.addProperty("seed", m.seed());
            o.add("monteCarlo", mc);
        }
        return o;
    }

    /**
     * Each case: the values it sets, every value it changes with its base value and the ratio,
     * and the checks judged under it.
     */
    private static JsonArray cases(Analysis a) {
        int digits = a.settings().significantFigures();
        JsonArray out = new JsonArray();
        for (Row r : a.rows()) {
            if (!(r instanceof Row.CaseRow k)) continue;
            JsonObject o = new JsonObject();
            o.addProperty("case", k.name());
            o.addProperty("line", a.lines().line(k.span().start()));
            if (k.note() != null) o.addProperty("note", k.note());
            JsonArray given = new JsonArray();
            k.given().forEach(v -> given.add(caseValue(v, digits)));
            o.add("given", given);
            JsonArray changed = new JsonArray();
            k.changed().forEach(v -> changed.add(caseValue(v, digits)));
            o.add("changed", changed);
            JsonArray checks = new JsonArray();
            for (Row.CheckRow c : k.checks()) {
                JsonObject x = new JsonObject();
                x.addProperty("check", c.source());
                x.addProperty("verdict", CheckText.word(c));
                x.addProperty("detail", CheckText.detail(c));
                checks.add(x);
            }
            o.add("checks", checks);
            out.add(o);
        }
        return out;
    }

    private static JsonObject caseValue(Row.CaseValue v, int digits) {
        JsonObject o = new JsonObject();
        o.addProperty("name", v.name());
        if (v.base().known()) o.addProperty("baseSi", v.base().si());
        if (v.value().known()) o.addProperty("valueSi", v.value().si());
        o.addProperty("baseShown", ValueText.of(v.base(), v.display(), digits));
        o.addProperty("shown", ValueText.of(v.value(), v.display(), digits));
        Double ratio = CaseText.ratioOf(v);
        if (ratio != null) o.addProperty("ratio", ratio);
        return o;
    }

    /** A value of a sweep's table: SI (absent when unknown) and as shown in the column's unit. */
    private static JsonObject cell(dev.plumb.analysis.Value v, Unit unit, int digits) {
        JsonObject o = new JsonObject();
        if (v.known()) o.addProperty("valueSi", v.si());
        o.addProperty("shown", SweepText.number(v, unit, digits));
        return o;
    }

    /**
     * The table of the sweep that varies {@code varied}, one row per value given: the numbers in
     * the header's units, then the checks' marks and the range column as `plumb eval` shows them.
     * False when the calc has no such sweep.
     */
    static boolean sweepCsv(Analysis a, String varied, PrintWriter out) {
        for (Row r : a.rows()) {
            if (!(r instanceof Row.SweepRow w) || !w.varied().equals(varied)) continue;
            List<Unit> units = SweepText.units(w);
            line(SweepText.header(w), out);
            for (Row.SweepLine l : w.lines()) line(SweepText.cells(w, l, units, a.settings().significantFigures()), out);
            return true;
        }
        return false;
    }

    private static void line(List<String> cells, PrintWriter out) {
        StringBuilder line = new StringBuilder();
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) line.append(',');
            line.append(quoted(dev.plumb.diagnostics.Printable.line(cells.get(i))));
        }
        out.print(line.append("\r\n"));
    }

    /**
     * One row per value, RFC 4180 quoting (the spread after the value, empty for a value without
     * one), then two columns per case, in the order the cases are written: the value under that
     * case in SI and as shown (a value the case does not change is its base value there). An
     * unknown value has empty number cells and "?" as shown.
     */
    static void csv(Analysis a, PrintWriter out) {
        List<Row.CaseRow> cases = a.rows().stream().filter(r -> r instanceof Row.CaseRow).map(r -> (Row.CaseRow) r).toList();
        StringBuilder head = new StringBuilder("name,line,input,value_si,si_unit,shown,unit,dimension,note,spread_si,spread");
        for (Row.CaseRow k : cases) head.append(",case_").append(k.name()).append("_si,case_").append(k.name());
        out.print(head.append("\r\n"));
        int digits = a.settings().significantFigures();
        for (Row r : a.rows()) {
            if (!(r instanceof Row.ValueRow v)) continue;
            boolean known = v.value().known();
            List<String> cells = new java.util.ArrayList<>(List.of(
                v.name(), String.valueOf(a.lines().line(v.span().start())), String.valueOf(v.input()),
                known ? String.valueOf(v.value().si()) : "", known ? DisplayUnits.defaultFor(v.value().dimension()).symbol() : "",
                ValueText.of(a, v), v.display() == null ? "" : v.display().symbol(), known ? v.value().dimension().describe() : "",
                v.note() == null ? "" : v.note(), v.spread() == null ? "" : String.valueOf(v.spread().si()),
                ValueText.spread(v).strip()));
            for (Row.CaseRow k : cases) {
                dev.plumb.analysis.Value there = underCase(k, v);
                cells.add(there.known() ? String.valueOf(there.si()) : "");
                cells.add(ValueText.of(there, v.display(), digits));
            }
            StringBuilder line = new StringBuilder();
            for (int i = 0; i < cells.size(); i++) {
                if (i > 0) line.append(',');
                // A calc's own text may hold control characters: written escaped, never raw.
                line.append(quoted(dev.plumb.diagnostics.Printable.line(cells.get(i))));
            }
            out.print(line.append("\r\n"));
        }
    }

    /** A value under a case: as the case set or changed it, else its base value. */
    private static dev.plumb.analysis.Value underCase(Row.CaseRow k, Row.ValueRow v) {
        for (List<Row.CaseValue> values : List.of(k.given(), k.changed())) {
            for (Row.CaseValue c : values) if (c.name().equals(v.name())) return c.value();
        }
        return v.value();
    }

    /** A cell quoted when it holds a comma, a quote or a line break (RFC 4180), quotes doubled. */
    private static String quoted(String cell) {
        boolean plain = cell.chars().noneMatch(c -> c == ',' || c == '"' || c == '\n' || c == '\r');
        return plain ? cell : "\"" + cell.replace("\"", "\"\"") + "\"";
    }
}
