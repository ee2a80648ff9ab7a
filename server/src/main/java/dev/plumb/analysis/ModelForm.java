package dev.plumb.analysis;

import java.util.List;

/**
 * Model-form uncertainty of a value a correlation or table gives: the values that every entry
 * of its family valid at the call's arguments gives there (the one called among them), and their
 * range. It is reported apart from the spread of the inputs: it says how much the choice of
 * formula matters, not how far the inputs may lie. A value computed from such a call carries the
 * choice on: its values with each entry in place of the one called ({@code through} names the
 * definition whose formula is chosen).
 *
 * @param entries each valid entry's value at the call (or, through a definition, this value with
 *     that entry chosen there), the one called first
 * @param through null at the call itself; else the definition whose choice of entry this is
 * @param others how many other definitions' choices of entry also reach this value (their ranges
 *     are not in this one: only the widest is kept)
 */
public record ModelForm(double low, double high, List<Entry> entries, String through, int others) {
    public ModelForm {
        entries = List.copyOf(entries);
    }

    /** One entry of the family and its value at the call, in SI. */
    public record Entry(String name, double si) {
    }

    /** The range of the entries' values, at the call itself. */
    static ModelForm of(List<Entry> entries) {
        return of(entries, null);
    }

    /** The range of the entries' values, through {@code through}'s choice (null: at the call). */
    static ModelForm of(List<Entry> entries, String through) {
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (Entry e : entries) {
            low = Math.min(low, e.si());
            high = Math.max(high, e.si());
        }
        return new ModelForm(low, high, entries, through, 0);
    }

    /** The range relative to the value the entry called gives, for choosing the widest of several. */
    double relativeWidth() {
        double called = Math.abs(entries.get(0).si());
        return called == 0 ? high - low : (high - low) / called;
    }

    /** This one, knowing that {@code n} other choices reach the value too. */
    ModelForm withOthers(int n) {
        return new ModelForm(low, high, entries, through, n);
    }
}
