package dev.plumb.syntax;

import dev.plumb.diagnostics.Span;

/** A unit as written in the source; the units layer resolves it. */
public record UnitText(String text, Span span) {
}
