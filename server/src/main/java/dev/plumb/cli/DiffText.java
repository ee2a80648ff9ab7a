package dev.plumb.cli;

import dev.plumb.present.Caution;
import dev.plumb.analysis.Row;
import dev.plumb.compare.CheckChange;
import dev.plumb.compare.Diff;
import dev.plumb.compare.EntryChange;
import dev.plumb.compare.FileDiff;
import dev.plumb.compare.FindingChange;
import dev.plumb.compare.ValueChange;
import dev.plumb.diagnostics.Printable;
import dev.plumb.present.CheckText;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;

/** `plumb diff` for the terminal: per changed calc, flipped checks first, then values, findings and entries. */
final class DiffText {
    private DiffText() {
    }

    static void write(Diff diff, PrintWriter out, Style style, int digits) {
        out.println(style.bold("Value diff: " + DiffHeader.from(diff) + " → " + DiffHeader.to(diff)) + "; values within "
            + DiffWords.tolerance(diff.tolerance()) + " relative count as unchanged.");
        for (FileDiff f : diff.changed()) {
            out.println();
            out.println(style.bold(p(Location.path(f.file()))) + ": " + DiffWords.summary(f));
            unreadable(f, out);
            checks(f, out, style);
            values("inputs changed", f, f.inputs(), out, digits, true);
            values("results changed", f, f.results(), out, digits, true);
            values("values added", f, f.added(), out, digits, false);
            values("values removed", f, f.removed(), out, digits, false);
            renames(f, out);
            findings(f, out, style);
            entries(f, out);
            uses(f, out);
        }
        out.println();
        out.println(style.bold(DiffHeader.tally(diff)));
        out.println(Caution.TEXT);
    }

    private static void unreadable(FileDiff f, PrintWriter out) {
        if (f.before().unreadable() != null) out.println("  could not be read before: " + p(f.before().unreadable()));
        if (f.after().unreadable() != null) out.println("  cannot be read now: " + p(f.after().unreadable()));
    }

    private static void checks(FileDiff f, PrintWriter out, Style style) {
        if (f.checks().isEmpty()) return;
        out.println("  checks");
        // Flipped first: they are what a reviewer must see.
        for (CheckChange c : f.checks().stream().sorted(java.util.Comparator.comparing(c -> !c.flipped())).toList()) {
            String marks = DiffWords.marks(c);
            Row.CheckRow now = c.after() != null ? c.after() : c.before();
            String painted = now.verdict() == Row.Verdict.PASSED && !c.removed() ? style.good(marks) : style.bad(marks);
            String sides = c.added() ? CheckText.detail(c.after()) : c.removed() ? CheckText.detail(c.before())
                : CheckText.detail(c.before()) + " → " + CheckText.detail(c.after());
            out.println("    " + painted + "  line " + c.line() + ": " + p(c.source())
                + (c.note() == null ? "" : " \"" + p(c.note()) + "\"") + ": " + p(sides));
        }
    }

    private static void values(String title, FileDiff f, List<ValueChange> values, PrintWriter out, int digits, boolean paired) {
        if (values.isEmpty()) return;
        out.println("  " + title);
        int width = values.stream().mapToInt(v -> DiffWords.name(f, v).codePointCount(0, DiffWords.name(f, v).length()))
            .max().orElse(0);
        for (ValueChange v : values) {
            String name = DiffWords.name(f, v);
            String pad = " ".repeat(width - name.codePointCount(0, name.length()));
            String where = v.line() > 0 ? "line " + v.line() + "  " : "";
            String what = paired
                ? DiffWords.before(v, digits) + " → " + DiffWords.after(v, digits) + "  " + DiffWords.change(v)
                : v.status() == ValueChange.Status.ADDED ? DiffWords.after(v, digits) : DiffWords.before(v, digits);
            out.println("    " + p(name) + pad + "  " + where + p(what));
        }
    }

    private static void renames(FileDiff f, PrintWriter out) {
        if (f.renames().isEmpty()) return;
        out.println("  renamed (same formula)");
        f.renames().forEach(r -> out.println("    " + p(r.before()) + " → " + p(r.after())));
    }

    private static void findings(FileDiff f, PrintWriter out, Style style) {
        for (boolean appeared : new boolean[] {true, false}) {
            List<FindingChange> list = f.findings().stream().filter(x -> x.appeared() == appeared).toList();
            if (list.isEmpty()) continue;
            out.println(appeared ? "  findings new" : "  findings gone");
            for (FindingChange x : list) {
                out.println("    line " + x.line() + ":" + x.column() + " " + style.severity(x.finding().severity()) + " "
                    + x.finding().code().id() + ": " + p(x.finding().message()));
            }
        }
    }

    private static void entries(FileDiff f, PrintWriter out) {
        if (f.entries().isEmpty()) return;
        out.println("  library entries");
        for (EntryChange e : f.entries()) {
            String what = switch (e.status()) {
                case ADDED -> "added";
                case REMOVED -> "removed";
                case CHANGED -> "changed: " + String.join(", ", e.parts());
            };
            out.println("    " + e.kind() + " " + p(e.name()) + ", line " + e.line() + ": " + what);
        }
    }

    private static void uses(FileDiff f, PrintWriter out) {
        if (f.changedUses().isEmpty()) return;
        out.println("  used files changed");
        for (Path u : f.changedUses()) out.println("    " + p(Location.path(u)));
    }

    private static String p(String s) {
        return Printable.line(s);
    }
}
