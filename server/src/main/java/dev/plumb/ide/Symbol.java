package dev.plumb.ide;

import dev.plumb.diagnostics.Span;
import java.util.List;

/** An outline entry: a section with its definitions, or a definition. */
public record Symbol(String name, Kind kind, String detail, Span span, Span selection, List<Symbol> children) {
    public enum Kind { SECTION, INPUT, VALUE, FUNCTION, CORRELATION, TABLE, CHECK }

    public Symbol {
        children = List.copyOf(children);
    }
}
