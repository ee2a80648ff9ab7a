package dev.plumb.compare;

import java.util.List;

/**
 * A whole value diff: what was compared with what, and each calc's changes, in path order.
 *
 * @param before, after what was compared: two revisions, or two files
 * @param tolerance the relative change below which a value counts as unchanged
 */
public record Diff(Named before, Named after, double tolerance, List<FileDiff> files) {
    public Diff {
        files = List.copyOf(files);
    }

    /**
     * A revision or file as people name it.
     *
     * @param label as the user named it ("HEAD~1", "main"), "working tree", or a file's path
     * @param shortId, fullId the commit's shortest unambiguous and full ids; null for the working tree and files
     */
    public record Named(String label, String shortId, String fullId) {
    }

    /** The calcs with anything to report. */
    public List<FileDiff> changed() {
        return files.stream().filter(f -> f.status() != FileDiff.Status.UNCHANGED).toList();
    }

    /** Whether any calc has anything to report. */
    public boolean anyChange() {
        return !changed().isEmpty();
    }

    /** Whether any check's verdict flipped between the revisions. */
    public boolean anyCheckFlipped() {
        return files.stream().anyMatch(f -> !f.flipped().isEmpty());
    }
}
