package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * An invariant of the solver (issue: a green check must mean sound): a line's findings do not
 * depend on whether the line is evaluated inside a solve. Every annotated mistake fixture is
 * rewritten so that each of its formulas depends on a solved unknown and the solve's equation
 * reaches each of them (each formula `f` becomes `(f) * z_meta`, each input `x` it uses
 * `(x * z_meta)`, and a last line solves `z_meta = a^0 * b^0 * …`, whose root is 1), which
 * makes every formula one of the solve's dependents, evaluated on each trial, and every value in
 * it unknown until the solve settles. The same codes must appear on the same lines as before;
 * the only change the rewrite may cause is its own consequence: a check that uses a formula the
 * solve could not settle (because a formula the solve depends on has no value) is not evaluated,
 * which replaces that check's verdict.
 */
class SeekDependentsInvariantTest {

    static Stream<String> fixtures() throws IOException, URISyntaxException {
        Path dir = Path.of(SeekDependentsInvariantTest.class.getResource("/diagnostics").toURI());
        try (Stream<Path> files = Files.list(dir)) {
            // The budget fixture's statement exhausts the budget on purpose; per trial that is only slower.
        return files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".plumb"))
            .filter(n -> !n.equals("limit.budget.plumb")).sorted().toList().stream();
        }
    }

    @ParameterizedTest
    @MethodSource("fixtures")
    void aFormulaReportsTheSameWhetherOrNotASolveDependsOnIt(String fixture) {
        String text = Fixture.resource(fixture);
        Analysis plain = Fixture.analyze(text);
        List<Statement.Definition> wrapped = wrappable(plain);
        if (wrapped.isEmpty()) return; // nothing in this fixture can become a dependent
        Set<String> inputs = new TreeSet<>();
        for (Statement s : plain.syntax().statements()) {
            // Temperatures stay as written: a point times a number is another finding, not the same one.
            if (s instanceof Statement.Definition d && d.input() && !(plain.scope().lookup(d.name().text())
                instanceof Binding.ValueBinding v && v.value().known()
                && v.value().dimension().equals(Dimension.TEMPERATURE))) {
                inputs.add(d.name().text());
            }
        }
        String rewritten = fixture + " rewritten so a solve depends on its formulas:\n" + rewrite(text, inputs, wrapped);
        Analysis solved = Fixture.analyze(rewrite(text, inputs, wrapped));
        int lines = (int) text.chars().filter(c -> c == '\n').count(); // the solve goes below them
        Set<String> before = codesByLine(plain, lines);
        Set<String> after = codesByLine(solved, lines);
        Set<String> lost = new TreeSet<>(before);
        lost.removeAll(after);
        lost.removeIf(f -> after.contains(f.substring(0, f.indexOf(':')) + ": check.not-evaluated"));
        Set<String> added = new TreeSet<>(after);
        added.removeAll(before);
        added.removeIf(f -> f.endsWith(": check.not-evaluated"));
        assertEquals(Set.of(), lost, () -> "findings lost or moved in " + rewritten);
        assertEquals(Set.of(), added, () -> "findings added in " + rewritten);
        assertFalse(solved.rows().isEmpty());
    }

    /** Single-line formulas that are not inputs and whose values are not temperatures (which a product would change). */
    private static List<Statement.Definition> wrappable(Analysis a) {
        // What depends on a fixture's own solve (or motion) stays out: tying it to z_meta as well would make two
        // solves a circle.
        Set<String> solvedAlready = new TreeSet<>();
        for (Statement s : a.syntax().statements()) {
            if (s instanceof Statement.Seek seek) solvedAlready.addAll(a.graph().dependents(seek.name().text()));
            // Likewise a several-unknown solve's and a motion's (each of their names is a statement).
            if (s instanceof Statement.SeekSystem k) solvedAlready.addAll(a.graph().dependents(k.name().text()));
            if (s instanceof Statement.Evolve k) solvedAlready.addAll(a.graph().dependents(k.name().text()));
        }
        List<Statement.Definition> out = new ArrayList<>();
        for (Statement s : a.syntax().statements()) {
            if (!(s instanceof Statement.Definition d) || d.input() || d.expr() instanceof Expr.Piecewise) continue;
            if (solvedAlready.contains(d.name().text())) continue;
            String formula = a.text().substring(d.expr().span().start(), d.expr().span().end());
            if (formula.contains("\n")) continue;
            Binding b = a.scope().lookup(d.name().text());
            if (b instanceof Binding.ValueBinding v && v.value().known() && v.value().dimension().equals(Dimension.TEMPERATURE)) {
                continue;
            }
            out.add(d);
        }
        return out;
    }

    private static String rewrite(String text, Set<String> inputs, List<Statement.Definition> wrapped) {
        StringBuilder out = new StringBuilder(text);
        List<Statement.Definition> backwards = new ArrayList<>(wrapped);
        backwards.sort(Comparator.comparingInt((Statement.Definition d) -> d.expr().span().start()).reversed());
        for (Statement.Definition d : backwards) {
            List<dev.plumb.diagnostics.Span> uses = new ArrayList<>();
            References.each(d.expr(), (name, span) -> {
                // A name written as a function (`k(V)`) stays as written: its finding is about that.
                boolean called = span.end() < text.length() && text.charAt(span.end()) == '(';
                if (inputs.contains(name) && !called) uses.add(span);
            });
            out.insert(d.expr().span().end(), ") * z_meta");
            uses.sort(Comparator.comparingInt(dev.plumb.diagnostics.Span::start).reversed());
            for (dev.plumb.diagnostics.Span u : uses) {
                out.insert(u.end(), " * z_meta)");
                out.insert(u.start(), "(");
            }
            out.insert(d.expr().span().start(), "(");
        }
        if (!text.endsWith("\n")) out.append('\n');
        Set<String> names = new TreeSet<>();
        wrapped.forEach(d -> names.add(d.name().text()));
        out.append("seek z_meta in 0.5 .. 1.5 where z_meta = ")
            .append(String.join(" * ", names.stream().map(n -> n + "^0").toList())).append('\n');
        return out.toString();
    }

    /** "line 3: unit.mismatch" for every finding on the first {@code lines} lines. */
    private static Set<String> codesByLine(Analysis a, int lines) {
        Set<String> out = new TreeSet<>();
        for (Diagnostic d : a.diagnostics()) {
            int line = a.lines().line(d.span().start());
            if (line <= lines) out.add("line " + line + ": " + d.code().id());
        }
        return out;
    }
}
