package dev.plumb.cli;

import dev.plumb.analysis.Settings;
import picocli.CommandLine.Option;

/** Options shared by the commands that evaluate documents. */
final class CommonOptions {
    @Option(names = "--digits", paramLabel = "N", defaultValue = "4",
        description = "significant figures of shown values (default: ${DEFAULT-VALUE})")
    int digits;

    @Option(names = "--color", negatable = true, description = "colour the output (default: only on a terminal, "
        + "never with NO_COLOR set)")
    Boolean color;

    Settings settings() {
        return new Settings(Math.max(1, Math.min(15, digits)), Settings.DEFAULT.equalityTolerance());
    }

    Style style() {
        return color == null ? Style.detect() : new Style(color);
    }
}
