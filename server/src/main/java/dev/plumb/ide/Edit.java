package dev.plumb.ide;

/** A text edit in UTF-16 offsets: replace {@code length} units at {@code offset} by {@code replacement}. */
public record Edit(int offset, int length, String replacement) {
    public int end() {
        return offset + length;
    }
}
