package dev.plumb.stdlib;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import dev.plumb.diagnostics.Diagnostic;
import java.nio.file.Path;
import java.util.List;

/** Evaluates standard-library calls the way a user's document does, for tests against published values. */
public final class StdlibCheck {
    private static final Path FILE = Path.of("stdlib-check.plumb").toAbsolutePath();

    private StdlibCheck() {
    }

    /** Analyses a whole document. */
    public static Analysis analyze(String document) {
        return new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(FILE, document);
    }

    /** The SI value of an expression such as {@code cd_sphere_sn(1e3)}; fails on any error. */
    public static double si(String expression) {
        Analysis a = analyze("x = " + expression + "\n");
        List<Diagnostic> errors = a.diagnostics().stream()
            .filter(d -> d.severity() == dev.plumb.diagnostics.Severity.ERROR).toList();
        if (!errors.isEmpty()) throw new AssertionError(expression + ": " + errors);
        Row.ValueRow row = (Row.ValueRow) a.rows().get(0);
        return row.value().si();
    }

    /** The diagnostics of {@code x = expression}: warnings such as range.outside included. */
    public static List<Diagnostic> diagnostics(String expression) {
        return analyze("x = " + expression + "\n").diagnostics();
    }
}
