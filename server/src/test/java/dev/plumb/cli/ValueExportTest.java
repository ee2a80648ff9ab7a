package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `plumb eval --format json|csv`: every value for other tools, parseable, nothing lost. */
class ValueExportTest {
    @TempDir
    Path dir;

    private static final String CALC = """
        input b = 1.2 m    "panel width, drawing \\"S-01\\", rev B"
        input h = 800 mm
        A = b * h          in cm^2
        x = A + 1 s
        check A < 2 m^2
        """;

    @Test
    void jsonHasEveryValueInSiAndAsShownWithTheChecksAndFindings() throws IOException {
        Path calc = Cli.write(dir, "panel.plumb", CALC);
        Cli run = Cli.run("eval", "--format", "json", calc.toString());
        JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
        assertEquals(4, root.getAsJsonArray("values").size(), run.out());
        JsonObject area = root.getAsJsonArray("values").get(2).getAsJsonObject();
        assertEquals("A", area.get("name").getAsString());
        // by hand: 1.2 m × 0.8 m = 0.96 m² = 9600 cm²
        assertEquals(0.96, area.get("valueSi").getAsDouble(), 1e-12);
        assertEquals("m²", area.get("siUnit").getAsString());
        assertEquals("9600 cm²", area.get("shown").getAsString());
        assertEquals(3, area.get("line").getAsInt());
        JsonObject unknown = root.getAsJsonArray("values").get(3).getAsJsonObject();
        assertTrue(!unknown.has("valueSi") && unknown.get("shown").getAsString().equals("?"), unknown.toString());
        assertEquals("pass", root.getAsJsonArray("checks").get(0).getAsJsonObject().get("verdict").getAsString());
        assertEquals("unit.mismatch", root.getAsJsonArray("diagnostics").get(0).getAsJsonObject().get("code").getAsString());
        assertEquals(1, run.exitCode(), "the error still fails the run");
    }

    @Test
    void valuesFromUsedFilesAreListedWithTheirFilesAndNotes() throws IOException {
        java.nio.file.Files.createDirectories(dir.resolve(".git"));
        Cli.write(dir, "site.plumb", "input V_site = 31 m/s   \"site gust, wind brief\"\ninput unused_here = 2 m\n");
        Path calc = Cli.write(dir, "calc.plumb", "use \"site.plumb\"\nq = 0.5 * 1.2 kg/m^3 * V_site^2\n");
        Cli text = Cli.run("eval", "--no-color", calc.toString());
        assertTrue(text.out().contains("From used files\n  V_site = 31 m/s    (site.plumb)  site gust, wind brief\n\n"
            + "In this calc\n  q      = 576.6 Pa\n"), text.out());
        assertTrue(!text.out().contains("unused_here"), "only the values the calc uses");
        JsonObject root = JsonParser.parseString(Cli.run("eval", "--format", "json", calc.toString()).out()).getAsJsonObject();
        JsonObject used = root.getAsJsonArray("usedValues").get(0).getAsJsonObject();
        assertEquals("V_site", used.get("name").getAsString());
        assertEquals("site.plumb", used.get("file").getAsString());
        assertEquals(31, used.get("valueSi").getAsDouble(), 0);
        assertEquals("site gust, wind brief", used.get("note").getAsString());
    }

    @Test
    void stepsShowEveryTrialInTheUnitTheRootIsShownIn() throws IOException {
        // by hand: v · 2 s = 3 m gives v = 1.5 m/s = 1500 mm/s
        Path calc = Cli.write(dir, "steps.plumb", "seek v in 1 mm/s .. 10 m/s where v * 2 s = 3 m\n");
        Cli run = Cli.run("eval", "--steps", "--no-color", calc.toString());
        assertTrue(run.out().contains("v = 1500 mm/s"), run.out());
        List<String> trials = run.out().lines().filter(l -> l.matches("\\s+\\d+  v = .*")).toList();
        assertTrue(!trials.isEmpty() && trials.stream().allMatch(l -> l.contains(" mm/s ") && l.contains("bracket")),
            run.out());
    }

    @Test
    void evalOfAFolderSaysItTakesAFile() throws IOException {
        Cli.write(dir, "panel.plumb", CALC);
        Cli run = Cli.run("eval", dir.toString());
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("eval takes one calc file") && run.err().contains("plumb check"), run.err());
    }

    @Test
    void csvHasOneQuotedRowPerValue() throws IOException {
        Path calc = Cli.write(dir, "panel.plumb", CALC);
        Cli run = Cli.run("eval", "--format", "csv", calc.toString());
        List<String> rows = run.out().lines().toList();
        assertEquals("name,line,input,value_si,si_unit,shown,unit,dimension,note,spread_si,spread", rows.get(0));
        assertEquals(5, rows.size(), run.out());
        // RFC 4180: a cell with a comma or a quote is quoted, its quotes doubled.
        assertTrue(rows.get(1).endsWith(",\"panel width, drawing \"\"S-01\"\", rev B\",,"), rows.get(1));
        assertTrue(rows.get(4).startsWith("x,4,false,,,?,"), rows.get(4));
    }

    /** A body coasting at constant speed: by hand, x = u t, so 12 m at 4 m/s takes 3 s. */
    private static final String MOTION = """
        input u = 4 m/s
        evolve x from 0 m over t rates u until x >= 12 m every 1 s
        """;

    @Test
    void csvWritesTheTableOfTheMotionNamedAndJsonHoldsEveryMotion() throws IOException {
        Path calc = Cli.write(dir, "coast.plumb", MOTION);
        Cli csv = Cli.run("eval", "--format", "csv", "--trajectory", "x", calc.toString());
        assertEquals(0, csv.exitCode(), csv.err());
        List<String> lines = csv.out().lines().toList();
        assertEquals("t (s),x (m)", lines.get(0));
        assertEquals(5, lines.size(), csv.out());
        // by hand: x = 4 m/s × t at t = 0, 1, 2, 3 s
        for (int i = 0; i <= 3; i++) {
            String[] cells = lines.get(i + 1).split(",");
            assertEquals(i, Double.parseDouble(cells[0]), 1e-9);
            assertEquals(4.0 * i, Double.parseDouble(cells[1]), 1e-9);
        }
        JsonObject root = JsonParser.parseString(Cli.run("eval", "--format", "json", calc.toString()).out()).getAsJsonObject();
        JsonObject motion = root.getAsJsonArray("trajectories").get(0).getAsJsonObject();
        assertEquals("[\"t\",\"x\"]", motion.getAsJsonArray("names").toString());
        assertEquals(4, motion.getAsJsonArray("rows").size());
        assertEquals(12, motion.getAsJsonArray("rows").get(3).getAsJsonArray().get(1).getAsDouble(), 1e-9);
    }

    @Test
    void aTrajectoryNameThatIsNoMotionOrAnotherFormatIsAUsageError() throws IOException {
        Path calc = Cli.write(dir, "coast.plumb", MOTION);
        Cli none = Cli.run("eval", "--format", "csv", "--trajectory", "u", calc.toString());
        assertEquals(2, none.exitCode());
        assertTrue(none.err().contains("u is not the time or a state of a motion") && none.err().contains("times: t"),
            none.err());
        Cli text = Cli.run("eval", "--trajectory", "x", calc.toString());
        assertEquals(2, text.exitCode());
        assertTrue(text.err().contains("--format csv"), text.err());
    }
}
