package dev.plumb.cli;

import dev.plumb.compare.Comparison;
import dev.plumb.compare.Diff;
import dev.plumb.diagnostics.Printable;
import dev.plumb.revisions.GitRepo;
import dev.plumb.revisions.Revision;
import dev.plumb.revisions.RevisionProblem;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * `plumb diff [REV1 [REV2]] [-- PATH…]` and `plumb diff OLD.plumb NEW.plumb`: what a change did to
 * the results. Reads the revisions (dev.plumb.revisions), analyses them, pairs them
 * (dev.plumb.compare) and prints; nothing else.
 */
@Command(name = "diff", mixinStandardHelpOptions = true,
    customSynopsis = {"plumb diff [OPTIONS] [REV1 [REV2]] [-- PATH...]", "       plumb diff [OPTIONS] OLD.plumb NEW.plumb"},
    description = {"Show what a change did to the results: values moved (by how much), checks flipped, findings new "
        + "and gone, library entries changed.",
        "REV1 defaults to HEAD, REV2 to the working tree, PATH to every calc of the repository; "
            + "`plumb diff OLD.plumb NEW.plumb` compares two files, in git or not.",
        "Exit 0: nothing changed; 1: something changed (with --fail-on check-flip: a check flipped); 2: usage problems."})
final class DiffCommand implements Callable<Integer> {
    enum Format { text, markdown, json }

    /** What makes the exit code 1. */
    enum FailOn { change, check_flip }

    @Parameters(paramLabel = "REV", arity = "0..*",
        description = "two revisions (a commit, branch or tag), or two calc files; after `--`, the files and folders to compare")
    List<String> args = new ArrayList<>();

    @Option(names = "--format", defaultValue = "text",
        description = "text, markdown (for a pull-request comment) or json (default: ${DEFAULT-VALUE})")
    Format format;

    private double tolerance = Comparison.DEFAULT_TOLERANCE;

    @Option(names = "--tolerance", paramLabel = "REL", defaultValue = "1e-9",
        description = "a value whose relative change is at most this counts as unchanged (default: ${DEFAULT-VALUE})")
    void tolerance(double t) {
        if (!(t >= 0) || Double.isInfinite(t)) {
            throw new ParameterException(spec.commandLine(), "--tolerance must be a relative change of 0 or more, such as "
                + "1e-6, not " + t);
        }
        tolerance = t;
    }

    @Option(names = "--fail-on", paramLabel = "WHAT", defaultValue = "change", converter = FailOnWords.class,
        description = "change (anything reported) or check-flip (only a check whose verdict changed) makes the exit "
            + "code 1 (default: ${DEFAULT-VALUE})")
    FailOn failOn;

    @Mixin
    CommonOptions common;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Diff diff;
        try {
            diff = compare();
        } catch (RevisionProblem e) {
            err.println("plumb: " + e.getMessage());
            return Main.USAGE;
        }
        Style style = format == Format.text ? common.style() : new Style(false);
        PrintWriter out = style.writer(spec.commandLine().getOut());
        int digits = common.settings().significantFigures();
        switch (format) {
            case json -> DiffJson.write(diff, out, digits);
            case markdown -> DiffMarkdown.write(diff, out, digits);
            default -> DiffText.write(diff, out, style, digits);
        }
        out.flush();
        boolean fails = failOn == FailOn.check_flip ? diff.anyCheckFlipped() : diff.anyChange();
        return fails ? Main.FINDINGS : Main.CLEAN;
    }

    private Diff compare() throws RevisionProblem {
        int afterDelimiter = afterDelimiter();
        List<String> revs = args.subList(0, args.size() - afterDelimiter);
        List<Path> paths = args.subList(args.size() - afterDelimiter, args.size()).stream().map(Path::of).toList();
        if (afterDelimiter == 0 && revs.size() == 2 && isFile(revs.get(0)) && isFile(revs.get(1))) {
            return DiffRun.files(Path.of(revs.get(0)), Path.of(revs.get(1)), common.sources(), common.settings(), tolerance);
        }
        if (revs.size() > 2) {
            throw new RevisionProblem("diff compares two revisions, not " + revs.size() + ": write `plumb diff REV1 REV2 -- "
                + "PATH…` to name files and folders after `--`");
        }
        try (GitRepo repo = GitRepo.holding(paths.isEmpty() ? Path.of("") : paths.get(0))) {
            Revision before = resolve(repo, revs.isEmpty() ? "HEAD" : revs.get(0));
            Revision after = revs.size() < 2 ? repo.workingTree() : resolve(repo, revs.get(1));
            List<String> inRepo = repo.inRepository(paths);
            long max = common.sources().maxBytes();
            var old = repo.calcsAt(before, inRepo, max);
            var now = repo.calcsAt(after, inRepo, max);
            if (old.files().isEmpty() && now.files().isEmpty()) {
                throw new RevisionProblem("no .plumb files " + (paths.isEmpty() ? "in the repository" : "in "
                    + Printable.line(paths.toString())) + " at " + Printable.line(before.label()) + " or at "
                    + Printable.line(after.label()));
            }
            return DiffRun.revisions(old, now, common.settings(), tolerance);
        }
    }

    /** A revision, or a hint to put a path after `--` when the name is a file or folder instead. */
    private static Revision resolve(GitRepo repo, String name) throws RevisionProblem {
        try {
            return repo.resolve(name);
        } catch (RevisionProblem e) {
            if (Files.exists(Path.of(name))) {
                throw new RevisionProblem("'" + Printable.line(name) + "' is not a revision but a file or folder: to compare "
                    + "the calcs in it write `plumb diff -- " + Printable.line(name) + "`, to compare two calc files name both");
            }
            throw e;
        }
    }

    private static boolean isFile(String arg) {
        return Files.isRegularFile(Path.of(arg)) || Files.isSymbolicLink(Path.of(arg));
    }

    /** How many of the arguments came after `--`: those are paths, the ones before revisions. */
    private int afterDelimiter() {
        List<String> original = spec.commandLine().getParseResult().originalArgs();
        int at = original.indexOf("--");
        return at < 0 ? 0 : Math.min(args.size(), original.size() - at - 1);
    }

    /** Accepts the option's words as written: check-flip. */
    static final class FailOnWords implements picocli.CommandLine.ITypeConverter<FailOn> {
        @Override
        public FailOn convert(String value) {
            for (FailOn f : FailOn.values()) {
                if (f.name().replace('_', '-').equals(value)) return f;
            }
            throw new picocli.CommandLine.TypeConversionException("expected change or check-flip, not '" + value + "'");
        }
    }
}
