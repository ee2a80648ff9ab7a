package dev.plumb.ide;

import dev.plumb.diagnostics.Span;
import java.nio.file.Path;

/** Where a name is defined: a file (a library file lies under Stdlib.ROOT) and the name's span. */
public record Target(Path file, Span span) {
}
