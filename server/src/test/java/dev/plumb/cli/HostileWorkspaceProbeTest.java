package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonParser;
import dev.plumb.analysis.DiskReadsTest;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * A probe of the whole command line against a workspace built to attack it: links to a file
 * outside and to `/`, a pipe, links to devices, control sequences in notes, titles and names, a
 * non-calc file behind a `.plumb` name, and a 2-million-line file. Every output format must
 * finish, show nothing of the outside, and put no control character on a terminal.
 */
@Timeout(value = 180, unit = TimeUnit.SECONDS)
class HostileWorkspaceProbeTest {
    private static final String SECRET = "s3cr3t_outside_token";
    private static final String ENV_SECRET = "env_inside_token";

    @TempDir
    Path dir;
    Path ws;

    @BeforeEach
    void buildHostileWorkspace() throws IOException {
        Path outside = Files.createDirectories(dir.resolve("outside"));
        Files.writeString(outside.resolve("secret.plumb"), SECRET + " = 1\n" + SECRET + "_b = " + SECRET + "_c\n");
        Files.writeString(outside.resolve("plumb.toml"), "");
        ws = Files.createDirectories(dir.resolve("ws"));
        Files.createDirectories(ws.resolve(".git"));
        Files.createSymbolicLink(ws.resolve("linkdir"), outside);
        Files.createSymbolicLink(ws.resolve("rootlink"), Path.of("/"));
        Files.createSymbolicLink(ws.resolve("creds.plumb"), outside.resolve("secret.plumb"));
        Files.writeString(ws.resolve(".env"), ENV_SECRET + " = 1\n");
        Files.createSymbolicLink(ws.resolve("env.plumb"), ws.resolve(".env"));
        Files.createSymbolicLink(ws.resolve("zero.plumb"), Path.of("/dev/zero"));
        Files.createSymbolicLink(ws.resolve("stdin.plumb"), Path.of("/dev/stdin"));
        if (DiskReadsTest.mkfifo(ws.resolve("pipe.plumb"))) {
            Files.createSymbolicLink(ws.resolve("pipelink.plumb"), ws.resolve("pipe.plumb"));
        }
        Files.writeString(ws.resolve("big.plumb"), "x\n".repeat(2_000_000));
        String esc = UntrustedOutputTest.HOSTILE;
        Files.writeString(ws.resolve("main.plumb"), String.join("\n",
            "title \"" + esc + "\"",
            "# " + esc,
            "use \"linkdir/secret.plumb\"",
            "use \"rootlink/etc/passwd\"",
            "use \"rootlink/etc/hostname\"",
            "use \"creds.plumb\"",
            "use \"env.plumb\"",
            "use \"zero.plumb\"",
            "use \"stdin.plumb\"",
            "use \"pipe.plumb\"",
            "use \"pipelink.plumb\"",
            "use \"big.plumb\"",
            "input L = 2 m  \"" + esc + "\"",
            "y" + "\u001b[2K" + " = L * 2",
            "z = " + SECRET + " + " + ENV_SECRET,
            "check L < 1 m \"" + esc + "\"",
            ""), StandardCharsets.UTF_8);
    }

    private static void nothingOfTheOutside(Cli run) {
        for (String out : List.of(run.out(), run.err())) {
            assertFalse(out.contains(SECRET + " = 1") || out.contains(SECRET + "_b") || out.contains(SECRET + "_c"), out);
            assertFalse(out.contains(ENV_SECRET + " = 1"), out);
            assertFalse(out.contains("root:x:0:0"), out);
            assertFalse(out.contains("Exception") || out.contains("\tat "), out);
        }
    }

    @Test
    void textOutputShowsNoOutsideContentAndNoControls() {
        for (String command : List.of("check", "eval")) {
            Cli run = Cli.run(command, "--no-color", command.equals("check") ? ws.toString() : ws.resolve("main.plumb").toString());
            assertEquals(1, run.exitCode(), run.err());
            nothingOfTheOutside(run);
            UntrustedOutputTest.noControls(run.out());
            UntrustedOutputTest.noControls(run.err());
        }
    }

    @Test
    void jsonAndSarifShowNoOutsideContentAndStayValid() {
        for (String format : List.of("json", "sarif")) {
            Cli run = Cli.run("check", "--format=" + format, ws.toString());
            assertEquals(1, run.exitCode(), run.err());
            nothingOfTheOutside(run);
            assertTrue(JsonParser.parseString(run.out()).isJsonObject());
            UntrustedOutputTest.noControls(run.out());
        }
    }

    @Test
    void existingAndMissingFilesOutsideReadTheSame() {
        String out = Cli.run("check", "--no-color", ws.resolve("main.plumb").toString()).out();
        String passwd = out.lines().filter(l -> l.contains("\"rootlink/etc/passwd\"")).findFirst().orElseThrow();
        String hostname = out.lines().filter(l -> l.contains("\"rootlink/etc/hostname\"")).findFirst().orElseThrow();
        assertEquals(passwd.replace("passwd", "N").replaceAll(":\\d+:\\d+:", ":"),
            hostname.replace("hostname", "N").replaceAll(":\\d+:\\d+:", ":"));
    }
}
