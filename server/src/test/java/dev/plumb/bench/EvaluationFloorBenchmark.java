package dev.plumb.bench;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import java.nio.file.Path;
import java.util.Collection;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.OptionsBuilder;

/**
 * How far Plumb's evaluation is from the floor: the same arithmetic on plain Java doubles. The
 * calc is {@link ChainCalc}'s 1,000-definition chain; Plumb evaluates it again for every row of
 * a sweep of its first speed ({@link #ROWS} rows: each row evaluates every definition again,
 * with units, dimension checks and the lints' bookkeeping, through the engine's one re-run
 * path), so the time a row adds — the swept calc's time less the plain calc's, over the rows —
 * is the evaluation alone, without reading, resolving or planning. {@link #doubles} does the
 * same rows with plain doubles. {@link #main} runs the three and prints the ratio.
 * Run: see DEVELOPERS.md, "Benchmarks". Figures only; nothing here asserts a time.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 8, time = 1)
@Fork(value = 1, jvmArgs = {"-Xss64m"})
public class EvaluationFloorBenchmark {
    static final int DEFINITIONS = 1_000;
    static final int ROWS = 200;
    private static final Path FILE = Path.of("floor.plumb").toAbsolutePath();
    private final String calc = ChainCalc.plumb(DEFINITIONS);
    private final String swept = calc + "sweep V_0 over 10 m/s .. 40 m/s in " + ROWS + " steps\n    show "
        + ChainCalc.lastSpeed(DEFINITIONS) + "\n";

    @Benchmark
    public Analysis plumbOnce() {
        return new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(FILE, calc);
    }

    @Benchmark
    public Analysis plumbSwept() {
        return new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(FILE, swept);
    }

    /** The chain's arithmetic for every row, as a Java programmer would write it without units. */
    @Benchmark
    public double doubles() {
        double rho = 1.225;
        double a = 1.5;
        double total = 0;
        for (int r = 0; r < ROWS; r++) {
            double v = 10 + 30.0 * r / (ROWS - 1);
            double f = 0;
            for (int n = 1; n <= DEFINITIONS; n++) {
                if (n % 10 == 0) f = 1.2 * a * 0.5 * rho * v * v / 1000;
                else v = v * 1.0001 + 0.001;
            }
            total += v + f;
        }
        return total;
    }

    public static void main(String[] args) throws Exception {
        Collection<RunResult> results = new Runner(new OptionsBuilder()
            .include(EvaluationFloorBenchmark.class.getSimpleName()).build()).run();
        double once = 0;
        double sweptTime = 0;
        double floor = 0;
        for (RunResult r : results) {
            String name = r.getParams().getBenchmark();
            double us = r.getPrimaryResult().getScore();
            if (name.endsWith("plumbOnce")) once = us;
            if (name.endsWith("plumbSwept")) sweptTime = us;
            if (name.endsWith("doubles")) floor = us;
        }
        double plumbPerDefinition = (sweptTime - once) / ROWS / DEFINITIONS * 1000;
        double floorPerDefinition = floor / ROWS / DEFINITIONS * 1000;
        System.out.printf(Locale.ROOT, "%nEvaluation of one definition, %,d-definition chain, %d sweep rows:%n", DEFINITIONS, ROWS);
        System.out.printf(Locale.ROOT, "  Plumb (re-run path, units and checks):  %8.1f ns%n", plumbPerDefinition);
        System.out.printf(Locale.ROOT, "  plain Java doubles (the floor):          %8.2f ns%n", floorPerDefinition);
        System.out.printf(Locale.ROOT, "  ratio:                                   %8.0f×%n", plumbPerDefinition / floorPerDefinition);
    }
}
