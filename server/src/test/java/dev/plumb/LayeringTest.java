package dev.plumb;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Keeps the architecture visible: each package imports only the layers below it (see
 * ARCHITECTURE.md). ANTLR stays in syntax, Indriya in units, picocli and JSON in cli, and the
 * protocol library only ever in the language-server adapter.
 */
class LayeringTest {
    private static final Pattern IMPORT = Pattern.compile("^import (?:static )?([\\w.]+)\\.[\\w*]+;", Pattern.MULTILINE);

    /** Package → allowed import prefixes besides java.* and the package itself. */
    private static final Map<String, List<String>> ALLOWED = Map.of(
        "diagnostics", List.of(),
        "syntax", List.of("dev.plumb.diagnostics", "dev.plumb.grammar", "org.antlr.v4.runtime"),
        "units", List.of("dev.plumb.diagnostics", "javax.measure", "tech.units.indriya", "systems.uom"),
        "analysis", List.of("dev.plumb.diagnostics", "dev.plumb.syntax", "dev.plumb.units", "org.apache.commons.math3"),
        "ide", List.of("dev.plumb.diagnostics", "dev.plumb.syntax", "dev.plumb.units", "dev.plumb.analysis"),
        "lsp", List.of("dev.plumb.diagnostics", "dev.plumb.syntax", "dev.plumb.units", "dev.plumb.analysis",
            "dev.plumb.ide", "org.eclipse.lsp4j", "com.google.gson"),
        "cli", List.of("dev.plumb.diagnostics", "dev.plumb.analysis", "dev.plumb.syntax", "dev.plumb.units",
            "dev.plumb.lsp", "picocli", "com.google.gson"));

    @Test
    void onlyTheAdapterSpeaksTheProtocol() throws IOException {
        List<String> leaks = new ArrayList<>();
        try (Stream<Path> files = Files.walk(Path.of("src/main/java/dev/plumb"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                boolean adapter = f.toString().contains("/lsp/");
                if (!adapter && Files.readString(f).contains("org.eclipse.lsp4j")) leaks.add(f.toString());
            }
        }
        assertEquals(List.of(), leaks);
    }

    @Test
    void packagesImportOnlyTheLayersBelow() throws IOException {
        Path main = Path.of("src/main/java/dev/plumb");
        assertTrue(Files.isDirectory(main), "run from the server module");
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(main)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String pkg = main.relativize(f).getName(0).toString();
                List<String> allowed = ALLOWED.get(pkg);
                if (allowed == null) {
                    violations.add(f + ": package " + pkg + " has no layering rule; add one here and in ARCHITECTURE.md");
                    continue;
                }
                Matcher m = IMPORT.matcher(Files.readString(f));
                while (m.find()) {
                    String imported = m.group(1);
                    boolean ok = imported.startsWith("java.") || imported.startsWith("dev.plumb." + pkg)
                        || allowed.stream().anyMatch(imported::startsWith);
                    if (!ok) violations.add(f + " imports " + imported);
                }
            }
        }
        assertEquals(List.of(), violations);
    }
}
