package dev.plumb.analysis;

import static dev.plumb.analysis.Fixture.value;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Related;
import dev.plumb.diagnostics.Severity;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `use` across files in a temporary workspace, and files that cannot be read as text. The
 * files carry their expected diagnostics as fixture annotations.
 */
class UseTest {
    @TempDir
    Path dir;
    /** The workspace root: it holds plumb.toml. */
    Path root;

    @BeforeEach
    void markWorkspace() throws IOException {
        root = Files.createDirectories(dir.resolve("ws"));
        Files.writeString(root.resolve("plumb.toml"), "");
    }

    private Path write(String name, String text) throws IOException {
        Path file = root.resolve(name);
        Files.createDirectories(file.getParent());
        Files.writeString(file, text, StandardCharsets.UTF_8);
        return file;
    }

    private static Workspace workspace() {
        return new Workspace(new FileSources(), Settings.DEFAULT);
    }

    @Test
    void aMissingFileIsNotFound() throws IOException {
        Path main = write("main.plumb", """
            use "lib/missing.plumb"
            #   ^^^^^^^^^^^^^^^^^^^ use.not-found: cannot use "lib/missing.plumb": no such file
            x = 1
            """);
        Fixture.check(workspace().analyze(main));
    }

    @Test
    void aCircleOfThreeFilesGivesTheSameFindingsWhateverTheOrderAndTiming() throws IOException {
        // Files that use each other and call each other's functions: whichever file an analysis
        // starts from, and however the threads interleave, every file says the same.
        Path a = write("a.plumb", "use \"b.plumb\"\nfa(x) = 2 * x\nya = fb(3) + fc(1)\n");
        Path b = write("b.plumb", "use \"c.plumb\"\nfb(x) = 3 * x\nyb = fc(2) + fa(1)\n");
        Path c = write("c.plumb", "use \"a.plumb\"\nfc(x) = 5 * x\nyc = fa(4) + fb(1)\n");
        List<List<Path>> orders = List.of(List.of(a, b, c), List.of(b, c, a), List.of(c, a, b), List.of(c, b, a));
        java.util.Set<String> outcomes = new java.util.TreeSet<>();
        for (int run = 0; run < 40; run++) {
            List<Path> order = orders.get(run % orders.size());
            List<String> found = new java.util.ArrayList<>();
            for (Batch.Checked checked : Batch.check(workspace(), order, 1 + run % 4)) {
                for (var d : checked.diagnostics()) {
                    found.add(checked.analysis().file().getFileName() + ":" + d.code().id() + ":" + d.message());
                }
            }
            java.util.Collections.sort(found);
            outcomes.add(String.join("\n", found));
        }
        assertEquals(1, outcomes.size(), () -> String.join("\n---\n", outcomes));
        // On the circle no file takes names from another: each reports the circle and its unknown names.
        String only = outcomes.iterator().next();
        assertEquals(3, only.lines().filter(l -> l.contains("use.cycle")).count(), only);
        assertEquals(6, only.lines().filter(l -> l.contains("name.unknown")).count(), only);
    }

    private Path[] twoFilesInACircle() throws IOException {
        Path a = write("a.plumb", """
            use "b.plumb"
            #   ^^^^^^^^^ use.cycle: files use each other in a circle (a.plumb → b.plumb → a.plumb)
            x = 1
            """);
        Path b = write("b.plumb", """
            use "a.plumb"
            #   ^^^^^^^^^ use.cycle: files use each other in a circle (b.plumb → a.plumb → b.plumb)
            y = 2
            """);
        return new Path[] {a, b};
    }

    @Test
    void aPathNoFileCanHaveIsNotFound() throws IOException {
        // Found by the fuzzer (EngineFuzzTestInputs/*/use-path-with-nul): the engine threw.
        Path main = write("nul.plumb", "x = 1\n");
        Analysis a = workspace().analyzeText(main, "use \"a\0b.plumb\"\nx = 1\n");
        assertEquals(1, a.diagnostics().size(), a.diagnostics().toString());
        assertEquals(Code.USE_NOT_FOUND, a.diagnostics().get(0).code());
        assertTrue(a.diagnostics().get(0).message().startsWith("cannot use \"a\\0b.plumb\": it is not a file path here"),
            a.diagnostics().get(0).message());
    }

    @Test
    void theFileBeingCheckedReportsTheCycleAtItsOwnUse() throws IOException {
        Path[] ab = twoFilesInACircle();
        Fixture.check(workspace().analyze(ab[0]));
        Fixture.check(workspace().analyze(ab[1]));
    }

    @Test
    void aFilesDiagnosticsDoNotDependOnWhichFileWasCheckedFirst() throws IOException {
        Path[] ab = twoFilesInACircle();
        Workspace bFirst = workspace();
        List<String> alone = summary(bFirst.analyze(ab[1]));
        Workspace aFirst = workspace();
        aFirst.analyze(ab[0]);
        assertEquals(alone, summary(aFirst.analyze(ab[1])));
        // Checking both at once on several threads gives each file the same result too.
        for (int round = 0; round < 5; round++) {
            List<Batch.Checked> both = Batch.check(workspace(), List.of(ab[0], ab[1]), 2);
            assertEquals(alone, summary(both.get(1).analysis()));
        }
    }

    private static List<String> summary(Analysis a) {
        return a.diagnostics().stream().map(d -> d.code() + " " + d.span() + " " + d.message()).toList();
    }

    @Test
    void aFileMayUseItselfOnlyAsACycle() throws IOException {
        Path a = write("self.plumb", """
            use "self.plumb"
            #   ^^^^^^^^^^^^ use.cycle: self.plumb → self.plumb
            x = 1
            """);
        Fixture.check(workspace().analyze(a));
    }

    @Test
    void aPathOutsideTheWorkspaceIsRefused() throws IOException {
        // dir/x.plumb exists, but it lies outside the workspace root dir/ws.
        Files.writeString(dir.resolve("x.plumb"), "x = 1\n");
        Path main = write("calc/main.plumb", """
            use "../../x.plumb"
            #   ^^^^^^^^^^^^^^^ use.outside-workspace: "../../x.plumb" leads outside the workspace
            """);
        Analysis a = workspace().analyze(main);
        Fixture.check(a);
        String message = a.diagnostics().get(0).message();
        assertTrue(message.contains(root.toString()), message);
    }

    @Test
    void withNoMarkerAnywhereTheMessageSaysHowToMakeAWorkspace() throws IOException {
        Path bare = Files.createDirectories(dir.resolve("bare/calc"));
        for (Path p = bare; p != null; p = p.getParent()) {
            org.junit.jupiter.api.Assumptions.assumeFalse(Files.exists(p.resolve(".git")) || Files.exists(p.resolve("plumb.toml")),
                "a folder above the temporary folder marks a workspace: " + p);
        }
        Files.writeString(dir.resolve("bare/shared.plumb"), "k = 2\n");
        Path main = bare.resolve("main.plumb");
        Files.writeString(main, """
            use "../shared.plumb"
            #   ^^^^^^^^^^^^^^^^^ use.outside-workspace: "../shared.plumb" leads outside the workspace: no folder above this file holds .git or plumb.toml, so the workspace is only the file's own folder
            """, StandardCharsets.UTF_8);
        Analysis a = workspace().analyze(main);
        Fixture.check(a);
        String message = a.diagnostics().get(0).message();
        assertTrue(message.contains("create an empty file named plumb.toml"), message);
    }

    @Test
    void aGitFolderAlsoMarksTheWorkspaceRoot() throws IOException {
        Path inner = Files.createDirectories(root.resolve("project"));
        Files.createDirectories(inner.resolve(".git"));
        Files.writeString(root.resolve("shared.plumb"), "k = 2\n");
        Path main = write("project/main.plumb", """
            use "../shared.plumb"
            #   ^^^^^^^^^^^^^^^^^ use.outside-workspace: leads outside the workspace
            """);
        Fixture.check(workspace().analyze(main));
    }

    @Test
    void aUsedFileWithErrorsIsReportedOnceAndItsGoodValuesStillWork() throws IOException {
        write("lib.plumb", """
            input w = 2 m
            g(t) = t * 3
            bad = 1 mtr
            """);
        Path main = write("main.plumb", """
            use "lib.plumb"
            #   ^^^^^^^^^^^ use.has-errors: "lib.plumb" has 1 error; the first, on line 3: unknown unit 'mtr'
            z = w * 2
            q = g(2)
            k = bad * 2
            """);
        Analysis a = workspace().analyze(main);
        Fixture.check(a);
        assertEquals(4.0, value(a, "z").value().si(), 1e-12);
        assertEquals(6.0, value(a, "q").value().si(), 1e-12);
        assertFalse(value(a, "k").value().known());
    }

    @Test
    void importedValuesAndFunctionsWork() throws IOException {
        write("lib/air.plumb", """
            input ρ = 1.225 kg/m^3   "sea-level air"
            q(v) = 0.5 * ρ * v^2     "dynamic pressure"
            """);
        Path main = write("main.plumb", """
            use "lib/air.plumb"
            p = q(20 m/s)
            m = ρ * 2 m^3
            """);
        Analysis a = workspace().analyze(main);
        Fixture.check(a);
        // q = ½ρv² (common practice): ½ × 1.225 × 20² = 245 Pa, by hand.
        assertEquals(245.0, value(a, "p").value().si(), 1e-12);
        assertEquals(2.45, value(a, "m").value().si(), 1e-12);
        assertEquals(List.of(root.resolve("lib/air.plumb")), a.imports());
    }

    @Test
    void anErrorInsideAnImportedFunctionIsReportedAtTheCall() throws IOException {
        Path lib = write("lib/flow.plumb", "v(Q, A) = Q / A   \"mean speed\"\n");
        Path main = write("main.plumb", """
            use "lib/flow.plumb"
            x = v(1 m^3/s, 0 m^2)
            #   ^^^^^^^^^^^^^^^^^ math.division-by-zero: in v(…): division by zero: the divisor A is 0
            """);
        Analysis a = workspace().analyze(main);
        Fixture.check(a);
        Related inside = a.diagnostics().get(0).related().get(0);
        assertEquals(lib.toString(), inside.file());
        String libText = Files.readString(lib);
        assertEquals(libText.lastIndexOf('A'), inside.span().start());
    }

    @Test
    void aDiamondOfUsesIsNotADuplicate() throws IOException {
        write("lib/d.plumb", "input base = 1.5\n");
        write("lib/b.plumb", "use \"d.plumb\"\nfb = base * 2\n");
        write("lib/c.plumb", "use \"d.plumb\"\nfc = base * 3\n");
        Path a = write("a.plumb", """
            use "lib/b.plumb"
            use "lib/c.plumb"
            y = base + fb + fc
            """);
        Analysis analysis = workspace().analyze(a);
        Fixture.check(analysis);
        assertEquals(1.5 + 3 + 4.5, value(analysis, "y").value().si(), 1e-12);
    }

    @Test
    void aNameDefinedInTwoUsedFilesIsADuplicate() throws IOException {
        write("one.plumb", "k = 7\n");
        write("two.plumb", "k = 2\n");
        Path main = write("main.plumb", """
            use "one.plumb"
            use "two.plumb"
            #   ^^^^^^^^^^^ name.duplicate: k is defined both in one.plumb and in two.plumb: rename one of them
            z = k
            """);
        Fixture.check(workspace().analyze(main));
    }

    @Test
    void aNameDefinedHereAndInAUsedFileIsADuplicate() throws IOException {
        write("one.plumb", "k = 7\n");
        Path main = write("main.plumb", """
            use "one.plumb"
            k = 3
            #< name.duplicate: k is already defined in one.plumb: rename it here or there
            """);
        Fixture.check(workspace().analyze(main));
    }

    @Test
    void batchKeepsAnInputThatOnlyAnImportingFileUses() throws IOException {
        Path lib = write("lib.plumb", """
            input extra = 2     "used by main.plumb only"
            input spare = 3     "used by nobody"
            """);
        Path main = write("main.plumb", """
            use "lib.plumb"
            z = extra * 2
            """);
        List<Batch.Checked> both = Batch.check(workspace(), List.of(main, lib), 2);
        Batch.Checked checkedLib = both.get(1);
        assertEquals(lib, checkedLib.analysis().file());
        Fixture.check("""
            input extra = 2     "used by main.plumb only"
            input spare = 3     "used by nobody"
            #     ^^^^^ input.unused: input spare is not used by any value or check
            """, checkedLib.diagnostics());
        assertEquals(List.of(), both.get(0).diagnostics());

        // Checked alone, the library cannot know main.plumb uses extra.
        List<Batch.Checked> alone = Batch.check(workspace(), List.of(lib), 1);
        assertEquals(2, alone.get(0).diagnostics().stream().filter(d -> d.code() == Code.INPUT_UNUSED).count());
    }

    @Test
    void aBinaryFileIsNotText() throws IOException {
        Path bin = root.resolve("drawing.plumb");
        Files.write(bin, new byte[] {'x', ' ', '=', ' ', '1', '\n', 0, 1, 2, 3});
        Analysis a = workspace().analyze(bin);
        assertEquals(1, a.diagnostics().size());
        Diagnostic d = a.diagnostics().get(0);
        assertEquals(Code.FILE_NOT_TEXT, d.code());
        assertEquals(Severity.ERROR, d.severity());
        assertTrue(d.message().contains("NUL byte") && d.message().contains("offset 6"), d.message());
    }

    @Test
    void invalidUtf8IsNotText() throws IOException {
        Path latin1 = root.resolve("notes.plumb");
        // "T = 15 °C" saved as ISO-8859-1: the degree sign is the lone byte 0xB0.
        Files.write(latin1, "T = 15 \u00b0C\n".getBytes(StandardCharsets.ISO_8859_1));
        Analysis a = workspace().analyze(latin1);
        assertEquals(List.of(Code.FILE_NOT_TEXT), a.diagnostics().stream().map(Diagnostic::code).toList());
        String message = a.diagnostics().get(0).message();
        assertTrue(message.contains("not valid UTF-8") && message.contains("offset 7"), message);
    }

    @Test
    void usingAFileThatIsNotTextSaysWhy() throws IOException {
        Files.write(root.resolve("drawing.plumb"), new byte[] {0, 1, 2});
        Path main = write("main.plumb", """
            use "drawing.plumb"
            #   ^^^^^^^^^^^^^^^ use.has-errors: it holds a NUL byte, so it is binary, not a text file
            """);
        Fixture.check(workspace().analyze(main));
    }

    @Test
    void aMissingFileGivesAnErrorNotAnException() {
        Analysis a = workspace().analyze(root.resolve("nowhere.plumb"));
        assertEquals(1, a.count(Severity.ERROR));
        assertTrue(a.diagnostics().get(0).message().contains("no such file"), a.diagnostics().get(0).message());
    }
}
