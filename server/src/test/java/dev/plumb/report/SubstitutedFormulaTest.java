package dev.plumb.report;

import static dev.plumb.report.MathDom.all;
import static dev.plumb.report.MathDom.children;
import static dev.plumb.report.MathDom.only;
import static dev.plumb.report.MathDom.reading;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.plumb.syntax.Statement;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/** The formula again with each name's value and unit in its place, as the caller formatted them. */
class SubstitutedFormulaTest {

    private static final ValueSource AIR = ValueSource.of(Map.of(
        "rho", new ShownValue("1.2", "kg/m^3"),
        "V", new ShownValue("31", "m/s"),
        "C_D", ShownValue.plain("1.18"),
        "A", new ShownValue("2.4", "m²"),
        "dT", new ShownValue("-4", "K")));

    private static Element substituted(String line, ShownValue result) {
        Statement.Definition d = Written.definition(line);
        return MathDom.parse(Written.MATH.definition(d, AIR, result));
    }

    @Test
    void eachNameIsReplacedByItsValueAndUnitAndTheResultFollows() {
        Element math = substituted("F_D = 0.5 * rho * V^2 * C_D * A", new ShownValue("1633", "N"));
        assertEquals("F D = 0.5 ⋅ 1.2 kg / m 3 ⋅ ( 31 m / s ) 2 ⋅ 1.18 ⋅ 2.4 m 2 = 1633 N", reading(math));
        assertEquals("msub", children(children(math).get(0)).get(0).getLocalName(), "the defined name stays a symbol");
    }

    @Test
    void aValueWithAUnitIsBracketedUnderAnExponent() {
        Element power = only(substituted("q = V^2", null), "msup");
        Element base = children(power).get(0);
        assertEquals("( 31 m / s )", reading(base));
        assertEquals("(", children(base).get(0).getTextContent());
    }

    @Test
    void aNegativeValueIsBracketedAfterAnOperator() {
        assertEquals("T = 20 − ( − 4 K )", reading(substituted("T = 20 - dT", null)));
        assertEquals("T = − 4 K + 20", reading(substituted("T = dT + 20", null)), "first in a sum it needs none");
    }

    @Test
    void aNameWithoutAValueStaysASymbol() {
        Element math = substituted("F = rho * V * L_ref", null);
        assertEquals("F = 1.2 kg / m 3 ⋅ 31 m / s ⋅ L ref", reading(math));
        assertEquals("L", children(only(math, "msub")).get(0).getTextContent());
    }

    @Test
    void valuesReachFractionsRootsCallsAndConditions() {
        Element math = substituted("w = sqrt(2 * A / (rho * C_D)) when abs(dT) < 5 K otherwise max(V, 0 m/s)", null);
        Element root = all(math, "msqrt").get(0);
        Element frac = only(root, "mfrac");
        assertEquals("2 ⋅ 2.4 m 2", reading(children(frac).get(0)));
        assertEquals("1.2 kg / m 3 ⋅ 1.18", reading(children(frac).get(1)));
        assertEquals("when | − 4 K | < 5 K", reading(children(all(math, "mtr").get(0)).get(1)));
        assertEquals("max \u2061 ( 31 m / s , 0 m / s )", reading(children(all(math, "mtr").get(1)).get(0)));
    }
}
