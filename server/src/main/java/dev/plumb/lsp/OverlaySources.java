package dev.plumb.lsp;

import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Sources;
import java.nio.file.Path;

/** Documents as the editor has them: open buffers first, the files on disk otherwise. */
final class OverlaySources implements Sources {
    private final DocumentStore documents;
    private final FileSources disk = new FileSources();

    OverlaySources(DocumentStore documents) {
        this.documents = documents;
    }

    @Override
    public Loaded load(Path file) {
        OpenDocument d = documents.byPath(file.toAbsolutePath().normalize());
        return d != null ? new Text(d.text()) : disk.load(file);
    }

    @Override
    public Path workspaceRoot(Path file) {
        return disk.workspaceRoot(file);
    }
}
