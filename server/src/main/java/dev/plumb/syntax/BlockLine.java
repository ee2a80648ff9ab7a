package dev.plumb.syntax;

import dev.plumb.diagnostics.Span;
import java.util.List;

/**
 * The lines of correlation and table blocks as the parser reads them, one by one, before
 * {@link BlockGrouper} gathers them into {@link Statement.Correlation} and {@link Statement.Table}.
 */
sealed interface BlockLine {
    Span span();

    record CorrelationHead(Span span, Ident name, List<Statement.Param> params) implements BlockLine {
    }

    record TableHead(Span span, Ident name, Statement.Param param) implements BlockLine {
    }

    /** A one-word or one-text property: source, family, basis, regime, interpolate. */
    record Property(Span span, String key, String text, Ident word) implements BlockLine {
    }

    /** {@code basis frontal crossflow}: a basis with the flow direction it faces. */
    record Basis(Span span, Ident basis, Ident flow) implements BlockLine {
    }

    record Valid(Span span, Statement.Bound bound) implements BlockLine {
    }

    /** {@code domain 0 < Re}: where the formula has a physical meaning at all. */
    record Domain(Span span, Statement.Bound bound) implements BlockLine {
    }

    record Accuracy(Span span, Expr value) implements BlockLine {
    }

    record Piece(Span span, Statement.Piece piece) implements BlockLine {
    }

    record Columns(Span span, List<Statement.Column> columns) implements BlockLine {
    }

    record Row(Span span, Statement.Row row) implements BlockLine {
    }

    record End(Span span) implements BlockLine {
    }
}
