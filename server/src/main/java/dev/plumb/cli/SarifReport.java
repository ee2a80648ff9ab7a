package dev.plumb.cli;

import dev.plumb.present.Caution;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Batch;
import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Related;
import dev.plumb.diagnostics.Severity;
import java.io.PrintWriter;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;

/**
 * `plumb check --format sarif`: the findings as a SARIF 2.1.0 log (OASIS Static Analysis Results
 * Interchange Format), which code-review hosts and CI dashboards read to show each finding on
 * its line. Columns are counted in UTF-16 code units, as the log says (`columnKind`); files
 * under the working folder are given relative to it (`%SRCROOT%`).
 */
final class SarifReport {
    static final String SCHEMA = "https://json.schemastore.org/sarif-2.1.0.json";
    private static final String ROOT = "%SRCROOT%";

    private SarifReport() {
    }

    static void write(List<Batch.Checked> results, String version, PrintWriter out) {
        Path cwd = Path.of("").toAbsolutePath();
        JsonObject driver = new JsonObject();
        driver.addProperty("name", "plumb");
        driver.addProperty("version", version);
        JsonArray rules = new JsonArray();
        for (Code c : Code.values()) {
            JsonObject rule = new JsonObject();
            rule.addProperty("id", c.id());
            DiagnosticsGuide.Section guide = DiagnosticsGuide.of(c.id());
            if (guide != null) {
                rule.add("shortDescription", text("text", guide.firstSentence()));
                rule.add("fullDescription", text("text", guide.summary()));
                JsonObject help = text("text", guide.fix().isEmpty() ? guide.summary() : guide.summary() + " Fix: " + guide.fix());
                help.addProperty("markdown", guide.markdown());
                rule.add("help", help);
            }
            JsonObject config = new JsonObject();
            config.addProperty("level", level(c.severity()));
            rule.add("defaultConfiguration", config);
            rules.add(rule);
        }
        driver.add("rules", rules);
        JsonObject tool = new JsonObject();
        tool.add("driver", driver);

        JsonArray found = new JsonArray();
        for (Batch.Checked c : results) {
            for (Diagnostic d : c.diagnostics()) found.add(result(c.analysis(), d, cwd));
        }
        JsonObject run = new JsonObject();
        run.add("tool", tool);
        JsonObject base = new JsonObject();
        JsonObject root = new JsonObject();
        root.addProperty("uri", cwd.toUri().toString());
        base.add(ROOT, root);
        run.add("originalUriBaseIds", base);
        run.addProperty("columnKind", "utf16CodeUnits");
        run.add("results", found);
        JsonObject properties = new JsonObject();
        properties.addProperty("notice", Caution.TEXT);
        run.add("properties", properties);

        JsonObject log = new JsonObject();
        log.addProperty("$schema", SCHEMA);
        log.addProperty("version", "2.1.0");
        JsonArray runs = new JsonArray();
        runs.add(run);
        log.add("runs", runs);
        out.println(new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(log));
    }

    private static JsonObject result(Analysis a, Diagnostic d, Path cwd) {
        JsonObject r = new JsonObject();
        r.addProperty("ruleId", d.code().id());
        r.addProperty("ruleIndex", d.code().ordinal());
        r.addProperty("level", level(d.severity()));
        JsonObject message = new JsonObject();
        message.addProperty("text", d.message());
        r.add("message", message);
        JsonArray locations = new JsonArray();
        locations.add(location(a, a.file(), d.span().start(), d.span().end(), cwd));
        r.add("locations", locations);
        JsonArray related = new JsonArray();
        for (Related rel : d.related()) {
            // Related places in this file have their offsets here; in another file, only its name.
            if (rel.file() == null || !Path.of(rel.file()).equals(a.file())) continue;
            JsonObject l = location(a, a.file(), rel.span().start(), rel.span().end(), cwd);
            JsonObject text = new JsonObject();
            text.addProperty("text", rel.message());
            l.add("message", text);
            related.add(l);
        }
        if (!related.isEmpty()) r.add("relatedLocations", related);
        if (d.isAccepted()) {
            // Accepted in the calc itself: SARIF 2.1.0's own suppression, with the reviewer's reason.
            JsonObject suppression = new JsonObject();
            suppression.addProperty("kind", "inSource");
            suppression.addProperty("status", "accepted");
            suppression.addProperty("justification", d.accepted());
            JsonArray suppressions = new JsonArray();
            suppressions.add(suppression);
            r.add("suppressions", suppressions);
        }
        return r;
    }

    private static JsonObject location(Analysis a, Path file, int startOffset, int endOffset, Path cwd) {
        int start = Math.min(startOffset, a.text().length());
        int end = Math.min(Math.max(endOffset, start), a.text().length());
        JsonObject region = new JsonObject();
        region.addProperty("startLine", a.lines().line(start));
        region.addProperty("startColumn", a.lines().utf16Column(start) + 1);
        region.addProperty("endLine", a.lines().line(end));
        region.addProperty("endColumn", a.lines().utf16Column(end) + 1);
        JsonObject physical = new JsonObject();
        physical.add("artifactLocation", artifact(file, cwd));
        physical.add("region", region);
        JsonObject location = new JsonObject();
        location.add("physicalLocation", physical);
        return location;
    }

    /** A path under the working folder relative to it; any other as an absolute file URI. */
    private static JsonObject artifact(Path file, Path cwd) {
        Path abs = file.toAbsolutePath().normalize();
        JsonObject artifact = new JsonObject();
        if (abs.startsWith(cwd)) {
            artifact.addProperty("uri", relativeUri(cwd.relativize(abs)));
            artifact.addProperty("uriBaseId", ROOT);
        } else {
            artifact.addProperty("uri", abs.toUri().toString());
        }
        return artifact;
    }

    private static String relativeUri(Path relative) {
        String path = relative.toString().replace('\\', '/');
        try {
            return new URI(null, null, path, null).toASCIIString();
        } catch (URISyntaxException e) {
            return path;
        }
    }

    private static JsonObject text(String key, String value) {
        JsonObject o = new JsonObject();
        o.addProperty(key, value);
        return o;
    }

    private static String level(Severity s) {
        return switch (s) {
            case ERROR -> "error";
            case WARNING -> "warning";
            default -> "note";
        };
    }
}
