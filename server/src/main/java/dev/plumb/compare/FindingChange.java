package dev.plumb.compare;

import dev.plumb.diagnostics.Diagnostic;

/**
 * A finding present at one revision and not at the other.
 *
 * @param appeared true when it is new at the later revision, false when it is gone from it
 * @param line, column where it is, 1-based (columns count characters), at the revision that has it
 */
public record FindingChange(Diagnostic finding, boolean appeared, int line, int column) {
}
