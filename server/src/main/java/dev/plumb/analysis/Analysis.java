package dev.plumb.analysis;

import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Severity;
import dev.plumb.syntax.LineMap;
import dev.plumb.syntax.ParsedSource;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Everything the engine found in one document, immutable.
 *
 * @param syntax the parse the analysis was made from (an editor reparses from it after an edit)
 * @param headers title, author, reviewer, revision as written
 * @param scope the names the document defines and imports, with their values
 * @param importedUses for each imported file, the names of it this document uses
 * @param imports the files this document uses, directly
 * @param settings the options it was made with (the layers that show values read the significant figures here)
 * @param graph the document's own definitions by identity: what each uses, the findings on each
 */
public record Analysis(Path file, String text, ParsedSource syntax, Map<String, String> headers, List<Row> rows,
                       List<Diagnostic> diagnostics, Scope scope, Map<Path, Set<String>> importedUses,
                       List<Path> imports, List<Reference> references, List<CallSite> calls, Settings settings,
                       DefinitionGraph graph) {

    /**
     * What stands in for a file or folder that could not be read at all: no text, one finding at
     * its start. For callers outside the engine that find such a place themselves (a folder walk).
     */
    public static Analysis unreadable(Path file, dev.plumb.diagnostics.Code code, String message) {
        Diagnostic d = Diagnostic.of(code, new dev.plumb.diagnostics.Span(0, 0), message);
        return new Analysis(file, "", ParsedSource.unread(""), Map.of(), List.of(), List.of(d), new Scope(""), Map.of(),
            List.of(), List.of(), List.of(), Settings.DEFAULT, DefinitionGraph.empty(file));
    }

    /**
     * A call of a correlation or table column in this document: its arguments and where they sit
     * in the range (for hover).
     *
     * @param used for a correlation with several formulas, which one gave the value here (the fit
     *     a selector chose, or the fits it blended); null when there was no choice
     */
    public record CallSite(dev.plumb.diagnostics.Span callee, String name, List<Argument> arguments, Standing standing,
                           List<String> breaches, String range, String used) {
        public CallSite {
            arguments = List.copyOf(arguments);
            breaches = List.copyOf(breaches);
        }
    }

    /** One argument of a call: the parameter's name, the value passed, the unit it reads best in (null: SI). */
    public record Argument(String name, Value value, dev.plumb.units.Unit unit) {
    }

    /**
     * Where a call's arguments sit. {@code breaches} of a {@link CallSite} say, in words, which
     * bound each breach crossed (for OUTSIDE) or why the formula is undefined there (OUTSIDE_DOMAIN);
     * {@code range} is the entry's stated range, empty when it states none.
     */
    public enum Standing {
        /** Within every stated bound. */
        INSIDE,
        /** Beyond a stated bound: the value is an extrapolation. */
        OUTSIDE,
        /** Where the formula is undefined: no value. */
        OUTSIDE_DOMAIN,
        /** The entry states no range. */
        NO_RANGE,
        /** A table read between its rows. */
        TABLE_INSIDE,
        /** A table read beyond its first or last row (extrapolated). */
        TABLE_BEYOND
    }

    /** The correlation calls written within a span (a definition's line), in source order. */
    public List<CallSite> callsIn(dev.plumb.diagnostics.Span span) {
        return calls.stream().filter(c -> c.callee().start() >= span.start() && c.callee().end() <= span.end()).toList();
    }

    /** The correlation call whose name covers an offset, or null. */
    public CallSite callAt(int offset) {
        for (CallSite c : calls) {
            if (offset >= c.callee().start() && offset <= c.callee().end()) return c;
        }
        return null;
    }

    /** A name used in the document, where; what it stands for is {@code scope().lookup(name)}. */
    public record Reference(String name, dev.plumb.diagnostics.Span span) {
    }

    /** The name used at an offset, or null. */
    public Reference referenceAt(int offset) {
        for (Reference r : references) {
            if (offset >= r.span().start() && offset <= r.span().end()) return r;
        }
        return null;
    }

    public Analysis {
        headers = Map.copyOf(headers);
        rows = List.copyOf(rows);
        diagnostics = List.copyOf(diagnostics);
        importedUses = Map.copyOf(importedUses);
        imports = List.copyOf(imports);
        references = List.copyOf(references);
        calls = List.copyOf(calls);
    }

    /** Lines and columns of the text. */
    /** The trajectory of the motion whose time or state {@code name} is, or null when it is none (or did not run). */
    public Trajectory trajectory(String name) {
        return scope.lookup(name) instanceof Binding.ValueBinding v ? v.trajectory() : null;
    }

    /** Each motion's trajectory that ran, in source order: one per motion statement (its time's row). */
    public List<Trajectory> trajectories() {
        List<Trajectory> out = new java.util.ArrayList<>();
        for (Row r : rows) {
            if (r instanceof Row.ValueRow v && v.statement() instanceof dev.plumb.syntax.Statement.Evolve k && k.index() == 0) {
                Trajectory t = trajectory(v.name());
                if (t != null) out.add(t);
            }
        }
        return out;
    }

    public LineMap lines() {
        return syntax.lines();
    }

    /** The open findings of a severity: accepted ones are counted by {@link #accepted()}. */
    public long count(Severity severity) {
        return diagnostics.stream().filter(d -> d.severity() == severity && !d.isAccepted()).count();
    }

    /** The findings a reviewer has accepted in the calc. */
    public long accepted() {
        return diagnostics.stream().filter(Diagnostic::isAccepted).count();
    }

    public boolean hasErrors() {
        return count(Severity.ERROR) > 0;
    }
}
