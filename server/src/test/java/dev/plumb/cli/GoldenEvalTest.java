package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * `plumb eval` on every sample against its golden output in src/test/resources/golden/.
 * Refresh with {@code mvn -B verify -Dupdate.golden=true}; never edit the golden files by hand.
 */
class GoldenEvalTest {
    private static final boolean UPDATE = Boolean.getBoolean("update.golden");

    @TestFactory
    Stream<DynamicTest> everySampleMatchesItsGolden() throws IOException {
        Path root = dev.plumb.RepoRoot.get();
        Path samples = root.resolve("samples");
        Path golden = root.resolve("server/src/test/resources/golden");
        List<Path> files;
        try (Stream<Path> walk = Files.walk(samples)) {
            files = walk.filter(p -> p.toString().endsWith(".plumb")).sorted().toList();
        }
        assertFalse(files.isEmpty());
        return files.stream().map(file -> DynamicTest.dynamicTest(samples.relativize(file).toString(), () -> {
            Cli run = Cli.run("eval", "--no-color", file.toString());
            String actual = "exit " + run.exitCode() + "\n" + run.out().replace(file.toString(), "<file>");
            Path expected = golden.resolve(samples.relativize(file) + ".txt");
            if (UPDATE) {
                Files.createDirectories(expected.getParent());
                Files.writeString(expected, actual, StandardCharsets.UTF_8);
            }
            assertTrue(Files.exists(expected), "no golden file " + expected + ": create it with -Dupdate.golden=true");
            assertEquals(Files.readString(expected, StandardCharsets.UTF_8), actual,
                "eval output changed; if intended, refresh with -Dupdate.golden=true");
        }));
    }
}
