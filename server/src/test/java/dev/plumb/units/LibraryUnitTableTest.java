package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The unit table in the jar says what the unit library (Indriya, systems-common) says, read live,
 * so the table can never drift from its source; refresh it with {@code -Dupdate.golden=true}.
 */
class LibraryUnitTableTest {
    private static final Path TABLE = Path.of("src/main/resources/dev/plumb/units/" + LibraryUnitTable.RESOURCE);

    @Test
    void theTableSaysWhatTheUnitLibrarySays() throws IOException {
        String live = LibraryUnitTable.text(LibraryUnits.all());
        if (Boolean.getBoolean("update.golden")) {
            Files.createDirectories(TABLE.getParent());
            Files.writeString(TABLE, live, StandardCharsets.UTF_8);
            return;
        }
        assertEquals(live, Files.readString(TABLE, StandardCharsets.UTF_8),
            "the unit table is stale: refresh it with -Dupdate.golden=true");
    }

    @Test
    void theTableReadsBackAsTheLibrarysUnits() {
        // Every factor, offset, dimension, spelling and prefix flag, exactly (doubles round-trip in their text).
        assertEquals(LibraryUnits.all(), LibraryUnitTable.read());
    }
}
