package dev.plumb.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/** Rename at the cursor ($0): every occurrence the analyser resolves changes, nothing else. */
class OccurrencesTest {

    private static String rename(String marked, String to) {
        Marked m = Marked.of(marked);
        Occurrences.Renaming r = Occurrences.rename(m.analysis(), m.cursor(), to);
        assertNull(r.refusal(), r.refusal());
        return Formatter.apply(m.analysis().text(), r.edits());
    }

    @Test
    void renamingASolvedValueCoversItsOwnEquation() {
        assertEquals("""
            W = 2 N
            seek U in 1 m/s .. 10 m/s where U * 1 N*s/m = W
            P = W * U
            """, rename("""
            W = 2 N
            seek V$0 in 1 m/s .. 10 m/s where V * 1 N*s/m = W
            P = W * V
            """, "U"));
    }

    @Test
    void renamingFromAUseInsideTheEquationWorksToo() {
        assertEquals("seek h from 1 m where h^3 = 8 m^3\ny = h\n", rename("seek x from 1 m where x$0^3 = 8 m^3\ny = x\n", "h"));
    }
}
