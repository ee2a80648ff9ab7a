package dev.plumb.diagnostics;

import java.util.ArrayList;
import java.util.List;

/**
 * One finding in one file: a stable code, where, a message that says what to do, and the
 * repairs that mend it as data ({@code fixes}, the preferred first), so that no editor ever has
 * to read a repair back out of the message. A warning or hint a reviewer has accepted in the calc
 * ({@code accept CODE at NAME "reason"}) carries that reason in {@code accepted}; an open finding
 * has an empty one. An accepted finding is still shown, with its reason.
 */
public record Diagnostic(Code code, Severity severity, Span span, String message, List<Related> related, List<Fix> fixes,
                         String accepted) {
    public Diagnostic {
        related = List.copyOf(related);
        fixes = List.copyOf(fixes);
        accepted = accepted == null ? "" : accepted;
    }

    public Diagnostic(Code code, Severity severity, Span span, String message, List<Related> related, List<Fix> fixes) {
        this(code, severity, span, message, related, fixes, "");
    }

    public Diagnostic(Code code, Severity severity, Span span, String message, List<Related> related) {
        this(code, severity, span, message, related, List.of());
    }

    /** True when a reviewer has accepted this finding (its reason is {@link #accepted()}). */
    public boolean isAccepted() {
        return !accepted.isEmpty();
    }

    /** This finding, accepted for a reason. */
    public Diagnostic acceptedBecause(String reason) {
        return new Diagnostic(code, severity, span, message, related, fixes, reason);
    }

    public static Diagnostic of(Code code, Span span, String message) {
        return new Diagnostic(code, code.severity(), span, message, List.of());
    }

    public Diagnostic withRelated(Related r) {
        List<Related> all = new ArrayList<>(related);
        all.add(r);
        return new Diagnostic(code, severity, span, message, all, fixes, accepted);
    }

    /** This finding with more repairs after the ones it has. */
    public Diagnostic withFixes(List<Fix> more) {
        if (more.isEmpty()) return this;
        List<Fix> all = new ArrayList<>(fixes);
        all.addAll(more);
        return new Diagnostic(code, severity, span, message, related, all, accepted);
    }

    public Diagnostic withFix(Fix f) {
        return withFixes(List.of(f));
    }
}
