package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The standard library's name list says which file defines which name, so that a calc loads only
 * the files it uses. The list is made from the files themselves and checked here, so it can never
 * drift; refresh it with {@code -Dupdate.golden=true}. Loading on demand must give every calc
 * exactly what loading the whole library first gives.
 */
class StdlibNamesTest {
    private static final Path LIST = Path.of("src/main/resources/stdlib/" + Stdlib.NAMES);

    @Test
    void theNameListSaysWhatTheFilesDefine() throws IOException {
        dev.plumb.GeneratedFile.matches(LIST, Stdlib.indexing().namesText(), "the standard library's name list");
    }

    @Test
    void aCalcLoadsOnlyTheFilesWhoseNamesItUses() {
        Stdlib lazy = Stdlib.open();
        assertEquals(0, lazy.loadedFiles(), "nothing is read before a calc asks");
        Analysis a = analyse(lazy, "rho = air_density(20 degC, 101325 Pa)\nx = 2 m * 3\n");
        assertTrue(a.diagnostics().isEmpty(), a.diagnostics().toString());
        // air_density is in properties.plumb, which uses no other file.
        assertEquals(1, lazy.loadedFiles());
        // A misspelt name is still offered its library neighbour, from the list alone.
        Analysis typo = analyse(lazy, "rho = air_densty(20 degC, 101325 Pa)\n");
        assertTrue(typo.diagnostics().get(0).message().contains("air_density"), typo.diagnostics().toString());
        assertEquals(1, lazy.loadedFiles());
    }

    @Test
    void everyCalcAnalysesAsWithTheWholeLibraryLoadedFirst() throws IOException {
        List<Path> calcs = dev.plumb.RepoRoot.calcs();
        Stdlib whole = Stdlib.indexing();
        for (Path calc : calcs) {
            // A fresh library per calc: each loads what that calc (and the files it uses) needs.
            Analysis onDemand = new Workspace(new FileSources(), Settings.DEFAULT, Stdlib.open().asLibrary()).analyze(calc);
            Analysis eager = new Workspace(new FileSources(), Settings.DEFAULT, whole.asLibrary()).analyze(calc);
            assertEquals(eager.diagnostics(), onDemand.diagnostics(), calc.toString());
            assertEquals(eager.rows(), onDemand.rows(), calc.toString());
            assertEquals(eager.calls().size(), onDemand.calls().size(), calc.toString());
        }
        assertTrue(calcs.size() > 50, "samples and diagnostics fixtures: " + calcs.size());
    }

    private static Analysis analyse(Stdlib library, String text) {
        return new Workspace(new FileSources(), Settings.DEFAULT, library.asLibrary())
            .analyzeText(Path.of("/tmp/lazy-library.plumb"), text);
    }
}
