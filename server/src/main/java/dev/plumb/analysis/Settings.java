package dev.plumb.analysis;

/**
 * Options of one analysis, passed explicitly (no global state).
 *
 * @param significantFigures digits shown for values
 * @param equalityTolerance relative tolerance of {@code ==} and {@code !=} in checks
 * @param criticalReynolds the critical Reynolds number for regime checks, replacing the library's
 *     Re_crit where the document does not define its own; null keeps the library's
 * @param samples how many Monte Carlo samples of the tolerances to draw, besides the first-order
 *     estimate (0: none)
 * @param seed the seed of the samples' random generator
 */
public record Settings(int significantFigures, double equalityTolerance, Double criticalReynolds, int samples, long seed) {
    public static final Settings DEFAULT = new Settings(4, 1e-6, null);
    /** The most Monte Carlo samples a run may ask for. */
    public static final int MAX_SAMPLES = 1_000_000;
    /** The random generator's seed unless another is asked for: the same samples every run. */
    public static final long DEFAULT_SEED = 20261202L;

    /** Settings without a Monte Carlo estimate. */
    public Settings(int significantFigures, double equalityTolerance, Double criticalReynolds) {
        this(significantFigures, equalityTolerance, criticalReynolds, 0, DEFAULT_SEED);
    }

    /** These settings with a Monte Carlo estimate of {@code n} samples (0: none) from this seed. */
    public Settings withSamples(int n, long seed) {
        return new Settings(significantFigures, equalityTolerance, criticalReynolds, n, seed);
    }

    public Settings(int significantFigures, double equalityTolerance) {
        this(significantFigures, equalityTolerance, null);
    }

    public Settings {
        if (significantFigures < 1 || significantFigures > 15) {
            throw new IllegalArgumentException("significant figures must be 1..15, got " + significantFigures);
        }
        if (samples < 0 || samples > MAX_SAMPLES) {
            throw new IllegalArgumentException("Monte Carlo samples must be 0.." + MAX_SAMPLES + ", got " + samples);
        }
    }
}
