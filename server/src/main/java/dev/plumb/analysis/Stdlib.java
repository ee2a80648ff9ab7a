package dev.plumb.analysis;

import dev.plumb.syntax.Statement;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.concurrent.atomic.AtomicReferenceArray;

/**
 * The standard library: correlations, tables and constants written in Plumb itself, shipped in
 * the jar under {@code stdlib/} (listed in {@code stdlib/index}), read and checked once, then
 * shared read-only by every document. Each file sees the files listed before it.
 *
 * <p>A file is read and checked the first time a document (or a later library file) uses one of
 * its names: a calc that uses the air properties and one drag curve does not wait for the lift
 * or rough-surface files. Which file defines which name comes from {@code stdlib/names}, which the
 * build writes from the files themselves ({@code StdlibNamesTest}, {@code -Dupdate.golden=true})
 * and checks on every test run; a file that turns out to define other names than the list says
 * stops the load loudly, as a fault of the build, rather than leave a name unknown.
 */
public final class Stdlib {
    /** Where the library's files appear to be, in messages and related locations. */
    public static final Path ROOT = Path.of("/plumb-stdlib");
    /** The generated list of the names each library file defines. */
    static final String NAMES = "names";

    /** The files in load order. */
    private final List<String> order;
    /** For each name, the positions in {@link #order} of the files that define it, ascending. */
    private final Map<String, int[]> definers;
    /** For each family, the positions of the files with members of it, ascending. */
    private final Map<String, int[]> families;
    /** Each loaded file's analysis and own names; null until it is loaded. */
    private final AtomicReferenceArray<LoadedFile> loaded;
    /** True while the names list is being made from the files (then there is none to check against). */
    private final boolean indexing;
    private final LibraryNames whole;
    private volatile long loadNanos;

    private record LoadedFile(Analysis analysis, Map<String, Binding> names) {
    }

    private Stdlib(List<String> order, Map<String, int[]> definers, Map<String, int[]> families, boolean indexing) {
        this.order = List.copyOf(order);
        this.definers = definers;
        this.families = families;
        this.loaded = new AtomicReferenceArray<>(order.size());
        this.indexing = indexing;
        this.whole = new View(order.size());
    }

    private static final class Holder {
        static final Stdlib INSTANCE = open();
    }

    public static Stdlib get() {
        return Holder.INSTANCE;
    }

    /** The library as every document sees it: its names and its families. */
    Library asLibrary() {
        return new Library(whole, this::family);
    }

    /** Each library file's analysis, all loaded: a healthy library has no diagnostics (a test keeps it so). */
    public List<Analysis> files() {
        List<Analysis> out = new ArrayList<>(order.size());
        for (int i = 0; i < order.size(); i++) out.add(file(i).analysis());
        return List.copyOf(out);
    }

    /** How long reading and checking the library's files has taken so far in this process. */
    public long loadNanos() {
        return loadNanos;
    }

    /** How many of the library's files are loaded so far (a calc loads only those it uses). */
    public int loadedFiles() {
        int n = 0;
        for (int i = 0; i < order.size(); i++) if (loaded.get(i) != null) n++;
        return n;
    }

    /** Every correlation and table column of the library, by name, in library order (loads every file). */
    public Map<String, Binding> entries() {
        Map<String, Binding> e = entries;
        if (e == null) {
            e = Collections.unmodifiableMap(collectEntries());
            entries = e;
        }
        return e;
    }

    /** Read once the library has loaded; every out-of-range call asks for a family's members. */
    private volatile Map<String, Binding> entries;

    private Map<String, Binding> collectEntries() {
        Map<String, Binding> out = new LinkedHashMap<>();
        for (int i = 0; i < order.size(); i++) entriesOf(i, out);
        return out;
    }

    /** The correlations and table columns the file at {@code index} defines, added to {@code out} in its order. */
    private void entriesOf(int index, Map<String, Binding> out) {
        Analysis a = file(index).analysis();
        for (Row r : a.rows()) {
            if (!(r instanceof Row.FunctionRow f) || f.kind() == Row.Callable.FUNCTION) continue;
            String name = f.signature().substring(0, f.signature().indexOf('('));
            Binding b = whole.lookup(name);
            if (b != null) {
                out.put(name, b);
            } else if (f.kind() == Row.Callable.TABLE) {
                // A table with several output columns is called by column: water.rho, water.mu.
                List<Statement.Column> columns = tableNamed(a, name).columns();
                for (Statement.Column column : columns.subList(1, columns.size())) {
                    Binding col = whole.lookup(name + "." + column.name().text());
                    if (col != null) out.put(name + "." + column.name().text(), col);
                }
            }
        }
    }

    private Statement.Table tableNamed(Analysis a, String name) {
        for (Binding b : a.scope().all().values()) {
            if (b instanceof Binding.TableBinding t && t.def().name().text().equals(name)) return t.def();
        }
        throw new IllegalStateException("no table " + name);
    }

    /** The library's correlations and table columns of a family, to offer where one is out of range. */
    List<Binding> family(String family) {
        // Only the files with members of the family are read: a calc's model-form spread asks for
        // the family of every library entry it calls.
        Map<String, Binding> members = new LinkedHashMap<>();
        for (int i : families.getOrDefault(family, new int[0])) entriesOf(i, members);
        List<Binding> out = new ArrayList<>();
        for (Binding b : members.values()) {
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

    /**
     * The library's names as the file at {@code before} in load order sees them: those of the
     * files before it (the last file to define a name wins), then the built-ins.
     */
    private final class View implements LibraryNames {
        private final int before;
        private volatile Collection<String> visible;

        View(int before) {
            this.before = before;
        }

        @Override
        public Binding lookup(String name) {
            int[] files = definers.get(name);
            int at = -1;
            if (files != null) {
                for (int f : files) if (f < before) at = f;
            }
            Binding b = at < 0 ? null : file(at).names().get(name);
            return b != null ? b : Builtins.lookup(name);
        }

        @Override
        public Collection<String> visibleNames() {
            Collection<String> v = visible;
            if (v == null) {
                TreeSet<String> all = new TreeSet<>();
                definers.forEach((name, files) -> {
                    if (files[0] < before) all.add(name);
                });
                all.addAll(Builtins.names());
                v = Collections.unmodifiableSortedSet(all);
                // While the name list is being made it grows file by file: nothing to keep yet.
                if (!indexing) visible = v;
            }
            return v;
        }
    }

    /** The file at {@code index} in load order, read and checked on first use. */
    private LoadedFile file(int index) {
        LoadedFile done = loaded.get(index);
        if (done != null) return done;
        // One file's checking may load the files whose names it uses; all of it happens on one
        // deep-stacked thread under one lock, so nested loads neither deadlock nor run twice.
        return DeepStack.call(() -> {
            synchronized (this) {
                LoadedFile again = loaded.get(index);
                return again != null ? again : load(index);
            }
        });
    }

    private LoadedFile load(int index) {
        long start = System.nanoTime();
        String name = order.get(index);
        Path path = ROOT.resolve(name);
        Workspace loader = new Workspace(new ResourceSources(), Settings.DEFAULT, Library.loading(new View(index)));
        Analysis a = loader.analyze(path);
        Map<String, Binding> own = new HashMap<>();
        a.scope().all().forEach((key, binding) -> {
            if (binding.file() != null && binding.file().equals(path)) own.put(key, binding);
        });
        LoadedFile out = new LoadedFile(a, Map.copyOf(own));
        if (indexing) {
            own.keySet().forEach(n -> definers.merge(n, new int[] {index}, Stdlib::appended));
            familiesOf(own).forEach(f -> families.merge(f, new int[] {index}, Stdlib::appended));
        } else {
            checkAgainstIndex(index, own);
        }
        loaded.set(index, out);
        loadNanos += System.nanoTime() - start;
        return out;
    }

    /** The families the given bindings have members of, sorted. */
    private static TreeSet<String> familiesOf(Map<String, Binding> own) {
        TreeSet<String> out = new TreeSet<>();
        for (Binding b : own.values()) {
            String f = familyOf(b);
            if (f != null) out.add(f);
        }
        return out;
    }

    private void checkAgainstIndex(int index, Map<String, Binding> own) {
        if (!listedFor(definers, index).equals(new TreeSet<>(own.keySet())) || !listedFor(families, index).equals(familiesOf(own))) {
            throw new IllegalStateException("the standard library's name list (stdlib/" + NAMES + ") is stale for "
                + order.get(index) + ": the build must refresh it (-Dupdate.golden=true)");
        }
    }

    /** The keys whose files include {@code index}, sorted. */
    private static TreeSet<String> listedFor(Map<String, int[]> byKey, int index) {
        TreeSet<String> out = new TreeSet<>();
        byKey.forEach((key, files) -> {
            for (int f : files) if (f == index) out.add(key);
        });
        return out;
    }

    private static int[] appended(int[] earlier, int[] more) {
        int[] out = java.util.Arrays.copyOf(earlier, earlier.length + more.length);
        System.arraycopy(more, 0, out, earlier.length, more.length);
        return out;
    }

    /** The library as it starts in a fresh process: only the name list read, no file yet. */
    static Stdlib open() {
        List<String> order = index();
        Map<String, int[]> definers = new HashMap<>();
        Map<String, int[]> families = new HashMap<>();
        if (!readNames(order, definers, families)) {
            // No usable name list (a build that skipped writing it): read every file now, in order.
            return indexing(order);
        }
        return new Stdlib(order, definers, families, false);
    }

    /** The library read file by file in load order, its name list made as it goes (what the build writes). */
    static Stdlib indexing() {
        return indexing(index());
    }

    private static Stdlib indexing(List<String> order) {
        Stdlib s = new Stdlib(order, new java.util.concurrent.ConcurrentHashMap<>(), new java.util.concurrent.ConcurrentHashMap<>(),
            true);
        for (int i = 0; i < order.size(); i++) s.file(i);
        return s;
    }

    /** The name list's text: one line per file in load order, its names sorted. */
    String namesText() {
        StringBuilder b = new StringBuilder();
        b.append("# Generated from the library's files by StdlibNamesTest (-Dupdate.golden=true); do not edit.\n");
        b.append("# For each file: the names it defines, then the families it has members of. A calc loads\n");
        b.append("# only the files whose names it uses (and, for a family's spread, those with its members).\n");
        for (int i = 0; i < order.size(); i++) {
            b.append(order.get(i)).append(':');
            for (String n : new TreeSet<>(file(i).names().keySet())) b.append(' ').append(n);
            b.append('\n').append(order.get(i)).append(' ').append(FAMILIES).append(':');
            for (String f : familiesOf(file(i).names())) b.append(' ').append(f);
            b.append('\n');
        }
        return b.toString();
    }

    private static final String FAMILIES = "families";

    /**
     * Fills {@code definers} and {@code families} from the jar's name list; false when the list is
     * missing or does not list exactly the index's files.
     */
    private static boolean readNames(List<String> order, Map<String, int[]> definers, Map<String, int[]> families) {
        String text = read(NAMES);
        if (text == null) return false;
        List<String> files = new ArrayList<>();
        for (String line : text.split("\n")) {
            if (line.isBlank() || line.startsWith("#")) continue;
            int colon = line.indexOf(':');
            if (colon < 0) return false;
            String head = line.substring(0, colon).strip();
            boolean familyLine = head.endsWith(" " + FAMILIES);
            String file = familyLine ? head.substring(0, head.length() - FAMILIES.length()).strip() : head;
            int at = order.indexOf(file);
            if (at < 0) return false;
            if (!familyLine) files.add(file);
            for (String n : line.substring(colon + 1).strip().split(" +")) {
                if (!n.isEmpty()) (familyLine ? families : definers).merge(n, new int[] {at}, Stdlib::appended);
            }
        }
        if (!files.equals(order)) return false;
        definers.values().forEach(java.util.Arrays::sort);
        families.values().forEach(java.util.Arrays::sort);
        return true;
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
