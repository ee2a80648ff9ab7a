package dev.plumb.revisions;

import org.eclipse.jgit.lib.ObjectId;

/**
 * A revision of a repository's calcs: a commit, or the working tree (the files on disk, saved or
 * not yet committed).
 *
 * @param label what the user named it ("HEAD~1", "main"), or "working tree"
 * @param commit the commit, null for the working tree
 * @param shortId the commit's shortest unambiguous id of at least 7 digits, null for the working tree
 */
public record Revision(String label, ObjectId commit, String shortId) {
    public static final String WORKING_TREE = "working tree";

    public boolean workingTree() {
        return commit == null;
    }

    /** The commit's full id, or null for the working tree. */
    public String fullId() {
        return commit == null ? null : commit.name();
    }
}
