package dev.plumb.revisions;

import java.nio.file.Path;
import java.util.Optional;
import org.eclipse.jgit.api.Git;
import org.eclipse.jgit.api.Status;
import org.eclipse.jgit.lib.Constants;
import org.eclipse.jgit.lib.ObjectId;
import org.eclipse.jgit.lib.ObjectReader;
import org.eclipse.jgit.lib.Repository;

/**
 * Which commit a calc was evaluated at, for a report's revision line: the commit of HEAD in the
 * repository holding the calc, and whether the calc (or anything tracked in the working tree)
 * differs from it, so a printed result can be traced to the text it came from.
 *
 * @param shortId HEAD's shortest unambiguous id, at least 7 hexadecimal digits
 * @param fullId HEAD's full id (40 hexadecimal digits)
 * @param fileChanged the calc differs from HEAD: changed, staged, new (untracked or added) or deleted
 * @param treeChanged some tracked file of the working tree differs from HEAD (changed, staged or
 *     deleted; new untracked files do not count, as in {@code git describe --dirty})
 */
public record HeadState(String shortId, String fullId, boolean fileChanged, boolean treeChanged) {

    /**
     * The state of the repository holding {@code calc}; empty when the calc is not inside a git
     * working tree, the repository has no commit yet, or it cannot be read.
     */
    public static Optional<HeadState> of(Path calc) {
        Repository repo = GitRepo.find(calc.toAbsolutePath().normalize().getParent() == null
            ? calc : calc.toAbsolutePath().normalize().getParent());
        if (repo == null) return Optional.empty();
        try (repo; Git git = new Git(repo); ObjectReader reader = repo.newObjectReader()) {
            Path top = repo.getWorkTree().toPath().toRealPath();
            Path file = GitRepo.realish(calc);
            if (!file.startsWith(top)) return Optional.empty();
            ObjectId head = repo.resolve(Constants.HEAD + "^{commit}");
            if (head == null) return Optional.empty();
            String rel = top.relativize(file).toString().replace(java.io.File.separatorChar, '/');
            Status status = git.status().call();
            boolean fileChanged = status.getModified().contains(rel) || status.getChanged().contains(rel)
                || status.getAdded().contains(rel) || status.getRemoved().contains(rel) || status.getMissing().contains(rel)
                || status.getUntracked().contains(rel) || status.getConflicting().contains(rel);
            return Optional.of(new HeadState(reader.abbreviate(head, 7).name(), head.name(), fileChanged,
                status.hasUncommittedChanges()));
        } catch (Exception e) {
            // A repository that cannot be read gives no revision line rather than a wrong one.
            return Optional.empty();
        }
    }

    /** The report's line: "commit 1a2b3c4, with uncommitted changes to this calc (1a2b3c4…full id)". */
    public String words() {
        String state = fileChanged ? "with uncommitted changes to this calc"
            : treeChanged ? "this calc as committed; other files have uncommitted changes" : "no uncommitted changes";
        return "commit " + shortId + ", " + state + " (" + fullId + ")";
    }
}
