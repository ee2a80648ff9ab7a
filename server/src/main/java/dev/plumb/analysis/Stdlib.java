package dev.plumb.analysis;

import dev.plumb.syntax.Statement;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The standard library: correlations, tables and constants written in Plumb itself, shipped in
 * the jar under {@code stdlib/} (listed in {@code stdlib/index}), read and checked once, then
 * shared read-only by every document. Each file sees the files listed before it.
 */
public final class Stdlib {
    /** Where the library's files appear to be, in messages and related locations. */
    public static final Path ROOT = Path.of("/plumb-stdlib");

    private final Scope scope;
    private final List<Analysis> files;
    private final long loadNanos;

    private Stdlib(Scope scope, List<Analysis> files, long loadNanos) {
        this.scope = scope;
        this.files = List.copyOf(files);
        this.loadNanos = loadNanos;
    }

    private static final class Holder {
        static final Stdlib INSTANCE = load();
    }

    public static Stdlib get() {
        return Holder.INSTANCE;
    }

    /** The library as every document sees it: its names and its families. */
    Library asLibrary() {
        return new Library(scope, this::family);
    }

    /** The library's names, as the parent scope of every document. */
    Scope scope() {
        return scope;
    }

    /** Each library file's analysis: a healthy library has no diagnostics (a test keeps it so). */
    public List<Analysis> files() {
        return files;
    }

    /** How long reading and checking the library took, once per process. */
    public long loadNanos() {
        return loadNanos;
    }

    /** Every correlation and table column of the library, by name, in library order (built once). */
    public Map<String, Binding> entries() {
        Map<String, Binding> e = entries;
        if (e == null) {
            e = java.util.Collections.unmodifiableMap(collectEntries());
            entries = e;
        }
        return e;
    }

    /** Read once the library has loaded; every out-of-range call asks for a family's members. */
    private volatile Map<String, Binding> entries;

    private Map<String, Binding> collectEntries() {
        Map<String, Binding> out = new LinkedHashMap<>();
        for (Analysis a : files) {
            for (Row r : a.rows()) {
                if (!(r instanceof Row.FunctionRow f) || f.kind() == Row.Callable.FUNCTION) continue;
                String name = f.signature().substring(0, f.signature().indexOf('('));
                Binding b = scope.lookup(name);
                if (b != null) {
                    out.put(name, b);
                } else if (f.kind() == Row.Callable.TABLE) {
                    // A table with several output columns is called by column: water.rho, water.mu.
                    List<Statement.Column> columns = tableNamed(a, name).columns();
                    for (Statement.Column column : columns.subList(1, columns.size())) {
                        Binding col = scope.lookup(name + "." + column.name().text());
                        if (col != null) out.put(name + "." + column.name().text(), col);
                    }
                }
            }
        }
        return out;
    }

    private Statement.Table tableNamed(Analysis a, String name) {
        for (Binding b : a.scope().all().values()) {
            if (b instanceof Binding.TableBinding t && t.def().name().text().equals(name)) return t.def();
        }
        throw new IllegalStateException("no table " + name);
    }

    /** The library's correlations and table columns of a family, to offer where one is out of range. */
    List<Binding> family(String family) {
        List<Binding> out = new ArrayList<>();
        for (Binding b : entries().values()) {
            String f = familyOf(b);
            if (family.equals(f)) out.add(b);
        }
        return out;
    }

    static String familyOf(Binding b) {
        if (b instanceof Binding.CorrelationBinding c && c.def().family() != null) return c.def().family().text();
        if (b instanceof Binding.TableBinding t && t.def().family() != null) return t.def().family().text();
        return null;
    }

    private static Stdlib load() {
        long start = System.nanoTime();
        Scope all = new Scope("");
        List<Analysis> files = new ArrayList<>();
        Sources resources = new ResourceSources();
        for (String name : index()) {
            Path path = ROOT.resolve(name);
            Workspace loader = new Workspace(resources, Settings.DEFAULT, Library.loading(all));
            Analysis a = loader.analyze(path);
            files.add(a);
            a.scope().all().forEach((key, binding) -> {
                if (binding.file() != null && binding.file().equals(path)) all.put(key, binding);
            });
        }
        return new Stdlib(all, files, System.nanoTime() - start);
    }

    private static List<String> index() {
        String text = read("index");
        List<String> names = new ArrayList<>();
        for (String line : text.split("\n")) {
            String t = line.strip();
            if (!t.isEmpty() && !t.startsWith("#")) names.add(t);
        }
        return names;
    }

    static String read(String name) {
        try (InputStream in = Stdlib.class.getResourceAsStream("/stdlib/" + name)) {
            if (in == null) return null;
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Reads library files from the jar. */
    private static final class ResourceSources implements Sources {
        @Override
        public Loaded load(Path file, Path root) {
            String text = file.startsWith(ROOT) ? read(ROOT.relativize(file).toString()) : null;
            return text == null ? new Missing("not in the standard library") : new Text(text);
        }

        @Override
        public Path workspaceRoot(Path file) {
            return ROOT;
        }
    }

    /** For diagnostics that point into the library. */
    static boolean isLibrary(Path file) {
        return file != null && file.startsWith(ROOT);
    }

}
