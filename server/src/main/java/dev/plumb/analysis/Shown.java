package dev.plumb.analysis;

import dev.plumb.units.DisplayUnits;
import dev.plumb.units.QuantityFormat;
import dev.plumb.units.Unit;

/** How values and source text read in the engine's messages (results are worded by the layers that show them). */
final class Shown {
    private Shown() {
    }

    /**
     * The value in the given unit. On an offset scale (°C, °F) a temperature difference is shown
     * as a difference, without the offset; anything else as a point.
     */
    static String value(Value v, Unit unit, int sig) {
        if (!v.known()) return "?";
        return QuantityFormat.format(v.si(), unit == null ? DisplayUnits.defaultFor(v.dimension()) : unit, sig,
            v.difference());
    }

    /** The Celsius scale, to show temperature points in messages. */
    static Unit celsius() {
        return ((dev.plumb.units.UnitResult.Ok) dev.plumb.units.UnitRegistry.standard().resolve("°C")).unit();
    }

    static String value(Value v) {
        return value(v, null, 4);
    }

    /** The source text of a span, shortened for messages. */
    private static final java.util.regex.Pattern BLANKS = java.util.regex.Pattern.compile("\\s+");

    static String source(String text, dev.plumb.diagnostics.Span span) {
        String s = BLANKS.matcher(text.substring(Math.max(0, span.start()), Math.min(text.length(), span.end())))
            .replaceAll(" ");
        return s.length() > 40 ? s.substring(0, 37) + "…" : s;
    }
}
