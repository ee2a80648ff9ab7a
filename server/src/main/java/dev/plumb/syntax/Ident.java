package dev.plumb.syntax;

import dev.plumb.diagnostics.Span;

/** A name as written, with where it was written. */
public record Ident(String text, Span span) {
}
