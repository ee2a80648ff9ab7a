package dev.plumb;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Keeps the architecture visible: each package imports only what its row of ARCHITECTURE.md's
 * layer table allows, read from that table, so the document and the code cannot drift apart.
 * ANTLR stays in syntax, Indriya in units, picocli and JSON in cli, and the protocol library only
 * ever in the language-server adapter.
 */
class LayeringTest {
    private static final Pattern IMPORT = Pattern.compile("^import (?:static )?([\\w.]+)\\.[\\w*]+;", Pattern.MULTILINE);
    private static final Pattern ROW = Pattern.compile("^\\| `(\\w+)` \\| (.*) \\|$", Pattern.MULTILINE);
    private static final Pattern TICKED = Pattern.compile("`([\\w.]+)`");

    /** Package → allowed import prefixes besides java.* and the package itself, as ARCHITECTURE.md's table says. */
    private static Map<String, List<String>> allowed() throws IOException {
        String doc = Files.readString(Path.of("../ARCHITECTURE.md"));
        Map<String, List<String>> out = new LinkedHashMap<>();
        Matcher row = ROW.matcher(doc);
        while (row.find()) {
            List<String> prefixes = new ArrayList<>();
            Matcher t = TICKED.matcher(row.group(2));
            while (t.find()) prefixes.add(t.group(1));
            out.put(row.group(1), prefixes);
        }
        return out;
    }

    @Test
    void theTableHasARowForEveryPackage() throws IOException {
        Map<String, List<String>> rules = allowed();
        try (Stream<Path> dirs = Files.list(Path.of("src/main/java/dev/plumb"))) {
            List<String> missing = dirs.filter(Files::isDirectory).map(p -> p.getFileName().toString())
                .filter(p -> !rules.containsKey(p)).toList();
            assertEquals(List.of(), missing, "packages with no row in ARCHITECTURE.md's layer table");
        }
        assertTrue(rules.get("diagnostics").isEmpty(), "the bottom layer imports nothing");
    }

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
    void packagesImportOnlyTheLayersTheirRowAllows() throws IOException {
        Map<String, List<String>> rules = allowed();
        Path main = Path.of("src/main/java/dev/plumb");
        assertTrue(Files.isDirectory(main), "run from the server module");
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(main)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String pkg = main.relativize(f).getName(0).toString();
                List<String> allowed = rules.get(pkg);
                if (allowed == null) {
                    violations.add(f + ": package " + pkg + " has no row in ARCHITECTURE.md's layer table");
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
