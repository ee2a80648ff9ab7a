package dev.plumb.syntax;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import java.util.ArrayList;
import java.util.List;

/**
 * Gathers the lines of {@code correlation … end} and {@code table … end} blocks into one
 * statement each, and says clearly what is wrong with a block: a missing {@code end}, a line
 * that belongs elsewhere, rows that do not fit the header. A block with a broken line becomes
 * {@link Statement.Broken}, so its name stays defined without further noise.
 */
final class BlockGrouper {
    private final List<Diagnostic> diagnostics = new ArrayList<>();
    private final List<Statement> out = new ArrayList<>();
    private Block open;

    /** The lines of one block while it is being read. */
    private static final class Block {
        final BlockLine head;
        final List<Object> lines = new ArrayList<>();
        Span end;
        boolean broken;

        Block(BlockLine head) {
            this.head = head;
        }
    }

    List<Diagnostic> diagnostics() {
        return diagnostics;
    }

    List<Statement> group(List<Object> items) {
        for (Object item : items) {
            if (item instanceof BlockLine.CorrelationHead || item instanceof BlockLine.TableHead) {
                if (open != null) close("it has no `end` before the next block starts");
                open = new Block((BlockLine) item);
            } else if (open != null) {
                inBlock(item);
            } else if (item instanceof BlockLine line) {
                error(line.span(), outside(line));
            } else {
                out.add((Statement) item);
            }
        }
        if (open != null) close("it has no `end` before the end of the file");
        return out;
    }

    private void inBlock(Object item) {
        if (item instanceof BlockLine.End end) {
            open.end = end.span();
            close(null);
        } else if (item instanceof BlockLine || item instanceof Statement.Header) {
            open.lines.add(item);
        } else if (item instanceof Statement.Broken) {
            open.broken = true;
        } else if (item instanceof Statement.Narrative) {
            return; // a comment inside a block
        } else {
            close("it has no `end` before this statement");
            out.add((Statement) item);
        }
    }

    private static String outside(BlockLine line) {
        if (line instanceof BlockLine.Piece) return "a formula line `= …` belongs inside a `correlation … end` block";
        if (line instanceof BlockLine.Columns) {
            return "a line of names: if this is a table's header, it belongs inside a `table … end` block; "
                + "if it is a formula, it lacks '=' or an operator between the names";
        }
        if (line instanceof BlockLine.Row) return "a row of numbers belongs inside a `table … end` block";
        if (line instanceof BlockLine.End) return "`end` without a `correlation` or `table` to close";
        String key = line instanceof BlockLine.Property p ? p.key() : line instanceof BlockLine.Valid ? "valid"
            : line instanceof BlockLine.Basis ? "basis" : line instanceof BlockLine.Domain ? "domain" : "accuracy";
        return "`" + key + "` belongs inside a `correlation … end` or `table … end` block";
    }

    private void close(String missingEnd) {
        Block b = open;
        open = null;
        Ident name = b.head instanceof BlockLine.CorrelationHead c ? c.name() : ((BlockLine.TableHead) b.head).name();
        String what = (b.head instanceof BlockLine.CorrelationHead ? "correlation " : "table ") + name.text();
        if (missingEnd != null) error(b.head.span(), what + " is not closed: " + missingEnd + "; add a line `end`");
        Span span = Span.cover(b.head.span(), b.end != null ? b.end : lastSpan(b));
        int before = diagnostics.size();
        Statement built = b.head instanceof BlockLine.CorrelationHead c ? correlation(c, b, span) : table(
            (BlockLine.TableHead) b.head, b, span);
        boolean failed = b.broken || diagnostics.size() > before || missingEnd != null;
        out.add(failed ? new Statement.Broken(span, name) : built);
    }

    private static Span lastSpan(Block b) {
        if (b.lines.isEmpty()) return b.head.span();
        Object last = b.lines.get(b.lines.size() - 1);
        return last instanceof BlockLine l ? l.span() : ((Statement) last).span();
    }

    /** Metadata common to both kinds of block. */
    private final class Meta {
        String title;
        String source;
        Ident family;
        Ident basis;
        Ident flow;
        Ident regime;
        Ident interpolate;
        Expr accuracy;
        final List<Statement.Bound> valid = new ArrayList<>();
        final List<Statement.Bound> domain = new ArrayList<>();

        /** Takes a metadata line; false when the line is not metadata. */
        boolean take(Object line) {
            if (line instanceof Statement.Header h && h.key().equals("title")) {
                title = once(title, h.text(), h.span(), "title");
            } else if (line instanceof BlockLine.Property p) {
                switch (p.key()) {
                    case "source" -> source = once(source, p.text(), p.span(), "source");
                    case "family" -> family = once(family, p.word(), p.span(), "family");
                    case "basis" -> basis = once(basis, p.word(), p.span(), "basis");
                    case "regime" -> regime = once(regime, p.word(), p.span(), "regime");
                    default -> interpolate = once(interpolate, p.word(), p.span(), "interpolate");
                }
            } else if (line instanceof BlockLine.Basis b) {
                basis = once(basis, b.basis(), b.span(), "basis");
                flow = flow != null ? flow : b.flow();
            } else if (line instanceof BlockLine.Valid v) {
                valid.add(v.bound());
            } else if (line instanceof BlockLine.Domain d) {
                domain.add(d.bound());
            } else if (line instanceof BlockLine.Accuracy a) {
                accuracy = once(accuracy, a.value(), a.span(), "accuracy");
            } else if (line instanceof Statement.Header h) {
                error(h.span(), "`" + h.key() + "` belongs to the document's header, not inside a block");
            } else {
                return false;
            }
            return true;
        }

        private <T> T once(T existing, T value, Span span, String key) {
            if (existing != null) error(span, "a second `" + key + "` line: a block takes one; remove one of them");
            return existing != null ? existing : value;
        }
    }

    private Statement correlation(BlockLine.CorrelationHead head, Block b, Span span) {
        Meta meta = new Meta();
        List<Statement.Piece> pieces = new ArrayList<>();
        for (Object line : b.lines) {
            if (meta.take(line)) continue;
            if (line instanceof BlockLine.Piece p) {
                if (!pieces.isEmpty() && pieces.get(pieces.size() - 1).otherwise()) {
                    error(p.span(), "a formula after the `otherwise` formula is never used: move `otherwise` last");
                }
                pieces.add(p.piece());
            } else {
                error(((BlockLine) line).span(), "a correlation has no table lines: this belongs in a `table … end` block");
            }
        }
        if (meta.interpolate != null) error(head.span(), "`interpolate` belongs to tables; remove it from correlation "
            + head.name().text());
        if (pieces.isEmpty() && !b.broken) {
            error(head.span(), "correlation " + head.name().text() + " has no formula: add a line `= …`");
        }
        for (int i = 0; i + 1 < pieces.size(); i++) {
            if (pieces.get(i).condition() == null && !pieces.get(i).otherwise()) {
                error(pieces.get(i).span(), "with several formulas, each but the last needs `when CONDITION`");
            }
        }
        return new Statement.Correlation(span, head.name(), head.params(), meta.title, meta.source, meta.family,
            meta.basis, meta.valid, meta.regime, meta.accuracy, pieces, meta.flow, meta.domain);
    }

    private Statement table(BlockLine.TableHead head, Block b, Span span) {
        Meta meta = new Meta();
        List<Statement.Column> columns = null;
        List<Statement.Row> rows = new ArrayList<>();
        for (Object line : b.lines) {
            if (meta.take(line)) continue;
            if (line instanceof BlockLine.Columns c) {
                if (columns != null) error(c.span(), "a second header row: a table has one");
                else if (!rows.isEmpty()) error(c.span(), "the header row must come before the rows of numbers");
                else columns = c.columns();
            } else if (line instanceof BlockLine.Row r) {
                rows.add(r.row());
            } else {
                error(((BlockLine) line).span(), "a table has no formula lines: this belongs in a `correlation … end` block");
            }
        }
        if (meta.regime != null) error(head.span(), "`regime` belongs to correlations; remove it from table "
            + head.name().text());
        if (columns == null) {
            if (!b.broken) error(head.span(), "table " + head.name().text() + " has no header row: add a line of column "
                + "names, the argument first, e.g. `T in degC   rho in kg/m^3`");
        } else {
            checkRows(head, columns, rows);
        }
        return new Statement.Table(span, head.name(), head.param(), meta.title, meta.source, meta.family, meta.basis,
            meta.valid, meta.accuracy, meta.interpolate, columns == null ? List.of() : columns, rows, meta.flow,
            meta.domain);
    }

    private void checkRows(BlockLine.TableHead head, List<Statement.Column> columns, List<Statement.Row> rows) {
        if (rows.size() < 2) {
            error(head.span(), "table " + head.name().text() + " needs at least two rows of numbers to interpolate");
        }
        Double previous = null;
        for (Statement.Row r : rows) {
            if (r.numbers().size() != columns.size()) {
                error(r.span(), "this row has " + r.numbers().size() + " numbers but the header names " + columns.size()
                    + " columns");
                continue;
            }
            double x = r.numbers().get(0);
            if (previous != null && x <= previous) {
                error(r.span(), "rows must ascend in " + columns.get(0).name().text() + ": " + fmt(x) + " comes after "
                    + fmt(previous));
            }
            previous = x;
        }
    }

    private static String fmt(double x) {
        return x == Math.rint(x) && Math.abs(x) < 1e15 ? String.valueOf((long) x) : String.valueOf(x);
    }

    private void error(Span span, String message) {
        diagnostics.add(Diagnostic.of(Code.SYNTAX_ERROR, span, message));
    }
}
