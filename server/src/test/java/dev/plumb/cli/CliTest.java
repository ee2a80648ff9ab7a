package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The command line's contract: output lines, exit codes, formats. */
class CliTest {
    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        return Cli.write(dir, name, text);
    }

    @Test
    void cleanFileExitsZeroWithSummaryAndCaution() throws IOException {
        Path f = write("ok.plumb", "input L = 2 m\nA = L^2\ncheck A < 5 m^2\n");
        Cli run = Cli.run("check", "--no-color", f.toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("Checked 1 file: 0 errors, 0 warnings, 0 hints; 1 checks passed."), run.out());
        assertTrue(run.out().contains("licensed engineer"));
    }

    @Test
    void errorsGiveFileLineColumnAndExitOne() throws IOException {
        Path f = write("bad.plumb", "input F = 3 N\ninput L = 2 m\nx = F + L\n");
        Cli run = Cli.run("check", "--no-color", f.toString());
        assertEquals(1, run.exitCode());
        String first = run.out().lines().findFirst().orElseThrow();
        assertTrue(first.matches(".*bad\\.plumb:3:5: error unit\\.mismatch: adding a length \\(m\\) to a force \\(N\\).*"), first);
    }

    @Test
    void failedCheckExitsOne() throws IOException {
        Path f = write("fail.plumb", "input F = 7 kN\ncheck F <= 6 kN \"anchor\"\n");
        Cli run = Cli.run("check", "--no-color", f.toString());
        assertEquals(1, run.exitCode());
        assertTrue(run.out().contains("check failed: F = 7 kN is not <= 6 kN (anchor)"), run.out());
    }

    @Test
    void foldersAreSearchedRecursively() throws IOException {
        write("a/one.plumb", "x = 1\n");
        write("a/b/two.plumb", "y = 2\n");
        write("a/b/notes.txt", "not a calc\n");
        Cli run = Cli.run("check", "--no-color", dir.resolve("a").toString());
        assertEquals(0, run.exitCode());
        assertTrue(run.out().contains("Checked 2 files"), run.out());
    }

    @Test
    void usageAndMissingPathsExitTwo() {
        assertEquals(2, Cli.run("check").exitCode());
        assertEquals(2, Cli.run("check", dir.resolve("nope.plumb").toString()).exitCode());
        assertEquals(2, Cli.run("frobnicate").exitCode());
        assertEquals(2, Cli.run("check", "--format", "xml", dir.toString()).exitCode());
        Cli missing = Cli.run("eval", dir.resolve("nope.plumb").toString());
        assertEquals(2, missing.exitCode());
        assertTrue(missing.err().contains("no such file"));
    }

    @Test
    void jsonFormatIsValidJsonWithTheSameFindings() throws IOException {
        Path f = write("j.plumb", "input F = 3 N\nx = F + 2 m\ncheck F > 5 N\n");
        Cli run = Cli.run("check", "--format", "json", f.toString());
        assertEquals(1, run.exitCode());
        JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
        var diags = root.getAsJsonArray("files").get(0).getAsJsonObject().getAsJsonArray("diagnostics");
        assertEquals(2, diags.size());
        JsonObject first = diags.get(0).getAsJsonObject();
        assertEquals("unit.mismatch", first.get("code").getAsString());
        assertEquals(2, first.get("line").getAsInt());
        assertEquals(5, first.get("column").getAsInt());
        assertEquals(1, root.getAsJsonObject("summary").get("checksFailed").getAsInt());
        assertTrue(root.get("notice").getAsString().contains("licensed engineer"));
    }

    @Test
    void sarifFormatIsASarifLogWithUtf16ColumnsAndRelativePaths() throws IOException {
        // SARIF 2.1.0 (OASIS Standard, 2020): sarifLog with version and runs; columnKind
        // utf16CodeUnits; regions with 1-based lines and columns, endColumn just past the region;
        // artifact URIs relative to a uriBaseId (from memory).
        Path folder = Path.of("target", "sarif-test");
        Files.createDirectories(folder);
        Path f = folder.resolve("ρ calc.plumb");
        Files.writeString(f, "input 𝑥_a = 3 N\nx = 𝑥_a + 2 m\ncheck 𝑥_a > 5 N\n");
        Cli run = Cli.run("check", "--format", "sarif", f.toString());
        assertEquals(1, run.exitCode(), run.err());
        JsonObject log = JsonParser.parseString(run.out()).getAsJsonObject();
        assertEquals("2.1.0", log.get("version").getAsString());
        assertEquals(SarifReport.SCHEMA, log.get("$schema").getAsString());
        JsonObject sarifRun = log.getAsJsonArray("runs").get(0).getAsJsonObject();
        assertEquals("utf16CodeUnits", sarifRun.get("columnKind").getAsString());
        var rules = sarifRun.getAsJsonObject("tool").getAsJsonObject("driver").getAsJsonArray("rules");
        var results = sarifRun.getAsJsonArray("results");
        assertEquals(2, results.size(), results.toString());
        for (var r : results) {
            JsonObject result = r.getAsJsonObject();
            assertEquals(result.get("ruleId").getAsString(),
                rules.get(result.get("ruleIndex").getAsInt()).getAsJsonObject().get("id").getAsString());
        }
        JsonObject mismatch = results.get(0).getAsJsonObject();
        assertEquals("unit.mismatch", mismatch.get("ruleId").getAsString());
        assertEquals("error", mismatch.get("level").getAsString());
        JsonObject physical = mismatch.getAsJsonArray("locations").get(0).getAsJsonObject()
            .getAsJsonObject("physicalLocation");
        assertEquals("target/sarif-test/%CF%81%20calc.plumb", physical.getAsJsonObject("artifactLocation").get("uri").getAsString());
        assertEquals("%SRCROOT%", physical.getAsJsonObject("artifactLocation").get("uriBaseId").getAsString());
        JsonObject region = physical.getAsJsonObject("region");
        // "x = " is 4 units; "𝑥_a + 2 m" is 10 (𝑥 is a surrogate pair).
        assertEquals(2, region.get("startLine").getAsInt());
        assertEquals(5, region.get("startColumn").getAsInt());
        assertEquals(15, region.get("endColumn").getAsInt());
        assertEquals("check.failed", results.get(1).getAsJsonObject().get("ruleId").getAsString());
        // Each rule carries its section of docs/diagnostics.md as help.
        for (var r : rules) assertTrue(r.getAsJsonObject().has("shortDescription"), r.toString());
        JsonObject rule = rules.get(mismatch.get("ruleIndex").getAsInt()).getAsJsonObject();
        assertTrue(rule.getAsJsonObject("shortDescription").get("text").getAsString()
            .startsWith("Two things that must have one dimension do not"), rule.toString());
        assertTrue(rule.getAsJsonObject("help").get("markdown").getAsString().contains("**Fix:**"), rule.toString());
        assertTrue(sarifRun.getAsJsonObject("properties").get("notice").getAsString().contains("licensed engineer"));
    }

    @Test
    void noColourUnlessAskedOrOnATerminal() throws IOException {
        Path f = write("c.plumb", "x = 1 +\n");
        assertFalse(Cli.run("check", f.toString()).out().contains("\u001b["), "tests do not run on a terminal");
        assertTrue(Cli.run("check", "--color", f.toString()).out().contains("\u001b["));
    }

    @Test
    void evalPrintsValuesInDisplayUnitsAligned() throws IOException {
        Path f = write("e.plumb", "section \"Air\"\ninput T = 15 degC\ninput p = 101.325 kPa\n"
            + "rho = p / (287.05 J/(kg*K) * T)\nlong_name = 2 * p in bar\n");
        Cli run = Cli.run("eval", "--no-color", f.toString());
        assertEquals(0, run.exitCode(), run.out());
        // ρ = p/(R·T) = 101325 / (287.05 × 288.15) = 1.2250 kg/m³, worked by hand.
        assertTrue(run.out().contains("  rho       = 1.225 kg/m³"), run.out());
        assertTrue(run.out().contains("  T         = 15 °C"), run.out());
        assertTrue(run.out().contains("  long_name = 2.027 bar"), run.out());
    }

    @Test
    void evalSaysWhichFitASelectorUsed() throws IOException {
        // cd_sphere hands over from Brown-Lawler to Morrison through a blend over 1e5 < Re < 2e5
        // (stdlib/sphere.plumb); the reviewer sees which gave each value.
        Path f = write("s.plumb", "Cd_low = cd_sphere(5e4)\nCd_mid = cd_sphere(1.5e5)\nCd_sn = cd_sphere_sn(100)\n");
        Cli run = Cli.run("eval", "--no-color", f.toString());
        assertEquals(0, run.exitCode(), run.out());
        assertTrue(run.out().contains("[cd_sphere: frontal basis]  [used: cd_sphere_brown_lawler at Re = 50000]"),
            run.out());
        assertTrue(run.out().contains("[used: cd_sphere_brown_lawler and cd_sphere_morrison (the formula when "
            + "1e5 < Re < 2e5) at Re = 150000]"), run.out());
        assertFalse(run.out().lines().filter(l -> l.contains("Cd_sn")).findFirst().orElseThrow().contains("used"),
            "a correlation with one formula has nothing to choose");
    }

    @Test
    void evalSaysWhichWayAFrontalBasisFaces() throws IOException {
        // cd_cylinder is referred to the projected area d·L of a cylinder in cross-flow.
        Path f = write("c.plumb", "Cd = cd_cylinder(1e5)\n");
        Cli run = Cli.run("eval", "--no-color", f.toString());
        assertTrue(run.out().contains("[cd_cylinder: frontal basis, cross-flow]"), run.out());
    }

    @Test
    void binaryFileIsAClearError() throws IOException {
        Path f = dir.resolve("image.plumb");
        Files.write(f, new byte[] {(byte) 0x89, 'P', 'N', 'G', 0, 0, 0, 13});
        Cli run = Cli.run("check", "--no-color", f.toString());
        assertEquals(1, run.exitCode());
        assertTrue(run.out().contains("file.not-text"), run.out());
        assertTrue(run.out().contains("NUL byte"), run.out());
    }
}
