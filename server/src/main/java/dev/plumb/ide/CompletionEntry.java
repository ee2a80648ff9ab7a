package dev.plumb.ide;

/**
 * One completion: what is shown, what kind, a detail (a value, a signature), and what is
 * inserted — a snippet with placeholders ({@code ${1:Re}}) when {@code snippet} is true.
 */
public record CompletionEntry(String label, Kind kind, String detail, String insert, boolean snippet) {
    public enum Kind { VALUE, INPUT, FUNCTION, CORRELATION, TABLE, UNIT, KEYWORD, CONSTANT }
}
