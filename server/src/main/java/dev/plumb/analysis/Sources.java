package dev.plumb.analysis;

import java.nio.file.Path;

/**
 * Where documents come from. The command line reads files; the language server lays its open
 * editors over the files. The engine itself never touches the file system directly, and every
 * read from disk goes through {@link DiskReads}, which keeps it inside the workspace.
 */
public interface Sources {
    /**
     * The document's text, or why it cannot be read. {@code root} is the workspace root of the
     * analysis that asks: a file whose real path lies outside it reads as missing.
     */
    Loaded load(Path file, Path root);

    /** The largest document, in bytes of UTF-8, that is analysed; a larger one gets one finding. */
    default long maxBytes() {
        return DiskReads.DEFAULT_MAX_BYTES;
    }

    /** The workspace root of a file: `use` may not reach outside it. */
    Path workspaceRoot(Path file);

    /**
     * True when the file's workspace root is a folder marked by `.git` or `plumb.toml`; false
     * when no folder above the file is, and its root is only its own folder.
     */
    default boolean workspaceMarked(Path file) {
        return true;
    }

    sealed interface Loaded {
    }

    record Text(String text) implements Loaded {
    }

    /** The file is missing, unreadable, outside the workspace, not a regular file or too large. */
    record Missing(String reason) implements Loaded {
    }

    /** The file exists but is not UTF-8 text; offset is the first bad byte. */
    record NotText(String reason, long offset) implements Loaded {
    }
}
