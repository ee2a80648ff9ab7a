package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/** Reads of untrusted calcs: links out of the workspace, special files and oversized files. */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
public class DiskReadsTest {
    private static final String SECRET = "hunter2_secret_token";

    @TempDir
    Path dir;
    Path root;
    Path outside;

    @BeforeEach
    void workspaceAndOutside() throws IOException {
        root = Files.createDirectories(dir.resolve("ws"));
        Files.writeString(root.resolve("plumb.toml"), "");
        outside = Files.createDirectories(dir.resolve("outside"));
        Files.writeString(outside.resolve("secret.plumb"), SECRET + " = 1\nx = " + SECRET + "_b\n");
        Files.writeString(outside.resolve("plumb.toml"), "");
    }

    private Analysis analyzeUse(String path) throws IOException {
        Path main = root.resolve("main.plumb");
        Files.writeString(main, "use \"" + path + "\"\ny = 1\n");
        return new Workspace(new FileSources(), Settings.DEFAULT).analyze(main);
    }

    private static Diagnostic only(Analysis a, Code code) {
        List<Diagnostic> found = a.diagnostics().stream().filter(d -> d.code() == code).toList();
        assertEquals(1, found.size(), () -> "one " + code.id() + " in " + a.diagnostics());
        return found.get(0);
    }

    private static void noSecretIn(Analysis a) {
        for (Diagnostic d : a.diagnostics()) assertFalse(d.message().contains(SECRET), d.message());
        assertTrue(a.scope().all().keySet().stream().noneMatch(n -> n.contains(SECRET)), "names of the outside file");
    }

    @Test
    void aFolderLinkOutOfTheWorkspaceReadsAsMissing() throws IOException {
        // The outside folder even holds plumb.toml: a root found through the link must not count.
        Files.createSymbolicLink(root.resolve("linkdir"), outside);
        Analysis a = analyzeUse("linkdir/secret.plumb");
        noSecretIn(a);
        assertTrue(only(a, Code.USE_NOT_FOUND).message().contains(DiskReads.NO_SUCH_FILE));
    }

    @Test
    void existingAndMissingFilesOutsideCannotBeToldApart() throws IOException {
        Files.createSymbolicLink(root.resolve("rootlink"), Path.of("/"));
        String there = only(analyzeUse("rootlink/etc/passwd"), Code.USE_NOT_FOUND).message();
        String missing = only(analyzeUse("rootlink/etc/no-such-file-here"), Code.USE_NOT_FOUND).message();
        assertEquals(there.replace("passwd", "X"), missing.replace("no-such-file-here", "X"));
    }

    @Test
    void aFileLinkToANonCalcIsNotRead() throws IOException {
        Files.writeString(root.resolve(".env"), SECRET + "=1\n");
        Path creds = Files.createSymbolicLink(root.resolve("creds.plumb"), root.resolve(".env"));
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyze(creds);
        noSecretIn(a);
        assertTrue(only(a, Code.FILE_UNREADABLE).message().contains("not a .plumb file"));
    }

    @Test
    void aFileThatIsNotACalcIsNotRead() throws IOException {
        Files.writeString(root.resolve(".env"), SECRET + "=1\n");
        Analysis a = analyzeUse(".env");
        noSecretIn(a);
        assertTrue(only(a, Code.USE_NOT_FOUND).message().contains("it is not a .plumb file"));
    }

    @Test
    void aTopLevelFileLinkedFromOutsideIsRefused() throws IOException {
        Path link = Files.createSymbolicLink(root.resolve("calc.plumb"), outside.resolve("secret.plumb"));
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyze(link);
        noSecretIn(a);
        assertTrue(only(a, Code.FILE_UNREADABLE).message().contains(DiskReads.NO_SUCH_FILE));
    }

    @Test
    void deviceLinksAreRefusedWithoutReading() throws IOException {
        assumeTrue(Files.exists(Path.of("/dev/zero")));
        Files.createSymbolicLink(root.resolve("zero.plumb"), Path.of("/dev/zero"));
        Files.createSymbolicLink(root.resolve("stdin.plumb"), Path.of("/dev/stdin"));
        // /dev is outside the workspace: refused as missing. A device inside cannot be made, so the
        // regular-file rule is shown with a pipe below.
        assertTrue(only(analyzeUse("zero.plumb"), Code.USE_NOT_FOUND).message().contains(DiskReads.NO_SUCH_FILE));
        assertTrue(only(analyzeUse("stdin.plumb"), Code.USE_NOT_FOUND).message().contains(DiskReads.NO_SUCH_FILE));
    }

    @Test
    void aPipeInsideTheWorkspaceIsRefusedWithoutBlocking() throws Exception {
        Path fifo = root.resolve("pipe.plumb");
        assumeTrue(mkfifo(fifo), "mkfifo is not available");
        String message = only(analyzeUse("pipe.plumb"), Code.USE_NOT_FOUND).message();
        assertTrue(message.contains("not a regular file"), message);
    }

    public static boolean mkfifo(Path at) {
        try {
            Process p = new ProcessBuilder("mkfifo", at.toString()).redirectErrorStream(true).start();
            return p.waitFor(20, TimeUnit.SECONDS) && p.exitValue() == 0 && Files.exists(at);
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    @Test
    void aFileOverTheSizeLimitIsOneFinding() throws IOException {
        Files.writeString(root.resolve("big.plumb"), "a = 1\n".repeat(400));
        Path main = root.resolve("main.plumb");
        Files.writeString(main, "use \"big.plumb\"\ny = 1\n");
        Analysis a = new Workspace(new FileSources(1024), Settings.DEFAULT).analyze(main);
        String message = only(a, Code.USE_NOT_FOUND).message();
        assertTrue(message.contains("larger than 1 KiB"), message);
        Analysis big = new Workspace(new FileSources(1024), Settings.DEFAULT).analyze(root.resolve("big.plumb"));
        assertTrue(only(big, Code.FILE_UNREADABLE).message().contains("larger than 1 KiB"));
    }

    @Test
    void anEditorTextOverTheSizeLimitIsOneFinding() {
        Analysis a = new Workspace(new FileSources(1024), Settings.DEFAULT).analyzeText(root.resolve("x.plumb"),
            "a = 1\n".repeat(400));
        assertEquals(1, a.diagnostics().size(), a.diagnostics()::toString);
        assertTrue(only(a, Code.FILE_UNREADABLE).message().contains("larger than 1 KiB"));
    }

    @Test
    void linksThatStayInsideStillWork() throws IOException {
        Files.createDirectories(root.resolve("common"));
        Files.writeString(root.resolve("common/air.plumb"), "rho = 1.2 kg/m^3\n");
        Files.createSymbolicLink(root.resolve("shared"), root.resolve("common"));
        Path main = root.resolve("main.plumb");
        Files.writeString(main, "use \"shared/air.plumb\"\ny = rho * 2\n");
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyze(main);
        assertEquals(List.of(), a.diagnostics().stream().filter(d -> d.code().severity() == dev.plumb.diagnostics.Severity.ERROR).toList());
    }
}
