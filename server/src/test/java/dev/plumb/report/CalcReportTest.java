package dev.plumb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.RepoRoot;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import dev.plumb.present.UsedValues;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.xml.sax.InputSource;

/** The report's structure on every sample, read back with a real HTML parser. */
class CalcReportTest {

    static Stream<Path> samples() throws IOException {
        try (Stream<Path> walk = Files.walk(RepoRoot.get().resolve("samples"))) {
            return walk.filter(p -> p.toString().endsWith(".plumb")).sorted().toList().stream();
        }
    }

    private static Analysis analyze(Path file) {
        return new Workspace(new FileSources(), Settings.DEFAULT).analyze(file);
    }

    private static Document report(Analysis a) {
        return Jsoup.parse(CalcReport.html(a, a.diagnostics(), new CalcReport.Context("calc.plumb", "2026-12-02", null)));
    }

    @ParameterizedTest
    @MethodSource("samples")
    void everySampleHasItsInputsProseChecksAndCaution(Path sample) throws Exception {
        Analysis a = analyze(sample);
        Document page = report(a);
        assertTrue(page.select("script").isEmpty(), "no scripts");
        assertTrue(page.select("link, img[src^=http], [src^=http]").isEmpty(), "nothing fetched");

        // The inputs table: the calc's own inputs in order, then those of the files it uses.
        List<String> inputs = new ArrayList<>();
        a.rows().forEach(r -> {
            if (r instanceof Row.ValueRow v && v.input()) inputs.add(v.name());
        });
        UsedValues.of(a).forEach(u -> inputs.add(u.name()));
        assertEquals(inputs, page.select("section.inputs tbody tr").eachAttr("data-name"));

        // Every line of prose, in order.
        String text = page.text();
        int from = 0;
        for (Row r : a.rows()) {
            if (!(r instanceof Row.NarrativeRow n) || n.text().isBlank()) continue;
            int at = text.indexOf(n.text().strip(), from);
            assertTrue(at >= 0, "the prose line \"" + n.text().strip() + "\" in order, in " + sample);
            from = at;
        }

        long checks = a.rows().stream().filter(r -> r instanceof Row.CheckRow).count();
        assertEquals(checks, page.select("div.check").size());
        for (Element c : page.select("div.check")) assertTrue(c.selectFirst(".mark").text().matches("[✓✗?] Check .*"), c.text());
        assertTrue(text.contains("never replace, the judgement of a licensed engineer"), "the caution");

        // Every formula is well-formed MathML.
        for (Element math : page.select("math")) {
            DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
            f.setNamespaceAware(true);
            f.newDocumentBuilder().parse(new InputSource(new StringReader(math.outerHtml())));
        }
    }

    @ParameterizedTest
    @MethodSource("samples")
    void referencesAreNumberedOnceInTheOrderTheyAreCited(Path sample) {
        Document page = report(analyze(sample));
        List<String> listed = page.select("section.references li").eachAttr("id");
        List<String> sources = page.select("section.references li").eachText();
        assertEquals(sources.stream().distinct().toList(), sources, "each source once");
        for (int i = 0; i < listed.size(); i++) assertEquals("ref-" + (i + 1), listed.get(i));
        List<String> firstCited = new ArrayList<>();
        for (Element cite : page.select("a.cite")) {
            String target = cite.attr("href").substring(1);
            assertTrue(listed.contains(target), "a citation points at a listed reference: " + target);
            if (!firstCited.contains(target)) firstCited.add(target);
        }
        assertEquals(listed, firstCited, "numbered in the order first cited");
    }

    @ParameterizedTest
    @MethodSource("samples")
    void everyLibraryCallWithAStatedRangeHasAPlotWithItsPointInsideOrOutsideAsTheValueSays(Path sample) {
        Analysis a = analyze(sample);
        Document page = report(a);
        List<Element> calls = page.select("section.library ul.calls > li");
        List<Analysis.CallSite> sites = a.calls().stream()
            .sorted(java.util.Comparator.comparingInt((Analysis.CallSite c) -> c.callee().start())).toList();
        int plotted = 0;
        for (Element li : calls) {
            Element svg = li.selectFirst("svg");
            boolean outside = li.hasClass("outside");
            if (svg == null) continue;
            plotted++;
            assertEquals(1, svg.select(".point").size(), "one operating point");
            assertEquals(outside, svg.selectFirst(".point").hasClass("outside"), li.text());
            assertFalse(svg.select("rect.band").isEmpty(), "the stated range is shaded");
        }
        long ranged = sites.stream().filter(c -> c.standing() != Analysis.Standing.NO_RANGE).count();
        assertEquals(ranged, plotted, "one plot per call of an entry with a stated range in " + sample);
    }

    @Test
    void aCallOutsideTheRangeIsMarkedOutsideInItsPlot() {
        // The library states cd_sphere_stokes for 0 < Re <= 0.1 (creeping flow): 0.05 lies inside, 50 outside.
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("s.plumb"),
            "C_in = cd_sphere_stokes(0.05)\nC_out = cd_sphere_stokes(50)\n");
        List<Element> points = report(a).select("section.library svg .point");
        assertEquals(List.of(false, true), points.stream().map(p -> p.hasClass("outside")).toList());
    }

    @Test
    void anInputsToleranceIsShownBesideItsValueInTheTableAndInItsSection() {
        // ± 1 m/s on 20 m/s is ±5 % (1/20, by hand); the reviewer reads the tolerance where the value is.
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("t.plumb"),
            "section \"Wind\"\ninput V = 20 m/s ± 1 m/s \"gust\"\nq = 0.6 kg/m^3 * V^2 in Pa\n");
        Document page = report(a);
        assertTrue(page.selectFirst("section.inputs tr[data-name=V] td.value").text().contains("± 1 m/s (±5 %)"),
            page.selectFirst("section.inputs").outerHtml());
        assertTrue(page.selectFirst("p.inputs-here").text().contains("± 1 m/s (±5 %)"), page.selectFirst("p.inputs-here").outerHtml());
    }

    @Test
    void aDefinitionShowsItsFormulaTheValuesPutInAndTheResult() {
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("q.plumb"),
            "input ρ = 1.2 kg/m^3\ninput V_w = 30 m/s\nq = 0.5 * ρ * V_w^2 / sqrt(4)\n");
        Element q = report(a).selectFirst("div.definition[data-name=q]");
        // 0.5 × 1.2 × 30² / 2 = 270 Pa, by hand.
        assertEquals("270 Pa", q.attr("data-shown"));
        assertEquals(270.0, Double.parseDouble(q.attr("data-si")), 1e-9);
        List<Element> formulas = q.select("div.formula math");
        assertEquals(2, formulas.size(), "symbols, then values and result");
        assertFalse(formulas.get(0).select("mfrac").isEmpty());
        assertFalse(formulas.get(0).select("msqrt").isEmpty());
        assertFalse(formulas.get(0).select("msup").isEmpty());
        assertFalse(formulas.get(0).select("msub").isEmpty(), "V_w has a subscript");
        assertEquals("ρ", formulas.get(0).select("mi").get(1).text());
        assertTrue(formulas.get(1).text().contains("270"), formulas.get(1).text());
    }

    @Test
    void aRangedCallWhosePlotCannotBeMadeSaysSo() {
        // `slow` calls f ten thousand times per evaluation: computed once for the calc, too costly to
        // sample ninety times for a picture, so the report says it was not drawn.
        String parts = "f(x) = x + 1\ng(x) = f(f(f(f(f(f(f(f(f(f(x))))))))))\nh(x) = g(g(g(g(g(g(g(g(g(g(x))))))))))\n"
            + "k(x) = h(h(h(h(h(h(h(h(h(h(x))))))))))\nl(x) = k(k(k(k(k(k(k(k(k(k(x))))))))))\n";
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("np.plumb"), parts
            + "correlation slow(Re: dimensionless)\n    valid 1 <= Re <= 10\n    = l(Re) * 0 + 1\nend\ny = slow(5)\n");
        Document page = report(a);
        assertTrue(page.select("section.library svg").isEmpty());
        assertTrue(page.selectFirst("section.library p.no-plot").text().startsWith("Not drawn"), page.select("section.library").text());
    }

    @Test
    void aFormulaTooLongForALineListsItsValuesInstead() {
        // Formulas do not wrap when printed: a long one with its values put in would run off the page.
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("long.plumb"),
            "input a_first = 1.25 m\ninput b_second = 2.5 m\ninput c_third = 3.75 m\ninput d_fourth = 4.5 m\n"
                + "L = a_first + b_second + c_third + d_fourth + a_first * b_second / c_third + d_fourth * c_third / b_second"
                + " + a_first + b_second + c_third + d_fourth\n");
        Element l = report(a).selectFirst("div.definition[data-name=L]");
        Element values = l.selectFirst("p.values-used");
        assertTrue(values != null, l.html());
        assertEquals(8, values.select("math").size(), "each of the four names once, with its value");
        assertTrue(l.selectFirst("p.root").text().contains("="), "then the result on its own line");
    }

    @Test
    void aCalcsOwnTextNeverBecomesMarkup() {
        String hostile = "title \"<script>alert(1)</script> \u202Eevil\"\n"
            + "# <img src=x onerror=alert(2)> prose\n"
            + "input x = 1 m   \"<b>note</b>\"\n";
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("h.plumb"), hostile);
        String html = CalcReport.html(a, a.diagnostics(), new CalcReport.Context("h.plumb", "2026-12-02", null));
        Document page = Jsoup.parse(html);
        assertTrue(page.select("script, img, b").isEmpty(), html);
        assertTrue(page.text().contains("<script>alert(1)</script>"), "shown as text");
        assertFalse(html.contains("\u202E"), "a direction override is shown as an escape, not obeyed");
    }

    @Test
    void aSweepIsTabledAndPlottedWithItsFailingAndOutOfRangeRowsMarked() {
        // Re = V·0.4 m / 1.5e-5 m²/s: 1.3e5 .. 5.3e6 in log steps; the laminar Blasius entry is valid
        // to 3e6 and laminar to Re_crit 5e5, so rows 3–5 are outside. D = ½ρV²Cf·S: 0.0036, 0.014, 0.052, 0.21, 0.83 N, so a check of 0.1 N fails at rows 4 and 5.
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("sw.plumb"), """
            input V = 5 m/s
            input L = 0.4 m
            input nu = 1.5e-5 m^2/s
            Re = V * L / nu
            Cf = cf_plate_blasius_avg(Re)
            D = 0.5 * 1.2 kg/m^3 * V^2 * Cf * 0.06 m^2
            check D <= 0.1 N
            sweep V over 5 m/s .. 200 m/s in 5 log steps
                show D, Cf
            """);
        Document page = report(a);
        assertEquals(1, page.select("div.sweep table.sweep-table").size());
        assertEquals(6, page.select("div.sweep table.sweep-table tr").size(), "a header and five rows");
        assertEquals(2, page.select("div.sweep svg.sweep-plot").size(), "one plot per shown result");
        Element d = page.select("div.sweep svg.sweep-plot").get(0);
        assertEquals(3, d.select("circle.point.outside").size());
        assertEquals(2, d.select("g.point.fails").size());
        assertEquals(2, d.select("circle.point.inside").size());
    }

    @Test
    void aGridIsPlottedAsOneNamedLinePerValueOfItsSecondValue() {
        // F = 0.6 kg/m³ · V² · d · 1 m over V 10, 20, 30 m/s and d 0.1, 0.2 m: six rows, two lines of three points,
        // the second dashed, each named in the legend beside the plot.
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("grid.plumb"), """
            input V = 20 m/s
            input d = 0.2 m
            F = 0.6 kg/m^3 * V^2 * d * 1 m in N
            sweep V over 10 m/s .. 30 m/s by 10 m/s, d over 0.1 m .. 0.2 m by 0.1 m
                show F
            """);
        Document page = report(a);
        assertEquals(List.of("V [m/s]", "d [m]", "F [N]"), page.select("div.sweep table.sweep-table tr").get(0).select("th").eachText());
        assertEquals(7, page.select("div.sweep table.sweep-table tr").size(), "a header and six rows");
        Element plot = page.selectFirst("div.sweep svg.sweep-plot");
        assertEquals(2, plot.select("polyline.result").size());
        assertEquals(3, plot.select("polyline.result").get(0).attr("points").split(" ").length);
        assertFalse(plot.select("polyline.result").get(0).hasAttr("stroke-dasharray"));
        assertTrue(plot.select("polyline.result").get(1).hasAttr("stroke-dasharray"));
        assertEquals(List.of("d = 0.1 m", "d = 0.2 m"), plot.select("text").eachText().stream().filter(t -> t.startsWith("d = "))
            .toList());
        assertEquals(2, plot.select("line.legend").size());
        assertTrue(plot.select("line.legend").get(1).hasAttr("stroke-dasharray"), "the legend shows each line's dashes");
    }

    @Test
    void aValueShowsItsSpreadAndACaseItsRatios() {
        // F = 0.6 kg/m · V²: 240 N ± 24 N at V = 20 ± 1 m/s (2 · 5 %); doubled V, four times F.
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("t.plumb"), """
            input V = 20 m/s ± 1 m/s
            F = 0.6 kg/m * V^2 in N
            case doubled: V = 2 * V
            """);
        Document page = report(a);
        assertEquals("F = 240 N ± 24 N (±10 %) to first order; shares of the variance: V 100 %",
            page.selectFirst("div.definition#" + page.select("div.definition").last().id() + " p.spread").text());
        assertEquals(List.of("F", "240 N", "960 N", "×4"), page.select("div.case table.case-table tr").get(2).select("td").eachText());
    }
}
