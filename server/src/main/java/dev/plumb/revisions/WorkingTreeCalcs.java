package dev.plumb.revisions;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.eclipse.jgit.dircache.DirCacheIterator;
import org.eclipse.jgit.lib.FileMode;
import org.eclipse.jgit.lib.Repository;
import org.eclipse.jgit.treewalk.FileTreeIterator;
import org.eclipse.jgit.treewalk.TreeWalk;
import org.eclipse.jgit.treewalk.WorkingTreeIterator;
import org.eclipse.jgit.treewalk.filter.AndTreeFilter;
import org.eclipse.jgit.treewalk.filter.PathFilterGroup;
import org.eclipse.jgit.treewalk.filter.PathSuffixFilter;
import org.eclipse.jgit.treewalk.filter.TreeFilter;

/**
 * The calcs of the working tree as git sees it: tracked ones and new ones not yet added, but not
 * what .gitignore hides (build output, copies). Only names are read here; the calcs themselves are
 * read through the engine's rules ({@code FileSources}). Links to folders and nested repositories
 * are not entered.
 */
final class WorkingTreeCalcs {
    private WorkingTreeCalcs() {
    }

    static List<String> list(Repository repo, List<String> paths) throws IOException {
        List<String> out = new ArrayList<>();
        try (TreeWalk walk = new TreeWalk(repo)) {
            int work = walk.addTree(new FileTreeIterator(repo));
            int index = walk.addTree(new DirCacheIterator(repo.readDirCache()));
            walk.setFilter(filter(paths));
            while (walk.next()) {
                WorkingTreeIterator w = walk.getTree(work, WorkingTreeIterator.class);
                if (w == null) continue; // deleted from the disk, only in the index
                boolean tracked = walk.getTree(index, DirCacheIterator.class) != null;
                if (!tracked && w.isEntryIgnored()) continue;
                if (walk.isSubtree()) {
                    walk.enterSubtree();
                    continue;
                }
                FileMode mode = walk.getFileMode(work);
                if (mode == FileMode.REGULAR_FILE || mode == FileMode.EXECUTABLE_FILE || mode == FileMode.SYMLINK) {
                    out.add(walk.getPathString());
                }
            }
        }
        return out;
    }

    /** Calc files under the given repository paths (everywhere when none is given). */
    static TreeFilter filter(List<String> paths) {
        TreeFilter calcs = PathSuffixFilter.create(".plumb");
        return paths.isEmpty() ? calcs : AndTreeFilter.create(PathFilterGroup.createFromStrings(paths), calcs);
    }
}
