package dev.plumb.units;

import java.util.List;

/** Result of resolving a unit expression: a unit, or what is wrong and where. */
public sealed interface UnitResult permits UnitResult.Ok, UnitResult.Error {

    record Ok(Unit unit) implements UnitResult {
    }

    /**
     * A known unit offered in place of an unknown one, with what it is: its name, its kind of
     * quantity and its size in SI ("pound-force per square inch, a pressure: 1 psi = 6894.757
     * Pa"). Taking a suggestion changes the value's magnitude or kind whenever the unit is not
     * the one meant, so the reader is always told what it is.
     */
    record Suggestion(String spelling, String note) {

        /** "'psi' (pound-force per square inch, a pressure: 1 psi = 6894.757 Pa)". */
        public String described() {
            return "'" + spelling + "' (" + note + ")";
        }
    }

    /**
     * A unit expression that could not be resolved.
     *
     * @param offset UTF-16 offset of the bad part inside the unit text
     * @param length UTF-16 length of the bad part (at least 1 unless the text is empty)
     * @param offers close known units, at most three, best first
     */
    record Error(String message, int offset, int length, List<Suggestion> offers)
            implements UnitResult {

        public Error {
            offers = List.copyOf(offers);
        }

        /** The spellings of the offered units, best first. */
        public List<String> suggestions() {
            return offers.stream().map(Suggestion::spelling).toList();
        }

        /** " (did you mean 'a' (what a is) or 'b' (what b is)?)", or "" with no offer. */
        public String didYouMean() {
            if (offers.isEmpty()) {
                return "";
            }
            return " (did you mean "
                    + String.join(" or ", offers.stream().map(Suggestion::described).toList())
                    + "?)";
        }
    }
}
