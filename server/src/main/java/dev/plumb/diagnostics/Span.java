package dev.plumb.diagnostics;

/** A range of source text as UTF-16 offsets into the document string, end exclusive. */
public record Span(int start, int end) {
    public static final Span NONE = new Span(0, 0);

    public Span {
        if (end < start) end = start;
    }

    public static Span cover(Span a, Span b) {
        return new Span(Math.min(a.start, b.start), Math.max(a.end, b.end));
    }

    public int length() {
        return end - start;
    }

    public boolean contains(int offset) {
        return offset >= start && offset < end;
    }
}
