package dev.plumb.revisions;

import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Sources;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.eclipse.jgit.lib.Constants;
import org.eclipse.jgit.lib.FileMode;
import org.eclipse.jgit.lib.ObjectId;
import org.eclipse.jgit.lib.ObjectReader;
import org.eclipse.jgit.lib.Repository;
import org.eclipse.jgit.revwalk.RevCommit;
import org.eclipse.jgit.revwalk.RevWalk;
import org.eclipse.jgit.storage.file.FileRepositoryBuilder;

/**
 * The git repository that holds the calcs, read with JGit (no git process): it resolves revision
 * names, lists the calcs at a revision and gives the {@link Sources} that read them there.
 * Close it when done.
 */
public final class GitRepo implements AutoCloseable {
    private final Repository repo;
    private final Path workTree;

    private GitRepo(Repository repo, Path workTree) {
        this.repo = repo;
        this.workTree = workTree;
    }

    /** The repository holding {@code place} (a file or folder), searching upwards from it. */
    public static GitRepo holding(Path place) throws RevisionProblem {
        Repository repo = find(place);
        if (repo == null) {
            throw new RevisionProblem(printable(place.toAbsolutePath().normalize()) + " is not inside a git repository: "
                + "run plumb diff inside one, or compare two calc files with `plumb diff OLD.plumb NEW.plumb`");
        }
        try {
            return new GitRepo(repo, repo.getWorkTree().toPath().toRealPath());
        } catch (IOException | RuntimeException e) {
            repo.close();
            throw new RevisionProblem("the repository at " + printable(repo.getDirectory().toPath())
                + " has no working tree that can be read (" + e.getClass().getSimpleName() + ")");
        }
    }

    /** The repository above {@code place}, or null when there is none (or only a bare one). */
    static Repository find(Path place) {
        Path start = place.toAbsolutePath().normalize();
        while (start != null && !Files.isDirectory(start)) start = start.getParent();
        if (start == null) return null;
        FileRepositoryBuilder builder = new FileRepositoryBuilder().findGitDir(start.toFile()).setMustExist(true);
        if (builder.getGitDir() == null) return null;
        try {
            Repository repo = builder.build();
            if (repo.isBare()) {
                repo.close();
                return null;
            }
            return repo;
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    /** The top folder of the working tree, as a real path. */
    public Path workTree() {
        return workTree;
    }

    /** The working tree as a revision. */
    public Revision workingTree() {
        return new Revision(Revision.WORKING_TREE, null, null);
    }

    /** A commit by any name git understands (HEAD, HEAD~2, a branch, a tag, an id). */
    public Revision resolve(String name) throws RevisionProblem {
        ObjectId id;
        try {
            id = repo.resolve(name + "^{commit}");
        } catch (IOException | RuntimeException e) {
            id = null;
        }
        if (id == null) {
            boolean empty;
            try {
                empty = repo.resolve(Constants.HEAD + "^{commit}") == null;
            } catch (IOException | RuntimeException e) {
                empty = false;
            }
            throw new RevisionProblem(empty
                ? "the repository at " + printable(workTree) + " has no commit yet: commit the calcs first, or compare two "
                    + "calc files with `plumb diff OLD.plumb NEW.plumb`"
                : "unknown revision '" + printable(name) + "' in the repository at " + printable(workTree)
                    + ": name a commit, branch or tag (for example HEAD~1)");
        }
        try (ObjectReader reader = repo.newObjectReader()) {
            return new Revision(name, id.copy(), reader.abbreviate(id, 7).name());
        } catch (IOException e) {
            return new Revision(name, id.copy(), id.abbreviate(7).name());
        }
    }

    /**
     * The given paths (files or folders, absolute or relative to the working folder) as the
     * repository spells them; empty when none is given or one is the top folder (every calc).
     */
    public List<String> inRepository(List<Path> paths) throws RevisionProblem {
        List<String> out = new ArrayList<>();
        boolean everything = false;
        for (Path p : paths) {
            Path real = realish(p);
            if (!real.startsWith(workTree)) {
                throw new RevisionProblem(printable(p) + " is outside the repository at " + printable(workTree)
                    + ": name files and folders inside it");
            }
            String rel = workTree.relativize(real).toString().replace(java.io.File.separatorChar, '/');
            if (rel.isEmpty()) everything = true;
            else out.add(rel);
        }
        return everything ? List.of() : out;
    }

    /** The path with links resolved as far as it exists (a calc deleted in the working tree still has a place). */
    static Path realish(Path p) {
        Path abs = p.toAbsolutePath().normalize();
        Path existing = abs;
        while (existing != null && !Files.exists(existing)) existing = existing.getParent();
        if (existing == null) return abs;
        try {
            return existing.toRealPath().resolve(existing.relativize(abs));
        } catch (IOException e) {
            return abs;
        }
    }

    /** The calcs (*.plumb) at a revision under the given repository paths (all when empty), sorted. */
    public List<Path> calcs(Revision revision, List<String> paths) throws RevisionProblem {
        try {
            List<String> found = revision.workingTree() ? WorkingTreeCalcs.list(repo, paths) : committed(revision, paths);
            return found.stream().sorted().map(workTree::resolve).toList();
        } catch (IOException | RuntimeException e) {
            throw new RevisionProblem("cannot list the calcs at " + printable(revision.label()) + " in the repository at "
                + printable(workTree) + " (" + e.getClass().getSimpleName() + ")");
        }
    }

    private List<String> committed(Revision revision, List<String> paths) throws IOException {
        List<String> out = new ArrayList<>();
        try (RevWalk rw = new RevWalk(repo); org.eclipse.jgit.treewalk.TreeWalk walk = new org.eclipse.jgit.treewalk.TreeWalk(repo)) {
            RevCommit commit = rw.parseCommit(revision.commit());
            walk.addTree(commit.getTree());
            walk.setRecursive(true);
            walk.setFilter(WorkingTreeCalcs.filter(paths));
            while (walk.next()) {
                FileMode mode = walk.getFileMode(0);
                if (mode == FileMode.REGULAR_FILE || mode == FileMode.EXECUTABLE_FILE || mode == FileMode.SYMLINK) {
                    out.add(walk.getPathString());
                }
            }
        }
        return out;
    }

    /** Where the calcs of a revision are read: the commit's objects, or the disk for the working tree. */
    public Sources sources(Revision revision, long maxBytes) throws RevisionProblem {
        if (revision.workingTree()) return new FileSources(maxBytes);
        try (RevWalk rw = new RevWalk(repo)) {
            return new TreeSources(repo, rw.parseCommit(revision.commit()).getTree(), workTree, maxBytes);
        } catch (IOException | RuntimeException e) {
            throw new RevisionProblem("cannot read " + printable(revision.label()) + " in the repository at "
                + printable(workTree) + " (" + e.getClass().getSimpleName() + ")");
        }
    }

    /** The calcs of a revision under the given repository paths (all when empty), with the sources that read them. */
    public RevisionCalcs calcsAt(Revision revision, List<String> paths, long maxBytes) throws RevisionProblem {
        return new RevisionCalcs(revision, calcs(revision, paths), sources(revision, maxBytes));
    }

    @Override
    public void close() {
        repo.close();
    }

    Repository repository() {
        return repo;
    }

    /** What the user typed or the disk holds, shown without control characters. */
    static String printable(Object o) {
        return dev.plumb.diagnostics.Printable.line(String.valueOf(o));
    }
}
