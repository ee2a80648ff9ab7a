package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.plumb.revisions.GitFixture;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The difftool configuration README gives, run by a real git process (Plumb itself never starts
 * one): `git difftool --tool=plumb` hands `plumb diff` the two copies of each changed calc.
 * Skipped where git is not installed.
 */
class GitDifftoolTest {
    @TempDir
    Path dir;

    @Test
    void gitDifftoolRunsPlumbDiffOnBothCopiesOfAChangedCalc() throws Exception {
        assumeTrue(gitInstalled(), "git is not installed");
        try (GitFixture git = GitFixture.init(dir)) {
            String calc = "input V = 20 m/s \"design gust\"\nq = 0.5 * 1.25 kg/m^3 * V^2 in Pa\n";
            git.write("gate.plumb", calc);
            git.commit("first issue");
            git.write("gate.plumb", calc.replace("20 m/s", "30 m/s"));
        }
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String plumb = "'" + java + "' -cp '" + System.getProperty("java.class.path") + "' dev.plumb.app.Plumb";
        ProcessBuilder pb = new ProcessBuilder("git", "-c", "difftool.plumb.cmd=" + plumb + " diff --no-color \"$LOCAL\" \"$REMOTE\"",
            "difftool", "--tool=plumb", "-y", "--", "*.plumb").directory(dir.toFile()).redirectErrorStream(true);
        // The user's and the machine's git settings stay out of the test.
        pb.environment().keySet().removeIf(k -> k.startsWith("GIT_") || k.equals("JAVA_TOOL_OPTIONS"));
        pb.environment().put("GIT_CONFIG_NOSYSTEM", "1");
        pb.environment().put("GIT_CONFIG_GLOBAL", "/dev/null");
        Process p = pb.start();
        p.getOutputStream().close();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "git difftool did not finish");
        assertEquals(0, p.exitValue(), out);
        // by hand: q = ρV²/2 = 0.5 · 1.25 · 20² = 250 Pa before, 0.5 · 1.25 · 30² = 562.5 Pa after: (30/20)² − 1 = +125 %.
        assertTrue(out.lines().anyMatch(l -> l.equals("    q  line 2  250 Pa → 562.5 Pa  +125.0 %")), out);
        assertTrue(out.lines().anyMatch(l -> l.equals("    V  line 1  20 m/s → 30 m/s  +50.00 %")), out);
    }

    private static boolean gitInstalled() {
        try {
            Process p = new ProcessBuilder("git", "--version").redirectErrorStream(true).start();
            p.getInputStream().readAllBytes();
            return p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException | InterruptedException e) {
            return false;
        }
    }
}
