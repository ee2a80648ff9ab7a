package dev.plumb.analysis;

import java.util.List;

/**
 * Model-form uncertainty of a value a correlation or table gives: the values that every entry
 * of its family valid at the call's arguments gives there (the one called among them), and their
 * range. It is reported apart from the spread of the inputs: it says how much the choice of
 * formula matters, not how far the inputs may lie.
 *
 * @param entries each valid entry's value at the call, the one called first
 */
public record ModelForm(double low, double high, List<Entry> entries) {
    public ModelForm {
        entries = List.copyOf(entries);
    }

    /** One entry of the family and its value at the call, in SI. */
    public record Entry(String name, double si) {
    }

    /** The range of the entries' values. */
    static ModelForm of(List<Entry> entries) {
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (Entry e : entries) {
            low = Math.min(low, e.si());
            high = Math.max(high, e.si());
        }
        return new ModelForm(low, high, entries);
    }
}
