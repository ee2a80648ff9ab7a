package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** Every analysis ends: work beyond the budget is cut short with one finding, and a run nobody wants stops. */
class BudgetTest {

    /** f0(x) = x, fk(x) = f(k-1)(x) + f(k-1)(x): the work of f_n doubles with n. */
    private static String doubling(int levels) {
        StringBuilder b = new StringBuilder("f0(x) = x\n");
        for (int k = 1; k <= levels; k++) b.append("f").append(k).append("(x) = f").append(k - 1).append("(x) + f").append(k - 1)
            .append("(x)\n");
        return b.toString();
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void aFormulaThatDoublesItsWorkSixtyTimesIsStoppedAndTheRestIsEvaluated() {
        Fixture.checkResource("limit.budget.plumb");
        Analysis a = Fixture.analyze(doubling(60) + "y = f60(1)\nz = 2 m\ncheck z < 3 m\n");
        assertEquals(List.of("limit.budget"), a.diagnostics().stream().map(d -> d.code().id()).toList());
        assertEquals("?", Fixture.shown(a, "y"));
        // by hand: z = 2 m < 3 m, evaluated after the cut
        assertEquals(2.0, Fixture.value(a, "z").value().si(), 0);
    }

    @Test
    @Timeout(value = 30, unit = TimeUnit.SECONDS)
    void aRunNobodyWantsAnyMoreStopsWithinItsSteps() throws Exception {
        AtomicBoolean unwanted = new AtomicBoolean(false);
        Thread later = new Thread(() -> {
            try {
                Thread.sleep(200);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            unwanted.set(true);
        });
        later.start();
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT)
            .analyzeText(Path.of("budget.plumb").toAbsolutePath(), doubling(60) + "y = f60(1)\n", null, unwanted::get);
        later.join();
        assertNull(a, "a superseded run gives no result");
    }
}
