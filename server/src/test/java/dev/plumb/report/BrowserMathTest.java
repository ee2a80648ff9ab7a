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
    private static final Path OUT = HeadlessChromium.OUT;
    private static final Pattern MEASURE = Pattern.compile("(\\w+)=(-?[\\d.]+)");

    @Test
    void aBrowserLaysOutTheFormulas() throws Exception {
        String chromium = HeadlessChromium.chromium();
        Files.createDirectories(OUT);
        Path page = OUT.resolve("formulas.html").toAbsolutePath();
        Files.writeString(page, FormulaPage.html(), StandardCharsets.UTF_8);

        Map<String, Double> m = measurements(HeadlessChromium.run(chromium, "--dump-dom", page.toUri().toString()));
        assertTrue(m.get("fraction") > m.get("numerator") + m.get("denominator"),
            "a fraction stands taller than its numerator and denominator together: " + m);
        assertTrue(m.get("root") > m.get("radicand") && m.get("rootWidth") > m.get("radicandWidth"),
            "a root sign is larger than what it covers: " + m);
        assertTrue(m.get("exponentBottom") < m.get("baseBottom"), "an exponent is raised above its base's line: " + m);

        Path png = OUT.resolve("formulas.png").toAbsolutePath();
        Files.deleteIfExists(png);
        HeadlessChromium.run(chromium, "--screenshot=" + png, "--window-size=1000,1100", page.toUri().toString());
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

}
