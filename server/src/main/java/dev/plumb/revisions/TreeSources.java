package dev.plumb.revisions;

import dev.plumb.analysis.DiskReads;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Sources;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.eclipse.jgit.lib.Constants;
import org.eclipse.jgit.lib.FileMode;
import org.eclipse.jgit.lib.ObjectId;
import org.eclipse.jgit.lib.ObjectLoader;
import org.eclipse.jgit.lib.Repository;
import org.eclipse.jgit.revwalk.RevTree;
import org.eclipse.jgit.treewalk.TreeWalk;

/**
 * Calcs as a commit has them, read from the repository's objects, never from the disk: a calc and
 * every file it `use`s come from the same commit. Paths are the working tree's (the file at
 * {@code workTree/a/b.plumb} is the commit's {@code a/b.plumb}), so a definition's identity (file
 * and name) is the same at every revision. The rules of {@link DiskReads} hold here too: nothing
 * outside the workspace root, only regular {@code .plumb} files (a link in the commit is followed
 * inside it), at most {@code maxBytes}, strict UTF-8.
 */
final class TreeSources implements Sources {
    /** Links followed one after another before a file counts as missing (a loop of links). */
    private static final int MAX_LINKS = 8;

    private final Repository repo;
    private final RevTree tree;
    private final Path workTree;
    private final long maxBytes;
    private final Map<Path, Path> roots = new ConcurrentHashMap<>();

    TreeSources(Repository repo, RevTree tree, Path workTree, long maxBytes) {
        this.repo = repo;
        this.tree = tree;
        this.workTree = workTree;
        this.maxBytes = maxBytes;
    }

    @Override
    public long maxBytes() {
        return maxBytes;
    }

    @Override
    public Loaded load(Path file, Path root) {
        Path f = file.toAbsolutePath().normalize();
        Path r = root.toAbsolutePath().normalize();
        if (!f.startsWith(r) || !f.startsWith(workTree)) return new Missing(DiskReads.NO_SUCH_FILE);
        try {
            return read(f, r, 0);
        } catch (IOException | RuntimeException e) {
            return new Missing("it cannot be read from the repository (" + e.getClass().getSimpleName() + ")");
        }
    }

    private Loaded read(Path file, Path root, int links) throws IOException {
        try (TreeWalk walk = TreeWalk.forPath(repo, gitPath(file), tree)) {
            if (walk == null) return new Missing(DiskReads.NO_SUCH_FILE);
            FileMode mode = walk.getFileMode(0);
            ObjectId id = walk.getObjectId(0);
            if (mode == FileMode.SYMLINK) {
                if (links >= MAX_LINKS) return new Missing(DiskReads.NO_SUCH_FILE);
                String target = new String(repo.open(id, Constants.OBJ_BLOB).getBytes(4096), StandardCharsets.UTF_8);
                Path next = file.getParent().resolve(target).normalize();
                // A link that leads out of the workspace reads as missing, as on disk.
                if (!next.startsWith(root)) return new Missing(DiskReads.NO_SUCH_FILE);
                return read(next, root, links + 1);
            }
            if (mode != FileMode.REGULAR_FILE && mode != FileMode.EXECUTABLE_FILE) {
                return new Missing("it is not a regular file (a folder or a submodule): use a .plumb file");
            }
            if (!file.getFileName().toString().endsWith(".plumb")) {
                return new Missing("it is not a .plumb file: only calcs are read, so give the file the .plumb extension");
            }
            ObjectLoader loader = repo.open(id, Constants.OBJ_BLOB);
            if (loader.getSize() > maxBytes) return new Missing(DiskReads.tooLarge(maxBytes));
            return FileSources.decode(loader.getBytes((int) Math.min(Integer.MAX_VALUE - 8, maxBytes)));
        }
    }

    /** The nearest folder at or above the file's holding plumb.toml in this commit, else the repository's top. */
    @Override
    public Path workspaceRoot(Path file) {
        Path folder = file.toAbsolutePath().normalize().getParent();
        if (folder == null || !folder.startsWith(workTree)) return workTree;
        return roots.computeIfAbsent(folder, this::markedRoot);
    }

    private Path markedRoot(Path folder) {
        for (Path p = folder; p != null && p.startsWith(workTree) && !p.equals(workTree); p = p.getParent()) {
            try (TreeWalk walk = TreeWalk.forPath(repo, gitPath(p.resolve("plumb.toml")), tree)) {
                if (walk != null) return p;
            } catch (IOException | RuntimeException e) {
                return workTree;
            }
        }
        return workTree;
    }

    /** The repository's own spelling of a working-tree path: relative, with '/'. */
    private String gitPath(Path file) {
        return workTree.relativize(file).toString().replace(java.io.File.separatorChar, '/');
    }
}
