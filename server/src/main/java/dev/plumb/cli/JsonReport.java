package dev.plumb.cli;

import dev.plumb.present.Caution;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Batch;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Severity;
import java.io.PrintWriter;
import java.util.List;

/** `plumb check --format json`: the same findings for machines (CI annotations, dashboards). */
final class JsonReport {
    private JsonReport() {
    }

    static void write(List<Batch.Checked> results, PrintWriter out) {
        JsonObject root = new JsonObject();
        JsonArray files = new JsonArray();
        for (Batch.Checked c : results) {
            JsonObject f = new JsonObject();
            f.addProperty("path", Location.path(c.analysis().file()));
            JsonArray ds = new JsonArray();
            for (Diagnostic d : c.diagnostics()) ds.add(diagnostic(c.analysis(), d));
            f.add("diagnostics", ds);
            files.add(f);
        }
        root.add("files", files);
        TextReport.Tally t = TextReport.Tally.of(results);
        JsonObject summary = new JsonObject();
        summary.addProperty("files", t.files());
        summary.addProperty("errors", t.count(Severity.ERROR));
        summary.addProperty("warnings", t.count(Severity.WARNING));
        summary.addProperty("hints", t.count(Severity.HINT) + t.count(Severity.INFO));
        summary.addProperty("accepted", t.accepted());
        summary.addProperty("checksPassed", t.checksPassed());
        summary.addProperty("checksFailed", t.checksFailed());
        summary.addProperty("checksNotEvaluated", t.checksNotEvaluated());
        root.add("summary", summary);
        root.addProperty("notice", Caution.TEXT);
        out.println(new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(root));
    }

    static JsonObject diagnostic(Analysis a, Diagnostic d) {
        JsonObject o = new JsonObject();
        o.addProperty("code", d.code().id());
        o.addProperty("severity", d.severity().label());
        int start = Math.min(d.span().start(), a.text().length());
        int end = Math.min(d.span().end(), a.text().length());
        o.addProperty("line", a.lines().line(start));
        o.addProperty("column", a.lines().column(start));
        o.addProperty("endLine", a.lines().line(end));
        o.addProperty("endColumn", a.lines().column(end));
        o.addProperty("message", d.message());
        if (d.isAccepted()) o.addProperty("accepted", d.accepted());
        return o;
    }
}
