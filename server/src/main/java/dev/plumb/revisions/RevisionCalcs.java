package dev.plumb.revisions;

import dev.plumb.analysis.Sources;
import java.nio.file.Path;
import java.util.List;

/**
 * The calcs of one revision, ready for the engine: which files there are and where they are read.
 *
 * @param files the calcs under the asked paths, sorted, as working-tree paths
 * @param sources reads them (and the files they use) as this revision has them
 */
public record RevisionCalcs(Revision revision, List<Path> files, Sources sources) {
    public RevisionCalcs {
        files = List.copyOf(files);
    }
}
