package dev.plumb.cli;

import dev.plumb.compare.CheckChange;
import dev.plumb.compare.Diff;
import dev.plumb.compare.FileDiff;
import dev.plumb.compare.ValueChange;
import dev.plumb.report.CalcReport;
import dev.plumb.revisions.GitRepo;
import dev.plumb.revisions.Revision;
import dev.plumb.revisions.RevisionProblem;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** `plumb report --against REV`: the value diff of each calc since REV, worded for its report. */
final class ReportChanges {
    /** Relative change below which a value counts as unchanged, as `plumb diff`'s default. */
    private static final double TOLERANCE = 1e-9;

    private ReportChanges() {
    }

    /** Each calc's changes since {@code rev}, by the calc's real path, against the working tree. */
    static Map<Path, CalcReport.Changes> since(String rev, List<Path> paths, CommonOptions common) throws RevisionProblem {
        Diff diff;
        String label;
        try (GitRepo repo = GitRepo.holding(paths.get(0))) {
            Revision before = repo.resolve(rev);
            label = before.label() + (before.shortId() == null ? "" : " (commit " + before.shortId() + ")");
            List<String> inRepo = repo.inRepository(paths);
            long max = common.sources().maxBytes();
            diff = DiffRun.revisions(repo.calcsAt(before, inRepo, max), repo.calcsAt(repo.workingTree(), inRepo, max),
                common.settings(), TOLERANCE);
        }
        int digits = common.settings().significantFigures();
        Map<Path, CalcReport.Changes> out = new HashMap<>();
        for (FileDiff f : diff.files()) {
            Map<String, String> values = new LinkedHashMap<>();
            for (ValueChange v : f.values()) {
                if (!v.reported() || v.after() == null) continue;
                values.put(v.name(), v.status() == ValueChange.Status.ADDED ? "new since " + rev
                    : "was " + DiffWords.before(v, digits) + ", " + DiffWords.change(v));
            }
            List<String> flipped = new ArrayList<>();
            for (CheckChange c : f.flipped()) {
                flipped.add(DiffWords.marks(c) + "  line " + c.line() + ": " + c.source() + " — was "
                    + DiffWords.verdict(c.before()) + ", now " + DiffWords.verdict(c.after()));
            }
            out.put(real(f.file()), new CalcReport.Changes(label, values, flipped));
        }
        return out;
    }

    /** The changes of one calc; a calc new since the revision has every value new. */
    static CalcReport.Changes of(Map<Path, CalcReport.Changes> changes, Path calc, String rev) {
        if (rev == null) return null;
        CalcReport.Changes c = changes.get(real(calc));
        return c != null ? c : new CalcReport.Changes(rev, Map.of(), List.of());
    }

    private static Path real(Path p) {
        try {
            return p.toRealPath();
        } catch (IOException e) {
            return p.toAbsolutePath().normalize();
        }
    }
}
