package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Severity;
import org.junit.jupiter.api.Test;

/** accept statements: accepted findings keep their place and carry the reason; the bad ones are findings. */
class AcceptTest {

    @Test
    void anAcceptedFindingIsStillListedWithItsReasonAndCountedApart() {
        Analysis a = Fixture.checkResource("accept.stale.plumb");
        Diagnostic range = a.diagnostics().stream().filter(d -> d.code() == Code.RANGE_OUTSIDE).findFirst().orElseThrow();
        assertTrue(range.isAccepted());
        assertEquals("validated against the invented tunnel report TR-118", range.accepted());
        assertEquals(Severity.WARNING, range.severity());
        assertEquals(1, a.accepted());
        assertEquals(2, a.count(Severity.WARNING)); // the two stale acceptances, not the accepted finding
        assertTrue(a.diagnostics().stream().filter(d -> d.code() == Code.ACCEPT_STALE).noneMatch(Diagnostic::isAccepted));
    }

    @Test
    void invalidAcceptancesAcceptNothing() {
        Analysis a = Fixture.checkResource("accept.invalid.plumb");
        assertFalse(a.diagnostics().stream().anyMatch(Diagnostic::isAccepted));
        assertEquals(0, a.accepted());
    }

    @Test
    void aMissingReasonIsASyntaxError() {
        Fixture.checkResource("syntax.error.accept-reason.plumb");
    }

    @Test
    void acceptAndAtStayUsableAsNames() {
        Fixture.check("accept = 3\nat = accept + 1\ncheck at > 1\n");
    }
}
