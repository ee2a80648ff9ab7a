package dev.plumb.cli;

import dev.plumb.analysis.Trajectory;
import dev.plumb.present.TrajectoryText;
import dev.plumb.present.UsedValues;
import dev.plumb.present.ValueText;
import dev.plumb.present.CheckText;
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

    /** One row per value, RFC 4180 quoting; an unknown value has empty number cells and "?" as shown. */
    static void csv(Analysis a, PrintWriter out) {
        out.print("name,line,input,value_si,si_unit,shown,unit,dimension,note\r\n");
        for (Row r : a.rows()) {
            if (!(r instanceof Row.ValueRow v)) continue;
            boolean known = v.value().known();
            String[] cells = {
                v.name(), String.valueOf(a.lines().line(v.span().start())), String.valueOf(v.input()),
                known ? String.valueOf(v.value().si()) : "", known ? DisplayUnits.defaultFor(v.value().dimension()).symbol() : "",
                ValueText.of(a, v), v.display() == null ? "" : v.display().symbol(), known ? v.value().dimension().describe() : "",
                v.note() == null ? "" : v.note()};
            StringBuilder line = new StringBuilder();
            for (int i = 0; i < cells.length; i++) {
                if (i > 0) line.append(',');
                // A calc's own text may hold control characters: written escaped, never raw.
                line.append(quoted(dev.plumb.diagnostics.Printable.line(cells[i])));
            }
            out.print(line.append("\r\n"));
        }
    }

    /** A cell quoted when it holds a comma, a quote or a line break (RFC 4180), quotes doubled. */
    private static String quoted(String cell) {
        boolean plain = cell.chars().noneMatch(c -> c == ',' || c == '"' || c == '\n' || c == '\r');
        return plain ? cell : "\"" + cell.replace("\"", "\"\"") + "\"";
    }
}
