package dev.plumb.cli;

import dev.plumb.present.Caution;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Batch;
import dev.plumb.analysis.Workspace;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** `plumb eval FILE`: every value in its display unit, aligned, with the checks and findings. */
@Command(name = "eval", mixinStandardHelpOptions = true,
    description = "Evaluate one calc file and print every value and check. Exit codes as for check.")
final class EvalCommand implements Callable<Integer> {
    @Parameters(arity = "1", paramLabel = "FILE", description = "the calc file")
    Path file;

    @Mixin
    CommonOptions common;

    @picocli.CommandLine.Option(names = "--steps",
        description = "also print each `seek`'s iterations: trial value, residual and bracket, in the root's unit")
    boolean steps;

    /** How the values are written: for people, or for other tools. */
    enum Format { text, json, csv }

    @picocli.CommandLine.Option(names = "--format", defaultValue = "text",
        description = "text, json (every value, check and finding) or csv (one row per value); default: ${DEFAULT-VALUE}")
    Format format;

    @picocli.CommandLine.Option(names = "--trajectory", paramLabel = "NAME",
        description = "with --format csv: write the trajectory table of the motion whose time or state is NAME "
            + "instead of the values")
    String trajectory;

    @picocli.CommandLine.Option(names = "--sweep", paramLabel = "NAME",
        description = "with --format csv: write the table of the sweep that varies NAME instead of the values")
    String sweep;

    @picocli.CommandLine.Option(names = "--sensitivity", paramLabel = "NAME",
        description = "list under NAME each tolerance's and stated accuracy's share of its variance, largest first")
    String sensitivity;

    @picocli.CommandLine.Mixin
    MonteCarloOptions monteCarlo;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Style style = common.style();
        PrintWriter out = style.writer(spec.commandLine().getOut());
        PrintWriter err = spec.commandLine().getErr();
        if (Files.isDirectory(file)) {
            err.println("plumb: eval takes one calc file, and " + dev.plumb.diagnostics.Printable.line(file.toString())
                + " is a folder: name a .plumb file in it, or use `plumb check " + dev.plumb.diagnostics.Printable.line(
                    file.toString()) + "` for every calc below it");
            return Main.USAGE;
        }
        if (sweep != null && format != Format.csv) {
            err.println("plumb: --sweep NAME writes one sweep's table as CSV: add --format csv (text and json show every sweep)");
            return Main.USAGE;
        }
        if (!Files.isRegularFile(file)) {
            err.println("plumb: no such file: " + dev.plumb.diagnostics.Printable.line(file.toString()));
            return Main.USAGE;
        }
        if (trajectory != null && format != Format.csv) {
            err.println("plumb: --trajectory chooses the table that --format csv writes; text and json show every "
                + "motion's table already");
            return Main.USAGE;
        }
        if (trajectory != null && sweep != null) {
            err.println("plumb: --trajectory and --sweep each choose the one table --format csv writes: give one of them");
            return Main.USAGE;
        }
        Workspace workspace = new Workspace(common.sources(), monteCarlo.applied(common.settings()));
        List<Batch.Checked> results = Batch.check(workspace, List.of(file), 1);
        Batch.Checked checked = results.get(0);
        Analysis a = checked.analysis();
        if (format != Format.text) {
            // Machine formats are the data alone: no colours, no notice a parser would trip on.
            PrintWriter plain = spec.commandLine().getOut();
            if (format == Format.json) {
                ValueExport.json(a, checked.diagnostics(), plain);
            } else if (trajectory != null) {
                dev.plumb.analysis.Trajectory t = a.trajectory(trajectory);
                if (t == null) {
                    List<String> motions = a.trajectories().stream().map(m -> m.names().get(0)).toList();
                    err.println("plumb: " + dev.plumb.diagnostics.Printable.line(trajectory) + " is not the time or a "
                        + "state of a motion that ran in this calc" + (motions.isEmpty() ? " (it has none)"
                        : "; its motions' times: " + dev.plumb.diagnostics.Printable.line(String.join(", ", motions))));
                    return Main.USAGE;
                }
                ValueExport.csvTrajectory(t, plain);
            } else if (sweep != null) {
                if (!ValueExport.sweepCsv(a, sweep, plain)) {
                    err.println("plumb: " + dev.plumb.diagnostics.Printable.line(file.toString()) + " has no sweep of "
                        + dev.plumb.diagnostics.Printable.line(sweep) + ": name the value a `sweep` line varies");
                    return Main.USAGE;
                }
            } else {
                ValueExport.csv(a, plain);
            }
            plain.flush();
            return TextReport.Tally.of(results).exitCode(false);
        }
        EvalReport.write(a, out, style, steps, sensitivity);
        if (!checked.diagnostics().isEmpty()) {
            out.println();
            out.println(style.bold("Findings"));
            checked.diagnostics().forEach(d -> out.println("  " + TextReport.line(checked, d, style)));
        }
        out.println();
        out.println(Caution.TEXT);
        out.flush();
        return TextReport.Tally.of(results).exitCode(false);
    }
}
