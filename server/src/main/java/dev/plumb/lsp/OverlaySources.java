package dev.plumb.lsp;

import dev.plumb.analysis.DiskReads;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Sources;
import java.nio.file.Path;

/**
 * Documents as the editor has them: open buffers first, the files on disk otherwise. An open
 * buffer obeys the same workspace rule as a file (DiskReads), so a link cannot bring in a
 * buffer from outside either.
 */
final class OverlaySources implements Sources {
    private final DocumentStore documents;
    private final FileSources disk;

    OverlaySources(DocumentStore documents, long maxBytes) {
        this.documents = documents;
        this.disk = new FileSources(maxBytes);
    }

    @Override
    public Loaded load(Path file, Path root) {
        OpenDocument d = documents.byPath(file.toAbsolutePath().normalize());
        if (d == null) return disk.load(file, root);
        if (!DiskReads.insideRoot(file, root)) return new Missing(DiskReads.NO_SUCH_FILE);
        if (DiskReads.exceeds(d.text(), maxBytes())) return new Missing(DiskReads.tooLarge(maxBytes()));
        return new Text(d.text());
    }

    @Override
    public long maxBytes() {
        return disk.maxBytes();
    }

    @Override
    public Path workspaceRoot(Path file) {
        return disk.workspaceRoot(file);
    }

    @Override
    public boolean workspaceMarked(Path file) {
        return disk.workspaceMarked(file);
    }
}
