package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Fix;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Evaluates one definition: its value, the unit it is shown in, its `as` tag and, for a
 * correlation's result, its origin. The same code serves the real run and a solver's trials;
 * only the reporter they are given differs.
 */
final class Definitions {
    private final Path file;
    private final String text;
    private final Scope scope;
    private final UnitRegistry units;

    Definitions(Path file, String text, Scope scope, UnitRegistry units) {
        this.file = file;
        this.text = text;
        this.scope = scope;
        this.units = units;
    }

    /** The definition's binding in {@code env}; its value is unknown when it lies on a circle. */
    Binding.ValueBinding evaluate(Statement.Definition d, Environment env, Reporter reporter, boolean inCycle, Budget budget) {
        Evaluator evaluator = new Evaluator(scope, env, java.util.Map.of(), reporter, text, units, budget);
        Value v = evaluator.eval(d.expr());
        if (inCycle) v = Value.UNKNOWN;
        Unit display = displayUnit(d, v, evaluator, reporter);
        Origin origin = BlockChecks.origin(d.expr(), scope, units);
        if (d.basis() == null) return new Binding.ValueBinding(file, d.name().span(), v, display, null, d.input(), origin, d.note());
        Tagged tagged = tagged(d.name(), d.basis(), v, reporter);
        return new Binding.ValueBinding(file, d.name().span(), tagged.value(), display, tagged.tag(), d.input(), origin, d.note());
    }

    /** A solved value's binding: shown in its `in` unit, else in the unit of the bracket's (or start value's) number. */
    Binding.ValueBinding solved(Statement.Seek s, Value v, Environment env, Reporter reporter, Budget budget) {
        Evaluator evaluator = new Evaluator(scope, env, java.util.Map.of(), reporter, text, units, budget);
        Unit display = v.known() ? displayUnit(s, v, evaluator, reporter) : null;
        Tagged tagged = tagged(s.name(), s.basis(), v, reporter);
        return new Binding.ValueBinding(file, s.name().span(), tagged.value(), display, tagged.tag(), false, null, s.note());
    }

    /** An unknown of a several-unknown solve: shown in the unit of its start value (or bracket), SI when none. */
    Binding.ValueBinding solvedInSystem(Statement.SeekSystem k, Value v, Unit shown) {
        Unit display = v.known() ? (shown != null ? shown : DisplayUnits.defaultFor(v.dimension())) : null;
        return new Binding.ValueBinding(file, k.name().span(), v, display, null, false, null, k.system().note());
    }

    /** A name of a motion (its time or a state) at the stop, carrying the whole trajectory. */
    Binding.ValueBinding evolved(Statement.Evolve k, Value v, Unit shown, Trajectory trajectory) {
        Unit display = v.known() ? (shown != null ? shown : DisplayUnits.defaultFor(v.dimension())) : null;
        return new Binding.ValueBinding(file, k.name().span(), v, display, null, false, null, k.motion().note(),
            v.known() ? trajectory : null);
    }

    /** A binding for a value with nothing to show it by (a trial value, an unknown). */
    Binding.ValueBinding bare(Value v) {
        return new Binding.ValueBinding(file, Span.NONE, v, null, null, false, null, null);
    }

    /** A value with the tag its `as` gave it; the tag is null when there is none or it was refused. */
    private record Tagged(Value value, String tag) {
    }

    /** Applies `as TAG` (the word, or null) to a value; a tag that does not fit what the value is, is reported. */
    private Tagged tagged(Ident named, Ident word, Value v, Reporter reporter) {
        String tag = tagOf(word, reporter);
        if (tag == null || !v.known()) return new Tagged(v, tag);
        String name = named.text();
        boolean density = BlockChecks.DENSITY_TAGS.contains(tag);
        if (v.dimension().equals(density ? BasisRules.DENSITY : BasisRules.AREA)) {
            return new Tagged(v.noted(density ? BasisRules.densityTagged(v, tag, name) : BasisRules.tagged(v, tag, name)),
                tag);
        }
        reporter.report(density ? Code.BASIS_DENSITY : Code.BASIS_AREA, word.span(), "`as " + tag + "` "
            + (density ? "says whose density a value is" : "tags areas") + ", but " + name + " is "
            + v.dimension().describe() + ": remove the tag");
        return new Tagged(v, null);
    }

    private static String tagOf(Ident word, Reporter reporter) {
        if (word == null) return null;
        String b = word.text();
        if (BlockChecks.BASES.contains(b) || BlockChecks.DENSITY_TAGS.contains(b)) return b;
        Set<String> tags = new HashSet<>(BlockChecks.BASES);
        tags.addAll(BlockChecks.DENSITY_TAGS);
        reporter.report(Code.BASIS_UNKNOWN, word.span(), "unknown tag '" + b + "'"
            + Suggestions.didYouMean(Suggestions.closest(b, tags, 1))
            + ": an area is frontal, wetted or planform; a density is fluid or body");
        return null;
    }

    /** The solved value's unit (the one rule, DisplayChoice.ofSeek), reporting an `in` unit that is wrong or unknown. */
    private Unit displayUnit(Statement.Seek s, Value v, Evaluator evaluator, Reporter reporter) {
        if (s.displayUnit() != null) {
            Unit u = evaluator.resolveUnit(s.displayUnit(), false);
            if (u != null && !u.dimension().equals(v.dimension())) {
                reporter.report(Code.UNIT_MISMATCH, s.displayUnit().span(), "`in " + s.displayUnit().text() + "` shows "
                    + u.dimension().describe() + ", but " + s.name().text() + " is " + v.dimension().describe());
            }
        }
        return DisplayChoice.ofSeek(s, v.dimension(), units);
    }

    private Unit displayUnit(Statement.Definition d, Value v, Evaluator evaluator, Reporter reporter) {
        Unit fallback = v.known() ? DisplayUnits.defaultFor(v.dimension()) : null;
        if (d.displayUnit() != null) {
            Unit u = evaluator.resolveUnit(d.displayUnit(), false);
            if (u == null || !v.known()) return fallback;
            if (!u.dimension().equals(v.dimension())) {
                // A dimension no common quantity has is more often a slip in the formula than in the unit.
                boolean unusual = !v.dimensionless() && v.dimension().name() == null;
                String fix = v.dimensionless()
                    ? ": a plain number has no unit to show; drop `in " + d.displayUnit().text() + "`, or give a number"
                        + " in the expression its unit (write `5 mm`, not `5 in mm`)"
                    : unusual
                    ? ". No common quantity has that dimension, so the formula is the likely mistake, not the unit: "
                        + "check the operands of " + Shown.source(text, d.expr().span())
                        + " (a factor too many or too few, a wrong power, a unit on the wrong number)"
                    : ": use a unit of that dimension, such as " + fallback.symbol();
                List<Fix> fixes = v.dimensionless() || unusual ? List.of()
                    : List.of(new Fix("Show it in " + fallback.symbol(), d.displayUnit().span(), fallback.symbol()));
                reporter.report(Code.UNIT_MISMATCH, d.displayUnit().span(), "`in " + d.displayUnit().text() + "` shows "
                    + u.dimension().describe() + ", but " + d.name().text() + " is " + v.dimension().describe() + fix,
                    fixes, List.of());
                return fallback;
            }
            return u;
        }
        Unit written = v.known() ? DisplayChoice.written(d.expr(), units) : null;
        if (written == null && v.known()) written = DisplayChoice.pointScale(d.expr(), v, evaluator::lookup);
        return written != null ? written : fallback;
    }
}
