package dev.plumb.bench;

import dev.plumb.analysis.Batch;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.function.Supplier;
import java.util.stream.Stream;

/**
 * Prints how long `plumb check` takes, in process (warm JIT, what the language server will see
 * on every keystroke) and as a fresh JVM (what a person or CI sees), on the samples and on a
 * generated 10,000-line document. Run:
 * {@code mvn -B -q -pl server -am test-compile exec:java -Dexec.classpathScope=test
 * -Dexec.mainClass=dev.plumb.bench.CheckBenchmark}. Figures only: nothing here asserts a time.
 */
public final class CheckBenchmark {
    private static final int WARMUP = 15;
    private static final int RUNS = 30;

    private CheckBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path root = dev.plumb.RepoRoot.get();
        List<Path> samples;
        try (Stream<Path> walk = Files.walk(root.resolve("samples"))) {
            samples = walk.filter(p -> p.toString().endsWith(".plumb")).sorted().toList();
        }
        Path big = Files.createTempFile("plumb-bench-", ".plumb");
        Files.writeString(big, GeneratedCalc.of(10_000));
        long lines = Files.readAllLines(big).size();
        int cores = Runtime.getRuntime().availableProcessors();

        System.out.printf("Plumb check benchmark — %d cores, %s %s%n", cores, System.getProperty("java.vm.name"),
            System.getProperty("java.version"));
        long libraryStart = System.nanoTime();
        dev.plumb.analysis.Stdlib library = dev.plumb.analysis.Stdlib.get();
        System.out.printf("standard library: %d entries in %d files, read and checked in %.0f ms (once per process;"
                + " first use %.0f ms)%n", library.entries().size(), library.files().size(), library.loadNanos() / 1e6,
            (System.nanoTime() - libraryStart) / 1e6);
        report("samples (" + samples.size() + " files), in process", () -> Batch.check(fresh(), samples, cores));
        report("generated " + lines + "-line document, in process", () -> Batch.check(fresh(), List.of(big), 1));
        Path jar = root.resolve("server/target/plumb.jar");
        if (Files.exists(jar)) {
            coldRuns("samples, fresh JVM (java -jar plumb.jar check samples/)", jar, root.resolve("samples"));
            coldRuns("generated document, fresh JVM", jar, big);
        } else {
            System.out.println("(no server/target/plumb.jar: build it to also time fresh-JVM runs)");
        }
        Files.deleteIfExists(big);
    }

    private static Workspace fresh() {
        return new Workspace(new FileSources(), Settings.DEFAULT);
    }

    private static void report(String what, Supplier<?> run) {
        for (int i = 0; i < WARMUP; i++) run.get();
        double[] ms = new double[RUNS];
        var threads = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        long allocated = 0;
        for (int i = 0; i < RUNS; i++) {
            long bytes = threads.getTotalThreadAllocatedBytes();
            long t0 = System.nanoTime();
            run.get();
            ms[i] = (System.nanoTime() - t0) / 1e6;
            allocated += threads.getTotalThreadAllocatedBytes() - bytes;
        }
        Arrays.sort(ms);
        System.out.printf("%-52s median %8.2f ms   min %8.2f ms   p90 %8.2f ms   allocated %7.1f MB/run%n",
            what, ms[RUNS / 2], ms[0], ms[(int) (RUNS * 0.9)], allocated / (double) RUNS / 1e6);
    }

    private static void coldRuns(String what, Path jar, Path target) throws IOException, InterruptedException {
        int n = 5;
        double[] ms = new double[n];
        for (int i = 0; i < n; i++) {
            long t0 = System.nanoTime();
            Process p = new ProcessBuilder("java", "-jar", jar.toString(), "check", target.toString())
                .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
            p.waitFor();
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        Arrays.sort(ms);
        System.out.printf("%-52s median %8.0f ms   min %8.0f ms   (%d runs)%n", what, ms[n / 2], ms[0], n);
    }
}
