package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import dev.plumb.RepoRoot;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `plumb report`: where pages go, the contents page, and every value as `plumb eval --format json` gives it. */
class ReportCliTest {
    @TempDir
    Path dir;

    @Test
    void everyValueInEverySampleReportIsTheValueEvalGives() throws IOException {
        Path samples = RepoRoot.get().resolve("samples");
        Path out = dir.resolve("reports");
        Cli run = Cli.run("report", samples.toString(), "-o", out.toString());
        assertEquals(1, run.exitCode(), "the mistakes sample fails, as with check: " + run.err());
        List<Path> calcs;
        try (Stream<Path> walk = Files.walk(samples)) {
            calcs = walk.filter(p -> p.toString().endsWith(".plumb")).sorted().toList();
        }
        Document contents = Jsoup.parse(Files.readString(out.resolve("index.html"), StandardCharsets.UTF_8));
        assertEquals(calcs.size(), contents.select("tbody tr a").size(), "one contents entry per calc");
        int compared = 0;
        for (Path calc : calcs) {
            JsonObject eval = JsonParser.parseString(Cli.run("eval", "--format", "json", calc.toString()).out())
                .getAsJsonObject();
            Map<String, JsonObject> byName = new HashMap<>();
            for (String list : List.of("values", "usedValues")) {
                for (JsonElement e : eval.getAsJsonArray(list)) byName.putIfAbsent(e.getAsJsonObject().get("name")
                    .getAsString(), e.getAsJsonObject());
            }
            Element link = contents.select("tbody tr a").stream()
                .filter(a -> a.attr("href").endsWith(calc.getFileName().toString().replace(".plumb", ".html"))
                    && a.parent().text().contains(calc.getParent().getFileName().toString()))
                .findFirst().orElseThrow(() -> new AssertionError("no contents entry for " + calc));
            Document page = Jsoup.parse(Files.readString(out.resolve(link.attr("href")), StandardCharsets.UTF_8));
            for (Element shown : page.select("[data-name]")) {
                JsonObject expected = byName.get(shown.attr("data-name"));
                assertTrue(expected != null, "eval knows " + shown.attr("data-name") + " of " + calc);
                assertEquals(expected.get("shown").getAsString().replace("\u00a0", " "), shown.attr("data-shown"),
                    shown.attr("data-name") + " in " + calc);
                if (expected.has("valueSi")) {
                    assertEquals(expected.get("valueSi").getAsDouble(), Double.parseDouble(shown.attr("data-si")), 0.0,
                        shown.attr("data-name") + " in " + calc);
                } else {
                    assertTrue(!shown.hasAttr("data-si"), "an unknown value has no number in the page");
                }
                compared++;
            }
        }
        assertTrue(compared > 100, "the samples hold well over a hundred values: " + compared);
    }

    @Test
    void aReportCarriesTheMonteCarloEstimateAskedFor() throws IOException {
        // F = 0.6 kg/m · V² with V = 20 ± 1 m/s: 240 N, to first order ± 2·(1/20)·240 N = 24 N; the samples
        // (2000, the default seed) agree with it to the digits shown, as eval's own test finds.
        Path calc = Cli.write(dir, "w.plumb", "input V = 20 m/s ± 1 m/s\nF = 0.6 kg/m * V^2 in N\n");
        Path page = dir.resolve("w.html");
        assertEquals(0, Cli.run("report", "--monte-carlo", "2000", calc.toString(), "-o", page.toString()).exitCode());
        Document d = Jsoup.parse(Files.readString(page, StandardCharsets.UTF_8));
        String spread = d.select("p.spread").text();
        assertTrue(spread.contains("Monte Carlo: 240 N ± 24 N (mean ± standard deviation, 2000 samples, seed 20261202)"),
            spread);
        Cli refused = Cli.run("report", "--monte-carlo", "2000001", calc.toString());
        assertEquals(2, refused.exitCode());
        assertTrue(refused.err().contains("--monte-carlo takes 0 to 1000000 samples, not 2000001"), refused.err());
    }

    @Test
    void oneCalcGoesBesideItOrWhereTheOutputSays() throws IOException {
        Path calc = Cli.write(dir, "mast.plumb", "title \"Mast\"\ninput V = 20 m/s\nq = 0.5 * 1.2 kg/m^3 * V^2\n");
        Cli beside = Cli.run("report", calc.toString());
        assertEquals(0, beside.exitCode(), beside.err());
        assertTrue(Files.isRegularFile(dir.resolve("mast.html")), beside.out());
        Path named = dir.resolve("out/calc-sheet.html");
        assertEquals(0, Cli.run("report", calc.toString(), "-o", named.toString()).exitCode());
        assertTrue(Files.readString(named).contains("<title>Mast</title>"));
    }

    @Test
    void theTitleBlockNamesTheCommitAndSaysPlainlyWhenTheCalcDiffersFromIt() throws Exception {
        dev.plumb.revisions.GitFixture repo = dev.plumb.revisions.GitFixture.init(dir.resolve("repo"));
        try {
            Path calc = repo.write("mast.plumb", "title \"Mast\"\ninput V = 20 m/s\n");
            String id = repo.commit("the mast");
            Path page = dir.resolve("mast.html");
            Cli.run("report", calc.toString(), "-o", page.toString());
            String committed = Jsoup.parse(Files.readString(page)).select("dd").eachText().toString();
            assertTrue(committed.contains("commit " + id.substring(0, 7)) && committed.contains("no uncommitted changes"),
                committed);
            Files.writeString(calc, "title \"Mast\"\ninput V = 25 m/s\n");
            Cli.run("report", calc.toString(), "-o", page.toString());
            String changed = Jsoup.parse(Files.readString(page)).select("dd").eachText().toString();
            assertTrue(changed.contains("with uncommitted changes to this calc"), changed);
        } finally {
            repo.close();
        }
    }

    @Test
    void againstARevisionEachChangedValueShowsItsFormerValueAndFlippedChecksAreListed() throws Exception {
        dev.plumb.revisions.GitFixture repo = dev.plumb.revisions.GitFixture.init(dir.resolve("repo"));
        try {
            Path calc = repo.write("mast.plumb", "input V = 20 m/s\ninput L = 3 m\nq = 0.5 * 1.2 kg/m^3 * V^2\n"
                + "check q < 300 Pa\n");
            repo.commit("the mast");
            Files.writeString(calc, "input V = 25 m/s\ninput L = 3 m\nq = 0.5 * 1.2 kg/m^3 * V^2\ncheck q < 300 Pa\n");
            Path page = dir.resolve("mast.html");
            Cli run = Cli.run("report", calc.toString(), "-o", page.toString(), "--against", "HEAD");
            assertEquals(1, run.exitCode(), "the check now fails: " + run.err());
            Document d = Jsoup.parse(Files.readString(page));
            // q = ½·1.2·20² = 240 Pa before, ½·1.2·25² = 375 Pa now: (375 − 240)/240 = +56.25 %.
            assertEquals("Δ was 240 Pa, +56.25 %", d.selectFirst("div.definition.changed[data-name=q] .change").text());
            assertEquals("Δ was 20 m/s, +25.00 %", d.selectFirst("tr.changed[data-name=V] .change").text());
            assertTrue(d.select("tr[data-name=L]").hasClass("changed") == false, "an unchanged input is not marked");
            assertTrue(d.selectFirst("section.changes").text().contains("✓ → ✗"), d.selectFirst("section.changes").text());
            Cli bad = Cli.run("report", calc.toString(), "-o", page.toString(), "--against", "no-such-revision");
            assertEquals(2, bad.exitCode());
            assertTrue(bad.err().startsWith("plumb: ") && !bad.err().contains("Exception"), bad.err());
        } finally {
            repo.close();
        }
    }

    @Test
    void aFolderThatCannotBeReadIsSaidAndFailsTheRun() throws IOException {
        Cli.write(dir, "ok/a.plumb", "x = 1 m\n");
        Path locked = Files.createDirectories(dir.resolve("locked"));
        Files.writeString(locked.resolve("b.plumb"), "y = 2 m\n");
        assertTrue(locked.toFile().setReadable(false, false) && locked.toFile().setExecutable(false, false));
        try {
            org.junit.jupiter.api.Assumptions.assumeTrue(!Files.isReadable(locked), "running as a user who can read any folder");
            Cli run = Cli.run("report", dir.toString(), "-o", dir.resolve("out").toString());
            assertEquals(1, run.exitCode(), run.err());
            assertTrue(run.err().contains("cannot read") && run.err().contains("have no report"), run.err());
            assertTrue(Files.isRegularFile(dir.resolve("out").resolve(dir.relativize(dir.resolve("ok/a.html")))) || run.out()
                .contains("a.html"), run.out());
        } finally {
            locked.toFile().setReadable(true, false);
            locked.toFile().setExecutable(true, false);
        }
    }

    @Test
    void aPageNameForManyCalcsOrAMissingPathIsAUsageError() throws IOException {
        Cli.write(dir, "a.plumb", "x = 1 m\n");
        Cli.write(dir, "b.plumb", "y = 2 m\n");
        Cli many = Cli.run("report", dir.toString(), "-o", dir.resolve("one.html").toString());
        assertEquals(2, many.exitCode());
        assertTrue(many.err().contains("name a folder instead"), many.err());
        Cli missing = Cli.run("report", dir.resolve("nope.plumb").toString());
        assertEquals(2, missing.exitCode());
        assertTrue(!missing.err().contains("Exception"), missing.err());
    }
}
