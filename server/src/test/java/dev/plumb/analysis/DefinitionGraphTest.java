package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The analysis keeps the document's own definitions by name and file, what each uses, and each one's findings. */
class DefinitionGraphTest {

    private static final String CALC = String.join("\n",
        "input a = 2 m",
        "input b = 3 s",
        "c = a * 2",
        "d = c + b",
        "e = c / b",
        "f = 5 kg",
        "");

    @Test
    void usesAndDependentsFollowTheFormulas() {
        DefinitionGraph g = Fixture.analyze(CALC).graph();
        assertEquals(List.of("a", "b", "c", "d", "e", "f"), List.copyOf(g.names()));
        assertEquals(Set.of("c", "b"), g.uses("d"));
        assertEquals(Set.of("c", "d", "e"), g.dependents("a"), "everything downstream of a, directly or not");
        assertEquals(Set.of("d", "e"), g.dependents("b"));
        assertEquals(Set.of(), g.dependents("f"));
        assertEquals(Set.of(), g.uses("no_such_name"));
    }

    @Test
    void eachDefinitionKeepsTheFindingsOnItsOwnStatement() {
        Analysis a = Fixture.analyze(CALC);
        // d adds a time to a length: the one finding of the calc, and it is d's.
        assertEquals(List.of("unit.mismatch"), a.graph().findings("d").stream().map(x -> x.code().id()).toList());
        assertTrue(a.graph().findings("c").isEmpty());
    }

    @Test
    void identitiesAreNameAndFileNotPlace() {
        Analysis before = Fixture.analyze(CALC);
        Analysis after = Fixture.analyze("# a comment moves every line down\n" + CALC);
        assertEquals(before.graph().identity("e"), after.graph().identity("e"), "the same definition after an edit above it");
        assertNotEquals(before.graph().identity("e"), before.graph().identity("d"));
    }
}
