package dev.plumb.cli;

import dev.plumb.present.Caution;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import dev.plumb.revisions.GitFixture;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `plumb diff` end to end on repositories made with JGit: every line of the text output, the
 * Markdown summary with flipped checks first, the JSON's shape, exit codes and bad input. The
 * calcs are an invented hoarding panel at a depot gate and the air file it uses.
 */
class DiffCliTest {
    @TempDir
    Path dir;

    static final String AIR = "input rho_air = 1.25 kg/m^3   \"air at the depot gate, winter\"\n";
    /** Before: q = 0.5 · 1.25 · 20² = 250 Pa, A = 4 · 2 = 8 m², F = 1.3 · 8 · 250 = 2600 N, under 5.5 kN. */
    static final String PANEL = """
        title "Hoarding panel at the depot gate"
        use "air.plumb"
        input V  = 20 m/s     "design gust"
        input Cd = 1.3        "flat panel"
        input b  = 4 m
        input h  = 2 m
        A = b * h
        q = 0.5 * rho_air * V^2   in Pa
        F = Cd * A * q            in kN
        check F <= 5.5 kN "footing working capacity"
        """;

    /** Two commits: the gust raised to 30 m/s and the air file's density lowered to 1.20 kg/m³. */
    private String[] twoCommits(GitFixture git) throws Exception {
        git.write("site/air.plumb", AIR);
        git.write("site/hoarding.plumb", PANEL);
        String one = git.commit("first issue");
        git.write("site/air.plumb", AIR.replace("1.25", "1.20"));
        git.write("site/hoarding.plumb", PANEL.replace("20 m/s", "30 m/s"));
        String two = git.commit("gust from the revised wind brief");
        return new String[] {one, two};
    }

    private Path top() throws Exception {
        return dir.toRealPath();
    }

    @Test
    void textShowsTheFlippedCheckFirstThenInputsAndResultsMovedByTheRightAmount() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            String[] ids = twoCommits(git);
            Cli run = Cli.run("diff", "--no-color", "HEAD~1", "HEAD", "--", dir.toString());
            assertEquals(1, run.exitCode(), run.err());
            String air = Location.path(top().resolve("site/air.plumb"));
            String panel = Location.path(top().resolve("site/hoarding.plumb"));
            // by hand: ρ 1.25 → 1.20 is −4 %; V 20 → 30 m/s is +50 %; q = ρV²/2 goes 250 → 0.5 · 1.2 · 900 = 540 Pa,
            // +116 % (540/250 = 2.16); F = Cd·A·q goes with q: 2600 → 1.3 · 8 · 540 = 5616 N, over 5.5 kN.
            assertEquals(List.of(
                "Value diff: HEAD~1 (" + ids[0].substring(0, 7) + ") → HEAD (" + ids[1].substring(0, 7)
                    + "); values within 1e-9 relative count as unchanged.",
                "",
                air + ": 1 input changed",
                "  inputs changed",
                "    rho_air  line 1  1.25 kg/m³ → 1.2 kg/m³  -4.000 %",
                "",
                panel + ": 1 check flipped, 2 inputs changed, 2 results changed, 1 finding new, 1 used file changed",
                "  checks",
                "    ✓ → ✗  line 10: F <= 5.5 kN \"footing working capacity\": 2.6 kN <= 5.5 kN → 5.616 kN <= 5.5 kN",
                "  inputs changed",
                "    V                         line 3  20 m/s → 30 m/s  +50.00 %",
                "    rho_air (from air.plumb)  1.25 kg/m³ → 1.2 kg/m³  -4.000 %",
                "  results changed",
                "    q  line 8  250 Pa → 540 Pa  +116.0 %",
                "    F  line 9  2.6 kN → 5.616 kN  +116.0 %",
                "  findings new",
                "    line 10:1 error check.failed: check failed: F = 5.616 kN is not <= 5.5 kN (footing working capacity)",
                "  used files changed",
                "    " + air,
                "",
                "2 of 2 calcs changed: 1 check flipped, 0 added or removed; 3 inputs and 2 results changed; 1 finding new, 0 gone.",
                Caution.TEXT), run.out().lines().toList());
            assertEquals("", run.err());
        }
    }

    @Test
    void markdownPutsTheFlippedChecksFirstAndFoldsTheDetails() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            // A calc whose name sorts first but whose checks all still pass: it comes after the one that flipped.
            git.write("site/a-mast.plumb", "input V = 20 m/s\nq = 0.5 * 1.25 kg/m^3 * V^2 in Pa\ncheck q <= 1 kPa \"cladding\"\n");
            twoCommits(git);
            git.write("site/a-mast.plumb", "input V = 22 m/s\nq = 0.5 * 1.25 kg/m^3 * V^2 in Pa\ncheck q <= 1 kPa \"cladding\"\n");
            Cli run = Cli.run("diff", "--format", "markdown", "HEAD~1", "--", dir.toString());
            assertEquals(1, run.exitCode(), run.err());
            List<String> lines = run.out().lines().toList();
            String panel = Location.path(top().resolve("site/hoarding.plumb")).replace("_", "\\_");
            String mast = Location.path(top().resolve("site/a-mast.plumb")).replace("_", "\\_");
            int at = lines.indexOf("**1 check flipped**");
            assertTrue(at > 0, run.out());
            assertEquals(List.of(
                "**1 check flipped**",
                "",
                "| calc | line | check | before | after |",
                "| --- | ---: | --- | --- | --- |",
                "| " + panel + " | 10 | F &lt;= 5.5 kN | ✓ pass: 2.6 kN &lt;= 5.5 kN | ✗ fail: 5.616 kN &lt;= 5.5 kN |",
                "",
                "| calc | checks flipped | inputs changed | results changed | values added / removed | findings new / gone |",
                "| --- | ---: | ---: | ---: | ---: | ---: |",
                "| " + panel + " | 1 | 2 | 2 | 0 / 0 | 1 / 0 |",
                "| " + mast + " | 0 | 1 | 1 | 0 / 0 | 0 / 0 |"), lines.subList(at, at + 10));
            assertTrue(lines.get(0).startsWith("### Plumb value diff: HEAD\\~1 ("), lines.get(0));
            // by hand: V 20 → 22 m/s moves q = ρV²/2 by 1.1² − 1 = +21 %.
            assertTrue(lines.contains("| q | 2 | 250 Pa | 302.5 Pa | +21.00 % |"), run.out());
            assertTrue(lines.contains("<details><summary>" + mast + ": 1 input changed, 1 result changed</summary>"), run.out());
            assertEquals("> " + Caution.TEXT, lines.get(lines.size() - 1));
        }
    }

    @Test
    void jsonListsEveryCalcWithItsChangesInSiAndAsShown() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            String[] ids = twoCommits(git);
            Cli run = Cli.run("diff", "--format", "json", "HEAD~1", "HEAD", "--", dir.toString());
            assertEquals(1, run.exitCode(), run.err());
            JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
            assertEquals(ids[0], root.getAsJsonObject("before").get("commit").getAsString());
            assertEquals("HEAD", root.getAsJsonObject("after").get("label").getAsString());
            assertEquals(1e-9, root.get("tolerance").getAsDouble());
            assertTrue(root.get("changed").getAsBoolean());
            assertTrue(root.get("checkFlipped").getAsBoolean());
            assertEquals(Caution.TEXT, root.get("notice").getAsString());
            JsonArray files = root.getAsJsonArray("files");
            assertEquals(2, files.size());
            JsonObject panel = files.get(1).getAsJsonObject();
            assertEquals("changed", panel.get("status").getAsString());
            JsonObject check = panel.getAsJsonArray("checks").get(0).getAsJsonObject();
            assertEquals("flipped", check.get("change").getAsString());
            assertEquals("pass", check.getAsJsonObject("before").get("verdict").getAsString());
            assertEquals("fail", check.getAsJsonObject("after").get("verdict").getAsString());
            JsonArray values = panel.getAsJsonArray("values");
            assertEquals(List.of("V", "rho_air", "q", "F"),
                values.asList().stream().map(v -> v.getAsJsonObject().get("name").getAsString()).toList());
            JsonObject f = values.get(3).getAsJsonObject();
            assertEquals("result", f.get("kind").getAsString());
            // by hand: 2600 N → 5616 N, (5616 − 2600)/2600 = 1.16.
            assertEquals(2600, f.getAsJsonObject("before").get("si").getAsDouble(), 1e-9);
            assertEquals(5616, f.getAsJsonObject("after").get("si").getAsDouble(), 1e-9);
            assertEquals("5.616 kN", f.getAsJsonObject("after").get("shown").getAsString());
            assertEquals(1.16, f.get("relative").getAsDouble(), 1e-12);
            assertEquals("used", values.get(1).getAsJsonObject().get("kind").getAsString());
            assertEquals("new", panel.getAsJsonArray("findings").get(0).getAsJsonObject().get("change").getAsString());
            assertEquals(Location.path(top().resolve("site/air.plumb")), panel.getAsJsonArray("usedFilesChanged").get(0).getAsString());
        }
    }

    @Test
    void exitCodesSayWhetherAnythingChangedOrACheckFlipped() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            twoCommits(git);
            Cli same = Cli.run("diff", "--no-color", "--", dir.toString());
            assertEquals(0, same.exitCode(), same.out() + same.err());
            assertTrue(same.out().contains("0 of 2 calcs changed."), same.out());
            git.write("site/hoarding.plumb", PANEL.replace("20 m/s", "31 m/s"));
            Cli moved = Cli.run("diff", "--no-color", "--fail-on", "check-flip", "--", dir.toString());
            assertEquals(0, moved.exitCode(), "values moved, no check flipped: " + moved.out());
            assertEquals(1, Cli.run("diff", "--no-color", "--", dir.toString()).exitCode());
            assertEquals(1, Cli.run("diff", "--no-color", "--fail-on", "check-flip", "HEAD~1", "--", dir.toString()).exitCode());
            // by hand: 30 → 30.0003 m/s moves q and F by 1.00001² − 1 ≈ 2.0e-5 relative: inside 1e-4, outside 1e-5.
            git.write("site/hoarding.plumb", PANEL.replace("20 m/s", "30.0003 m/s"));
            git.write("site/air.plumb", AIR.replace("1.25", "1.20"));
            assertEquals(0, Cli.run("diff", "--tolerance", "1e-4", "--", dir.toString()).exitCode());
            assertEquals(1, Cli.run("diff", "--tolerance", "1e-5", "--", dir.toString()).exitCode());
        }
    }

    @Test
    void aCalcThatDoesNotParseAtOneRevisionHasValuesNotComputedRatherThanChanged() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            twoCommits(git);
            git.write("site/hoarding.plumb", PANEL.replace("20 m/s", "30 m/s").replace("* V^2", "* V^"));
            Cli run = Cli.run("diff", "--no-color", "--", dir.toString());
            assertEquals(1, run.exitCode(), run.err());
            List<String> lines = run.out().lines().toList();
            assertTrue(lines.contains("    q  line 8  540 Pa → ? (not computed)  not computed now"), run.out());
            assertTrue(lines.contains("    F  line 9  5.616 kN → ? (not computed)  not computed now"), run.out());
            assertTrue(lines.contains("    ✗ → ?  line 10: F <= 5.5 kN \"footing working capacity\": 5.616 kN <= 5.5 kN → "
                + "not evaluated: a value it needs is unknown"), run.out());
            assertTrue(lines.stream().anyMatch(l -> l.startsWith("    line 8:") && l.contains("error syntax.")), run.out());
            // A percentage, not any "100": the temporary folder's random name is in the output too.
            assertFalse(run.out().matches("(?s).*[+\u2212-]?100(\\.0+)? ?%.*"), "no made-up percentage: " + run.out());
        }
    }

    @Test
    void twoPlainFilesOutsideGitAreComparedEachWithItsOwnUses() throws Exception {
        Path before = Files.createDirectories(dir.resolve("issue-a"));
        Path after = Files.createDirectories(dir.resolve("issue-b"));
        Files.writeString(before.resolve("air.plumb"), AIR);
        Files.writeString(after.resolve("air.plumb"), AIR.replace("1.25", "1.20"));
        Files.writeString(before.resolve("hoarding.plumb"), PANEL);
        Files.writeString(after.resolve("hoarding.plumb"), PANEL);
        Cli run = Cli.run("diff", "--no-color", before.resolve("hoarding.plumb").toString(), after.resolve("hoarding.plumb").toString());
        assertEquals(1, run.exitCode(), run.out() + run.err());
        List<String> lines = run.out().lines().toList();
        // Paths read as everywhere in the output: relative to the working folder when near it (Location).
        assertEquals("Value diff: " + Location.path(before.resolve("hoarding.plumb")) + " → "
            + Location.path(after.resolve("hoarding.plumb"))
            + "; values within 1e-9 relative count as unchanged.", lines.get(0));
        // by hand: only ρ moves, −4 %; q and F are proportional to it: −4 % each.
        assertTrue(lines.contains("    q  line 8  250 Pa → 240 Pa  -4.000 %"), run.out());
        assertTrue(lines.contains("    F  line 9  2.6 kN → 2.496 kN  -4.000 %"), run.out());
    }

    @Test
    void aCalcsOwnTextCannotActOnTheTerminalOrTheMarkdown() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            String hostile = PANEL.replace("\"footing working capacity\"", "\"footing \u001b[2J\u202e| <b>capacity</b>\"");
            git.write("site/air.plumb", AIR);
            git.write("site/hoarding.plumb", hostile);
            git.commit("first issue");
            git.write("site/hoarding.plumb", hostile.replace("20 m/s", "30 m/s"));
            for (String format : List.of("text", "markdown")) {
                Cli run = Cli.run("diff", "--no-color", "--format", format, "--", dir.toString());
                assertEquals(1, run.exitCode(), run.err());
                assertFalse(run.out().contains("\u001b") || run.out().contains("\u202e"), format + ": " + run.out());
                // Shown as visible escapes; in Markdown also with its markup escaped, so the table keeps its columns.
                String shown = format.equals("text") ? "footing \\u001B[2J\\u202E| <b>capacity</b>"
                    : "footing \\\\u001B\\[2J\\\\u202E\\| &lt;b&gt;capacity&lt;/b&gt;";
                assertTrue(run.out().contains(shown), format + ": " + run.out());
            }
        }
    }

    @Test
    void badInputIsASentenceAndExitTwoNeverAStackTrace() throws Exception {
        Path plain = Files.createDirectories(dir.resolve("plain"));
        Cli notRepo = Cli.run("diff", "--", plain.toString());
        assertEquals(2, notRepo.exitCode());
        assertEquals("plumb: " + plain + " is not inside a git repository: run plumb diff inside one, or compare two calc "
            + "files with `plumb diff OLD.plumb NEW.plumb`", notRepo.err().strip());
        try (GitFixture git = GitFixture.init(dir.resolve("repo"))) {
            twoCommits(git);
            String repo = git.dir().toString();
            List<Cli> bad = List.of(
                Cli.run("diff", "no-such-rev", "--", repo),
                Cli.run("diff", "--", repo, plain.toString()),
                Cli.run("diff", "HEAD~1", "HEAD", "HEAD", "--", repo),
                Cli.run("diff", "--tolerance", "-1", "--", repo),
                Cli.run("diff", "--fail-on", "sometimes", "--", repo),
                Cli.run("diff", repo + "/site"));
            for (Cli b : bad) {
                assertEquals(2, b.exitCode(), b.err());
                assertTrue(b.err().startsWith("plumb: "), b.err());
                assertFalse(b.err().contains("Exception") || b.err().contains("\tat "), b.err());
                assertEquals("", b.out());
            }
            assertTrue(bad.get(0).err().startsWith("plumb: unknown revision 'no-such-rev' in the repository at "), bad.get(0).err());
            assertTrue(bad.get(1).err().contains(" is outside the repository at "), bad.get(1).err());
            assertTrue(bad.get(5).err().contains("is not a revision but a file or folder: to compare the calcs in it write "
                + "`plumb diff -- " + repo + "/site`"), bad.get(5).err());
        }
    }
}
