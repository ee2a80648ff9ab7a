package dev.plumb.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * The typeset formulas in a real browser, Debian's headless Chromium: a script in the page measures
 * a fraction, a root and a power as laid out, and a screenshot is kept as
 * {@code target/report-math/formulas.png} for people to look at.
 *
 * <p>CI sets PLUMB_REQUIRE_CHROMIUM and installs chromium, so there a missing browser fails the
 * test. Without the variable (a developer's machine) the test is skipped instead.
 */
class BrowserMathTest {
    private static final Path OUT = Path.of("target/report-math");
    private static final Pattern MEASURE = Pattern.compile("(\\w+)=(-?[\\d.]+)");

    @Test
    void aBrowserLaysOutTheFormulas() throws Exception {
        String chromium = chromium();
        Files.createDirectories(OUT);
        Path page = OUT.resolve("formulas.html").toAbsolutePath();
        Files.writeString(page, FormulaPage.html(), StandardCharsets.UTF_8);

        Map<String, Double> m = measurements(run(chromium, "--dump-dom", page.toUri().toString()));
        assertTrue(m.get("fraction") > m.get("numerator") + m.get("denominator"),
            "a fraction stands taller than its numerator and denominator together: " + m);
        assertTrue(m.get("root") > m.get("radicand") && m.get("rootWidth") > m.get("radicandWidth"),
            "a root sign is larger than what it covers: " + m);
        assertTrue(m.get("exponentBottom") < m.get("baseBottom"), "an exponent is raised above its base's line: " + m);

        Path png = OUT.resolve("formulas.png").toAbsolutePath();
        Files.deleteIfExists(png);
        run(chromium, "--screenshot=" + png, "--window-size=1000,1100", page.toUri().toString());
        byte[] head = Arrays.copyOf(Files.readAllBytes(png), 8);
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n'}, head, "a PNG at " + png);
    }

    /** The page's script writes {@code name=number} pairs into the element #layout. */
    private static Map<String, Double> measurements(String dom) {
        Matcher layout = Pattern.compile("<pre id=\"layout\">([^<]*)</pre>").matcher(dom);
        if (!layout.find()) fail("the page's script did not run; the page as dumped:\n" + dom);
        Map<String, Double> out = new HashMap<>();
        Matcher pair = MEASURE.matcher(layout.group(1));
        while (pair.find()) out.put(pair.group(1), Double.parseDouble(pair.group(2)));
        for (String key : List.of("fraction", "numerator", "denominator", "root", "radicand", "rootWidth", "radicandWidth",
            "exponentBottom", "baseBottom")) {
            if (!out.containsKey(key)) fail("no measurement " + key + " in: " + layout.group(1));
        }
        return out;
    }

    /** Runs headless Chromium on our own page; returns what it printed. */
    private static String run(String chromium, String... args) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory("plumb-chromium");
        Path log = OUT.resolve("chromium.log");
        List<String> command = new ArrayList<>(List.of(chromium, "--headless", "--disable-gpu",
            // CI runs as root, where Chromium starts only without its sandbox; the page is our own file.
            "--no-sandbox", "--user-data-dir=" + profile, "--no-first-run"));
        command.addAll(Arrays.asList(args));
        Process p = new ProcessBuilder(command).redirectError(log.toFile()).start();
        try {
            p.getOutputStream().close();
            String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!p.waitFor(120, TimeUnit.SECONDS) || p.exitValue() != 0) {
                fail("chromium failed (" + String.join(" ", command) + "); its messages are in " + log.toAbsolutePath());
            }
            return out;
        } finally {
            p.descendants().forEach(ProcessHandle::destroyForcibly);
            p.destroyForcibly();
            deleteTree(profile);
        }
    }

    /**
     * $PLUMB_CHROMIUM, else chromium or chromium-browser on the PATH. None: fail when
     * PLUMB_REQUIRE_CHROMIUM is set, else skip.
     */
    private static String chromium() {
        String chosen = System.getenv("PLUMB_CHROMIUM");
        if (chosen != null && !chosen.isBlank() && Files.isExecutable(Path.of(chosen))) return chosen;
        String path = System.getenv("PATH") == null ? "" : System.getenv("PATH");
        for (String dir : path.split(File.pathSeparator)) {
            for (String name : List.of("chromium", "chromium-browser")) {
                Path candidate = Path.of(dir.isEmpty() ? "." : dir, name);
                if (Files.isExecutable(candidate)) return candidate.toString();
            }
        }
        String message = "no chromium on the PATH: install Debian's chromium (apt-get install chromium), or point"
            + " PLUMB_CHROMIUM at a Chromium";
        String required = System.getenv("PLUMB_REQUIRE_CHROMIUM");
        if (required != null && !required.isBlank()) fail(message + ". PLUMB_REQUIRE_CHROMIUM is set, so this check may not be skipped");
        Assumptions.abort(message + "; skipped here since PLUMB_REQUIRE_CHROMIUM is not set");
        return null;
    }

    private static void deleteTree(Path root) throws IOException {
        try (var walk = Files.walk(root)) {
            for (Path p : walk.sorted((a, b) -> b.getNameCount() - a.getNameCount()).toList()) Files.deleteIfExists(p);
        }
    }
}
