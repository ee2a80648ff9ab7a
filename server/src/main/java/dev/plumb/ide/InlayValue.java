package dev.plumb.ide;

/** A computed value to show at the end of a statement: {@code = 1.204 kg/m³}, {@code ✓}. */
public record InlayValue(int offset, String label, String statement) {
}
