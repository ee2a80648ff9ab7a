package dev.plumb.compare;

import dev.plumb.analysis.Row;

/**
 * A check whose verdict differs between two revisions, or that exists at only one of them.
 *
 * @param before the check at the earlier revision, null when it was added
 * @param after the check at the later revision, null when it was removed
 * @param line its line, 1-based, at the later revision (the earlier one's for a removed check)
 */
public record CheckChange(Row.CheckRow before, Row.CheckRow after, int line) {
    /** The check as written at the later revision (the earlier one's when it was removed). */
    public String source() {
        return (after != null ? after : before).source();
    }

    /** Its note, or null. */
    public String note() {
        return (after != null ? after : before).note();
    }

    /** Passed at one revision and not at the other, or the other way round (not evaluated counts as not passed). */
    public boolean flipped() {
        return before != null && after != null && before.verdict() != after.verdict();
    }

    public boolean added() {
        return before == null;
    }

    public boolean removed() {
        return after == null;
    }
}
