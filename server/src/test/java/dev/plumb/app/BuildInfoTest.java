package dev.plumb.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.cli.Main;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.Properties;
import org.junit.jupiter.api.Test;

/** `plumb --version`: the build's version and commit, and "unknown" where the build had none. */
class BuildInfoTest {

    private static Properties props(String... keysAndValues) {
        Properties p = new Properties();
        for (int i = 0; i < keysAndValues.length; i += 2) {
            p.setProperty(keysAndValues[i], keysAndValues[i + 1]);
        }
        return p;
    }

    @Test
    void aBuildFromARepositoryNamesItsCommit() {
        String[] lines = BuildInfo.of(props("version", "1.2.0", "commit", "0123456789ab", "dirty", "false")).getVersion();
        assertEquals("plumb 1.2.0", lines[0]);
        assertEquals("commit 0123456789ab", lines[1]);
        assertTrue(lines[2].startsWith("Java " + System.getProperty("java.version")), lines[2]);
    }

    @Test
    void localChangesAreSaid() {
        String[] lines = BuildInfo.of(props("version", "1.2.0", "commit", "0123456789ab", "dirty", "true")).getVersion();
        assertEquals("commit 0123456789ab with local changes", lines[1]);
    }

    @Test
    void aBuildWithoutGitSaysUnknown() {
        // What Maven writes when the build had no repository: the pom's defaults.
        String[] lines = BuildInfo.of(props("version", "1.2.0", "commit", "unknown", "dirty", "false")).getVersion();
        assertEquals("commit unknown (not built from a git checkout, or without git)", lines[1]);
    }

    @Test
    void valuesMavenNeverFilledInAreUnknown() {
        BuildInfo info = BuildInfo.of(props("version", "${project.version}", "commit", "${git.commit.id.abbrev}",
            "dirty", "${git.dirty}"));
        assertEquals("unknown", info.version());
        assertEquals("unknown", info.commit());
        assertEquals("plumb unknown", info.getVersion()[0]);
        assertEquals("commit unknown (not built from a git checkout, or without git)", info.getVersion()[1]);
    }

    @Test
    void aMissingResourceIsUnknown() {
        BuildInfo info = BuildInfo.of(new Properties());
        assertEquals("plumb unknown", info.getVersion()[0]);
    }

    @Test
    void theBuiltResourceIsFilledIn() {
        BuildInfo info = BuildInfo.load();
        assertTrue(info.version().matches("\\d+\\.\\d+\\.\\d+(-SNAPSHOT)?"), info.version());
        assertTrue(info.commit().matches("[0-9a-f]{12}|unknown"), info.commit());
    }

    @Test
    void theVersionOptionPrintsItAndExitsZero() {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(new String[] {"--version"}, new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8), Map.of(), BuildInfo.load());
        String[] lines = out.toString(StandardCharsets.UTF_8).split("\\R");
        assertEquals(0, code);
        assertEquals("plumb " + BuildInfo.load().version(), lines[0]);
        assertTrue(lines[1].startsWith("commit "), lines[1]);
        assertEquals("", err.toString(StandardCharsets.UTF_8));
    }
}
