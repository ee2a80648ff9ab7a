package dev.plumb.cli;

import dev.plumb.compare.CheckChange;
import dev.plumb.compare.Diff;
import dev.plumb.compare.FileDiff;
import dev.plumb.compare.FindingChange;
import dev.plumb.diagnostics.Printable;

/** The words every format of `plumb diff` opens and closes with: what was compared, and the totals. */
final class DiffHeader {
    private DiffHeader() {
    }

    /** "HEAD (1a2b3c4)", "working tree" or a file's path. */
    static String from(Diff d) {
        return named(d.before());
    }

    static String to(Diff d) {
        return named(d.after());
    }

    private static String named(Diff.Named n) {
        String shown = Printable.line(n.label());
        // A commit named by its id is not named twice.
        if (n.shortId() == null || n.fullId().startsWith(n.label())) return shown;
        return shown + " (" + n.shortId() + ")";
    }

    /** "2 of 11 calcs changed: 1 check flipped, 3 results changed, 1 finding new." */
    static String tally(Diff d) {
        long flipped = d.files().stream().mapToLong(f -> f.flipped().size()).sum();
        long checks = d.files().stream().mapToLong(f -> f.checks().stream().filter(c -> !c.flipped()).count()).sum();
        long inputs = d.files().stream().mapToLong(f -> f.inputs().size()).sum();
        long results = d.files().stream().mapToLong(f -> f.results().size()).sum();
        long appeared = d.files().stream().mapToLong(f -> f.findings().stream().filter(FindingChange::appeared).count()).sum();
        long gone = d.files().stream().mapToLong(f -> f.findings().stream().filter(x -> !x.appeared()).count()).sum();
        String head = d.changed().size() + " of " + DiffWords.plural(d.files().size(), "calc") + " changed";
        if (!d.anyChange()) return head + ".";
        return head + ": " + DiffWords.plural(flipped, "check") + " flipped, " + checks + " added or removed; "
            + DiffWords.plural(inputs, "input") + " and " + DiffWords.plural(results, "result") + " changed; "
            + DiffWords.plural(appeared, "finding") + " new, " + gone + " gone.";
    }

    static long flipped(FileDiff f) {
        return f.checks().stream().filter(CheckChange::flipped).count();
    }
}
