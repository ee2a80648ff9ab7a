package dev.plumb.syntax;

import dev.plumb.diagnostics.Span;
import java.util.List;

/** One statement of a document, in source order. Optional parts are null when absent. */
public sealed interface Statement {
    Span span();

    /** {@code title "…"}, {@code author "…"}, {@code reviewer "…"}, {@code revision "…"}. */
    record Header(Span span, String key, String text) implements Statement {
    }

    /** A line of prose starting with '#'; text is without the '#'. */
    record Narrative(Span span, String text) implements Statement {
    }

    record Section(Span span, String title) implements Statement {
    }

    record Use(Span span, String path, Span pathSpan) implements Statement {
    }

    /** {@code [input] NAME = EXPR [in UNIT] [as BASIS] ["note"]}. */
    record Definition(Span span, boolean input, Ident name, Expr expr, UnitText displayUnit,
                      Ident basis, String note) implements Statement {
    }

    /** {@code NAME(P1, P2) = EXPR ["note"]}. */
    record Function(Span span, Ident name, List<Ident> params, Expr body, String note) implements Statement {
        public Function {
            params = List.copyOf(params);
        }
    }

    /** {@code check A op B [op C] ["note"]}: operands.size() == comparators.size() + 1. */
    record Check(Span span, List<Expr> operands, List<Comparator> comparators, String note) implements Statement {
        public Check {
            operands = List.copyOf(operands);
            comparators = List.copyOf(comparators);
        }
    }

    /**
     * A statement with a syntax error. Its name, when it had one, still counts as defined so that
     * later uses do not add "unknown name" noise to the syntax error already reported.
     */
    record Broken(Span span, Ident name) implements Statement {
    }
}
