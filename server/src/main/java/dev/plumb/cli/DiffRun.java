package dev.plumb.cli;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Batch;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Sources;
import dev.plumb.analysis.Workspace;
import dev.plumb.compare.Comparison;
import dev.plumb.compare.Diff;
import dev.plumb.compare.FileDiff;
import dev.plumb.compare.Side;
import dev.plumb.revisions.RevisionCalcs;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/** Wires `plumb diff`: analyses each revision's calcs with the engine and hands the pairs to the comparison. */
final class DiffRun {
    private DiffRun() {
    }

    /** Every calc of either revision, each paired with itself at the other. */
    static Diff revisions(RevisionCalcs before, RevisionCalcs after, Settings settings, double tolerance) {
        Workspace old = new Workspace(before.sources(), settings);
        Workspace now = new Workspace(after.sources(), settings);
        Map<Path, Batch.Checked> was = byFile(Batch.check(old, before.files(), threads()));
        Map<Path, Batch.Checked> is = byFile(Batch.check(now, after.files(), threads()));
        Set<Path> all = new TreeSet<>(was.keySet());
        all.addAll(is.keySet());
        List<FileDiff> files = new ArrayList<>();
        for (Path file : all) {
            Side b = side(was.get(file));
            Side a = side(is.get(file));
            files.add(Comparison.of(file, b, a, tolerance, changedUses(a.exists() ? a : b, old, now)));
        }
        return new Diff(named(before.revision()), named(after.revision()), tolerance, files);
    }

    /** Two calc files, each read where it lies (its `use`s beside it). */
    static Diff files(Path before, Path after, Sources sources, Settings settings, double tolerance) {
        Workspace old = new Workspace(sources, settings);
        Workspace now = new Workspace(sources, settings);
        Side b = side(Batch.check(old, List.of(before), 1).get(0));
        Side a = side(Batch.check(now, List.of(after), 1).get(0));
        FileDiff d = Comparison.of(after, b, a, tolerance, List.of());
        return new Diff(new Diff.Named(Location.path(before), null, null), new Diff.Named(Location.path(after), null, null),
            tolerance, List.of(d));
    }

    private static Diff.Named named(dev.plumb.revisions.Revision r) {
        return new Diff.Named(r.label(), r.shortId(), r.fullId());
    }

    private static Side side(Batch.Checked c) {
        return c == null ? Side.absent() : Side.of(c.analysis(), c.diagnostics());
    }

    private static Map<Path, Batch.Checked> byFile(List<Batch.Checked> checked) {
        Map<Path, Batch.Checked> out = new HashMap<>();
        for (Batch.Checked c : checked) out.put(c.analysis().file(), c);
        return out;
    }

    /** The files the calc uses, directly or not, whose text differs between the two revisions. */
    private static List<Path> changedUses(Side side, Workspace old, Workspace now) {
        List<Path> out = new ArrayList<>();
        if (!side.exists()) return out;
        Set<Path> seen = new HashSet<>();
        Deque<Path> todo = new ArrayDeque<>(side.analysis().imports());
        while (!todo.isEmpty()) {
            Path p = todo.poll();
            if (!seen.add(p)) continue;
            Analysis b = old.analyze(p);
            Analysis a = now.analyze(p);
            if (!b.text().equals(a.text())) out.add(p);
            todo.addAll(a.imports());
            todo.addAll(b.imports());
        }
        return out;
    }

    private static int threads() {
        return Runtime.getRuntime().availableProcessors();
    }
}
