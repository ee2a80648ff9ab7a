package dev.plumb.revisions;

/** Why revisions could not be read as asked (no repository, unknown revision, a path outside): a sentence for people. */
public final class RevisionProblem extends Exception {
    public RevisionProblem(String message) {
        super(message, null, false, false);
    }
}
