package dev.plumb.diagnostics;

import java.util.List;

/**
 * One finding in one file: a stable code, where, and a message that says what to do; {@code fix}
 * is the repair that mends it when there is exactly one (null otherwise).
 */
public record Diagnostic(Code code, Severity severity, Span span, String message, List<Related> related, Fix fix) {
    public Diagnostic {
        related = List.copyOf(related);
    }

    public Diagnostic(Code code, Severity severity, Span span, String message, List<Related> related) {
        this(code, severity, span, message, related, null);
    }

    public static Diagnostic of(Code code, Span span, String message) {
        return new Diagnostic(code, code.severity(), span, message, List.of());
    }

    public Diagnostic withRelated(Related r) {
        var all = new java.util.ArrayList<>(related);
        all.add(r);
        return new Diagnostic(code, severity, span, message, all, fix);
    }

    public Diagnostic withFix(Fix f) {
        return new Diagnostic(code, severity, span, message, related, f);
    }
}
