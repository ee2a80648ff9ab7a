package dev.plumb.compare;

import dev.plumb.analysis.Value;
import dev.plumb.units.Unit;
import java.nio.file.Path;

/**
 * How one value differs between two revisions. {@code before}/{@code after} are null where the
 * value does not exist at that revision; a value that exists but could not be computed is
 * {@link Value#UNKNOWN}, and its status says so rather than claiming a change.
 *
 * @param name the name at the later revision (the earlier one's for a removed value)
 * @param formerName the name at the earlier revision when the value was renamed, else null
 * @param usedFrom for a value taken from a used file, that file; else null
 * @param beforeUnit, afterUnit the unit each revision shows the value in (null: SI)
 * @param relative (after − before) / |before| for {@link Status#CHANGED} from a non-zero value; null otherwise
 * @param line the line that defines it, 1-based, at the later revision (the earlier one's for a removed value)
 */
public record ValueChange(String name, String formerName, Kind kind, Path usedFrom, Value before, Unit beforeUnit,
                          Value after, Unit afterUnit, Status status, Double relative, int line) {

    /** Where a value comes from in the calc. */
    public enum Kind {
        /** Given in the calc: {@code input NAME = …}. */
        INPUT,
        /** Taken by name from a used file. */
        USED,
        /** Computed in the calc (a derived or solved value). */
        RESULT
    }

    public enum Status {
        /** Both known, same dimension, moved by more than the tolerance. */
        CHANGED,
        /** Both known and within the tolerance (kept only for a renamed value). */
        UNCHANGED,
        /** Not computed at the earlier revision (it exists there), known at the later one. */
        NOT_COMPUTED_BEFORE,
        /** Known at the earlier revision, not computed at the later one. */
        NOT_COMPUTED_AFTER,
        /** Known at both, but of different dimensions: no relative change has a meaning. */
        DIMENSION_CHANGED,
        /** Only at the later revision. */
        ADDED,
        /** Only at the earlier revision. */
        REMOVED
    }

    /** Whether this moved from exactly zero, where a relative change has no meaning. */
    public boolean fromZero() {
        return status == Status.CHANGED && relative == null;
    }

    /** Whether a reader should hear of it: everything but an unchanged value. */
    public boolean reported() {
        return status != Status.UNCHANGED;
    }
}
