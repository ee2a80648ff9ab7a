package dev.plumb.units;

import java.util.Map;

/**
 * Gauge-pressure spellings, refused with advice. A gauge reading is the difference between a
 * pressure and the local atmosphere, so turning it into a pressure needs an atmospheric
 * pressure that the unit cannot know. Reading "30 psig" as 30 psi absolute would be wrong by
 * about an atmosphere, and in silence; so the spelling is an error that says what to write.
 */
final class GaugePressures {

    /** Gauge spelling → the unit of the same size and the absolute spelling. */
    private static final Map<String, String[]> GAUGE = Map.of(
            "psig", new String[] {"psi", "psia"},
            "barg", new String[] {"bar", "bar"});

    private GaugePressures() {
    }

    /** The message refusing {@code spelling}, or null when it is no gauge spelling. */
    static String refusal(String spelling) {
        String[] units = GAUGE.get(spelling);
        if (units == null) {
            return null;
        }
        return "'" + spelling + "' is a gauge pressure, a difference from the local atmospheric"
                + " pressure, which Plumb cannot know: write the absolute pressure in " + units[1]
                + ", or write the gauge reading in " + units[0]
                + " and add the atmosphere yourself: p = p_g + p_atm";
    }
}
