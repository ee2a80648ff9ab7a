package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Bad unit text comes back as an error with a range and, for unknown units, suggestions. */
class UnitErrorsTest {

    private static final UnitRegistry UNITS = UnitRegistry.standard();

    @Test
    void unknownUnitIsLocatedAndNamed() {
        // "kg/mtr": the atom "mtr" starts at offset 3 and is 3 long.
        UnitResult.Error e = error("kg/mtr", "unknown unit 'mtr'", 3, 3);
        assertEquals("m", e.suggestions().get(0));
    }

    @Test
    void wrongCaseSuggestsTheRightCase() {
        assertEquals("kPa", error("kpa", "unknown unit 'kpa'", 0, 3).suggestions().get(0));
        assertEquals("Pa", error("N/pa", "unknown unit 'pa'", 2, 2).suggestions().get(0));
    }

    @Test
    void wordsSuggestTheirSymbol() {
        assertEquals(List.of("m"), error("meter", "unknown unit 'meter'", 0, 5).suggestions());
        assertEquals("s", error("m/sec", "unknown unit 'sec'", 2, 3).suggestions().get(0));
    }

    @Test
    void gaugePressuresAreRefusedWithAdvice() {
        UnitResult.Error e = error("psig", "'psig' is a gauge pressure, a difference from the local"
                + " atmospheric pressure, which Plumb cannot know: write the absolute pressure in psia,"
                + " or write the gauge reading in psi and add the atmosphere yourself: p = p_g + p_atm",
                0, 4);
        assertEquals(List.of(), e.suggestions()); // no quick fix: each choice changes the value
        error("lbf/psig", e.message(), 4, 4);
        UnitResult.Error bar = assertInstanceOf(UnitResult.Error.class, UNITS.resolve("barg"));
        assertTrue(bar.message().contains("write the absolute pressure in bar,"), bar.message());
    }

    @Test
    void waterColumnsTakeTheirDigit() {
        assertEquals("inH2O", error("inH20", "unknown unit 'inH20'", 0, 5).suggestions().get(0));
        error("H2", "write the exponent with '^', as in H^2", 1, 1);
    }

    @Test
    void everySuggestionSaysWhatItIs() {
        // A suggestion of another size or kind must say so: name, kind of quantity, SI size.
        // by hand: 1 mi = 1.609 344 km (NIST SP 811 B.8 mile, exact; from memory), 1 min = 60 s
        assertEquals(" (did you mean 'm' (metre, a length) or 'mi' (mile, a length: 1 mi = 1609.344 m)"
                + " or 'min' (minute, a time: 1 min = 60 s)?)", error("mtr", "unknown unit 'mtr'", 0, 3)
                .didYouMean());
        // by hand: 1 km/h = 1000 m / 3600 s = 0.277 777 8 m/s to seven figures
        assertEquals("'km/h' (a velocity: 1 km/h = 0.2777778 m/s)",
                error("kph", "unknown unit 'kph'", 0, 3).offers().get(0).described());
        assertEquals("'degF' (degree Fahrenheit, a temperature)",
                error("degf", "unknown unit 'degf'", 0, 4).offers().get(0).described());
    }

    @Test
    void theUnitsEngineersWriteAreKnownNotCorrected() {
        // Once offered psi (144 × psf), psi (ksi/1000), kg (for kip) and T (tesla, for t).
        for (String known : List.of("psf", "ksi", "kip", "t", "ton", "klf", "plf", "psia")) {
            assertInstanceOf(UnitResult.Ok.class, UNITS.resolve(known), known);
        }
    }

    @Test
    void aOneLetterCaseSlipNamesTheKind() {
        assertEquals("'N' (newton, a force)", error("n", "unknown unit 'n'", 0, 1).offers().get(0)
                .described());
    }

    @Test
    void atMostThreeSuggestions() {
        assertTrue(error("mtr", "unknown unit 'mtr'", 0, 3).suggestions().size() <= 3);
    }

    @Test
    void offsetsCountUtf16Units() {
        // "m³/xx": the superscript is one UTF-16 unit, so "xx" starts at offset 3.
        error("m³/xx", "unknown unit 'xx'", 3, 2);
    }

    @Test
    void malformedExpressions() {
        error("kg//m", "expected a unit after '/'", 3, 1);
        error("kg/", "expected a unit after '/'", 2, 1);
        error("m^", "expected a whole-number exponent after '^'", 1, 1);
        error("m^x", "expected a whole-number exponent after '^'", 2, 1);
        error("(m/s", "missing ')' for this '('", 0, 1);
        error("m/s)", "unmatched ')'", 3, 1);
        error("m^(2", "missing ')' for this '('", 2, 1);
        error("()", "empty parentheses", 0, 2);
        error("m s", "missing '·' or '/' between units", 2, 1);
        error("m2", "write the exponent with '^', as in m^2", 1, 1);
        error("10/s", "the only number allowed in a unit is 1, as in 1/s", 0, 2);
        error("m^999", "exponent too large (at most 99)", 2, 3);
        error("m#", "unexpected '#' in unit", 1, 1);
        error("", "empty unit", 0, 0);
        error("  ", "empty unit", 0, 2);
    }

    @Test
    void deepNestingIsRefusedNotOverflowed() {
        String deep = "(".repeat(10_000) + "m" + ")".repeat(10_000);
        assertInstanceOf(UnitResult.Error.class, UNITS.resolve(deep));
    }

    @Test
    void hugeFactorsAreRefused() {
        assertInstanceOf(UnitResult.Error.class, UNITS.resolve("(Qm^30)^30"));
    }

    @Test
    void nullIsAnErrorToo() {
        assertInstanceOf(UnitResult.Error.class, UNITS.resolve(null));
    }

    @Test
    void randomTextNeverThrows() {
        String alphabet = "mkgsKNPa°CF%µμuΩ()*/·⋅^-−+0123456789²³⁻¹ .#lbfthdegR";
        Random random = new Random(20240611L);
        for (int i = 0; i < 500; i++) {
            StringBuilder text = new StringBuilder();
            int length = random.nextInt(12);
            for (int j = 0; j < length; j++) {
                text.append(alphabet.charAt(random.nextInt(alphabet.length())));
            }
            UnitResult result = UNITS.resolve(text.toString());
            assertNotNull(result);
            if (result instanceof UnitResult.Error e) {
                assertTrue(e.offset() >= 0 && e.offset() + e.length() <= text.length(),
                        "range inside the text: " + text);
                assertTrue(e.suggestions().size() <= 3);
            }
        }
    }

    @Test
    void charactersOutsideTheBasicPlaneAreReportedWhole() {
        error("m*😀", "expected a unit after '*'", 2, 2);
        error("😀", "unexpected '😀' in unit", 0, 2);
        error("\uD83D", "unexpected '\uD83D' in unit", 0, 1);
    }

    private static UnitResult.Error error(String text, String message, int offset, int length) {
        UnitResult result = UNITS.resolve(text);
        UnitResult.Error e = assertInstanceOf(UnitResult.Error.class, result, text);
        assertEquals(message, e.message(), text);
        assertEquals(offset, e.offset(), text + " offset");
        assertEquals(length, e.length(), text + " length");
        return e;
    }
}
