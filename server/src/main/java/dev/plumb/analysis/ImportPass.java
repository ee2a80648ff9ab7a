package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Severity;
import dev.plumb.syntax.Statement;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The first pass: reads the files a document `use`s (through the {@link Workspace}, which keeps
 * the workspace rule and analyses each file once) and gathers the names they define. Circles of
 * `use`, files that cannot be read and errors inside a used file are reported at the `use`.
 */
final class ImportPass {
    /** What the document imports: the names, in the order the files define them, and the files used directly. */
    record Imports(Map<String, Binding> names, List<Path> files) {
        Imports {
            names = Collections.unmodifiableMap(new LinkedHashMap<>(names));
            files = List.copyOf(files);
        }
    }

    private final Workspace workspace;
    private final Path file;
    private final List<Path> chain;
    private final Reporter reporter;
    private final java.util.function.BooleanSupplier superseded;
    private final Map<String, Binding> names = new LinkedHashMap<>();
    private final List<Path> files = new ArrayList<>();

    /** @param chain the files whose `use` led here, outermost first (to tell a circle) */
    ImportPass(Workspace workspace, Path file, List<Path> chain, Reporter reporter,
               java.util.function.BooleanSupplier superseded) {
        this.superseded = superseded;
        this.workspace = workspace;
        this.file = file;
        this.chain = chain;
        this.reporter = reporter;
    }

    Imports run(List<Statement> statements) {
        for (Statement s : statements) {
            if (s instanceof Statement.Use u) importFile(u);
        }
        return new Imports(names, files);
    }

    /** The file a `use` in {@code file} names, or null when its text is not a path here. */
    static Path target(Path file, Statement.Use u) {
        try {
            return file.toAbsolutePath().getParent().resolve(u.path()).normalize();
        } catch (java.nio.file.InvalidPathException e) {
            return null;
        }
    }

    private void importFile(Statement.Use u) {
        Path folder = file.toAbsolutePath().getParent();
        Path target;
        try {
            target = folder.resolve(u.path()).normalize();
        } catch (java.nio.file.InvalidPathException e) {
            // Under a locale that is not UTF-8 (LANG=C), the Java runtime cannot name files outside
            // ASCII at all: say so, rather than blame the path.
            boolean locale = !u.path().chars().allMatch(c -> c < 128)
                && !"UTF-8".equalsIgnoreCase(System.getProperty("sun.jnu.encoding", "UTF-8"));
            reporter.report(Code.USE_NOT_FOUND, u.pathSpan(), "cannot use \"" + u.path().replace("\0", "\\0") + "\": " + (locale
                ? "this Java runs under a locale that cannot name files outside ASCII; start Plumb with the `plumb` "
                    + "launcher, or set LC_ALL=C.UTF-8"
                : "it is not a file path here (" + e.getReason() + "): write the path of a .plumb file"));
            return;
        }
        Path root = workspace.sources().workspaceRoot(file);
        if (!target.startsWith(root)) {
            String why = workspace.sources().workspaceMarked(file)
                ? "\"" + u.path() + "\" leads outside the workspace (" + root + ", the nearest folder holding .git or "
                    + "plumb.toml): copy the file into the workspace"
                : "\"" + u.path() + "\" leads outside the workspace: no folder above this file holds .git or plumb.toml, "
                    + "so the workspace is only the file's own folder (" + root + "). To let `use` reach further, create an "
                    + "empty file named plumb.toml in the folder that holds all the calcs of the project (it marks the "
                    + "workspace root), or copy the file into this folder";
            reporter.report(Code.USE_OUTSIDE_WORKSPACE, u.pathSpan(), why);
            return;
        }
        Path self = file.toAbsolutePath().normalize();
        if (chain.contains(target) || target.equals(self)) {
            // The loop as seen from this file: this file, the target, … back to this file.
            List<Path> loop = new ArrayList<>(chain.subList(Math.max(0, chain.indexOf(target)), chain.size()));
            loop.add(self);
            Collections.rotate(loop, -loop.indexOf(self));
            files.add(target);
            reportUseCycle(u, loop);
            return;
        }
        List<Path> nextChain = new ArrayList<>(chain);
        nextChain.add(self);
        Workspace.Imported imported = workspace.analyzeImport(target, nextChain, superseded);
        if (imported.analysis() == null) {
            reporter.report(Code.USE_NOT_FOUND, u.pathSpan(), "cannot use \"" + u.path() + "\": " + imported.problem()
                + " (looked for " + target + ")");
            return;
        }
        files.add(target);
        Analysis a = imported.analysis();
        // On a circle, names come from none of its files, whichever file the analysis started
        // from: the circle is read from the files' texts, not from analyses made so far.
        List<Path> back = workspace.usePath(target, self, chain.isEmpty() ? self : chain.get(0));
        if (back != null) {
            List<Path> loop = new ArrayList<>();
            loop.add(self);
            loop.addAll(back.subList(0, back.size() - 1));
            reportUseCycle(u, loop);
            return;
        }
        reportImportedErrors(u, a);
        for (var entry : a.scope().all().entrySet()) {
            Binding existing = names.get(entry.getKey());
            if (existing == null) {
                names.put(entry.getKey(), entry.getValue());
            } else if (!sameOrigin(existing, entry.getValue())) {
                reporter.report(Code.NAME_DUPLICATE, u.pathSpan(), entry.getKey() + " is defined both in "
                    + fileName(existing.file()) + " and in " + fileName(entry.getValue().file()) + ": rename one of them");
            }
        }
    }

    private void reportUseCycle(Statement.Use u, List<Path> loop) {
        List<String> shown = new ArrayList<>();
        for (Path p : loop) shown.add(p.getFileName().toString());
        shown.add(loop.get(0).getFileName().toString());
        reporter.report(Code.USE_CYCLE, u.pathSpan(), "files use each other in a circle (" + String.join(" → ", shown)
            + "): move the shared definitions into a file of their own");
    }

    /**
     * Errors in a used file leave values unknown here: an error. Failed checks there leave every
     * value intact, so they are a warning here (the file's own check reports them as errors).
     */
    private void reportImportedErrors(Statement.Use u, Analysis a) {
        List<Diagnostic> errors = a.diagnostics().stream().filter(d -> d.severity() == Severity.ERROR).toList();
        if (errors.isEmpty()) return;
        List<Diagnostic> blocking = errors.stream().filter(d -> d.code() != Code.CHECK_FAILED).toList();
        Diagnostic first = blocking.isEmpty() ? errors.get(0) : blocking.get(0);
        String where = "; the first, on line " + a.lines().line(first.span().start()) + ": " + first.message();
        if (blocking.isEmpty()) {
            reporter.add(new Diagnostic(Code.USE_HAS_ERRORS, Severity.WARNING, u.pathSpan(), "\"" + u.path() + "\" has "
                + plural(errors.size(), "failing check") + where + ". Its values are computed; review the check there",
                List.of()));
            return;
        }
        reporter.report(Code.USE_HAS_ERRORS, u.pathSpan(), "\"" + u.path() + "\" has " + plural(blocking.size(), "error")
            + where + ". Fix them there: values here that depend on them are unknown");
    }

    private static String plural(int n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
    }

    private static boolean sameOrigin(Binding a, Binding b) {
        return a.file() != null && a.file().equals(b.file()) && a.span().equals(b.span());
    }

    static String fileName(Path p) {
        return p == null ? "the built-ins" : p.getFileName().toString();
    }
}
