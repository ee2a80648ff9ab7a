package dev.plumb.cli;

import dev.plumb.analysis.DiskReads;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Options shared by the commands that evaluate documents. */
final class CommonOptions {
    @Spec(Spec.Target.MIXEE)
    CommandSpec command;

    private int digits;
    private long maxFileBytes;

    /** Refused, not clamped, when out of range: a silently different precision is a wrong answer. */
    @Option(names = "--digits", paramLabel = "N", defaultValue = "4",
        description = "significant figures of shown values, 1 to 15 (default: ${DEFAULT-VALUE})")
    void digits(int n) {
        if (n < 1 || n > 15) {
            throw new ParameterException(command.commandLine(), "--digits must be 1 to 15 significant figures, not " + n);
        }
        digits = n;
    }

    @Option(names = "--max-file-bytes", paramLabel = "BYTES", defaultValue = "" + DiskReads.DEFAULT_MAX_BYTES,
        description = "the largest calc file read, in bytes; a larger one is one finding (default: ${DEFAULT-VALUE})")
    void maxFileBytes(long n) {
        if (n < 1) throw new ParameterException(command.commandLine(), "--max-file-bytes must be at least 1, not " + n);
        maxFileBytes = n;
    }

    @Option(names = "--color", negatable = true, description = "colour the output (default: only on a terminal, "
        + "never with NO_COLOR set)")
    Boolean color;

    Settings settings() {
        return new Settings(digits, Settings.DEFAULT.equalityTolerance());
    }

    /** Files read inside each file's workspace, up to the size limit. */
    FileSources sources() {
        return new FileSources(maxFileBytes);
    }

    Style style() {
        return color == null ? Style.detect() : new Style(color);
    }
}
