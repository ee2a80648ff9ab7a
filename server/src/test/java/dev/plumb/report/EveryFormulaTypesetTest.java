package dev.plumb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.RepoRoot;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.SourceParser;
import dev.plumb.syntax.Statement;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/**
 * Every formula of the samples and of the standard library, typeset in symbols and with values:
 * the markup is well-formed MathML, and with a value for every name no name is left as a symbol,
 * so the walk reaches every reference in every kind of expression.
 */
class EveryFormulaTypesetTest {
    private static final ValueSource EVERY_NAME = name -> Optional.of(new ShownValue("2.5e-3", "kg/(m·s)"));

    @Test
    void samplesAndLibrary() throws IOException {
        List<Path> calcs = new ArrayList<>();
        for (Path folder : List.of(RepoRoot.get().resolve("samples"), Path.of("src/main/resources/stdlib"))) {
            try (Stream<Path> files = Files.walk(folder)) {
                files.filter(p -> p.toString().endsWith(".plumb")).sorted().forEach(calcs::add);
            }
        }
        int typeset = 0;
        for (Path calc : calcs) {
            for (Statement s : SourceParser.parse(Files.readString(calc)).statements()) {
                for (Formula f : formulas(s)) {
                    String where = calc.getFileName() + ": " + f.symbols();
                    MathDom.parse(f.symbols());
                    Element valued = MathDom.parse(f.valued());
                    List<String> symbolsLeft = MathDom.all(valued, "mi").stream()
                        .filter(mi -> !mi.hasAttribute("mathvariant")).map(Element::getTextContent).toList();
                    assertEquals(List.of(), symbolsLeft, where);
                    typeset++;
                }
            }
        }
        assertTrue(typeset > 100, "only " + typeset + " formulas found in " + calcs.size() + " calcs");
    }

    private record Formula(String symbols, String valued) {
    }

    private static List<Formula> formulas(Statement s) {
        FormulaMath math = Written.MATH;
        List<Formula> out = new ArrayList<>();
        if (s instanceof Statement.Definition d) {
            out.add(new Formula(math.definition(d, ValueSource.none()), math.formula(d.expr(), EVERY_NAME)));
        } else if (s instanceof Statement.Function f) {
            out.add(new Formula(math.function(f), math.formula(f.body(), EVERY_NAME)));
        } else if (s instanceof Statement.Check c) {
            out.add(new Formula(math.comparison(c.operands(), c.comparators(), ValueSource.none()),
                math.comparison(c.operands(), c.comparators(), EVERY_NAME)));
        } else if (s instanceof Statement.Seek k) {
            out.add(new Formula(math.equation(k.lhs(), k.rhs(), ValueSource.none()), math.equation(k.lhs(), k.rhs(), EVERY_NAME)));
        } else if (s instanceof Statement.Correlation c) {
            Expr pieces = new Expr.Piecewise(c.span(), c.pieces());
            out.add(new Formula(math.formula(pieces, ValueSource.none()), math.formula(pieces, EVERY_NAME)));
            for (Statement.Bound b : c.valid()) {
                out.add(new Formula(math.comparison(b.operands(), b.comparators(), ValueSource.none()),
                    math.comparison(b.operands(), b.comparators(), EVERY_NAME)));
            }
        }
        return out;
    }
}
