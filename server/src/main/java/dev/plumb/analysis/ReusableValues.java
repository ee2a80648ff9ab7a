package dev.plumb.analysis;

import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Statement;
import java.nio.file.Path;
import java.util.Collections;
import java.util.HashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * What the next run of the same document may take over from this one instead of evaluating it
 * again (an editor's run after an edit): for each own name, its statement as written and the own
 * names it used, and for a definition whose evaluation reported nothing — no finding, no
 * correlation call — its value. Immutable.
 *
 * <p>A definition's value is a function of its statement's text, the values of the own names it
 * uses, and what the document sees from outside (the library, used files, the settings and the
 * transition Reynolds number). The next run takes a value over only when all of these are as
 * they were ({@link #fits}, {@link #unchanged}) and the names it uses kept their values — so an
 * edit re-evaluates exactly the definitions downstream of what it changed, and stops where a
 * re-evaluated value comes out as before. A definition that reported something is always
 * evaluated again, so every finding is made afresh at its current place.
 * {@code IncrementalEvaluationTest} compares this with fresh runs after thousands of random edits.
 */
final class ReusableValues {
    /** Nothing to reuse: a first run. */
    static final ReusableValues NONE = new ReusableValues(null, null, null, null, null, null, Map.of(), 0, null);

    /**
     * One own name as the run left it.
     *
     * @param span where its statement was written in {@code text}
     * @param binding its value, null for a name that has none (a function, a table)
     * @param quiet whether its evaluation reported nothing, so that its value may be taken over
     * @param statement the statement itself: a reparse hands the very same object back for a
     *     statement before the edit, which then needs no comparing and no moving
     * @param row the row made for it
     */
    record Entry(Span span, Set<String> uses, Binding.ValueBinding binding, boolean quiet, Statement statement, Row row) {
    }

    private final Path file;
    private final String text;
    private final Settings settings;
    private final Double transition;
    private final Object library;
    private final Map<String, Binding> imported;
    private final Map<String, Entry> entries;
    private final int takenOver;
    /** The run's dependency order and the graph it ordered; null for none. */
    private final DependencyOrder.Memo order;

    /**
     * @param library the library's names (the same object for the same library)
     * @param takenOver how many values the run that made these took over from the one before it
     * @param order the run's dependency order, which depends on nothing but the graph it orders
     */
    ReusableValues(Path file, String text, Settings settings, Double transition, Object library,
                   Map<String, Binding> imported, Map<String, Entry> entries, int takenOver, DependencyOrder.Memo order) {
        this.takenOver = takenOver;
        this.order = order;
        this.file = file;
        this.text = text;
        this.settings = settings;
        this.transition = transition;
        this.library = library;
        this.imported = imported;
        // Handed over by the run that made them, which keeps no reference: not copied.
        this.entries = Collections.unmodifiableMap(entries);
    }

    /** Whether a run of {@code file} with these surroundings may take anything over from this one. */
    boolean fits(Path file, Settings settings, Double transition, Object library, Map<String, Binding> imported) {
        return this.file != null && this.file.equals(file) && this.settings.equals(settings)
            && Objects.equals(this.transition, transition) && this.library == library && this.imported.equals(imported);
    }

    /** The run's dependency order with its graph, for the planner of the next run; null for none. */
    DependencyOrder.Memo order() {
        return order;
    }

    /** How many values the run that made these took over from the run before it (for tests and benchmarks). */
    int takenOver() {
        return takenOver;
    }

    Entry entry(String name) {
        return entries.get(name);
    }

    /**
     * Whether {@code s}, written in {@code now}, reads exactly as {@code name}'s statement did here
     * and uses the same own names.
     */
    boolean unchanged(String name, Statement s, String now, Set<String> uses) {
        Entry e = entries.get(name);
        if (e == null) return false;
        if (e.statement() == s) return sameInOrder(e.uses(), uses);
        Span was = e.span();
        Span is = s.span();
        return was.end() - was.start() == is.end() - is.start()
            && now.regionMatches(is.start(), text, was.start(), is.end() - is.start()) && sameInOrder(e.uses(), uses);
    }

    /**
     * Whether two statements' uses are equal, for statements written alike: their names come in
     * the order they are written, so equal sets list them in the same order, and a walk in step
     * is cheaper than a set comparison.
     */
    private static boolean sameInOrder(Set<String> a, Set<String> b) {
        if (a.size() != b.size()) return false;
        var i = b.iterator();
        for (String name : a) {
            if (!name.equals(i.next())) return false;
        }
        return true;
    }

    /**
     * Where the earlier run's unchanged statements stand now. A value remembers the places of the
     * lengths written as numbers it was made from (its {@link Shape} names them {@code #offset}, so
     * that two written lengths stay two symbols): a value taken over must name them where they are
     * now, as a fresh run would. Filled in evaluation order, so a value's own statement and those
     * of the names it uses are known when it is moved.
     */
    static final class Moves {
        /** Each unchanged statement's earlier start and end, and how far it moved: appended, sorted when first read. */
        private long[] moves = new long[64];
        private int count;
        private boolean sorted = true;
        private boolean moved;

        void add(Span was, Span is) {
            if (count * 2 == moves.length) moves = java.util.Arrays.copyOf(moves, moves.length * 2);
            // Packed so that sorting the longs sorts by earlier start.
            moves[2 * count] = ((long) was.start() << 32) | (was.end() & 0xffffffffL);
            moves[2 * count + 1] = is.start() - was.start();
            moved |= is.start() != was.start();
            if (count > 0 && moves[2 * count] < moves[2 * count - 2]) sorted = false;
            count++;
        }

        /**
         * The binding with every written length it remembers moved to where it is now, at the
         * place {@code name} is written now; null when one of them lies outside every unchanged
         * statement (the value cannot be taken over).
         */
        Binding.ValueBinding moved(Binding.ValueBinding b, Span name) {
            if (b.span().equals(name) && !byAnyMove()) return b;
            Value v = b.value();
            Shape shape = v.notes() == null ? null : v.notes().shape();
            if (shape != null && remembersPlaces(shape)) {
                Map<String, Integer> lengths = new HashMap<>();
                for (var e : shape.lengths().entrySet()) {
                    String key = e.getKey();
                    if (key.startsWith("#")) {
                        int at = Integer.parseInt(key.substring(1));
                        Integer by = movedBy(at);
                        if (by == null) return null;
                        key = "#" + (at + by);
                    }
                    lengths.put(key, e.getValue());
                }
                v = v.noted(v.notes().withShape(new Shape(shape.factor(), lengths)));
            }
            return new Binding.ValueBinding(b.file(), name, v, b.display(), b.basis(), b.input(), b.origin(), b.note(),
                b.trajectory());
        }

        /** Whether any unchanged statement so far moved (most edits leave everything before them in place). */
        private boolean byAnyMove() {
            return moved;
        }

        private static boolean remembersPlaces(Shape shape) {
            for (String k : shape.lengths().keySet()) {
                if (k.startsWith("#")) return true;
            }
            return false;
        }

        /** How far the unchanged statement holding earlier offset {@code at} moved; null when none holds it. */
        private Integer movedBy(int at) {
            if (!sorted) {
                long[][] pairs = new long[count][];
                for (int i = 0; i < count; i++) pairs[i] = new long[] {moves[2 * i], moves[2 * i + 1]};
                java.util.Arrays.sort(pairs, java.util.Comparator.comparingLong(p -> p[0]));
                for (int i = 0; i < count; i++) {
                    moves[2 * i] = pairs[i][0];
                    moves[2 * i + 1] = pairs[i][1];
                }
                sorted = true;
            }
            int low = 0;
            int high = count - 1;
            int found = -1;
            while (low <= high) {
                int mid = (low + high) >>> 1;
                if ((int) (moves[2 * mid] >>> 32) <= at) {
                    found = mid;
                    low = mid + 1;
                } else {
                    high = mid - 1;
                }
            }
            if (found < 0 || at >= (int) moves[2 * found]) return null;
            return (int) moves[2 * found + 1];
        }
    }

    /** Whether two bindings of a name give the same value, shown the same way (where they are written aside). */
    static boolean sameValue(Binding.ValueBinding a, Binding.ValueBinding b) {
        return a != null && b != null && a.value().equals(b.value()) && Objects.equals(a.display(), b.display())
            && Objects.equals(a.basis(), b.basis()) && a.input() == b.input() && Objects.equals(a.origin(), b.origin())
            && Objects.equals(a.note(), b.note()) && Objects.equals(a.trajectory(), b.trajectory());
    }
}
