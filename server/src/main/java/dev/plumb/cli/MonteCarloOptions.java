package dev.plumb.cli;

import dev.plumb.analysis.Settings;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The options that ask for a Monte Carlo estimate of the spreads besides the first-order one: `eval` and `report`. */
final class MonteCarloOptions {
    @Spec(Spec.Target.MIXEE)
    CommandSpec command;

    private int samples;

    /** Refused, not clamped, when out of range: fewer samples than asked for would be a different estimate. */
    @Option(names = "--monte-carlo", paramLabel = "N",
        description = "also estimate every spread from N Monte Carlo samples of the tolerances (at most 1000000)")
    void samples(int n) {
        if (n < 0 || n > Settings.MAX_SAMPLES) {
            throw new ParameterException(command.commandLine(), "--monte-carlo takes 0 to " + Settings.MAX_SAMPLES
                + " samples, not " + n);
        }
        samples = n;
    }

    @Option(names = "--seed", paramLabel = "SEED", defaultValue = "20261202",
        description = "the Monte Carlo samples' random seed (default: ${DEFAULT-VALUE}, the same samples every run)")
    long seed;

    /** {@code settings} with the samples asked for (none unless asked). */
    Settings applied(Settings settings) {
        return settings.withSamples(samples, seed);
    }
}
