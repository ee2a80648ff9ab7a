package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Fix;
import dev.plumb.diagnostics.Related;
import dev.plumb.diagnostics.Severity;
import dev.plumb.diagnostics.Span;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Collects the diagnostics of one document. Inside a call of a user function, findings in the
 * function's body are reported at the outermost call (the place the reviewer is looking at),
 * with the body as related location.
 *
 * <p>A {@link #discarding()} reporter is the sink of evaluations whose findings nobody keeps (a
 * solve's trials, a quiet look at another piece or fit): it drops every finding, and callers ask
 * {@link #keeps()} before doing work that only a finding's words or repairs need, so repeated
 * runs stay cheap.
 */
final class Reporter {
    private final Set<Diagnostic> diagnostics;
    /** The reporter of the caller, or null at document level. */
    private final Reporter caller;
    private final String function;
    private final Span callSpan;
    private final Path definingFile;
    /**
     * Inside a correlation's formula the range warnings of the correlations it calls stay quiet:
     * the outer correlation's own range is what the reviewer is told about. So does a bare angle
     * handed on inside (cd_cone's half_angle to the table of its rows): the outer call warns it.
     */
    private final boolean quietRanges;
    /** Drops everything: see {@link #discarding()}. */
    private final boolean discards;

    /** Correlation calls written in the document itself (not inside functions), for hover. */
    private final List<Analysis.CallSite> calls;
    /** Repairs to resolve once the document is evaluated, by the finding that asked (by identity). */
    private final java.util.Map<Diagnostic, List<FixRequest>> requests;
    /**
     * How many findings and calls were reported here and in every reporter made from this one,
     * counted before duplicates are dropped: a step that left it unchanged said nothing at all.
     */
    private final int[] said;

    Reporter() {
        this(new LinkedHashSet<>(), new ArrayList<>(), new java.util.IdentityHashMap<>(), new int[1], null, null, null, null,
            false, false);
    }

    /** A sink that keeps nothing; see the class comment. */
    static Reporter discarding() {
        return new Reporter(Set.of(), List.of(), java.util.Map.of(), new int[1], null, null, null, null, false, true);
    }

    /** False for a {@link #discarding()} reporter: whatever is reported here is dropped unread. */
    boolean keeps() {
        return !discards;
    }

    /** False where range and regime warnings are dropped (discarding, or inside a correlation's formula). */
    boolean keepsRanges() {
        return !discards && !quietRanges;
    }

    private Reporter(Set<Diagnostic> diagnostics, List<Analysis.CallSite> calls,
                     java.util.Map<Diagnostic, List<FixRequest>> requests, int[] said, Reporter caller, String function,
                     Span callSpan, Path file, boolean quietRanges, boolean discards) {
        this.said = said;
        this.discards = discards;
        this.diagnostics = diagnostics;
        this.calls = calls;
        this.requests = requests;
        this.caller = caller;
        this.function = function;
        this.callSpan = callSpan;
        this.definingFile = file;
        this.quietRanges = quietRanges;
    }

    void report(Code code, Span span, String message) {
        report(code, code.severity(), span, message);
    }

    void report(Code code, Severity severity, Span span, String message) {
        report(code, severity, span, message, List.of(), List.of());
    }

    /** A finding with the repairs that mend it: edits now, and requests the analyser resolves at the end. */
    void report(Code code, Span span, String message, List<Fix> fixes, List<FixRequest> later) {
        report(code, code.severity(), span, message, fixes, later);
    }

    private void report(Code code, Severity severity, Span span, String message, List<Fix> fixes,
                        List<FixRequest> later) {
        if (discards) return;
        if (quietRanges && (code == Code.RANGE_OUTSIDE || code == Code.RANGE_REGIME || code == Code.UNIT_BARE_ANGLE)) {
            return;
        }
        said[0]++;
        if (caller == null) {
            Diagnostic d = new Diagnostic(code, severity, span, message, List.of(), fixes);
            if (diagnostics.add(d) && !later.isEmpty()) requests.put(d, later);
            return;
        }
        // Found inside a function's body: the repairs would edit the body, perhaps in another
        // file, while the finding is shown at the call; they are not offered there.
        Related inside = new Related(definingFile == null ? null : definingFile.toString(), span, "inside " + function);
        caller.fromCall(code, severity, callSpan, "in " + function + "(…): " + message, inside);
    }

    private void fromCall(Code code, Severity severity, Span span, String message, Related related) {
        if (caller == null) {
            diagnostics.add(new Diagnostic(code, severity, span, message, List.of(related)));
            return;
        }
        caller.fromCall(code, severity, callSpan, "in " + function + "(…): " + message, related);
    }

    /** How many findings there are so far (to tell which a step added, with {@link #since}). */
    int size() {
        return diagnostics.size();
    }

    /** The findings added after there were {@code count}, in the order they were made. */
    List<Diagnostic> since(int count) {
        return new ArrayList<>(diagnostics).subList(Math.min(count, diagnostics.size()), diagnostics.size());
    }

    void add(Diagnostic d) {
        if (discards) return;
        said[0]++;
        diagnostics.add(d);
    }

    /** A count that grows with every finding or call reported (duplicates too); compare two readings. */
    int said() {
        return said[0];
    }

    /** A reporter for evaluating the body of {@code function} called at {@code at}. */
    Reporter inCall(String function, Span at, Path definingFile) {
        return new Reporter(diagnostics, calls, requests, said, this, function, at, definingFile, quietRanges, discards);
    }

    /** As {@link #inCall}, for a correlation's formula: nested range warnings stay quiet. */
    Reporter inCorrelation(String correlation, Span at, Path definingFile) {
        return new Reporter(diagnostics, calls, requests, said, this, correlation, at, definingFile, true, discards);
    }

    /** Records a correlation call made at document level. */
    void call(Analysis.CallSite site) {
        if (caller == null && !quietRanges && !discards) {
            said[0]++;
            calls.add(site);
        }
    }

    List<Analysis.CallSite> calls() {
        return new ArrayList<>(calls);
    }

    /** Every finding, with its requested repairs turned into edits by {@code resolve}. */
    List<Diagnostic> all(java.util.function.Function<FixRequest, List<Fix>> resolve) {
        List<Diagnostic> out = new ArrayList<>(diagnostics.size());
        for (Diagnostic d : diagnostics) {
            List<FixRequest> asked = requests.get(d);
            if (asked == null) {
                out.add(d);
                continue;
            }
            List<Fix> fixes = new ArrayList<>();
            for (FixRequest r : asked) fixes.addAll(resolve.apply(r));
            out.add(d.withFixes(fixes));
        }
        return out;
    }

    List<Diagnostic> all() {
        return all(r -> List.of());
    }
}
