package dev.plumb.analysis;

/**
 * Options of one analysis, passed explicitly (no global state).
 *
 * @param significantFigures digits shown for values
 * @param equalityTolerance relative tolerance of {@code ==} and {@code !=} in checks
 */
public record Settings(int significantFigures, double equalityTolerance) {
    public static final Settings DEFAULT = new Settings(4, 1e-6);

    public Settings {
        if (significantFigures < 1 || significantFigures > 15) {
            throw new IllegalArgumentException("significant figures must be 1..15, got " + significantFigures);
        }
    }
}
