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
     * it could not be computed.
     */
    record ValueRow(Span span, String name, boolean input, Value value, String shown, String basis, String note,
                    Origin origin, Solution solution) implements Row {
    }

    /** A function, correlation or table column; kind is "function", "correlation" or "table". */
    record FunctionRow(Span span, String signature, String kind, String note) implements Row {
    }

    /** A check; {@code passed} is null when it could not be evaluated. */
    record CheckRow(Span span, String source, Boolean passed, String detail, String note) implements Row {
    }
}
