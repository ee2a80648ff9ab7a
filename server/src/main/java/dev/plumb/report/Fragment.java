package dev.plumb.report;

/**
 * A typeset piece of a formula with what its surroundings need to know to decide on brackets: how
 * tightly it binds ({@code level}) and whether it starts with a sign, which may not follow an
 * operator directly ({@code a − (−b)}, not {@code a − −b}).
 */
record Fragment(String markup, int level, boolean signed) {
    /** A sum or difference. */
    static final int SUM = 10;
    /** A product or an inline quotient. */
    static final int PRODUCT = 20;
    /** A negation. */
    static final int UNARY = 25;
    /** A number with a unit or a power of ten: a product, but read as one quantity. */
    static final int SCALED = 30;
    /** A power, or a fraction (its bar groups it, but a power of it still needs brackets). */
    static final int POWER = 40;
    /** A name, a number, a call, a root, anything in brackets. */
    static final int ATOM = 50;

    static Fragment atom(String markup) {
        return new Fragment(markup, ATOM, false);
    }

    /**
     * This fragment, in brackets when it binds less tightly than {@code least}, or when it starts
     * with a sign where no sign may stand; bracketed, it is an atom.
     */
    Fragment bracketedBelow(int least, boolean signAllowed) {
        boolean needsBrackets = level < least || (signed && !signAllowed);
        return needsBrackets ? atom(MathElements.fenced("(", markup, ")")) : this;
    }
}
