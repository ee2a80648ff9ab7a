package dev.plumb.units;

/**
 * One unit symbol as it may appear between operators in a unit expression ("kPa", "ft", "°C"),
 * reduced to plain numbers once when the registry is built.
 *
 * @param symbol the canonical spelling written back to the user ("°C" for "degC", "µm" for "um")
 * @param offset non-zero only for the °C and °F scales; used only when the atom stands alone
 * @param name the unit's name in words ("pound-force per square foot", "kilopascal"), told to
 *     the user when a suggestion offers it
 */
record AtomUnit(String symbol, String name, double factor, double offset, Dimension dimension) {

    /** A temperature atom is a point on a scale when it stands alone, a difference otherwise. */
    boolean isTemperature() {
        return dimension.equals(Dimension.TEMPERATURE);
    }
}
