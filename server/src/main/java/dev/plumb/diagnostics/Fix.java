package dev.plumb.diagnostics;

/**
 * A repair that mends a finding by itself, carried as data so that an editor never has to read
 * it back out of the message: put {@code text} over {@code span}. {@code title} says what it
 * does, in the words of a quick-fix menu.
 */
public record Fix(String title, Span span, String text) {
}
