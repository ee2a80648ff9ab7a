package dev.plumb.cli;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The `plumb` command line for people and CI. The language server's command is added by the
 * launcher ({@code dev.plumb.app.Plumb}), so that this package never depends on the protocol.
 */
@Command(name = "plumb", mixinStandardHelpOptions = true, version = "plumb 0.1.0",
    description = "Checks plain-text drag, lift and skin-friction calcs: units, limits and checks.",
    subcommands = {CheckCommand.class, EvalCommand.class, ReportCommand.class, DiffCommand.class})
public final class Main implements Runnable {
    /** Exit codes: 0 clean, 1 errors or failed checks, 2 usage or input/output problems. */
    static final int CLEAN = 0;
    static final int FINDINGS = 1;
    static final int USAGE = 2;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "name a command: check, eval, report or diff");
    }

    /** Runs the command line with the given streams; returns the exit code. */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        return run(args, out, err, java.util.Map.of());
    }

    /** As {@link #run(String[], PrintStream, PrintStream)}, with more commands by name (the launcher's). */
    public static int run(String[] args, PrintStream out, PrintStream err, java.util.Map<String, Object> more) {
        return run(args, out, err, more, null);
    }

    /** As above, with the launcher's `--version` text (the build's version and commit); null keeps this class's. */
    public static int run(String[] args, PrintStream out, PrintStream err, java.util.Map<String, Object> more,
            CommandLine.IVersionProvider version) {
        CommandLine cli = new CommandLine(new Main());
        if (version != null) {
            cli.getCommandSpec().versionProvider(version);
        }
        more.forEach(cli::addSubcommand);
        cli.setOut(new java.io.PrintWriter(new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8), true));
        // Errors echo what was typed (paths, option values): neutralised like every report.
        cli.setErr(new NeutralWriter(new java.io.OutputStreamWriter(err, StandardCharsets.UTF_8), java.util.Set.of()));
        cli.setExitCodeExceptionMapper(e -> USAGE);
        cli.getCommandSpec().parser().abbreviatedOptionsAllowed(false);
        cli.setParameterExceptionHandler((ex, a) -> {
            java.io.PrintWriter e = ex.getCommandLine().getErr();
            e.println("plumb: " + ex.getMessage());
            ex.getCommandLine().usage(e);
            e.flush();
            return USAGE;
        });
        return cli.execute(args);
    }
}
