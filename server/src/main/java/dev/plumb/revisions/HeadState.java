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
        return new Reader().of(calc);
    }

    /**
     * Reads the head state of many calcs with one status of each repository they lie in: a
     * folder's reports need not walk the whole working tree once per calc.
     */
    public static final class Reader {
        /** Each repository's state by its git folder; empty for one that cannot be read. */
        private final java.util.Map<Path, Optional<Snapshot>> byRepository = new java.util.HashMap<>();

        /** As {@link HeadState#of(Path)}. */
        public Optional<HeadState> of(Path calc) {
            Path absolute = calc.toAbsolutePath().normalize();
            Repository repo = GitRepo.find(absolute.getParent() == null ? absolute : absolute.getParent());
            if (repo == null) return Optional.empty();
            Optional<Snapshot> snapshot;
            try (repo) {
                snapshot = byRepository.computeIfAbsent(repo.getDirectory().toPath().toAbsolutePath().normalize(),
                    dir -> Snapshot.of(repo));
            }
            return snapshot.flatMap(s -> s.stateOf(calc));
        }
    }

    /** One repository's HEAD and working-tree status, read once. */
    private record Snapshot(Path top, String shortId, String fullId, java.util.Set<String> changed, boolean treeChanged) {
        static Optional<Snapshot> of(Repository repo) {
            try (Git git = new Git(repo); ObjectReader reader = repo.newObjectReader()) {
                Path top = repo.getWorkTree().toPath().toRealPath();
                ObjectId head = repo.resolve(Constants.HEAD + "^{commit}");
                if (head == null) return Optional.empty();
                Status status = git.status().call();
                java.util.Set<String> changed = new java.util.HashSet<>();
                changed.addAll(status.getModified());
                changed.addAll(status.getChanged());
                changed.addAll(status.getAdded());
                changed.addAll(status.getRemoved());
                changed.addAll(status.getMissing());
                changed.addAll(status.getUntracked());
                changed.addAll(status.getConflicting());
                return Optional.of(new Snapshot(top, reader.abbreviate(head, 7).name(), head.name(), changed,
                    status.hasUncommittedChanges()));
            } catch (Exception e) {
                // A repository that cannot be read gives no revision line rather than a wrong one.
                return Optional.empty();
            }
        }

        Optional<HeadState> stateOf(Path calc) {
            Path file;
            try {
                file = GitRepo.realish(calc);
            } catch (Exception e) {
                return Optional.empty();
            }
            if (!file.startsWith(top)) return Optional.empty();
            String rel = top.relativize(file).toString().replace(java.io.File.separatorChar, '/');
            return Optional.of(new HeadState(shortId, fullId, changed.contains(rel), treeChanged));
        }
    }

    /** The report's line: "commit 1a2b3c4, with uncommitted changes to this calc (1a2b3c4…full id)". */
    public String words() {
        String state = fileChanged ? "with uncommitted changes to this calc"
            : treeChanged ? "this calc as committed; other files have uncommitted changes" : "no uncommitted changes";
        return "commit " + shortId + ", " + state + " (" + fullId + ")";
    }
}
