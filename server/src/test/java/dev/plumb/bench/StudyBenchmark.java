package dev.plumb.bench;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.function.Supplier;

/**
 * Prints how long the studies take on a generated 100-definition calc (a drag calc of our own
 * shape: inputs, a correlation call, a chain of derived values, a check): the calc alone, with a
 * 1,000-row sweep, with a tolerance carried to every value, and with a 10,000-sample Monte Carlo
 * estimate of it, in process after warm-up, as the
 * language server sees them. The study's own cost is the difference to the calc alone. Run:
 * {@code mvn -B -q -pl server test-compile exec:java -Dexec.classpathScope=test
 * -Dexec.mainClass=dev.plumb.bench.StudyBenchmark}. Figures only: nothing here asserts a time.
 */
public final class StudyBenchmark {
    private static final int WARMUP = 10;
    private static final int RUNS = 20;

    private StudyBenchmark() {
    }

    /** A calc of {@code definitions} definitions (five of them inputs), each derived one reaching back to the speed. */
    static String calc(int definitions, String tolerance) {
        StringBuilder b = new StringBuilder("title \"Generated study benchmark\"\n");
        b.append("input V = 20 m/s").append(tolerance).append('\n');
        b.append("input rho = 1.2 kg/m^3\ninput nu = 1.5e-5 m^2/s\ninput L = 2 m\ninput S = 3 m^2\n");
        b.append("Re = V * L / nu\nCf = cf_plate_turb_avg(Re)\nf0 = 0.5 * rho * V^2 * Cf * S\n");
        for (int i = 1; i < definitions - 8; i++) b.append("f").append(i).append(" = f").append(i - 1).append(" * 1.001 + ")
            .append(i % 7 == 0 ? "0.5 * rho * V^2 * 0.01 m^2" : "0.1 N").append('\n');
        b.append("check f").append(definitions - 9).append(" <= 400 N\n");
        return b.toString();
    }

    public static void main(String[] args) {
        String base = calc(100, "");
        String sweep = base + "sweep V over 5 m/s .. 50 m/s in 1000 steps\n    show f91, Cf, Re\n";
        String toleranced = calc(100, " ± 1 m/s");
        System.out.printf("Plumb study benchmark — %s %s%n", System.getProperty("java.vm.name"),
            System.getProperty("java.version"));
        double alone = report("100-definition calc alone", () -> analyse(base));
        double swept = report("the same with a 1,000-row sweep", () -> analyse(sweep));
        double spread = report("the same with V ± 1 m/s carried to every value", () -> analyse(toleranced));
        double sampled = report("the same with a 10,000-sample Monte Carlo", () -> analyse(toleranced,
            Settings.DEFAULT.withSamples(10_000, Settings.DEFAULT_SEED)));
        System.out.printf("the sweep's own cost: %.1f ms (%.1f µs a row); the tolerance's: %.1f ms; the Monte Carlo's: "
            + "%.0f ms (%.1f µs a sample)%n", swept - alone, (swept - alone) * 1000 / 1000, spread - alone, sampled - spread,
            (sampled - spread) * 1000 / 10_000);
    }

    private static Analysis analyse(String text) {
        return analyse(text, Settings.DEFAULT);
    }

    private static Analysis analyse(String text, Settings settings) {
        return new Workspace(new FileSources(), settings).analyzeText(Path.of("bench.plumb").toAbsolutePath(), text);
    }

    private static double report(String what, Supplier<Analysis> run) {
        Analysis check = run.get();
        if (check.hasErrors()) throw new IllegalStateException(what + ": " + check.diagnostics());
        for (int i = 0; i < WARMUP; i++) run.get();
        double[] ms = new double[RUNS];
        for (int i = 0; i < RUNS; i++) {
            long t0 = System.nanoTime();
            run.get();
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        Arrays.sort(ms);
        System.out.printf("%-52s median %8.2f ms   min %8.2f ms   p90 %8.2f ms%n", what, ms[RUNS / 2], ms[0],
            ms[(int) (RUNS * 0.9)]);
        return ms[RUNS / 2];
    }
}
