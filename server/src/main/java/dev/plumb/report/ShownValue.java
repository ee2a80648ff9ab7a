package dev.plumb.report;

import java.util.Objects;

/**
 * A value as the report shows it: its number and its unit, both as text the caller has already
 * formatted (significant figures and display units are the caller's choice, see
 * {@code dev.plumb.present.ValueText}). The number may be any text ("1.204", "4.5e7", "?"); the unit
 * is empty for a plain number and is typeset like a unit written in the calc.
 */
public record ShownValue(String number, String unit) {
    public ShownValue {
        Objects.requireNonNull(number, "number");
        unit = unit == null ? "" : unit;
    }

    /** A plain number. */
    public static ShownValue plain(String number) {
        return new ShownValue(number, "");
    }
}
