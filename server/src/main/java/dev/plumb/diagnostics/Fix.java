package dev.plumb.diagnostics;

/**
 * A repair that mends a finding by itself, carried as data so that an editor never has to read
 * it back out of the message: put {@code text} over {@code span}. {@code title} says what it
 * does, in the words of a quick-fix menu. {@code preferred} marks a repair an editor may apply
 * on its own ("fix all"): only one that keeps the meaning the user wrote (a missing `*`, a former
 * spelling), never one that could change a value's size or kind (a close spelling of a unit).
 */
public record Fix(String title, Span span, String text, boolean preferred) {
    /** A repair that is offered, never preferred. */
    public Fix(String title, Span span, String text) {
        this(title, span, text, false);
    }
}
