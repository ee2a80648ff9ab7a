package dev.plumb.cli;

import dev.plumb.present.Caution;
import dev.plumb.compare.CheckChange;
import dev.plumb.compare.Diff;
import dev.plumb.compare.EntryChange;
import dev.plumb.compare.FileDiff;
import dev.plumb.compare.FindingChange;
import dev.plumb.compare.ValueChange;
import dev.plumb.diagnostics.Printable;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;

/**
 * `plumb diff --format markdown`, for a pull-request comment: the flipped checks first, a short
 * table per calc, and each calc's details folded. Everything from the calcs is escaped, so a name
 * or note cannot break the table or inject markup.
 */
final class DiffMarkdown {
    private DiffMarkdown() {
    }

    static void write(Diff diff, PrintWriter out, int digits) {
        out.println("### Plumb value diff: " + md(DiffHeader.from(diff)) + " → " + md(DiffHeader.to(diff)));
        out.println();
        List<FileDiff> changed = diff.changed().stream()
            .sorted(Comparator.comparing((FileDiff f) -> f.flipped().isEmpty())).toList();
        if (changed.isEmpty()) {
            out.println("No calc changed: every value is within " + DiffWords.tolerance(diff.tolerance()) + " relative, every check as it was.");
            out.println();
        } else {
            flipped(changed, out);
            summary(changed, out);
            for (FileDiff f : changed) details(f, out, digits);
        }
        out.println(md(DiffHeader.tally(diff)) + " Values within " + DiffWords.tolerance(diff.tolerance()) + " relative count as unchanged.");
        out.println();
        out.println("> " + md(Caution.TEXT));
    }

    private static void flipped(List<FileDiff> files, PrintWriter out) {
        List<FileDiff> with = files.stream().filter(f -> !f.flipped().isEmpty()).toList();
        if (with.isEmpty()) return;
        long n = with.stream().mapToLong(f -> f.flipped().size()).sum();
        out.println("**" + DiffWords.plural(n, "check") + " flipped**");
        out.println();
        out.println("| calc | line | check | before | after |");
        out.println("| --- | ---: | --- | --- | --- |");
        for (FileDiff f : with) {
            for (CheckChange c : f.flipped()) {
                out.println("| " + md(Location.path(f.file())) + " | " + c.line() + " | " + md(c.source()) + " | "
                    + md(DiffWords.verdict(c.before())) + " | " + md(DiffWords.verdict(c.after())) + " |");
            }
        }
        out.println();
    }

    private static void summary(List<FileDiff> files, PrintWriter out) {
        out.println("| calc | checks flipped | inputs changed | results changed | values added / removed | findings new / gone |");
        out.println("| --- | ---: | ---: | ---: | ---: | ---: |");
        for (FileDiff f : files) {
            long appeared = f.findings().stream().filter(FindingChange::appeared).count();
            String path = md(Location.path(f.file()))
                + (f.status() == FileDiff.Status.CHANGED ? "" : " (" + DiffWords.summary(f) + ")");
            out.println("| " + path + " | " + f.flipped().size() + " | " + f.inputs().size() + " | " + f.results().size()
                + " | " + f.added().size() + " / " + f.removed().size() + " | " + appeared + " / "
                + (f.findings().size() - appeared) + " |");
        }
        out.println();
    }

    private static void details(FileDiff f, PrintWriter out, int digits) {
        out.println("<details><summary>" + md(Location.path(f.file())) + ": " + md(DiffWords.summary(f)) + "</summary>");
        out.println();
        if (f.before().unreadable() != null) out.println("Could not be read before: " + md(f.before().unreadable()) + "\n");
        if (f.after().unreadable() != null) out.println("Cannot be read now: " + md(f.after().unreadable()) + "\n");
        List<CheckChange> checks = f.checks().stream().sorted(Comparator.comparing(c -> !c.flipped())).toList();
        if (!checks.isEmpty()) {
            out.println("| check | line | before | after |");
            out.println("| --- | ---: | --- | --- |");
            for (CheckChange c : checks) {
                out.println("| " + md(c.source()) + (c.note() == null ? "" : " (" + md(c.note()) + ")") + " | " + c.line()
                    + " | " + md(DiffWords.verdict(c.before())) + " | " + md(DiffWords.verdict(c.after())) + " |");
            }
            out.println();
        }
        values(f, out, digits);
        if (!f.renames().isEmpty()) {
            out.println("Renamed (same formula): " + String.join(", ",
                f.renames().stream().map(r -> md(r.before()) + " → " + md(r.after())).toList()) + "\n");
        }
        for (boolean appeared : new boolean[] {true, false}) {
            List<FindingChange> list = f.findings().stream().filter(x -> x.appeared() == appeared).toList();
            if (list.isEmpty()) continue;
            out.println(appeared ? "Findings new:" : "Findings gone:");
            out.println();
            for (FindingChange x : list) {
                out.println("- line " + x.line() + ":" + x.column() + " " + x.finding().severity().label() + " "
                    + md(x.finding().code().id()) + ": " + md(x.finding().message()));
            }
            out.println();
        }
        for (EntryChange e : f.entries()) {
            out.println("- library " + e.kind() + " " + md(e.name()) + ", line " + e.line() + ": "
                + (e.status() == EntryChange.Status.CHANGED ? "changed: " + String.join(", ", e.parts())
                    : e.status().name().toLowerCase(java.util.Locale.ROOT)));
        }
        for (Path u : f.changedUses()) out.println("- used file changed: " + md(Location.path(u)));
        out.println("</details>");
        out.println();
    }

    private static void values(FileDiff f, PrintWriter out, int digits) {
        List<ValueChange> rows = new java.util.ArrayList<>(f.inputs());
        rows.addAll(f.results());
        rows.addAll(f.added());
        rows.addAll(f.removed());
        if (rows.isEmpty()) return;
        out.println("| value | line | before | after | change |");
        out.println("| --- | ---: | --- | --- | ---: |");
        for (ValueChange v : rows) {
            String kind = v.kind() == ValueChange.Kind.RESULT ? "" : " (input)";
            out.println("| " + md(DiffWords.name(f, v)) + kind + " | " + (v.line() > 0 ? v.line() : "") + " | "
                + md(DiffWords.before(v, digits)) + " | " + md(DiffWords.after(v, digits)) + " | " + md(DiffWords.change(v))
                + " |");
        }
        out.println();
    }

    /** Text from a calc as Markdown that shows it literally: no markup, no HTML, one line. */
    static String md(String s) {
        String text = Printable.line(s);
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '|', '\\', '`', '*', '_', '[', ']', '~', '#', '!' -> out.append('\\').append(c);
                case '\n', '\r' -> out.append(' ');
                default -> out.append(c);
            }
        }
        return out.toString();
    }
}
