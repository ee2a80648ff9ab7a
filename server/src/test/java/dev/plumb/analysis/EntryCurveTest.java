package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.units.UnitRegistry;
import org.junit.jupiter.api.Test;

/** A library entry drawn around its call: sampled over its stated range, within one small budget per curve. */
class EntryCurveTest {
    private static final String SLOW_PARTS = "f(x) = x + 1\n"
        + "g(x) = f(f(f(f(f(f(f(f(f(f(x))))))))))\n"
        + "h(x) = g(g(g(g(g(g(g(g(g(g(x))))))))))\n"
        + "k(x) = h(h(h(h(h(h(h(h(h(h(x))))))))))\n"
        + "l(x) = k(k(k(k(k(k(k(k(k(k(x))))))))))\n";

    @Test
    void aCurveSpansTheStatedRangeAndHoldsTheCallsPoint() {
        // 24/Re for 1 <= Re <= 10 (our own entry): at Re = 4 the value is 6, by hand.
        Analysis a = Fixture.analyze("correlation c24(Re: dimensionless)\n    valid 1 <= Re <= 10\n    = 24 / Re\nend\n"
            + "y = c24(4)\n");
        EntryCurve c = EntryCurve.of(a, a.calls().get(0), UnitRegistry.standard(), 11).orElseThrow();
        assertEquals(1, c.low(), 0);
        assertEquals(10, c.high(), 0);
        assertEquals(4, c.x(), 0);
        assertEquals(6, c.y(), 1e-12);
        assertTrue(c.inside());
        assertTrue(c.xs()[0] < 1 && c.xs()[c.xs().length - 1] > 10, "a margin either side of the range");
        for (int i = 0; i < c.xs().length; i++) assertEquals(24 / c.xs()[i], c.ys()[i], 1e-9);
    }

    @Test
    void anEntryTooCostlyToSampleIsNotDrawnAtAll() {
        // Each evaluation of `slow` calls f ten thousand times: affordable once in the calc, not
        // ninety times over for a picture, so the curve is given up rather than the report held up.
        Analysis a = Fixture.analyze(SLOW_PARTS + "correlation slow(Re: dimensionless)\n    valid 1 <= Re <= 10\n"
            + "    = l(Re) * 0 + 1\nend\ny = slow(5)\n");
        assertEquals(1.0, Fixture.value(a, "y").value().si(), 0, "the calc's own value is computed");
        assertFalse(EntryCurve.of(a, a.calls().get(0), UnitRegistry.standard(), 90).isPresent());
    }
}
