package dev.plumb.cli;

import dev.plumb.present.Caution;
import dev.plumb.diagnostics.Printable;
import dev.plumb.analysis.Batch;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Severity;
import java.io.PrintWriter;
import java.util.List;

/** `plumb check` for people: one line per finding, then a summary. */
final class TextReport {
    private TextReport() {
    }

    static void write(List<Batch.Checked> results, PrintWriter out, Style style) {
        for (Batch.Checked c : results) {
            for (Diagnostic d : c.diagnostics()) out.println(line(c, d, style));
        }
        Tally t = Tally.of(results);
        String checks = t.checksFailed() == 0 && t.checksNotEvaluated() == 0
            ? style.good(t.checksPassed() + " checks passed")
            : t.checksPassed() + " checks passed, " + style.bad(t.checksFailed() + " failed")
                + (t.checksNotEvaluated() == 0 ? "" : ", " + style.bad(t.checksNotEvaluated() + " not evaluated"));
        out.println(style.bold("Checked " + t.files() + " file" + (t.files() == 1 ? "" : "s") + ": ")
            + plural(t.count(Severity.ERROR), "error") + ", " + plural(t.count(Severity.WARNING), "warning") + ", "
            + plural(t.count(Severity.HINT) + t.count(Severity.INFO), "hint")
            + (t.accepted() == 0 ? "" : ", " + t.accepted() + " accepted") + "; " + checks + ".");
        out.println(Caution.TEXT);
    }

    static String line(Batch.Checked c, Diagnostic d, Style style) {
        // The calc's own text (names, notes, paths) is neutralised before colours are added.
        return Printable.line(Location.of(c.analysis(), d)) + ": " + style.severity(d.severity()) + " " + d.code().id() + ": "
            + Printable.line(d.message()) + (d.isAccepted() ? " [accepted: " + Printable.line(d.accepted()) + "]" : "");
    }

    private static String plural(long n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
    }

    /** Totals over a run. */
    record Tally(int files, long errors, long warnings, long hints, long infos, long accepted, long checksPassed,
                 long checksFailed, long checksNotEvaluated) {
        static Tally of(List<Batch.Checked> results) {
            long[] sev = new long[Severity.values().length];
            long accepted = 0;
            long passed = 0;
            long failed = 0;
            long notEvaluated = 0;
            for (Batch.Checked c : results) {
                for (Diagnostic d : c.diagnostics()) {
                    if (d.isAccepted()) accepted++;
                    else sev[d.severity().ordinal()]++;
                }
                for (Row r : c.analysis().rows()) {
                    if (!(r instanceof Row.CheckRow cr)) continue;
                    if (cr.passed() == null) notEvaluated++;
                    else if (cr.passed()) passed++;
                    else failed++;
                }
            }
            return new Tally(results.size(), sev[0], sev[1], sev[3], sev[2], accepted, passed, failed, notEvaluated);
        }

        /**
         * 1 when anything needs fixing (an error, a failed check, a check not evaluated, and with
         * {@code failOnWarnings} an open warning too), else 0. Accepted findings never fail a run.
         */
        int exitCode(boolean failOnWarnings) {
            boolean fails = errors > 0 || checksFailed > 0 || checksNotEvaluated > 0 || failOnWarnings && warnings > 0;
            return fails ? Main.FINDINGS : Main.CLEAN;
        }

        long count(Severity s) {
            return switch (s) {
                case ERROR -> errors;
                case WARNING -> warnings;
                case INFO -> infos;
                case HINT -> hints;
            };
        }
    }
}
