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
 * Debian's headless Chromium for the tests that look at what people see: $PLUMB_CHROMIUM, else
 * chromium or chromium-browser on the PATH. Without one the test is skipped, unless
 * PLUMB_REQUIRE_CHROMIUM is set (CI installs chromium and sets it), when it fails.
 */
final class HeadlessChromium {
    static final Path OUT = Path.of("target/report-math");

    private HeadlessChromium() {
    }

    /** Runs headless Chromium on our own page; returns what it printed. */
    static String run(String chromium, String... args) throws IOException, InterruptedException {
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
    static String chromium() {
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
