package dev.plumb.syntax;

/** The comparison operators of a {@code check}. */
public enum Comparator {
    LT("<"), LE("<="), GT(">"), GE(">="), EQ("=="), NE("!=");

    private final String symbol;

    Comparator(String symbol) {
        this.symbol = symbol;
    }

    public String symbol() {
        return symbol;
    }
}
