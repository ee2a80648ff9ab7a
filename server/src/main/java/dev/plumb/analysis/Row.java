package dev.plumb.analysis;

import dev.plumb.diagnostics.Span;

/** One line of a document's results, in source order: what `plumb eval` and reports show. */
public sealed interface Row {
    Span span();

    record SectionRow(Span span, String title) implements Row {
    }

    record NarrativeRow(Span span, String text) implements Row {
    }

    /**
     * A defined value. {@code shown} is the value in its display unit ("1.204 kg/m³"), "?" when
     * it could not be computed; {@code display} is that unit (null when unknown), and
     * {@code statement} the statement that defines it (a definition, a solve statement, or a
     * broken line), whose spans say where its formula and its `in` unit are written.
     */
    record ValueRow(Span span, String name, boolean input, Value value, String shown, String basis, String note,
                    Origin origin, Solution solution, dev.plumb.units.Unit display, dev.plumb.syntax.Statement statement)
        implements Row {

        /** The formula as written, for a definition; null for a solved value or a broken line. */
        public dev.plumb.syntax.Expr formula() {
            return statement instanceof dev.plumb.syntax.Statement.Definition d ? d.expr() : null;
        }

        /** Where the `in` unit is written, or null when none is. */
        public dev.plumb.syntax.UnitText displayUnitWritten() {
            if (statement instanceof dev.plumb.syntax.Statement.Definition d) return d.displayUnit();
            if (statement instanceof dev.plumb.syntax.Statement.Seek s) return s.displayUnit();
            return null;
        }
    }

    /** What a callable row defines. */
    enum Callable {
        FUNCTION, CORRELATION, TABLE;

        /** The word for people: "function", "correlation", "table". */
        public String word() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /** A function, correlation or table column. */
    record FunctionRow(Span span, String signature, Callable kind, String note) implements Row {
    }

    /** A check; {@code passed} is null when it could not be evaluated. */
    record CheckRow(Span span, String source, Boolean passed, String detail, String note) implements Row {
    }
}
