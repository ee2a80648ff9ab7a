package dev.plumb.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.plumb.RepoRoot;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * A sample's report printed to PDF by headless Chromium, as a reviewer prints it: every page
 * carries the calc's title and revision at the top and "page N of M" at the foot, the first page
 * the title block, the last the caution. The PDF and a PNG of the page on screen are kept under
 * target/report-math/ for people to look at. Needs chromium and poppler-utils (pdfinfo, pdftotext);
 * see {@link HeadlessChromium} for when their absence skips or fails.
 */
class BrowserReportTest {
    private static final Pattern PAGES = Pattern.compile("(?m)^Pages:\\s+(\\d+)");

    @Test
    void aPrintedReportHasItsTitleRevisionAndPageNumbersOnEveryPage() throws Exception {
        String chromium = HeadlessChromium.chromium();
        Path calc = RepoRoot.get().resolve("samples/sign-panel/sign-panel.plumb");
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyze(calc);
        Files.createDirectories(HeadlessChromium.OUT);
        Path html = HeadlessChromium.OUT.resolve("sign-panel.html").toAbsolutePath();
        Files.writeString(html, CalcReport.html(a, a.diagnostics(),
            new CalcReport.Context("samples/sign-panel/sign-panel.plumb", "2026-12-02", null)), StandardCharsets.UTF_8);

        Path pdf = HeadlessChromium.OUT.resolve("sign-panel.pdf").toAbsolutePath();
        Files.deleteIfExists(pdf);
        HeadlessChromium.run(chromium, "--no-pdf-header-footer", "--print-to-pdf=" + pdf, html.toUri().toString());
        Matcher pages = PAGES.matcher(tool("pdfinfo", pdf.toString()));
        assertTrue(pages.find(), "pdfinfo reads the PDF");
        int count = Integer.parseInt(pages.group(1));
        // The sign-panel calc has some twenty formulas and five checks: more than one A4 page, and few.
        assertTrue(count >= 2 && count <= 6, "pages: " + count);
        for (int n = 1; n <= count; n++) {
            String page = tool("pdftotext", "-layout", "-f", "" + n, "-l", "" + n, pdf.toString(), "-");
            assertTrue(page.contains("Quayside Row unit 7"), "the title at the top of page " + n + ":\n" + page);
            assertTrue(page.contains("Revision A, first issue"), "the revision on page " + n);
            assertTrue(page.contains("page " + n + " of " + count), "the page number on page " + n + ":\n" + page);
            if (n == 1) assertTrue(page.contains("Reviewer") && page.contains("5 checks: 5 passed"), page);
            if (n == count) assertTrue(page.contains("licensed engineer"), "the caution closes the report");
        }

        Path png = HeadlessChromium.OUT.resolve("sign-panel.png").toAbsolutePath();
        Files.deleteIfExists(png);
        HeadlessChromium.run(chromium, "--screenshot=" + png, "--window-size=1000,1400", html.toUri().toString());
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G'}, Arrays.copyOf(Files.readAllBytes(png), 4));
    }

    /** Runs a poppler tool; skipped like chromium when it is missing and not required. */
    private static String tool(String... command) throws IOException, InterruptedException {
        Process p;
        try {
            p = new ProcessBuilder(List.of(command)).redirectErrorStream(true).start();
        } catch (IOException e) {
            String message = command[0] + " is missing: install Debian's poppler-utils";
            if (System.getenv("PLUMB_REQUIRE_CHROMIUM") != null) fail(message);
            Assumptions.abort(message);
            return "";
        }
        p.getOutputStream().close();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(60, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail(command[0] + " did not finish");
        }
        assertEquals(0, p.exitValue(), command[0] + ": " + out);
        return out;
    }
}
