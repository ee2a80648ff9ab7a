package dev.plumb.diagnostics;

import java.util.List;

/** One finding in one file: a stable code, where, and a message that says what to do. */
public record Diagnostic(Code code, Severity severity, Span span, String message, List<Related> related) {
    public Diagnostic {
        related = List.copyOf(related);
    }

    public static Diagnostic of(Code code, Span span, String message) {
        return new Diagnostic(code, code.severity(), span, message, List.of());
    }

    public Diagnostic withRelated(Related r) {
        var all = new java.util.ArrayList<>(related);
        all.add(r);
        return new Diagnostic(code, severity, span, message, all);
    }
}
