package dev.plumb.cli;

import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Diagnostic;
import java.nio.file.Path;

/** How a file and a position are written on the command line. */
final class Location {
    private Location() {
    }

    /** The path relative to the working folder when it is near it (at most two levels up), else absolute. */
    static String path(Path file) {
        Path cwd = Path.of("").toAbsolutePath();
        Path abs = file.toAbsolutePath().normalize();
        if (!abs.getRoot().equals(cwd.getRoot())) return abs.toString();
        Path relative = cwd.relativize(abs);
        return relative.startsWith(Path.of("..", "..", "..")) ? abs.toString() : relative.toString();
    }

    /** {@code file:line:col} with 1-based line and column (columns count characters). */
    static String of(Analysis a, Diagnostic d) {
        int offset = Math.min(d.span().start(), a.text().length());
        return path(a.file()) + ":" + a.lines().line(offset) + ":" + a.lines().column(offset);
    }
}
