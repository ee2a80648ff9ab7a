package dev.plumb.cli;

import dev.plumb.present.Caution;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Value;
import dev.plumb.compare.CheckChange;
import dev.plumb.compare.Diff;
import dev.plumb.compare.EntryChange;
import dev.plumb.compare.FileDiff;
import dev.plumb.compare.FindingChange;
import dev.plumb.compare.ValueChange;
import dev.plumb.present.CheckText;
import dev.plumb.units.DisplayUnits;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * `plumb diff --format json`, for tools: every compared calc with its status, and for each changed
 * one its checks, values (SI and as shown), renames, findings, library entries and used files.
 */
final class DiffJson {
    private DiffJson() {
    }

    static void write(Diff diff, PrintWriter out, int digits) {
        JsonObject root = new JsonObject();
        root.add("before", named(diff.before()));
        root.add("after", named(diff.after()));
        root.addProperty("tolerance", diff.tolerance());
        root.addProperty("changed", diff.anyChange());
        root.addProperty("checkFlipped", diff.anyCheckFlipped());
        JsonArray files = new JsonArray();
        for (FileDiff f : diff.files()) files.add(file(f, digits));
        root.add("files", files);
        root.addProperty("notice", Caution.TEXT);
        out.println(new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(root));
    }

    private static JsonObject named(Diff.Named n) {
        JsonObject o = new JsonObject();
        o.addProperty("label", n.label());
        if (n.fullId() != null) {
            o.addProperty("commit", n.fullId());
            o.addProperty("shortCommit", n.shortId());
        }
        return o;
    }

    private static JsonObject file(FileDiff f, int digits) {
        JsonObject o = new JsonObject();
        o.addProperty("path", Location.path(f.file()));
        o.addProperty("status", word(f.status()));
        if (f.status() == FileDiff.Status.UNCHANGED) return o;
        if (f.before().unreadable() != null) o.addProperty("unreadableBefore", f.before().unreadable());
        if (f.after().unreadable() != null) o.addProperty("unreadableAfter", f.after().unreadable());
        JsonArray checks = new JsonArray();
        f.checks().stream().sorted(java.util.Comparator.comparing(c -> !c.flipped())).forEach(c -> checks.add(check(c)));
        o.add("checks", checks);
        List<ValueChange> values = new ArrayList<>(f.inputs());
        values.addAll(f.results());
        values.addAll(f.added());
        values.addAll(f.removed());
        f.values().stream().filter(v -> !v.reported()).forEach(values::add);
        JsonArray vs = new JsonArray();
        for (ValueChange v : values) vs.add(value(f, v, digits));
        o.add("values", vs);
        JsonArray renamed = new JsonArray();
        f.renames().forEach(r -> {
            JsonObject x = new JsonObject();
            x.addProperty("before", r.before());
            x.addProperty("after", r.after());
            renamed.add(x);
        });
        o.add("renamed", renamed);
        JsonArray findings = new JsonArray();
        for (FindingChange x : f.findings()) {
            JsonObject j = new JsonObject();
            j.addProperty("change", x.appeared() ? "new" : "gone");
            j.addProperty("code", x.finding().code().id());
            j.addProperty("severity", x.finding().severity().label());
            j.addProperty("line", x.line());
            j.addProperty("column", x.column());
            j.addProperty("message", x.finding().message());
            findings.add(j);
        }
        o.add("findings", findings);
        JsonArray entries = new JsonArray();
        for (EntryChange e : f.entries()) {
            JsonObject j = new JsonObject();
            j.addProperty("name", e.name());
            j.addProperty("kind", e.kind());
            j.addProperty("status", e.status().name().toLowerCase(Locale.ROOT));
            JsonArray parts = new JsonArray();
            e.parts().forEach(parts::add);
            j.add("parts", parts);
            j.addProperty("line", e.line());
            entries.add(j);
        }
        o.add("libraryEntries", entries);
        JsonArray uses = new JsonArray();
        for (Path u : f.changedUses()) uses.add(Location.path(u));
        o.add("usedFilesChanged", uses);
        return o;
    }

    private static JsonObject check(CheckChange c) {
        JsonObject o = new JsonObject();
        o.addProperty("check", c.source());
        o.addProperty("line", c.line());
        if (c.note() != null) o.addProperty("note", c.note());
        o.addProperty("change", c.flipped() ? "flipped" : c.added() ? "added" : "removed");
        if (c.before() != null) o.add("before", verdict(c.before()));
        if (c.after() != null) o.add("after", verdict(c.after()));
        return o;
    }

    private static JsonObject verdict(Row.CheckRow c) {
        JsonObject o = new JsonObject();
        o.addProperty("verdict", CheckText.word(c));
        o.addProperty("detail", CheckText.detail(c));
        return o;
    }

    private static JsonObject value(FileDiff f, ValueChange v, int digits) {
        JsonObject o = new JsonObject();
        o.addProperty("name", v.name());
        if (v.formerName() != null) o.addProperty("formerName", v.formerName());
        o.addProperty("kind", v.kind().name().toLowerCase(Locale.ROOT));
        if (v.usedFrom() != null) o.addProperty("from", Location.path(v.usedFrom()));
        if (v.line() > 0) o.addProperty("line", v.line());
        o.addProperty("status", word(v.status()));
        if (v.before() != null) o.add("before", side(v.before(), DiffWords.before(v, digits)));
        if (v.after() != null) o.add("after", side(v.after(), DiffWords.after(v, digits)));
        if (v.relative() != null) o.addProperty("relative", v.relative());
        return o;
    }

    /** A value in SI (absent when not computed) and as shown. */
    private static JsonObject side(Value v, String shown) {
        JsonObject o = new JsonObject();
        o.addProperty("computed", v.known());
        if (v.known()) {
            o.addProperty("si", v.si());
            o.addProperty("siUnit", DisplayUnits.defaultFor(v.dimension()).symbol());
        }
        o.addProperty("shown", shown);
        return o;
    }

    /** An enum constant as a JSON word: NOT_COMPUTED_BEFORE → "not-computed-before". */
    private static String word(Enum<?> e) {
        return e.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
