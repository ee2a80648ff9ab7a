package dev.plumb.cli;

import dev.plumb.analysis.Batch;
import dev.plumb.analysis.Workspace;
import dev.plumb.diagnostics.Printable;
import dev.plumb.report.CalcReport;
import dev.plumb.report.ContentsPage;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** `plumb report PATH… [-o OUT]`: the printable calc, one self-contained HTML page per calc. */
@Command(name = "report", mixinStandardHelpOptions = true,
    description = "Write each calc as a self-contained HTML page to read, print and sign (next to the calc, or "
        + "under -o). A folder also gets a contents page, index.html. Exit codes as for check.")
final class ReportCommand implements Callable<Integer> {
    @Parameters(arity = "1..*", paramLabel = "PATH", description = "calc files or folders (all *.plumb below them)")
    List<Path> paths;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT",
        description = "where to write: a .html file for one calc, else a folder (made if missing); default: beside each calc")
    Path output;

    @Option(names = "--against", paramLabel = "REV",
        description = "mark what changed since this git revision: each value that moved shows Δ and its former value, "
            + "and the checks whose verdict flipped are listed first")
    String against;

    @Mixin
    CommonOptions common;

    @Mixin
    MonteCarloOptions monteCarlo;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = common.style().writer(spec.commandLine().getOut());
        PrintWriter err = spec.commandLine().getErr();
        PlumbFiles.Expanded expanded = PlumbFiles.expandOrSay(paths, err);
        if (expanded == null) return Main.USAGE;
        List<Path> files = expanded.files();
        // A folder that cannot be read has no report: said, never skipped in silence (check makes it a finding).
        for (PlumbFiles.Unreadable u : expanded.unreadable()) {
            err.println("plumb: cannot read " + Printable.line(u.path().toString()) + " (" + u.reason()
                + "), so the calcs in it have no report: let plumb read it, or name only readable folders");
        }
        if (files.isEmpty()) return Main.USAGE;
        boolean oneFile = files.size() == 1 && paths.size() == 1 && !Files.isDirectory(paths.get(0));
        if (output != null && output.toString().endsWith(".html") && !oneFile) {
            err.println("plumb: -o " + Printable.line(output.toString()) + " names one page, but there are "
                + files.size() + " calcs: name a folder instead");
            return Main.USAGE;
        }
        java.util.Map<Path, CalcReport.Changes> changes;
        try {
            changes = against == null ? java.util.Map.of() : ReportChanges.since(against, paths, common);
        } catch (dev.plumb.revisions.RevisionProblem e) {
            err.println("plumb: " + e.getMessage());
            return Main.USAGE;
        }
        Workspace workspace = new Workspace(common.sources(), monteCarlo.applied(common.settings()));
        List<Batch.Checked> results = Batch.check(workspace, files, Runtime.getRuntime().availableProcessors());
        String made = LocalDate.now().toString();
        List<ContentsPage.Entry> entries = new ArrayList<>();
        Path contents = oneFile ? null : contentsPage();
        // One status per repository for all the calcs, not one per calc.
        dev.plumb.revisions.HeadState.Reader heads = new dev.plumb.revisions.HeadState.Reader();
        try {
            for (Batch.Checked c : results) {
                Path target = target(c.analysis().file(), oneFile);
                String shownPath = Location.path(c.analysis().file());
                write(target, CalcReport.html(c.analysis(), c.diagnostics(), new CalcReport.Context(shownPath, made,
                    heads.of(c.analysis().file()).map(dev.plumb.revisions.HeadState::words).orElse(null),
                    ReportChanges.of(changes, c.analysis().file(), against))));
                out.println("wrote " + Printable.line(target.toString()));
                if (contents != null) {
                    String link = contents.toAbsolutePath().getParent().relativize(target.toAbsolutePath()).toString();
                    entries.add(ContentsPage.entry(c.analysis(), c.diagnostics(), link, shownPath));
                }
            }
            if (contents != null) {
                write(contents, ContentsPage.html("Calc reports", entries));
                out.println("wrote " + Printable.line(contents.toString()));
            }
        } catch (IOException e) {
            err.println("plumb: cannot write the report: " + Printable.line(String.valueOf(e.getMessage())));
            return Main.USAGE;
        }
        out.flush();
        int code = TextReport.Tally.of(results).exitCode(false);
        return expanded.unreadable().isEmpty() ? code : Math.max(code, Main.FINDINGS);
    }

    /** Beside the calc by default; under -o, at the calc's path relative to here (or its name, for a calc elsewhere). */
    private Path target(Path calc, boolean oneFile) {
        String name = calc.getFileName().toString().replaceFirst("\\.plumb$", "") + ".html";
        if (output == null) return calc.resolveSibling(name);
        if (oneFile && output.toString().endsWith(".html")) return output;
        Path here = Path.of("").toAbsolutePath();
        Path absolute = calc.toAbsolutePath().normalize();
        Path relative = absolute.startsWith(here) ? here.relativize(absolute) : absolute.getFileName();
        Path parent = relative.getParent();
        return parent == null ? output.resolve(name) : output.resolve(parent).resolve(name);
    }

    /** index.html under -o, or in the first folder named. */
    private Path contentsPage() {
        if (output != null) return output.resolve("index.html");
        for (Path p : paths) {
            if (Files.isDirectory(p)) return p.resolve("index.html");
        }
        return paths.get(0).toAbsolutePath().getParent().resolve("index.html");
    }

    private static void write(Path target, String html) throws IOException {
        Path parent = target.toAbsolutePath().getParent();
        if (parent != null) Files.createDirectories(parent);
        Files.writeString(target, html, StandardCharsets.UTF_8);
    }
}
