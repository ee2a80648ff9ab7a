package dev.plumb.report;

import static dev.plumb.report.MathDom.all;
import static dev.plumb.report.MathDom.children;
import static dev.plumb.report.MathDom.only;
import static dev.plumb.report.MathDom.reading;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.syntax.Statement;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/** How formulas are laid out: fractions, roots, powers, calls, brackets, signs, pieces, comparisons. */
class FormulaLayoutTest {

    @Test
    void aDefinitionIsItsNameEqualToItsFormula() {
        Element math = Written.symbols("R_F = C_f * q * S_w");
        assertEquals("R F = C f ⋅ q ⋅ S w", reading(math));
        assertEquals("R", children(children(children(math).get(0)).get(0)).get(0).getTextContent());
    }

    @Test
    void divisionIsAFractionWithTheDividendOverTheDivisor() {
        Element frac = only(Written.formula("Re_L = V_tow * L_wl / nu_sw"), "mfrac");
        List<Element> parts = children(frac);
        assertEquals("V tow ⋅ L wl", reading(parts.get(0)));
        assertEquals("ν sw", reading(parts.get(1)));
    }

    @Test
    void aChainOfDivisionsIsOneFractionOverTheProductOfTheDivisors() {
        Element frac = only(Written.formula("x = a / b / c"), "mfrac");
        assertEquals("a", reading(children(frac).get(0)));
        assertEquals("b ⋅ c", reading(children(frac).get(1)));
    }

    @Test
    void aFactorAfterAFractionStaysBesideIt() {
        Element math = Written.formula("V = pi / 6 * d_b^3");
        Element frac = only(math, "mfrac");
        assertEquals("π", reading(children(frac).get(0)));
        assertEquals("6", reading(children(frac).get(1)));
        assertEquals("π 6 ⋅ d b 3", reading(math));
    }

    @Test
    void bracketsRoundAWholeNumeratorOrDenominatorAreLeftToTheFractionBar() {
        Element frac = only(Written.formula("x = (a + b) / (c - d)"), "mfrac");
        assertEquals("a + b", reading(children(frac).get(0)));
        assertEquals("c − d", reading(children(frac).get(1)));
    }

    @Test
    void bracketsTheUserWroteElsewhereAreKept() {
        assertEquals("2 ⋅ ( a + b )", reading(Written.formula("x = 2 * (a + b)")));
        assertEquals("( ( a ) )", reading(Written.formula("x = ((a))")));
        Element frac = only(Written.formula("x = a / (b + c) / d"), "mfrac");
        assertEquals("( b + c ) ⋅ d", reading(children(frac).get(1)), "a bracketed factor of the divisor keeps its brackets");
    }

    @Test
    void bracketsGrowOnlyRoundTallContent() {
        List<Element> flat = all(Written.formula("x = 2 * (a + b_c)^2"), "mo").stream()
            .filter(mo -> mo.getTextContent().matches("[()]")).toList();
        assertEquals(2, flat.size());
        for (Element mo : flat) assertEquals("false", mo.getAttribute("stretchy"), "round a line of text they keep their size");
        List<Element> tall = all(Written.formula("x = 2 * (a / b)"), "mo").stream()
            .filter(mo -> mo.getTextContent().matches("[()]")).toList();
        assertEquals(2, tall.size());
        for (Element mo : tall) assertEquals("", mo.getAttribute("stretchy"), "round a fraction they grow with it");
    }

    @Test
    void sqrtIsARootSignAndAHalfPowerStaysAPower() {
        Element math = Written.formula("Fn = V_tow / sqrt(g_n * L_wl)");
        Element root = only(math, "msqrt");
        assertEquals("g n ⋅ L wl", reading(root));
        assertEquals("msqrt", children(only(math, "mfrac")).get(1).getLocalName(), "the root is the denominator");
        Element half = Written.formula("c = x^0.5");
        assertEquals(List.of(), all(half, "msqrt"));
        assertEquals("0.5", reading(children(only(half, "msup")).get(1)));
    }

    @Test
    void aPowerRaisesItsExponent() {
        Element sup = only(Written.formula("q = 0.5 * rho * V_tow^2"), "msup");
        List<Element> parts = children(sup);
        assertEquals("msub", parts.get(0).getLocalName(), "the base is the subscripted symbol");
        assertEquals("V tow", reading(parts.get(0)));
        assertEquals("mn", parts.get(1).getLocalName());
        assertEquals("2", parts.get(1).getTextContent());
    }

    @Test
    void divisionInAnExponentStaysOnTheLineWithoutTheBrackets() {
        Element sup = only(Written.formula("Cd = 10 * Re^(-2/3)"), "msup");
        assertEquals(List.of(), all(sup, "mfrac"));
        assertEquals("− 2 / 3", reading(children(sup).get(1)));
    }

    @Test
    void functionNamesAreUprightAndApplyToTheirBracketedArguments() {
        Element math = Written.formula("y = exp(-x) + gas_density(p_0, T_0, R_air)");
        List<Element> names = all(math, "mi").stream().filter(mi -> "normal".equals(mi.getAttribute("mathvariant"))).toList();
        assertEquals(List.of("exp", "gas_density"), names.stream().map(Element::getTextContent).toList());
        for (Element name : names) {
            Element next = (Element) name.getNextSibling();
            assertEquals("mo", next.getLocalName());
            assertEquals("\u2061", next.getTextContent(), "the invisible function application follows the name");
        }
        assertTrue(reading(math).contains("gas_density \u2061 ( p 0 , T 0 , R air )"), reading(math));
    }

    @Test
    void log10AndAbsReadAsPrinted() {
        Element log = Written.formula("Cf = 0.455 / (log10(Re))^2.58");
        Element base = children(only(log, "msub")).get(0);
        assertEquals("log", base.getTextContent());
        assertEquals("normal", base.getAttribute("mathvariant"));
        assertEquals("| x − y |", reading(Written.formula("d = abs(x - y)")));
    }

    @Test
    void aMinusSignIsTypographicAndNeverFollowsAnOperatorBare() {
        assertEquals("− x 2", reading(Written.formula("y = -x^2")));
        assertEquals("a − ( − b )", reading(Written.formula("y = a - -b")));
        assertEquals("a ⋅ ( − b )", reading(Written.formula("y = a * -b")));
        assertEquals("− a ⋅ b", reading(Written.formula("y = -a * b")));
        assertEquals("+ x", reading(Written.formula("y = +x")), "a plus sign written before a value is kept");
    }

    @Test
    void aPiecewiseFormulaIsABraceOverOneRowAPiece() {
        Statement.Definition d = Written.definition("cf = 0.664 / sqrt(Re) when Re <= 5e5 otherwise 0.0592 / Re^0.2");
        Element math = MathDom.parse(Written.MATH.formula(d.expr(), ValueSource.none()));
        Element brace = children(children(math).get(0)).get(0);
        assertEquals("{", brace.getTextContent());
        assertEquals("true", only(math, "mtable").getAttribute("displaystyle"), "fractions in a piece at full size");
        List<Element> rows = all(math, "mtr");
        assertEquals(2, rows.size());
        assertEquals("when Re ≤ 5 × 10 5", reading(children(rows.get(0)).get(1)));
        assertEquals("otherwise", reading(children(rows.get(1)).get(1)));
        assertEquals(1, all(children(rows.get(0)).get(0), "msqrt").size());
        assertEquals(1, all(children(rows.get(1)).get(0), "mfrac").size());
    }

    @Test
    void aCheckIsAChainOfComparisons() {
        var check = (Statement.Check) Written.statement("check 1e6 < Re_L <= 1e10 \"turbulent\"");
        Element math = MathDom.parse(Written.MATH.comparison(check.operands(), check.comparators(), ValueSource.none()));
        assertEquals("10 6 < Re L ≤ 10 10", reading(math));
        var all = (Statement.Check) Written.statement("check a == b != c > d >= e");
        assertEquals("a = b ≠ c > d ≥ e",
            reading(MathDom.parse(Written.MATH.comparison(all.operands(), all.comparators(), ValueSource.none()))));
    }

    @Test
    void aFunctionShowsItsParameters() {
        var f = (Statement.Function) Written.statement("q_dyn(rho, V) = 0.5 * rho * V^2");
        assertEquals("q_dyn \u2061 ( ρ , V ) = 0.5 ⋅ ρ ⋅ V 2", reading(MathDom.parse(Written.MATH.function(f))));
    }

    @Test
    void aSolveStatementShowsItsEquation() {
        var seek = (Statement.Seek) Written.statement("seek V in 1 m/s .. 50 m/s where 0.5 * rho * V^2 = p_dyn");
        Element math = MathDom.parse(Written.MATH.equation(seek.lhs(), seek.rhs(), ValueSource.none()));
        assertEquals("0.5 ⋅ ρ ⋅ V 2 = p dyn", reading(math));
    }
}
