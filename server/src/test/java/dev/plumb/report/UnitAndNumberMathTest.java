package dev.plumb.report;

import static dev.plumb.report.MathDom.all;
import static dev.plumb.report.MathDom.children;
import static dev.plumb.report.MathDom.only;
import static dev.plumb.report.MathDom.reading;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/** Quantities: the number typeset, a thin space, the unit upright in its symbols. */
class UnitAndNumberMathTest {

    private static Element quantity(String number, String unit) {
        return MathDom.parse(Written.MATH.quantity(new ShownValue(number, unit)));
    }

    @Test
    void aUnitIsUprightAfterAThinSpace() {
        Element math = Written.formula("rho = 1.2 kg/m^3");
        Element space = only(math, "mspace");
        assertEquals("0.1667em", space.getAttribute("width"));
        assertEquals("mn", ((Element) space.getPreviousSibling()).getLocalName());
        Element unit = (Element) space.getNextSibling();
        for (Element mi : all(unit, "mi")) assertEquals("normal", mi.getAttribute("mathvariant"), mi.getTextContent());
        assertEquals("kg / m 3", reading(unit));
        Element cube = only(unit, "msup");
        assertEquals("m", children(cube).get(0).getTextContent());
        assertEquals("3", children(cube).get(1).getTextContent());
    }

    @Test
    void unitsAreShownInTheirSymbols() {
        assertEquals("20 °C", reading(quantity("20", "degC")));
        assertEquals("3 N · m", reading(quantity("3", "N*m")));
        assertEquals("9.81 m / s 2", reading(quantity("9.81", "m/s^2")));
        assertEquals("1 J / ( kg · °C )", reading(quantity("1", "J/(kg*degC)")));
        assertEquals("5 µm", reading(quantity("5", "um")));
        assertEquals("2 s − 1", reading(quantity("2", "s^-1")));
        Element perKelvin = quantity("1", "W/(m^2*K)");
        Element bracketed = children(all(perKelvin, "mrow").stream()
            .filter(r -> reading(r).startsWith("(")).findFirst().orElseThrow()).get(0);
        assertEquals("false", bracketed.getAttribute("stretchy"), "brackets inside a unit keep their size");
    }

    @Test
    void percentAndTheAngleDegreeFollowTheNumberWithoutASpace() {
        assertEquals(List.of(), all(quantity("12", "%"), "mspace"));
        assertEquals(List.of(), all(quantity("30", "deg"), "mspace"));
        assertEquals(1, all(quantity("30", "degC"), "mspace").size());
    }

    @Test
    void aUnitTheRegistryDoesNotKnowIsShownAsWritten() {
        assertEquals("3 furlong / fortnight", reading(quantity("3", "furlong/fortnight")));
        assertEquals("3 m ^", reading(quantity("3", "m^")));
        assertEquals("3 m )", reading(quantity("3", "m)")));
    }

    @Test
    void eNotationIsAPowerOfTen() {
        Element small = quantity("3.64e-7", "");
        assertEquals("3.64 × 10 − 7", reading(small));
        assertEquals("10", children(only(small, "msup")).get(0).getTextContent());
        assertEquals("10 6", reading(quantity("1e6", "")), "a mantissa of one is left out");
        assertEquals("2.5 × 10 12", reading(quantity("2.5E+012", "")));
    }

    @Test
    void numbersReadAsPrinted() {
        assertEquals("0.5", reading(Written.formula("x = .5")));
        Element negative = quantity("-1.5", "");
        assertEquals("− 1.5", reading(negative));
        assertEquals("mo", children(children(negative).get(0)).get(0).getLocalName());
        assertEquals("?", only(quantity("?", "kg"), "mtext").getTextContent(), "a value that could not be computed");
        assertTrue(reading(quantity("-∞", "")).startsWith("−"));
    }
}
