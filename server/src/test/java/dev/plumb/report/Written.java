package dev.plumb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import dev.plumb.syntax.ParsedSource;
import dev.plumb.syntax.SourceParser;
import dev.plumb.syntax.Statement;
import java.util.List;
import org.w3c.dom.Element;

/** Formulas as a calc writes them, parsed by the real parser and typeset, for the tests of this package. */
final class Written {
    static final FormulaMath MATH = new FormulaMath();

    private Written() {
    }

    /** The one statement of {@code line}, which must parse without errors. */
    static Statement statement(String line) {
        ParsedSource p = SourceParser.parse(line);
        assertEquals(List.of(), p.diagnostics(), "syntax errors in " + line);
        assertEquals(1, p.statements().size(), line);
        return p.statements().get(0);
    }

    static Statement.Definition definition(String line) {
        return assertInstanceOf(Statement.Definition.class, statement(line));
    }

    /** The definition in symbols, read back as MathML. */
    static Element symbols(String line) {
        return MathDom.parse(MATH.definition(definition(line), ValueSource.none()));
    }

    /** The right side of the definition alone, in symbols, read back as MathML. */
    static Element formula(String line) {
        return MathDom.parse(MATH.formula(definition(line).expr(), ValueSource.none()));
    }
}
