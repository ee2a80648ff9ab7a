package dev.plumb.cli;

import dev.plumb.analysis.DiskReads;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import picocli.CommandLine.Option;

/** Options shared by the commands that evaluate documents. */
final class CommonOptions {
    @Option(names = "--digits", paramLabel = "N", defaultValue = "4",
        description = "significant figures of shown values (default: ${DEFAULT-VALUE})")
    int digits;

    @Option(names = "--max-file-bytes", paramLabel = "BYTES", defaultValue = "" + DiskReads.DEFAULT_MAX_BYTES,
        description = "the largest calc file read, in bytes; a larger one is one finding (default: ${DEFAULT-VALUE})")
    long maxFileBytes;

    @Option(names = "--color", negatable = true, description = "colour the output (default: only on a terminal, "
        + "never with NO_COLOR set)")
    Boolean color;

    Settings settings() {
        return new Settings(Math.max(1, Math.min(15, digits)), Settings.DEFAULT.equalityTolerance());
    }

    /** Files read inside each file's workspace, up to the size limit. */
    FileSources sources() {
        return new FileSources(maxFileBytes);
    }

    Style style() {
        return color == null ? Style.detect() : new Style(color);
    }
}
