package dev.plumb.cli;

import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Diagnostic;
import java.nio.file.Path;

/** How a file and a position are written on the command line. */
final class Location {
    private Location() {
    }

    /** The path relative to the working folder when it lies below it, else as is. */
    static String path(Path file) {
        Path cwd = Path.of("").toAbsolutePath();
        Path abs = file.toAbsolutePath().normalize();
        return abs.startsWith(cwd) ? cwd.relativize(abs).toString() : abs.toString();
    }

    /** {@code file:line:col} with 1-based line and column (columns count characters). */
    static String of(Analysis a, Diagnostic d) {
        int offset = Math.min(d.span().start(), a.text().length());
        return path(a.file()) + ":" + a.lines().line(offset) + ":" + a.lines().column(offset);
    }
}
