package dev.plumb.compare;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * The value diff's pairing: one calc's analyses at two revisions in, what changed out. Pure: no
 * files, no git, no terminal; the caller analyses each revision (see {@code dev.plumb.revisions})
 * and words the result.
 */
public final class Comparison {
    /** The default relative tolerance below which a value counts as unchanged. */
    public static final double DEFAULT_TOLERANCE = 1e-9;

    private Comparison() {
    }

    /**
     * @param tolerance a value whose relative change is at most this counts as unchanged
     * @param changedUses files the calc uses whose text differs between the revisions
     */
    public static FileDiff of(Path file, Side before, Side after, double tolerance, List<Path> changedUses) {
        if (!before.readable() || !after.readable()) {
            // Nothing to pair when one side has no values: an unreadable file's values are unknown, not removed.
            boolean oneAbsent = !before.exists() || !after.exists();
            ValuePairing.Paired values = oneAbsent
                ? ValuePairing.pair(before.readable() ? before.analysis() : null, after.readable() ? after.analysis() : null,
                    tolerance)
                : new ValuePairing.Paired(List.of(), List.of(), Map.of());
            List<CheckChange> checks = oneAbsent
                ? CheckPairing.pair(before.readable() ? before.analysis() : null, after.readable() ? after.analysis() : null,
                    Map.of())
                : List.of();
            return new FileDiff(file, before, after, values.changes(), values.renames(), checks,
                FindingPairing.pair(before, after, Map.of()), List.of(), changedUses);
        }
        ValuePairing.Paired values = ValuePairing.pair(before.analysis(), after.analysis(), tolerance);
        return new FileDiff(file, before, after, values.changes(), values.renames(),
            CheckPairing.pair(before.analysis(), after.analysis(), values.renamed()),
            FindingPairing.pair(before, after, values.renamed()),
            EntryPairing.pair(before.analysis(), after.analysis()), changedUses);
    }
}
