package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What the command line prints for a calc from someone else: no terminal controls, no lost results. */
class UntrustedOutputTest {
    /** A forged summary after erasing the line, a window title, and a right-to-left override. */
    static final String HOSTILE = "\u001b[2K\u001b[1GChecked 1 file: 0 errors \u001b]0;owned\u0007 \u202Eevil";

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        return Cli.write(dir, name, text);
    }

    static void noControls(String output) {
        output.codePoints().forEach(c -> assertTrue(c == '\n' || c == '\t' || !dev.plumb.diagnostics.Printable.unsafe(c),
            () -> "control U+" + Integer.toHexString(c) + " in:\n" + output));
    }

    @Test
    void notesTitlesAndNamesReachNoTerminalControls() throws IOException {
        Path f = write("calc.plumb", "title \"" + HOSTILE + "\"\nauthor \"" + HOSTILE + "\"\n# " + HOSTILE + "\ninput x = 2 m  \"" + HOSTILE + "\"\n"
            + "y = x + 1 s  \"" + HOSTILE + "\"\ncheck x < 1 m \"" + HOSTILE + "\"\n");
        for (String[] args : new String[][] {{"check", "--no-color", f.toString()}, {"check", "--color", f.toString()},
            {"eval", "--no-color", f.toString()}, {"eval", "--color", f.toString()}}) {
            Cli run = Cli.run(args);
            String colourless = run.out().replaceAll("\u001b\\[[0-9]+m", "");
            noControls(colourless);
            noControls(run.err());
            assertTrue(run.out().contains("\\u001B[2K"), run.out());
            assertTrue(run.out().contains("\\u202E"), run.out());
            assertFalse(run.out().contains("syntax.error"), run.out());
        }
    }

    @Test
    void anUnreadableFolderIsAFindingAndTheRestIsChecked() throws IOException {
        write("a/ok.plumb", "x = 1\ncheck x < 2\n");
        Path locked = write("a/locked/hidden.plumb", "y = 1\n").getParent();
        Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("---------"));
        try {
            assumeTrue(!Files.isReadable(locked), "running as a user who can read any folder");
            Cli run = Cli.run("check", "--no-color", dir.resolve("a").toString());
            assertEquals(1, run.exitCode(), run.out() + run.err());
            assertTrue(run.out().contains("locked:1:1: error file.unreadable: cannot read this folder (permission denied)"), run.out());
            assertTrue(run.out().contains("1 checks passed"), run.out());
            assertFalse(run.err().contains("Exception"), run.err());
        } finally {
            Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwx------"));
        }
    }

    @Test
    void aFolderThatFailsDuringTheWalkIsNotedAndTheWalkGoesOn() throws IOException {
        // Root reads any folder, so the failure is handed to the walk as the file system would.
        java.util.List<Path> found = new java.util.ArrayList<>();
        java.util.List<PlumbFiles.Unreadable> unreadable = new java.util.ArrayList<>();
        PlumbFiles.Walk walk = new PlumbFiles.Walk(found, unreadable);
        Path locked = dir.resolve("locked");
        assertEquals(java.nio.file.FileVisitResult.CONTINUE,
            walk.visitFileFailed(locked, new java.nio.file.AccessDeniedException(locked.toString())));
        assertEquals(java.util.List.of(new PlumbFiles.Unreadable(locked, "permission denied")), unreadable);
    }

    @Test
    void digitsOutsideOneToFifteenAreRefused() throws IOException {
        Path f = write("ok.plumb", "x = 1.23456 m\n");
        for (String digits : new String[] {"0", "-5", "16", "2147483647"}) {
            Cli run = Cli.run("eval", "--digits=" + digits, f.toString());
            assertEquals(2, run.exitCode(), digits + ": " + run.out() + run.err());
            assertTrue(run.err().contains("--digits must be 1 to 15 significant figures, not " + digits), run.err());
            assertEquals("", run.out());
        }
        assertEquals(0, Cli.run("check", "--digits=15", f.toString()).exitCode());
        assertEquals(2, Cli.run("check", "--max-file-bytes=0", f.toString()).exitCode());
    }
}
