package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/** Output is UTF-8 whatever the locale: a child JVM runs the command line under LANG=C. */
class LocaleTest {
    @TempDir
    Path dir;

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void nonAsciiNamesAndUnitsSurviveACLocale() throws Exception {
        Files.createDirectories(dir.resolve(".git"));
        Path calc = dir.resolve("air.plumb");
        Files.writeString(calc, "title \"Luftdichte ρ\"\nρ_air = 1.2 kg/m^3\nμ = 1.8e-5 Pa*s\n", StandardCharsets.UTF_8);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"), "dev.plumb.app.Plumb",
            "eval", "--no-color", calc.toString());
        pb.environment().keySet().removeIf(k -> k.startsWith("LC_") || k.equals("LANG") || k.equals("JAVA_TOOL_OPTIONS"));
        pb.environment().put("LANG", "C");
        pb.environment().put("LC_ALL", "C");
        pb.redirectErrorStream(true);
        Process p = pb.start();
        byte[] out = p.getInputStream().readAllBytes();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        String text = new String(out, StandardCharsets.UTF_8);
        assertEquals(0, p.exitValue(), text);
        assertTrue(text.contains("Luftdichte ρ"), text);
        assertTrue(text.contains("ρ_air = 1.2 kg/m³"), text);
        assertTrue(text.contains("μ"), text);
        assertFalse(text.contains("?"), text);
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void withoutTheLauncherAFileNameOutsideAsciiGetsAMessageThatSaysWhy() throws Exception {
        // Under LANG=C the Java runtime itself cannot name "ρ.plumb"; the message says so and how to fix it.
        Files.createDirectories(dir.resolve(".git"));
        Files.writeString(dir.resolve("ρ.plumb"), "rho = 1.2 kg/m^3\n", StandardCharsets.UTF_8);
        Path calc = dir.resolve("main.plumb");
        Files.writeString(calc, "use \"ρ.plumb\"\nx = rho * 2\n", StandardCharsets.UTF_8);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"), "dev.plumb.app.Plumb",
            "check", calc.toString());
        pb.environment().keySet().removeIf(k -> k.startsWith("LC_") || k.equals("LANG") || k.equals("JAVA_TOOL_OPTIONS"));
        pb.environment().put("LANG", "C");
        pb.environment().put("LC_ALL", "C");
        pb.redirectErrorStream(true);
        Process p = pb.start();
        String text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        // Either the runtime can name the file (then the calc is clean), or the message says why not.
        assertTrue(p.exitValue() == 0 || text.contains("LC_ALL=C.UTF-8"), text);
    }

    @Test
    void theLauncherRunsJavaUnderAUtf8LocaleAndABoundedHeap() throws IOException {
        // The launcher cannot run in a test (it builds the jar first); its promises are read from it.
        List<String> script = Files.readAllLines(dev.plumb.RepoRoot.get().resolve("plumb"));
        assertTrue(script.contains("  *) export LC_ALL=C.UTF-8 ;;"), "a non-UTF-8 locale is replaced");
        assertTrue(script.stream().anyMatch(l -> l.startsWith("exec java -Xmx1g -Dfile.encoding=UTF-8")), "heap and encoding");
    }
}
