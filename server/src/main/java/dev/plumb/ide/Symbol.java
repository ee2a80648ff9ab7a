package dev.plumb.ide;

import dev.plumb.diagnostics.Span;
import java.util.List;

/** An outline entry: a section with its definitions, or a definition. kind: section, value, input, function, correlation, table, check. */
public record Symbol(String name, String kind, String detail, Span span, Span selection, List<Symbol> children) {
    public Symbol {
        children = List.copyOf(children);
    }
}
