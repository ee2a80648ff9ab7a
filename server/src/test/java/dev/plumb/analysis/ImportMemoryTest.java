package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import dev.plumb.diagnostics.Code;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Used files' analyses kept between an editor's runs: taken again only while the used file and
 * every file it uses read the same, and never where a `use` circle runs; a document analysed
 * with kept analyses gets exactly what a fresh analysis gives.
 */
class ImportMemoryTest {
    @TempDir
    Path dir;
    Path main;
    Path air;
    Path gas;
    final ImportMemory memory = new ImportMemory();

    @BeforeEach
    void files() throws IOException {
        Files.writeString(dir.resolve("plumb.toml"), "");
        gas = write("gas.plumb", "input R_air = 287.05 J/(kg*K)\n");
        air = write("air.plumb", "use \"gas.plumb\"\ninput T = 288.15 K\nrho(p) = p / (R_air * T)\n");
        main = write("main.plumb", "use \"air.plumb\"\nq = 0.5 * rho(101325 Pa) * (20 m/s)^2\n");
    }

    private Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f.toAbsolutePath().normalize();
    }

    private Workspace kept() {
        return new Workspace(new FileSources(), Settings.DEFAULT, memory);
    }

    private static Analysis fresh(Path file) {
        return new Workspace(new FileSources(), Settings.DEFAULT).analyze(file);
    }

    @Test
    void anUnchangedUsedFileIsAnalysedOnce() {
        Analysis first = kept().analyzeImport(air, List.of(), () -> false).analysis();
        assertSame(first, kept().analyzeImport(air, List.of(), () -> false).analysis());
        Analysis viaMain = kept().analyze(main);
        assertEquals(fresh(main).rows(), viaMain.rows());
        assertEquals(fresh(main).diagnostics(), viaMain.diagnostics());
    }

    @Test
    void aChangeInTheUsedFileOrInAFileItUsesIsSeen() throws IOException {
        Analysis first = kept().analyzeImport(air, List.of(), () -> false).analysis();
        write("gas.plumb", "input R_air = 300 J/(kg*K)\n");
        Analysis second = kept().analyzeImport(air, List.of(), () -> false).analysis();
        assertNotSame(first, second);
        assertEquals(fresh(main).rows(), kept().analyze(main).rows());
        write("air.plumb", "use \"gas.plumb\"\ninput T = 300 K\nrho(p) = p / (R_air * T)\n");
        assertNotSame(second, kept().analyzeImport(air, List.of(), () -> false).analysis());
        assertEquals(fresh(main).rows(), kept().analyze(main).rows());
    }

    @Test
    void otherSettingsMakeAFreshAnalysis() {
        Analysis first = kept().analyzeImport(air, List.of(), () -> false).analysis();
        Analysis other = new Workspace(new FileSources(), new Settings(6, 1e-6), memory).analyzeImport(air, List.of(), () -> false).analysis();
        assertNotSame(first, other);
    }

    @Test
    void filesInACircleAreNeverKept() throws IOException {
        write("gas.plumb", "use \"air.plumb\"\ninput R_air = 287.05 J/(kg*K)\n");
        Analysis first = kept().analyzeImport(air, List.of(), () -> false).analysis();
        assertEquals(true, first.diagnostics().stream().anyMatch(d -> d.code() == Code.USE_CYCLE), first.diagnostics().toString());
        assertNotSame(first, kept().analyzeImport(air, List.of(), () -> false).analysis());
        // main uses air, which is in a circle with gas: reported the same as without kept analyses.
        assertEquals(fresh(main).diagnostics(), kept().analyze(main).diagnostics());
    }
}
