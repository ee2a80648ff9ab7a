package dev.plumb.diagnostics;

/** Another place that explains a diagnostic, e.g. the first definition of a duplicated name. */
public record Related(String file, Span span, String message) {
}
