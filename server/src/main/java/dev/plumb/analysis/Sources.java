package dev.plumb.analysis;

import java.nio.file.Path;

/**
 * Where documents come from. The command line reads files; the language server will lay its
 * open editors over the files. The engine itself never touches the file system directly.
 */
public interface Sources {
    /** The document's text, or why it cannot be read. */
    Loaded load(Path file);

    /** The workspace root of a file: `use` may not reach outside it. */
    Path workspaceRoot(Path file);

    sealed interface Loaded {
    }

    record Text(String text) implements Loaded {
    }

    /** The file is missing or unreadable. */
    record Missing(String reason) implements Loaded {
    }

    /** The file exists but is not UTF-8 text; offset is the first bad byte. */
    record NotText(String reason, long offset) implements Loaded {
    }
}
