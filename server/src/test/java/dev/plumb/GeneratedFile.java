package dev.plumb;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * A file the build writes from a live source (the unit table, the library's name list): a test
 * compares it with what the source says now, or rewrites it under {@code -Dupdate.golden=true}.
 */
public final class GeneratedFile {
    private GeneratedFile() {
    }

    /** Asserts that {@code file} holds {@code live}, or writes it there when refreshing; {@code what} names it in the failure. */
    public static void matches(Path file, String live, String what) throws IOException {
        if (Boolean.getBoolean("update.golden")) {
            Files.createDirectories(file.toAbsolutePath().getParent());
            Files.writeString(file, live, StandardCharsets.UTF_8);
            return;
        }
        assertEquals(live, Files.readString(file, StandardCharsets.UTF_8), what + " is stale: refresh it with -Dupdate.golden=true");
    }
}
