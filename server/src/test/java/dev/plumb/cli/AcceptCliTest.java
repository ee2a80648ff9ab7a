package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Accepted findings on the command line: still listed with their reason, counted apart, and --fail-on. */
class AcceptCliTest {
    private static final String STRUT = "correlation cd_strut(Re)\n    valid 1e4 <= Re <= 2e5\n    = 0.12\nend\n";
    private static final String REASON = "validated against the invented tunnel report TR-118";

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Files.createDirectories(dir.resolve(".git"));
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    private Path accepted() throws IOException {
        return write("accepted.plumb", STRUT + "a = cd_strut(8e5)\naccept range.outside at a \"" + REASON + "\"\n");
    }

    private Path open() throws IOException {
        return write("open.plumb", STRUT + "a = cd_strut(8e5)\n");
    }

    @Test
    void anAcceptedWarningIsListedWithItsReasonAndCountedApart() throws IOException {
        Cli run = Cli.run("check", "--no-color", accepted().toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("warning range.outside: cd_strut is valid for 1e4 <= Re <= 2e5"), run.out());
        assertTrue(run.out().contains("[accepted: " + REASON + "]"), run.out());
        assertTrue(run.out().contains("Checked 1 file: 0 errors, 0 warnings, 0 hints, 1 accepted; 0 checks passed."), run.out());
    }

    @Test
    void failOnWarningFailsOnlyOnOpenWarnings() throws IOException {
        Path open = open();
        assertEquals(0, Cli.run("check", open.toString()).exitCode());
        assertEquals(0, Cli.run("check", "--fail-on", "error", open.toString()).exitCode());
        assertEquals(1, Cli.run("check", "--fail-on", "warning", open.toString()).exitCode());
        assertEquals(0, Cli.run("check", "--fail-on", "warning", accepted().toString()).exitCode());
        assertEquals(2, Cli.run("check", "--fail-on", "hint", open.toString()).exitCode());
    }

    @Test
    void aStaleAcceptanceIsAnOpenWarning() throws IOException {
        Path f = write("stale.plumb", STRUT + "a = cd_strut(1e5)\naccept range.outside at a \"no longer outside\"\n");
        Cli run = Cli.run("check", "--no-color", "--fail-on", "warning", f.toString());
        assertEquals(1, run.exitCode(), run.out());
        assertTrue(run.out().contains("warning accept.stale: there is no open range.outside finding on a"), run.out());
    }

    @Test
    void jsonCarriesTheReasonAndTheAcceptedCount() throws IOException {
        Cli run = Cli.run("check", "--format", "json", accepted().toString());
        JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
        JsonObject d = root.getAsJsonArray("files").get(0).getAsJsonObject().getAsJsonArray("diagnostics").get(0)
            .getAsJsonObject();
        assertEquals("range.outside", d.get("code").getAsString());
        assertEquals("warning", d.get("severity").getAsString());
        assertEquals(REASON, d.get("accepted").getAsString());
        assertEquals(0, root.getAsJsonObject("summary").get("warnings").getAsInt());
        assertEquals(1, root.getAsJsonObject("summary").get("accepted").getAsInt());
    }

    @Test
    void sarifMarksTheResultSuppressedInSource() throws IOException {
        // SARIF 2.1.0 §3.27.23 and §3.35: result.suppressions, each with kind "inSource" (the
        // suppression is written in the analysed file), a status and a justification (from memory).
        Cli run = Cli.run("check", "--format", "sarif", accepted().toString());
        JsonObject result = JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonArray("runs").get(0)
            .getAsJsonObject().getAsJsonArray("results").get(0).getAsJsonObject();
        assertEquals("range.outside", result.get("ruleId").getAsString());
        JsonObject suppression = result.getAsJsonArray("suppressions").get(0).getAsJsonObject();
        assertEquals("inSource", suppression.get("kind").getAsString());
        assertEquals("accepted", suppression.get("status").getAsString());
        assertEquals(REASON, suppression.get("justification").getAsString());

        JsonObject openResult = JsonParser.parseString(Cli.run("check", "--format", "sarif", open().toString()).out())
            .getAsJsonObject().getAsJsonArray("runs").get(0).getAsJsonObject().getAsJsonArray("results").get(0)
            .getAsJsonObject();
        assertFalse(openResult.has("suppressions"));
    }

    @Test
    void evalListsTheAcceptedFindingWithItsReason() throws IOException {
        Cli run = Cli.run("eval", "--no-color", accepted().toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("range.outside") && run.out().contains("[accepted: " + REASON + "]"), run.out());
    }
}
