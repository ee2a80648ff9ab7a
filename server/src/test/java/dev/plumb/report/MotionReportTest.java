package dev.plumb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.RepoRoot;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Trajectory;
import dev.plumb.analysis.Workspace;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;

/** The report of a motion and of a several-unknown solve, on the survey-tow sample, read back with jsoup. */
class MotionReportTest {
    private static final Analysis SAMPLE = new Workspace(new FileSources(), Settings.DEFAULT)
        .analyze(RepoRoot.get().resolve("samples/survey-tow/towed-sensor.plumb"));

    private static Document page() {
        return Jsoup.parse(CalcReport.html(SAMPLE, SAMPLE.diagnostics(),
            new CalcReport.Context("towed-sensor.plumb", "2026-12-02", null)));
    }

    @Test
    void theMotionIsDrawnStateByStateWithItsTable() {
        Trajectory t = SAMPLE.trajectory("t_drop");
        Document page = page();
        List<Element> plots = page.select("svg.trajectory");
        assertEquals(t.names().size() - 1, plots.size(), "one plot per state");
        assertEquals("v_bb against t_drop", plots.get(0).attr("aria-label"));
        assertEquals("z against t_drop", plots.get(1).attr("aria-label"));
        // The curve passes through every plot sample; the dot marks the stop.
        String points = plots.get(1).selectFirst("polyline.state").attr("points");
        assertEquals(t.plotTimes().length, points.trim().split(" ").length);
        assertEquals(1, plots.get(1).select("circle.stop").size());
        Element table = page.selectFirst("table.trajectory");
        assertEquals(t.times().length, table.select("tbody tr").size());
        assertEquals(List.of("t_drop (s)", "v_bb (m/s)", "z (m)"), table.select("thead th").eachText());
        // The last row is the stop: the floor, at the depth the calc gives (14 m, its input).
        assertEquals("14", table.select("tbody tr").last().select("td").get(2).text());
    }

    @Test
    void theSystemShowsEachEquationWithItsResidualAndTheIterates() {
        Document page = page();
        Element solved = page.getElementById(Anchors.of("V_max"));
        assertTrue(solved.text().contains("are solved together so that"), solved.text());
        assertEquals(2, solved.select("p.solve-summary").stream().filter(p -> p.text().startsWith("residual ")).count());
        assertTrue(solved.selectFirst("table.steps") != null);
    }

    @Test
    void drawChoosesTheStatesPlotted() {
        // by hand: x = u t, so 12 m at 4 m/s takes 3 s; only x is drawn.
        Analysis a = new Workspace(new FileSources(),
            Settings.DEFAULT).analyzeText(java.nio.file.Path.of("coast.plumb").toAbsolutePath(),
                "input u = 4 m/s\nevolve v, x from u, 0 m over t rates 0 m/s^2, v until x >= 12 m draw x\n");
        assertEquals(List.of(), a.diagnostics());
        Document page = Jsoup.parse(CalcReport.html(a, a.diagnostics(), new CalcReport.Context("coast.plumb", "2026-12-02", null)));
        assertEquals(List.of("x against t"), page.select("svg.trajectory").eachAttr("aria-label"));
        Analysis wrong = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(
            java.nio.file.Path.of("coast.plumb").toAbsolutePath(),
            "input u = 4 m/s\nevolve x from 0 m over t rates u until x >= 12 m draw u\n");
        assertEquals(List.of("name.unknown"), wrong.diagnostics().stream().map(d -> d.code().id()).toList());
        assertTrue(wrong.diagnostics().get(0).message().contains("u is not one of this motion's states (x)"));
    }
}
