package dev.plumb.lsp;

import java.nio.file.Path;

/** One document as the editor has it: the text and its version. Immutable; an edit makes a new one. */
record OpenDocument(String uri, Path path, String text, int version) {
}
