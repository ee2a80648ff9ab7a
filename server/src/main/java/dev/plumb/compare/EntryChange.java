package dev.plumb.compare;

import java.util.List;

/**
 * A correlation or table block (a library entry, the standard library's or a firm's own) whose
 * data differ between the revisions: its formula, rows, range, source or basis.
 *
 * @param kind "correlation" or "table"
 * @param parts what differs, in words ("rows", "valid range", "source", …); empty when it was added or removed
 * @param line its line, 1-based, at the later revision (the earlier one's when removed)
 */
public record EntryChange(String name, String kind, Status status, List<String> parts, int line) {
    public enum Status { ADDED, REMOVED, CHANGED }

    public EntryChange {
        parts = List.copyOf(parts);
    }
}
