package dev.plumb.analysis;

import dev.plumb.diagnostics.Span;

/**
 * A repair a finding asks for that only the whole document can turn into an edit: where a
 * definition's formula is, which densities carry a tag. The analyser resolves them once every
 * value is known ({@link Reporter#all}); what cannot be resolved is dropped, never guessed.
 */
sealed interface FixRequest {
    /** Replace the formula of the document's own definition {@code name} with {@code formula}. */
    record Formula(String title, String name, String formula) implements FixRequest {
    }

    /** Put the name of each of the document's densities tagged {@code tag} at {@code argument}. */
    record TaggedDensity(String tag, Span argument) implements FixRequest {
    }
}
