package dev.plumb.cli;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Batch;
import dev.plumb.diagnostics.Code;
import dev.plumb.analysis.Workspace;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** `plumb check PATH…`: every finding with its location, a summary, and an exit code for CI. */
@Command(name = "check", mixinStandardHelpOptions = true,
    description = "Check calc files and folders (all *.plumb below them). Exit 0: no errors; 1: errors or "
        + "failed checks (or open warnings, with --fail-on warning); 2: usage or file problems.")
final class CheckCommand implements Callable<Integer> {
    enum Format { text, json, sarif }

    /** The least severity of an open finding that fails the run. */
    enum FailOn { error, warning }

    @Parameters(arity = "1..*", paramLabel = "PATH", description = "files or folders to check")
    List<Path> paths;

    @Option(names = "--format", defaultValue = "text", description = "text, json or sarif (SARIF 2.1.0, for code review hosts; default: ${DEFAULT-VALUE})")
    Format format;

    @Option(names = "--fail-on", defaultValue = "error", paramLabel = "SEVERITY",
        description = "error or warning: with warning, an open (not accepted) warning also makes the exit code 1, "
            + "for CI that demands none (default: ${DEFAULT-VALUE})")
    FailOn failOn;

    @Mixin
    CommonOptions common;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Style style = common.style();
        PrintWriter out = style.writer(spec.commandLine().getOut());
        PrintWriter err = spec.commandLine().getErr();
        PlumbFiles.Expanded expanded = PlumbFiles.expandOrSay(paths, err);
        if (expanded == null) return Main.USAGE;
        List<Path> files = expanded.files();
        Workspace workspace = new Workspace(common.sources(), common.settings());
        List<Batch.Checked> results = new ArrayList<>(
            Batch.check(workspace, files, Runtime.getRuntime().availableProcessors()));
        for (PlumbFiles.Unreadable u : expanded.unreadable()) {
            Analysis a = Analysis.unreadable(u.path(), Code.FILE_UNREADABLE, "cannot read this folder ("
                + u.reason() + "), so the calcs in it were not checked: let plumb read it, or name only readable folders");
            results.add(new Batch.Checked(a, a.diagnostics()));
        }
        switch (format) {
            case json -> JsonReport.write(results, out);
            case sarif -> SarifReport.write(results, spec.root().version()[0].replaceFirst("^plumb ", ""), out);
            default -> TextReport.write(results, out, style);
        }
        out.flush();
        return TextReport.Tally.of(results).exitCode(failOn == FailOn.warning);
    }
}
