package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
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
        dev.plumb.GeneratedFile.matches(TABLE, LibraryUnitTable.text(LibraryUnits.all()), "the unit table");
    }

    @Test
    void theTableReadsBackAsTheLibrarysUnits() {
        // Every factor, offset, dimension, spelling and prefix flag, exactly (doubles round-trip in their text).
        assertEquals(LibraryUnits.all(), LibraryUnitTable.read());
    }
}
