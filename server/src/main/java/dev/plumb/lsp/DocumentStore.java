package dev.plumb.lsp;

import java.net.URI;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;

/** The open documents, edited incrementally; safe to read from any thread. */
final class DocumentStore {
    private final Map<String, OpenDocument> open = new ConcurrentHashMap<>();
    private final Positions.Enc encoding;

    DocumentStore(Positions.Enc encoding) {
        this.encoding = encoding;
    }

    OpenDocument open(String uri, String text, int version) {
        OpenDocument d = new OpenDocument(uri, path(uri), text, version);
        open.put(uri, d);
        return d;
    }

    OpenDocument change(String uri, int version, List<TextDocumentContentChangeEvent> changes) {
        OpenDocument d = open.get(uri);
        if (d == null) return null;
        String text = d.text();
        for (TextDocumentContentChangeEvent c : changes) {
            if (c.getRange() == null) {
                text = c.getText();
            } else {
                int start = Positions.offset(text, c.getRange().getStart(), encoding.value);
                int end = Positions.offset(text, c.getRange().getEnd(), encoding.value);
                text = text.substring(0, start) + c.getText() + text.substring(Math.max(start, end));
            }
        }
        OpenDocument next = new OpenDocument(uri, d.path(), text, version);
        open.put(uri, next);
        return next;
    }

    void close(String uri) {
        open.remove(uri);
    }

    OpenDocument get(String uri) {
        return open.get(uri);
    }

    OpenDocument byPath(Path p) {
        for (OpenDocument d : open.values()) {
            if (d.path().equals(p)) return d;
        }
        return null;
    }

    java.util.Collection<OpenDocument> all() {
        return open.values();
    }

    static Path path(String uri) {
        try {
            URI u = URI.create(uri);
            if ("file".equals(u.getScheme())) return Path.of(u).toAbsolutePath().normalize();
        } catch (IllegalArgumentException | java.nio.file.FileSystemNotFoundException e) {
            // fall through: an untitled buffer or another scheme
        }
        return Path.of("/plumb-untitled", Integer.toHexString(uri.hashCode()) + ".plumb");
    }
}
