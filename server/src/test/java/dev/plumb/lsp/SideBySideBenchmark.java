package dev.plumb.lsp;

import com.google.gson.JsonObject;
import dev.plumb.analysis.Batch;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import dev.plumb.bench.ChainCalc;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;

/**
 * Prints, in one run, Plumb's figures and those of a Python units library (pint, Debian's
 * {@code python3-pint}) on the same generated calcs ({@link ChainCalc}), with their ratios:
 * an edit in the editor against re-running the calc as a notebook cell, a fresh process
 * against a fresh script, and a folder of many calcs. The pint column is skipped, with a
 * message, when pint cannot be imported. Figures only; nothing here asserts a time.
 * Run from {@code server/}: see DEVELOPERS.md, "Benchmarks".
 */
public final class SideBySideBenchmark {
    private static final String PYTHON = Files.isExecutable(Path.of("/usr/bin/python3")) ? "/usr/bin/python3" : "python3";

    private SideBySideBenchmark() {
    }

    /** A median and a minimum, in milliseconds. */
    record Figure(double median, double min) {
        static Figure of(double[] ms) {
            double[] s = ms.clone();
            Arrays.sort(s);
            return new Figure(s[s.length / 2], s[0]);
        }

        @Override
        public String toString() {
            return String.format(java.util.Locale.ROOT, "%8.2f ms (min %7.2f)", median, min);
        }
    }

    public static void main(String[] args) throws Exception {
        Path work = Files.createTempDirectory("plumb-side-by-side");
        Files.createDirectories(work.resolve(".git"));
        boolean pint = pintAvailable();
        System.out.printf("Plumb beside pint — %d cores, %s %s; pint: %s%n", Runtime.getRuntime().availableProcessors(),
            System.getProperty("java.vm.name"), System.getProperty("java.version"),
            pint ? pintVersion() : "not importable by " + PYTHON + " (install python3-pint): its column is skipped");
        System.out.printf("%-62s %-26s %-26s %s%n", "figure", "Plumb", "pint", "pint / Plumb");

        JsonObject options = new JsonObject();
        options.addProperty("debounceMs", 0);
        TestClient client = new TestClient(TestClient.withInlayHints(), options);
        for (int n : new int[] {1_000, 10_000}) {
            String text = ChainCalc.plumb(n);
            String uri = client.openAnalysed(work.resolve("chain" + n + ".plumb"), text);
            int[] version = {1};
            int runs = n >= 10_000 ? 40 : 100;
            // Retype the top speed (line 2, `input V_0 = 20 m/s`): every value below changes.
            editAndShow(client, uri, version, new Range(new Position(1, 12), new Position(1, 14)), 400);
            Figure top = Figure.of(editAndShow(client, uri, version, new Range(new Position(1, 12), new Position(1, 14)), runs));
            Figure cell = pint ? pintRerun(work, n, runs) : null;
            row("edit at the top → values shown, " + n + "-definition chain", top, cell);
            if (n >= 10_000) {
                // Retype the factor of the last drag figure: nothing else depends on it.
                int line = text.split("\n", -1).length - 1;
                while (!text.split("\n")[line - 1].startsWith("F_")) line--;
                Range factor = new Range(new Position(line - 1, text.split("\n")[line - 1].indexOf("1.2")),
                    new Position(line - 1, text.split("\n")[line - 1].indexOf("1.2") + 3));
                editAndShow(client, uri, version, factor, 200);
                row("local edit (no dependents) → values shown, " + n + " lines", Figure.of(
                    editAndShow(client, uri, version, factor, runs)), null);
            }
        }
        TestClient.close(client);

        Path jar = dev.plumb.RepoRoot.get().resolve("server/target/plumb.jar");
        Path small = work.resolve("small.plumb");
        Files.writeString(small, ChainCalc.plumb(16));
        Path script = work.resolve("small.py");
        Files.writeString(script, ChainCalc.pythonScript(16));
        if (Files.exists(jar)) {
            Figure plain = fresh(List.of("java", "-jar", jar.toString(), "check", small.toString()), 7);
            Figure py = pint ? fresh(List.of(PYTHON, script.toString()), 7) : null;
            row("check of one 20-line calc, fresh process (java -jar)", plain, py);
            // As bin/plumb runs a check: the quick compiler, the simple collector, a class-data archive
            // made by the first run.
            Path archive = work.resolve("plumb.jsa");
            List<String> launcher = new ArrayList<>(List.of("java", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC"));
            List<String> first = new ArrayList<>(launcher);
            first.addAll(List.of("-XX:ArchiveClassesAtExit=" + archive, "-jar", jar.toString(), "check", small.toString()));
            run(first);
            if (Files.exists(archive)) launcher.addAll(List.of("-XX:SharedArchiveFile=" + archive, "-Xshare:auto"));
            launcher.addAll(List.of("-jar", jar.toString(), "check"));
            List<String> checkSmall = new ArrayList<>(launcher);
            checkSmall.add(small.toString());
            row("same, as the launcher runs it", fresh(checkSmall, 7), py);
            Path many = work.resolve("many");
            Files.createDirectories(many);
            for (int i = 0; i < 1_000; i++) Files.writeString(many.resolve("calc" + i + ".plumb"), ChainCalc.plumb(45));
            row("check of 1,000 calcs of 49 lines, fresh process (java -jar)", fresh(List.of("java", "-jar", jar.toString(),
                "check", many.toString()), 5), null);
            List<String> checkMany = new ArrayList<>(launcher);
            checkMany.add(many.toString());
            row("same, as the launcher runs it", fresh(checkMany, 5), null);
            List<Path> files;
            try (var s = Files.list(many)) {
                files = s.sorted().toList();
            }
            int cores = Runtime.getRuntime().availableProcessors();
            double[] ms = new double[15];
            for (int i = -5; i < ms.length; i++) {
                long t0 = System.nanoTime();
                // A workspace keeps the analyses it made: a fresh one per run, as a fresh `plumb check` has.
                Batch.check(new Workspace(new FileSources(), Settings.DEFAULT), files, cores);
                if (i >= 0) ms[i] = (System.nanoTime() - t0) / 1e6 / files.size();
            }
            row("1,000 calcs of 49 lines in one warm process: per calc", Figure.of(ms), null);
        } else {
            System.out.println("(no server/target/plumb.jar: build it to also time fresh processes)");
        }
        System.exit(0);
    }

    /**
     * Times {@code runs} edits of {@code range} (retyping two or three characters), each until the
     * editor has the new values of the lines it shows.
     */
    private static double[] editAndShow(TestClient client, String uri, int[] version, Range range, int runs)
        throws Exception {
        double[] ms = new double[runs];
        int width = range.getEnd().getCharacter() - range.getStart().getCharacter();
        for (int i = 0; i < runs; i++) {
            version[0]++;
            String now = width == 3 ? (version[0] % 2 == 0 ? "1.3" : "1.2") : (version[0] % 2 == 0 ? "21" : "22");
            long t0 = System.nanoTime();
            client.remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
                new VersionedTextDocumentIdentifier(uri, version[0]), List.of(new TextDocumentContentChangeEvent(range, now))));
            // What an editor asks for next: the values of the 60 lines it shows around the edit.
            int top = Math.max(0, range.getStart().getLine() - 30);
            client.remote.getTextDocumentService().inlayHint(new InlayHintParams(new TextDocumentIdentifier(uri),
                new Range(new Position(top, 0), new Position(top + 60, 0)))).get(60, TimeUnit.SECONDS);
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        return ms;
    }

    private static void row(String what, Figure plumb, Figure other) {
        System.out.printf("%-62s %-26s %-26s %s%n", what, plumb, other == null ? "—" : other.toString(),
            other == null ? "" : String.format(java.util.Locale.ROOT, "%.1f×", other.median() / plumb.median()));
    }

    /** Re-runs the chain as a notebook cell in one Python process (the registry made once, outside the timing). */
    private static Figure pintRerun(Path work, int n, int runs) throws IOException, InterruptedException {
        Path cell = work.resolve("cell" + n + ".py");
        Files.writeString(cell, ChainCalc.pythonCell(n));
        Path driver = work.resolve("rerun.py");
        Files.writeString(driver, """
            import sys, time, pint
            u = pint.UnitRegistry()
            code = compile(open(sys.argv[1]).read(), sys.argv[1], "exec")
            runs = int(sys.argv[2])
            times = []
            for i in range(runs + max(3, runs // 10)):
                t0 = time.perf_counter()
                exec(code, {"u": u})
                times.append((time.perf_counter() - t0) * 1000)
            print(" ".join(str(t) for t in times[-runs:]))
            """);
        String out = run(List.of(PYTHON, driver.toString(), cell.toString(), Integer.toString(runs)));
        return Figure.of(Arrays.stream(out.trim().split(" ")).mapToDouble(Double::parseDouble).toArray());
    }

    private static Figure fresh(List<String> command, int runs) throws IOException, InterruptedException {
        run(command);
        double[] ms = new double[runs];
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            run(command);
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        return Figure.of(ms);
    }

    private static String run(List<String> command) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        p.waitFor();
        return out;
    }

    private static boolean pintAvailable() {
        try {
            return run(List.of(PYTHON, "-c", "import pint")).isBlank();
        } catch (IOException | InterruptedException e) {
            return false;
        }
    }

    private static String pintVersion() throws IOException, InterruptedException {
        return "pint " + run(List.of(PYTHON, "-c", "import pint; print(pint.__version__)")).trim() + " on "
            + run(List.of(PYTHON, "--version")).trim();
    }
}
