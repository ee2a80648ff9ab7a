package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.EditDistance;
import dev.plumb.diagnostics.Fix;
import dev.plumb.diagnostics.Severity;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Applies the document's {@code accept CODE at NAME "reason"} statements to its findings, once
 * every finding is known: each open warning or hint of that code on the statement defining NAME
 * is marked accepted with the reason (and still shown). Accepting an error, an unknown code or a
 * name this document does not define is {@code accept.invalid}; an acceptance that finds nothing
 * to accept is {@code accept.stale}.
 */
final class Acceptances {
    private Acceptances() {
    }

    static List<Diagnostic> apply(List<Statement> statements, Map<String, Statement> own, List<Diagnostic> findings) {
        List<Diagnostic> out = new ArrayList<>(findings);
        List<Diagnostic> more = new ArrayList<>();
        for (Statement s : statements) {
            if (s instanceof Statement.Accept a) accept(a, own, out, more);
        }
        out.addAll(more);
        return out;
    }

    private static void accept(Statement.Accept a, Map<String, Statement> own, List<Diagnostic> out, List<Diagnostic> more) {
        Code code = byId(a.code());
        if (code == null) {
            more.add(Diagnostic.of(Code.ACCEPT_INVALID, a.codeSpan(), "there is no finding code `" + a.code() + "`"
                + nearest(a.code()) + ": write the code exactly as the finding shows it"));
            return;
        }
        if (code.severity() == Severity.ERROR) {
            more.add(Diagnostic.of(Code.ACCEPT_INVALID, a.codeSpan(), code.id() + " is an error, and an error cannot be "
                + "accepted: it means a value could not be computed or a check failed. Mend the calc instead"));
            return;
        }
        if (code == Code.ACCEPT_STALE) {
            more.add(Diagnostic.of(Code.ACCEPT_INVALID, a.codeSpan(), "a stale acceptance cannot be accepted: "
                + "remove the acceptance that matches nothing"));
            return;
        }
        Statement target = own.get(a.target().text());
        if (target == null) {
            more.add(Diagnostic.of(Code.ACCEPT_INVALID, a.target().span(), a.target().text() + " is not defined in this "
                + "file: accept a finding in the file whose statement defines the value"));
            return;
        }
        int accepted = 0;
        for (int i = 0; i < out.size(); i++) {
            Diagnostic d = out.get(i);
            if (d.code() == code && !d.isAccepted() && d.severity() != Severity.ERROR && within(d.span(), target.span())) {
                out.set(i, d.acceptedBecause(a.reason()));
                accepted++;
            }
        }
        if (accepted == 0) {
            more.add(Diagnostic.of(Code.ACCEPT_STALE, a.span(), "there is no open " + code.id() + " finding on "
                + a.target().text() + " to accept: the finding is gone (or another acceptance took it), so remove "
                + "this line, or name the value the finding is on").withFix(new Fix("Remove this acceptance", a.span(), "")));
        }
    }

    private static boolean within(Span inner, Span outer) {
        return inner.start() >= outer.start() && inner.start() <= outer.end();
    }

    private static Code byId(String id) {
        for (Code c : Code.values()) {
            if (c.id().equals(id)) return c;
        }
        return null;
    }

    private static String nearest(String written) {
        Code best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (Code c : Code.values()) {
            int d = EditDistance.between(written, c.id());
            if (d < bestDistance) {
                best = c;
                bestDistance = d;
            }
        }
        return best != null && bestDistance <= 3 ? " (did you mean " + best.id() + "?)" : "";
    }
}
