package dev.plumb.analysis;

import dev.plumb.units.Dimension;
import java.util.Map;
import java.util.Set;

/** The dimension words a correlation or table parameter may declare: {@code T: temperature}. */
final class ParameterDimensions {
    private static final Map<String, Dimension> WORDS = Map.ofEntries(
        Map.entry("dimensionless", Dimension.NONE),
        Map.entry("length", Dimension.LENGTH),
        Map.entry("area", Dimension.of(2, 0, 0, 0, 0, 0, 0)),
        Map.entry("volume", Dimension.of(3, 0, 0, 0, 0, 0, 0)),
        Map.entry("mass", Dimension.MASS),
        Map.entry("time", Dimension.TIME),
        Map.entry("temperature", Dimension.TEMPERATURE),
        Map.entry("velocity", Dimension.of(1, 0, -1, 0, 0, 0, 0)),
        Map.entry("acceleration", Dimension.of(1, 0, -2, 0, 0, 0, 0)),
        Map.entry("force", Dimension.of(1, 1, -2, 0, 0, 0, 0)),
        Map.entry("pressure", Dimension.of(-1, 1, -2, 0, 0, 0, 0)),
        Map.entry("density", Dimension.of(-3, 1, 0, 0, 0, 0, 0)),
        Map.entry("dynamic_viscosity", Dimension.of(-1, 1, -1, 0, 0, 0, 0)),
        Map.entry("kinematic_viscosity", Dimension.of(2, 0, -1, 0, 0, 0, 0)),
        Map.entry("power", Dimension.of(2, 1, -3, 0, 0, 0, 0)),
        Map.entry("energy", Dimension.of(2, 1, -2, 0, 0, 0, 0)),
        Map.entry("moment", Dimension.of(2, 1, -2, 0, 0, 0, 0)),
        Map.entry("frequency", Dimension.of(0, 0, -1, 0, 0, 0, 0)),
        Map.entry("mass_flow", Dimension.of(0, 1, -1, 0, 0, 0, 0)),
        Map.entry("volume_flow", Dimension.of(3, 0, -1, 0, 0, 0, 0)),
        Map.entry("angle", Dimension.NONE));

    private ParameterDimensions() {
    }

    /** The dimension of a word, or null when the word is not one of ours. */
    static Dimension of(String word) {
        return WORDS.get(word);
    }

    static Set<String> words() {
        return WORDS.keySet();
    }
}
