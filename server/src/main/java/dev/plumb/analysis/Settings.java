package dev.plumb.analysis;

/**
 * Options of one analysis, passed explicitly (no global state).
 *
 * @param significantFigures digits shown for values
 * @param equalityTolerance relative tolerance of {@code ==} and {@code !=} in checks
 * @param criticalReynolds the critical Reynolds number for regime checks, replacing the library's
 *     Re_crit where the document does not define its own; null keeps the library's
 */
public record Settings(int significantFigures, double equalityTolerance, Double criticalReynolds) {
    public static final Settings DEFAULT = new Settings(4, 1e-6, null);

    public Settings(int significantFigures, double equalityTolerance) {
        this(significantFigures, equalityTolerance, null);
    }

    public Settings {
        if (significantFigures < 1 || significantFigures > 15) {
            throw new IllegalArgumentException("significant figures must be 1..15, got " + significantFigures);
        }
    }
}
