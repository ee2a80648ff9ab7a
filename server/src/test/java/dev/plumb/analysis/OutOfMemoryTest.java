package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** An analysis that runs out of memory fails alone, with one finding, and the workspace goes on. */
class OutOfMemoryTest {
    /** Sources that run out of memory reading one file, as a huge or hostile file would. */
    private static final class ExhaustingSources implements Sources {
        @Override
        public Loaded load(Path file, Path root) {
            if (file.getFileName().toString().equals("huge.plumb")) throw new OutOfMemoryError("planted by the test");
            return new Text("x = 1\n");
        }

        @Override
        public Path workspaceRoot(Path file) {
            return file.getParent();
        }
    }

    @Test
    void runningOutOfMemoryIsOneFindingNotAnError() {
        Workspace w = new Workspace(new ExhaustingSources(), Settings.DEFAULT);
        Path main = Path.of("/calc/main.plumb");
        Analysis a = w.analyzeText(main, "use \"huge.plumb\"\ny = 2\n");
        List<Diagnostic> memory = a.diagnostics().stream().filter(d -> d.code() == Code.LIMIT_MEMORY).toList();
        assertEquals(1, memory.size(), a.diagnostics()::toString);
        assertTrue(memory.get(0).message().startsWith("checking this document needed more memory than Plumb has ("),
            memory.get(0).message());
        // The same workspace still analyses other documents.
        Analysis other = w.analyzeText(Path.of("/calc/other.plumb"), "z = 3\n");
        assertEquals(List.of(), other.diagnostics());
    }
}
