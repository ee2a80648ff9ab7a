package dev.plumb.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Completion at a cursor marked {@code $0} in the text. */
class CompletionTest {

    private static List<CompletionEntry> complete(String marked) {
        Marked m = Marked.of(marked);
        return Completion.at(m.analysis(), m.cursor());
    }

    @Test
    void aLineStartOffersTheSolveStatementAsSnippets() {
        List<CompletionEntry> found = complete("x = 1\nse$0");
        List<CompletionEntry> seeks = found.stream().filter(e -> e.snippet() && e.insert().startsWith("seek ")).toList();
        assertEquals(List.of("seek ${1:x} in ${2:low} .. ${3:high} where ${4:lhs} = ${5:rhs}",
            "seek ${1:x} from ${2:start} where ${3:lhs} = ${4:rhs}"), seeks.stream().map(CompletionEntry::insert).toList());
        assertTrue(found.stream().noneMatch(e -> e.label().equals("find")), "the former word is not offered");
    }

    @Test
    void afterSeekNameInTheBracketTakesValuesNotUnits() {
        List<CompletionEntry> found = complete("input V_min = 1 m/s\nseek V in V_$0");
        assertTrue(found.stream().anyMatch(e -> e.label().equals("V_min")), found.toString());
        assertTrue(found.stream().noneMatch(e -> e.kind() == CompletionEntry.Kind.UNIT), found.toString());
    }

    @Test
    void aDisplayUnitAfterInStillTakesUnits() {
        List<CompletionEntry> found = complete("x = 2 m in m$0");
        assertTrue(found.stream().anyMatch(e -> e.kind() == CompletionEntry.Kind.UNIT && e.label().equals("mm")),
            found.toString());
    }
}
