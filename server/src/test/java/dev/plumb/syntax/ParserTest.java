package dev.plumb.syntax;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Every statement form, and the shape of expressions. */
class ParserTest {

    private static List<Statement> statements(String text) {
        ParsedSource p = SourceParser.parse(text);
        assertEquals(List.of(), p.diagnostics(), "unexpected syntax errors");
        return p.statements();
    }

    private static Statement one(String text) {
        List<Statement> all = statements(text);
        assertEquals(1, all.size(), all.toString());
        return all.get(0);
    }

    private static String slice(String text, dev.plumb.diagnostics.Span span) {
        return text.substring(span.start(), span.end());
    }

    @Test
    void headers() {
        var h = assertInstanceOf(Statement.Header.class, one("title \"Mast on the pier \\\"B\\\"\""));
        assertEquals("title", h.key());
        assertEquals("Mast on the pier \"B\"", h.text());
        for (String key : List.of("author", "reviewer", "revision")) {
            assertEquals(key, ((Statement.Header) one(key + " \"x\"")).key());
        }
    }

    @Test
    void parenthesesAreKeptAsWritten() {
        String text = "x = 2 * (a + b)";
        var d = assertInstanceOf(Statement.Definition.class, one(text));
        var product = assertInstanceOf(Expr.Binary.class, d.expr());
        var group = assertInstanceOf(Expr.Group.class, product.right());
        assertEquals("(a + b)", text.substring(group.written().start(), group.written().end()));
        assertEquals("a + b", text.substring(group.span().start(), group.span().end()));
        assertInstanceOf(Expr.Binary.class, Expr.inner(group));
    }

    @Test
    void narrativeSectionAndTrailingComment() {
        List<Statement> s = statements("# Prose for the reviewer\nsection \"Air\"\nx = 1   # a code comment\n");
        assertEquals("Prose for the reviewer", ((Statement.Narrative) s.get(0)).text());
        assertEquals("Air", ((Statement.Section) s.get(1)).title());
        assertInstanceOf(Statement.Definition.class, s.get(2));
        assertEquals(3, s.size(), "a trailing comment is not a statement");
    }

    @Test
    void inputWithUnitDisplayBasisAndNote() {
        String text = "input A = 2.5 m^2 in cm^2 as frontal \"face area\"";
        var d = assertInstanceOf(Statement.Definition.class, one(text));
        assertTrue(d.input());
        assertEquals("A", d.name().text());
        var q = assertInstanceOf(Expr.Quantity.class, d.expr());
        assertEquals(2.5, q.number());
        assertEquals("m^2", q.unit().text());
        assertEquals("m^2", slice(text, q.unit().span()));
        assertEquals("cm^2", d.displayUnit().text());
        assertEquals("frontal", d.basis().text());
        assertEquals("face area", d.note());
    }

    @Test
    void basisLineWithAFlowDirection() {
        String text = "correlation cd_rod(Re)\n    basis frontal crossflow\n    = 1.2\nend\n"
            + "correlation cd_ball(Re)\n    basis frontal\n    = 0.4\nend\n";
        List<Statement> s = statements(text);
        var rod = assertInstanceOf(Statement.Correlation.class, s.get(0));
        assertEquals("frontal", rod.basis().text());
        assertEquals("crossflow", rod.flow().text());
        assertEquals("crossflow", slice(text, rod.flow().span()));
        var ball = assertInstanceOf(Statement.Correlation.class, s.get(1));
        assertEquals("frontal", ball.basis().text());
        assertEquals(null, ball.flow());
    }

    @Test
    void domainLinesAreKeptApartFromValidLines() {
        String text = "correlation cd_rod(Re, d: length)\n    domain Re > 0\n    domain d > 0 m\n"
            + "    valid 1e3 <= Re <= 2e5\n    = 1.2\nend\ndomain = 3\n";
        List<Statement> s = statements(text);
        var rod = assertInstanceOf(Statement.Correlation.class, s.get(0));
        assertEquals(2, rod.domain().size());
        assertEquals("d > 0 m", slice(text, rod.domain().get(1).span()));
        assertEquals(1, rod.valid().size());
        // The word is soft: outside a block it is a name like any other.
        var d = assertInstanceOf(Statement.Definition.class, s.get(1));
        assertEquals("domain", d.name().text());
    }

    @Test
    void derivedDefinitionAndFunction() {
        var d = assertInstanceOf(Statement.Definition.class, one("q = 0.5 * rho * V^2 in Pa"));
        assertFalse(d.input());
        assertEquals("Pa", d.displayUnit().text());
        var f = assertInstanceOf(Statement.Function.class, one("drag(Cd, A, q) = Cd * A * q \"force\""));
        assertEquals("drag", f.name().text());
        assertEquals(List.of("Cd", "A", "q"), f.params().stream().map(Ident::text).toList());
        assertEquals("force", f.note());
    }

    @Test
    void chainedCheck() {
        var c = assertInstanceOf(Statement.Check.class, one("check 1e3 < Re <= 2e5 \"fitted range\""));
        assertEquals(3, c.operands().size());
        assertEquals(List.of(Comparator.LT, Comparator.LE), c.comparators());
        assertEquals("fitted range", c.note());
        var all = assertInstanceOf(Statement.Check.class, one("check a >= b"));
        assertEquals(List.of(Comparator.GE), all.comparators());
        assertEquals(List.of(Comparator.NE), ((Statement.Check) one("check a != b")).comparators());
        assertEquals(List.of(Comparator.EQ), ((Statement.Check) one("check a == b")).comparators());
        assertEquals(List.of(Comparator.GT, Comparator.LT), ((Statement.Check) one("check a > b < c")).comparators());
    }

    @Test
    void acceptStatementKeepsTheCodeAsWrittenTheValueAndTheReason() {
        String text = "accept math.division-by-zero at Cd_1 \"validated, report TR-118\"";
        var a = assertInstanceOf(Statement.Accept.class, one(text));
        assertEquals("math.division-by-zero", a.code());
        assertEquals("math.division-by-zero", slice(text, a.codeSpan()));
        assertEquals("Cd_1", a.target().text());
        assertEquals("validated, report TR-118", a.reason());
        assertEquals(text, slice(text, a.span()));
        // Blanks inside a code are kept, so that `range . outside` is no code.
        assertEquals("range . outside", ((Statement.Accept) one("accept range . outside at x \"r\"")).code());
    }

    @Test
    void useStatement() {
        var u = assertInstanceOf(Statement.Use.class, one("use \"site/air.plumb\""));
        assertEquals("site/air.plumb", u.path());
    }

    @Test
    void precedenceAndAssociativity() {
        // -2^2 is -(2^2); ^ is right-associative; * binds tighter than +.
        var d = (Statement.Definition) one("x = -2^3^2 + 4 * 5");
        var add = assertInstanceOf(Expr.Binary.class, d.expr());
        assertEquals(Expr.Op.ADD, add.op());
        var neg = assertInstanceOf(Expr.Unary.class, add.left());
        var pow = assertInstanceOf(Expr.Binary.class, neg.operand());
        assertEquals(Expr.Op.POWER, pow.op());
        assertEquals(Expr.Op.POWER, assertInstanceOf(Expr.Binary.class, pow.right()).op());
        assertEquals(Expr.Op.MULTIPLY, assertInstanceOf(Expr.Binary.class, add.right()).op());
    }

    @Test
    void unitFollowsNumberButNotAfterSpaceStar() {
        var metres = (Statement.Definition) one("x = 2 m");
        assertEquals("m", ((Expr.Quantity) metres.expr()).unit().text());
        var times = (Statement.Definition) one("x = 2 * m");
        assertInstanceOf(Expr.Binary.class, times.expr());
        var compound = (Statement.Definition) one("x = 8.314 J/(mol*K) * T");
        var mul = assertInstanceOf(Expr.Binary.class, compound.expr());
        assertEquals("J/(mol*K)", ((Expr.Quantity) mul.left()).unit().text());
        var inCall = (Statement.Definition) one("x = f(2 m)");
        var call = assertInstanceOf(Expr.Call.class, inCall.expr());
        assertEquals("m", ((Expr.Quantity) call.args().get(0)).unit().text());
        var negativeExponent = (Statement.Definition) one("x = 3 s^-1");
        assertEquals("s^-1", ((Expr.Quantity) negativeExponent.expr()).unit().text());
        var unicode = (Statement.Definition) one("ρ = 1.2 kg/m³ + 0 kg·m⁻³");
        var sum = (Expr.Binary) unicode.expr();
        assertEquals("kg/m³", ((Expr.Quantity) sum.left()).unit().text());
        assertEquals("kg·m⁻³", ((Expr.Quantity) sum.right()).unit().text());
    }

    @Test
    void wordInAfterANumber() {
        // `5 in` alone is five inches; `5 in mm` shows five in millimetres; `5 in in mm` both.
        var inches = (Statement.Definition) one("L = 5 in");
        assertEquals("in", ((Expr.Quantity) inches.expr()).unit().text());
        assertNull(inches.displayUnit());
        var display = (Statement.Definition) one("L = 5 in mm");
        assertNull(((Expr.Quantity) display.expr()).unit());
        assertEquals("mm", display.displayUnit().text());
        var both = (Statement.Definition) one("L = 5 in in mm");
        assertEquals("in", ((Expr.Quantity) both.expr()).unit().text());
        assertEquals("mm", both.displayUnit().text());
    }

    @Test
    void continuationLines() {
        String text = "F = Cd * A *\n      q   in kN\n    \"drag on the face\"\ny = 2\n";
        List<Statement> s = statements(text);
        assertEquals(2, s.size());
        var f = (Statement.Definition) s.get(0);
        assertEquals("kN", f.displayUnit().text());
        assertEquals("drag on the face", f.note());
        assertEquals("y", ((Statement.Definition) s.get(1)).name().text());
    }

    @Test
    void narrativeNeverContinuesOntoAnIndentedLine() {
        List<Statement> s = statements("# Prose about the mast\n    z = 1\n");
        assertEquals(2, s.size());
        assertInstanceOf(Statement.Narrative.class, s.get(0));
        assertEquals("z", ((Statement.Definition) s.get(1)).name().text());
    }

    @Test
    void reciprocalDisplayUnit() {
        var d = (Statement.Definition) one("f = n / t in 1/s");
        assertEquals("1/s", d.displayUnit().text());
    }

    @Test
    void spaceInsideAUnitIsExplained() {
        ParsedSource p = SourceParser.parse("y = 2 kg m\n");
        assertEquals(1, p.diagnostics().size());
        assertTrue(p.diagnostics().get(0).message().contains("`kg*m` for a compound unit"), p.diagnostics().get(0).message());
    }

    @Test
    void softKeywordsAreNamesOutsideStatementStart() {
        var d = (Statement.Definition) one("table = section + end");
        assertEquals("table", d.name().text());
    }

    @Test
    void lastLineWithoutNewlineAndBlankLines() {
        assertEquals(2, statements("\n\n  a = 1\n\n\nb = 2").size());
        assertEquals(0, statements("").size());
        assertEquals(0, statements("\n\n   \n").size());
    }

    @Test
    void threeSyntaxErrorsOnThreeLinesGiveThree() {
        String text = "a = 1 +\nb = 2\nc = (3\nd = 4\ne = * 5\n";
        ParsedSource p = SourceParser.parse(text);
        assertEquals(3, p.diagnostics().size(), p.diagnostics().toString());
        assertEquals(List.of(1, 3, 5), p.diagnostics().stream().map(d -> p.lines().line(d.span().start())).toList());
        long good = p.statements().stream().filter(s -> s instanceof Statement.Definition).count();
        assertEquals(2, good, "b and d still parse");
        List<String> broken = p.statements().stream().filter(s -> s instanceof Statement.Broken)
            .map(s -> ((Statement.Broken) s).name().text()).toList();
        assertEquals(List.of("a", "c", "e"), broken);
    }

    @Test
    void positionsAfterNonAsciiText() {
        // '°', 'µ', '²', Greek letters and an emoji (two UTF-16 units) before the error.
        String text = "# wind 😀 °C µm m²\nρ_air = 1.2 kg/m³ µ ²\n";
        ParsedSource p = SourceParser.parse(text);
        assertEquals(1, p.diagnostics().size(), p.diagnostics().toString());
        Diagnostic d = p.diagnostics().get(0);
        assertEquals("µ", text.substring(d.span().start(), d.span().end()));
        assertEquals(2, p.lines().line(d.span().start()));
        assertEquals(19, p.lines().column(d.span().start()), "columns count characters");
        String emojiFirst = "x = 1 # 😀\ny = 😀\n";
        ParsedSource q = SourceParser.parse(emojiFirst);
        Diagnostic e = q.diagnostics().get(0);
        assertEquals("😀", emojiFirst.substring(e.span().start(), e.span().end()));
        assertEquals(5, q.lines().column(e.span().start()));
        assertEquals(4, q.lines().utf16Column(e.span().start()));
    }

    @Test
    void missingOperatorIsExplained() {
        ParsedSource p = SourceParser.parse("F = Cd A q\n");
        assertEquals(1, p.diagnostics().size());
        assertTrue(p.diagnostics().get(0).message().contains("Cd * A"), p.diagnostics().get(0).message());
    }

    @Test
    void unterminatedTextAndStrayCharacters() {
        ParsedSource p = SourceParser.parse("title \"Mast\nx = 3;\ny = 2\n");
        assertEquals(2, p.diagnostics().size(), p.diagnostics().toString());
        assertTrue(p.diagnostics().get(0).message().contains("not closed"));
        assertTrue(p.diagnostics().get(1).message().contains("';'"));
        assertTrue(p.statements().stream().anyMatch(s -> s instanceof Statement.Definition d && d.name().text().equals("y")));
    }

    @Test
    void deepNestingIsAClearErrorNotACrash() {
        String deep = "x = " + "(".repeat(5000) + "1" + ")".repeat(5000) + "\ny = 2\n";
        ParsedSource p = SourceParser.parse(deep);
        assertEquals(1, p.diagnostics().size());
        assertEquals(Code.SYNTAX_NESTING, p.diagnostics().get(0).code());
        assertTrue(p.statements().stream().anyMatch(s -> s instanceof Statement.Broken b && b.name().text().equals("x")));
        assertTrue(p.statements().stream().anyMatch(s -> s instanceof Statement.Definition d && d.name().text().equals("y")));
        ParsedSource signs = SourceParser.parse("x = " + "-".repeat(5000) + "1\n");
        assertEquals(Code.SYNTAX_NESTING, signs.diagnostics().get(0).code());
    }

    @Test
    void junkAfterACompleteStatementCostsOnlyItsLine() {
        ParsedSource p = SourceParser.parse("v = 3 kN.m\nw = 2 m )\ny = 2\n");
        assertEquals(2, p.diagnostics().size(), p.diagnostics().toString());
        assertTrue(p.diagnostics().get(0).message().contains("kN*m"), p.diagnostics().get(0).message());
        assertTrue(p.statements().stream().anyMatch(s -> s instanceof Statement.Definition d && d.name().text().equals("y")));
    }

    @Test
    void lineStartThatCannotStartAStatement() {
        ParsedSource p = SourceParser.parse(") = 3\nz = 1\n");
        assertEquals(1, p.diagnostics().size());
        assertTrue(p.diagnostics().get(0).message().contains("cannot start"));
        assertEquals(1, p.statements().size());
    }
}
