package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import java.nio.file.Path;

/** A calc with the cursor marked {@code $0}: the analysis of the text without the marker, and where it was. */
record Marked(Analysis analysis, int cursor) {
    static Marked of(String marked) {
        int at = marked.indexOf("$0");
        if (at < 0) throw new IllegalArgumentException("mark the cursor with $0");
        String text = marked.substring(0, at) + marked.substring(at + 2);
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("ide-test.plumb").toAbsolutePath(),
            text);
        return new Marked(a, at);
    }
}
