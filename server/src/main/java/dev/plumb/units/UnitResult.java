package dev.plumb.units;

import java.util.List;

/** Result of resolving a unit expression: a unit, or what is wrong and where. */
public sealed interface UnitResult permits UnitResult.Ok, UnitResult.Error {

    record Ok(Unit unit) implements UnitResult {
    }

    /**
     * A unit expression that could not be resolved.
     *
     * @param offset UTF-16 offset of the bad part inside the unit text
     * @param length UTF-16 length of the bad part (at least 1 unless the text is empty)
     * @param suggestions close known spellings, at most three, best first
     */
    record Error(String message, int offset, int length, List<String> suggestions)
            implements UnitResult {

        public Error {
            suggestions = List.copyOf(suggestions);
        }
    }
}
