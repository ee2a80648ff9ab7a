package dev.plumb.compare;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;

/**
 * What changed in one calc between two revisions: its values, checks, findings and library
 * entries. Pure data; the layers that show it word it.
 *
 * @param file the calc (at the later revision's path; for two plain files, the later file)
 * @param values every value that moved, appeared, disappeared, could not be computed at one
 *     revision, or was renamed; see {@link #inputs()}, {@link #results()}
 * @param checks checks whose verdict flipped, added and removed
 * @param findings findings new and gone
 * @param entries correlation and table blocks of this file whose data changed
 * @param changedUses files this calc uses (at the later revision) whose text differs between the revisions
 */
public record FileDiff(Path file, Side before, Side after, List<ValueChange> values, List<Rename> renames,
                       List<CheckChange> checks, List<FindingChange> findings, List<EntryChange> entries,
                       List<Path> changedUses) {
    public FileDiff {
        values = List.copyOf(values);
        renames = List.copyOf(renames);
        checks = List.copyOf(checks);
        findings = List.copyOf(findings);
        entries = List.copyOf(entries);
        changedUses = List.copyOf(changedUses);
    }

    public enum Status { ADDED, REMOVED, CHANGED, UNCHANGED }

    public Status status() {
        if (!before.exists()) return Status.ADDED;
        if (!after.exists()) return Status.REMOVED;
        boolean unreadableChanged = (before.unreadable() == null) != (after.unreadable() == null);
        return unreadableChanged || !values.isEmpty() || !checks.isEmpty() || !findings.isEmpty() || !entries.isEmpty()
            || !changedUses.isEmpty() || !renames.isEmpty() ? Status.CHANGED : Status.UNCHANGED;
    }

    /** Whether any result differs: a value moved, appeared, went or could not be computed, or a check changed. */
    public boolean resultsChanged() {
        return status() == Status.ADDED || status() == Status.REMOVED
            || values.stream().anyMatch(ValueChange::reported) || !checks.isEmpty()
            || (before.unreadable() == null) != (after.unreadable() == null);
    }

    /** Inputs, own and used, that changed between two existing values, in the calc's order. */
    public List<ValueChange> inputs() {
        return values.stream().filter(v -> v.kind() != ValueChange.Kind.RESULT && paired(v) && v.reported()).toList();
    }

    /**
     * Computed values that changed, the ones lost first (not computed at the later revision, then
     * at the earlier, then of another dimension, then from zero), then by the size of the relative change.
     */
    public List<ValueChange> results() {
        return values.stream().filter(v -> v.kind() == ValueChange.Kind.RESULT && paired(v) && v.reported())
            .sorted(Comparator.comparingInt(FileDiff::rank)
                .thenComparing(FileDiff::size)
                .thenComparingInt(ValueChange::line))
            .toList();
    }

    public List<ValueChange> added() {
        return values.stream().filter(v -> v.status() == ValueChange.Status.ADDED).toList();
    }

    public List<ValueChange> removed() {
        return values.stream().filter(v -> v.status() == ValueChange.Status.REMOVED).toList();
    }

    /** Checks whose verdict flipped, in the calc's order. */
    public List<CheckChange> flipped() {
        return checks.stream().filter(CheckChange::flipped).toList();
    }

    private static boolean paired(ValueChange v) {
        return v.status() != ValueChange.Status.ADDED && v.status() != ValueChange.Status.REMOVED;
    }

    /** The size of a relative change, to nine figures: changes equal but for rounding sort by line. */
    private static double size(ValueChange v) {
        if (v.relative() == null) return 0;
        return -Double.parseDouble(String.format(java.util.Locale.ROOT, "%.9g", Math.abs(v.relative())));
    }

    private static int rank(ValueChange v) {
        return switch (v.status()) {
            case NOT_COMPUTED_AFTER -> 0;
            case NOT_COMPUTED_BEFORE -> 1;
            case DIMENSION_CHANGED -> 2;
            default -> v.fromZero() ? 3 : 4;
        };
    }
}
