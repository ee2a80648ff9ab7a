package dev.plumb.report;

import static dev.plumb.report.MathDom.children;
import static dev.plumb.report.MathDom.only;
import static dev.plumb.report.MathDom.reading;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/** Names as symbols: subscripts from underscores, Greek letters from their names. */
class SymbolMathTest {

    private static Element symbol(String name) {
        return MathDom.parse(MathElements.math(SymbolMath.of(name)));
    }

    @Test
    void theFirstUnderscoreStartsTheSubscript() {
        Element sub = only(symbol("F_D"), "msub");
        List<Element> parts = children(sub);
        assertEquals("mi", parts.get(0).getLocalName());
        assertEquals("F", parts.get(0).getTextContent());
        assertEquals("mi", parts.get(1).getLocalName());
        assertEquals("D", parts.get(1).getTextContent());
    }

    @Test
    void furtherUnderscoresSeparatePartsOfOneSubscriptWithCommas() {
        Element sub = only(symbol("T_wall_max"), "msub");
        assertEquals("T", reading(children(sub).get(0)));
        assertEquals("wall , max", reading(children(sub).get(1)));
        Element numbered = only(symbol("C_D_0"), "msub");
        assertEquals("mn", children(children(numbered).get(1)).get(2).getLocalName(), "a subscript of digits is a number");
    }

    @Test
    void aNameWithAnEmptyPartIsShownAsWritten() {
        for (String name : List.of("_x", "x_", "a__b")) {
            Element math = symbol(name);
            assertEquals(List.of(), MathDom.all(math, "msub"), name);
            assertEquals(name, reading(math));
        }
    }

    @Test
    void greekNamesBecomeGreekLetters() {
        assertEquals("ρ", reading(symbol("rho")));
        assertEquals("μ", reading(symbol("mu")));
        assertEquals("ν", reading(symbol("nu")));
        assertEquals("α", reading(symbol("alpha")));
        assertEquals("mi", only(symbol("rho"), "mi").getLocalName());
        Element delta = children(only(symbol("Delta_p"), "msub")).get(0);
        assertEquals("Δ", delta.getTextContent());
        assertEquals("normal", delta.getAttribute("mathvariant"), "a capital Greek letter stands upright");
    }

    @Test
    void onlyAWholeNameOrTheSymbolBeforeTheSubscriptIsGreek() {
        assertEquals("ρ sw", reading(symbol("rho_sw")));
        assertEquals("rho0", reading(symbol("rho0")));
        assertEquals("alphabet", reading(symbol("alphabet")));
        assertEquals("Re theta", reading(symbol("Re_theta")));
        assertEquals("Rho", reading(symbol("Rho")), "a capital Rho would read as a Latin P");
    }

    @Test
    void namesAlreadyInGreekStayAsTheyAre() {
        assertEquals("η tow", reading(symbol("η_tow")));
    }
}
