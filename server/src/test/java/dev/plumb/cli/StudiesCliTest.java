package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The studies in `plumb eval`: text, JSON and CSV. A wind load of our own: F = 0.6 kg/m · V². */
class StudiesCliTest {
    @TempDir
    Path dir;

    private static final String CALC = """
        input V = 20 m/s ± 1 m/s
        F = 0.6 kg/m * V^2 in N
        check F <= 400 N
        case storm: V = 30 m/s
        sweep V over 10 m/s .. 30 m/s by 10 m/s
            show F
        """;

    @Test
    void textShowsTheSpreadTheCaseWithItsRatioAndTheSweepsTable() throws IOException {
        Path calc = Cli.write(dir, "w.plumb", CALC);
        Cli run = Cli.run("eval", "--sensitivity", "F", calc.toString());
        String out = run.out();
        // uF = 2·(1/20)·240 N = 24 N (10 %); the storm: 540 N, ×2.25; the sweep: 60, 240, 540 N.
        assertTrue(out.contains("F = 240 N ± 24 N (±10 %)"), out);
        assertTrue(out.contains("shares of the variance: V 100 %"), out);
        assertTrue(out.contains("F  240 N  → 540 N   ×2.25"), out);
        assertTrue(out.contains("V [m/s]  F [N]  checks"), out);
        assertTrue(out.contains("30       540    ✗ F <= 400 N"), out);
        assertTrue(out.contains("error check.failed: in case storm: check failed: F = 540 N is not <= 400 N"), out);
        assertEquals(1, run.exitCode(), "the storm case fails a check");
    }

    @Test
    void jsonCarriesTheSpreadTheCasesAndTheSweeps() throws IOException {
        Path calc = Cli.write(dir, "w.plumb", CALC);
        JsonObject root = JsonParser.parseString(Cli.run("eval", "--format", "json", calc.toString()).out()).getAsJsonObject();
        JsonObject f = root.getAsJsonArray("values").get(1).getAsJsonObject();
        assertEquals(24.0, f.getAsJsonObject("spread").get("si").getAsDouble(), 1e-6);
        assertEquals(0.1, f.getAsJsonObject("spread").get("relative").getAsDouble(), 1e-8);
        JsonObject storm = root.getAsJsonArray("cases").get(0).getAsJsonObject();
        assertEquals("storm", storm.get("case").getAsString());
        JsonObject changedF = storm.getAsJsonArray("changed").get(1).getAsJsonObject();
        assertEquals(2.25, changedF.get("ratio").getAsDouble(), 1e-12);
        JsonArray rows = root.getAsJsonArray("sweeps").get(0).getAsJsonObject().getAsJsonArray("rows");
        assertEquals(3, rows.size());
        assertEquals(540.0, rows.get(2).getAsJsonObject().getAsJsonArray("results").get(0).getAsJsonObject()
            .get("valueSi").getAsDouble(), 1e-9);
        assertEquals("fail", rows.get(2).getAsJsonObject().getAsJsonArray("verdicts").get(0).getAsString());
    }

    @Test
    void csvOfTheValuesHasEachCaseInTwoColumns() throws IOException {
        // The storm: V = 30 m/s, F = 0.6 kg/m · (30 m/s)² = 540 N.
        Path calc = Cli.write(dir, "w.plumb", CALC);
        List<String> rows = Cli.run("eval", "--format", "csv", calc.toString()).out().lines().toList();
        assertTrue(rows.get(0).endsWith(",spread_si,spread,case_storm_si,case_storm"), rows.get(0));
        assertTrue(rows.get(1).startsWith("V,1,true,20.0,") && rows.get(1).endsWith(",30.0,30 m/s"), rows.get(1));
        assertTrue(rows.get(2).startsWith("F,2,false,240.0,") && rows.get(2).endsWith(",540.0,540 N"), rows.get(2));
    }

    @Test
    void jsonNamesARowThatFailsOnlyAtItsBounds() throws IOException {
        // F = 0.6 kg/m · V², u(F) = 1.2 kg/m · V · 1 m/s: at 20 m/s 240 N + 24 N = 264 N <= 250 N fails at its
        // bounds though 240 N passes; at 10 m/s 60 N + 12 N passes.
        Path calc = Cli.write(dir, "m.plumb", """
            input V = 20 m/s ± 1 m/s
            F = 0.6 kg/m * V^2 in N
            check F <= 250 N with spread
            sweep V over 10 m/s .. 20 m/s by 10 m/s
                show F
            """);
        JsonObject root = JsonParser.parseString(Cli.run("eval", "--format", "json", calc.toString()).out()).getAsJsonObject();
        JsonArray rows = root.getAsJsonArray("sweeps").get(0).getAsJsonObject().getAsJsonArray("rows");
        assertEquals("pass", rows.get(0).getAsJsonObject().getAsJsonArray("verdicts").get(0).getAsString());
        assertEquals("fail at bound", rows.get(1).getAsJsonObject().getAsJsonArray("verdicts").get(0).getAsString());
    }

    @Test
    void jsonOfAGridNamesItsSecondValueAndGivesItInEveryRow() throws IOException {
        // F = 0.6 kg/m³ · V² · d · 1 m: at V = 20 m/s and d = 0.3 m, 72 N.
        Path calc = Cli.write(dir, "g.plumb", """
            input V = 20 m/s
            input d = 0.2 m
            F = 0.6 kg/m^3 * V^2 * d * 1 m in N
            sweep V over 10 m/s .. 20 m/s by 10 m/s, d over 0.1 m .. 0.3 m in 3 steps
                show F
            """);
        JsonObject grid = JsonParser.parseString(Cli.run("eval", "--format", "json", calc.toString()).out()).getAsJsonObject()
            .getAsJsonArray("sweeps").get(0).getAsJsonObject();
        assertEquals("d", grid.getAsJsonObject("across").get("name").getAsString());
        assertEquals("m", grid.getAsJsonObject("across").get("unit").getAsString());
        JsonArray rows = grid.getAsJsonArray("rows");
        assertEquals(6, rows.size());
        JsonObject last = rows.get(5).getAsJsonObject();
        assertEquals(20.0, last.getAsJsonObject("given").get("valueSi").getAsDouble(), 1e-12);
        assertEquals(0.3, last.getAsJsonObject("across").get("valueSi").getAsDouble(), 1e-12);
        assertEquals(72.0, last.getAsJsonArray("results").get(0).getAsJsonObject().get("valueSi").getAsDouble(), 1e-9);
    }

    @Test
    void csvWritesOneSweepsTableOnRequest() throws IOException {
        Path calc = Cli.write(dir, "w.plumb", CALC);
        List<String> rows = Cli.run("eval", "--format", "csv", "--sweep", "V", calc.toString()).out().lines().toList();
        assertEquals(List.of("V [m/s],F [N],checks", "10,60,✓", "20,240,✓", "30,540,✗ F <= 400 N"), rows);
        Cli none = Cli.run("eval", "--format", "csv", "--sweep", "W", calc.toString());
        assertEquals(2, none.exitCode());
        assertTrue(none.err().contains("has no sweep of W"), none.err());
        assertEquals(2, Cli.run("eval", "--sweep", "V", calc.toString()).exitCode(), "--sweep wants --format csv");
        // One CSV table at a time: a sweep's or a motion's, not both.
        Cli both = Cli.run("eval", "--format", "csv", "--sweep", "V", "--trajectory", "t", calc.toString());
        assertEquals(2, both.exitCode());
        assertTrue(both.err().contains("--trajectory and --sweep each choose the one table"), both.err());
    }

    @Test
    void monteCarloIsShownWithItsSampleCountAndSeed() throws IOException {
        Path calc = Cli.write(dir, "w.plumb", CALC);
        String out = Cli.run("eval", "--monte-carlo", "2000", calc.toString()).out();
        assertTrue(out.contains("(mean ± standard deviation, 2000 samples, seed 20261202)"), out);
        assertEquals(2, Cli.run("eval", "--monte-carlo", "-5", calc.toString()).exitCode());
    }
}
