package dev.plumb.analysis;

import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Unit;
import java.nio.file.Path;

/** What a name stands for in a document's scope. */
public sealed interface Binding {
    /** The file that defines it (null for built-ins). */
    Path file();

    /** Where it is defined (NONE for built-ins). */
    Span span();

    /**
     * A value: an input, a derived value or a built-in constant; origin is set for a correlation's
     * result, note to its source note (null for none), so files that use it can show where it comes from.
     * A state of a motion (and its time) carries the motion's {@link Trajectory}: the state at a
     * time inside it is {@code NAME(TIME)}; null for every other value.
     */
    record ValueBinding(Path file, Span span, Value value, Unit display, String basis, boolean input, Origin origin,
                        String note, Trajectory trajectory) implements Binding {
        /** A value that is not a state of a motion. */
        public ValueBinding(Path file, Span span, Value value, Unit display, String basis, boolean input, Origin origin,
                            String note) {
            this(file, span, value, display, basis, input, origin, note, null);
        }
    }

    /** A correlation, with the scope of the file that defines it. */
    record CorrelationBinding(Path file, Span span, Statement.Correlation def, Scope scope, boolean circular)
        implements Binding {
    }

    /**
     * One output column of a table: {@code name} is "table.column" (or the table's own name when it
     * has a single output column).
     */
    record TableBinding(Path file, Span span, String name, Statement.Table def, TableData data, Scope scope)
        implements Binding {
    }

    /**
     * A user function, with the scope of the file that defines it. A circular function (one
     * that calls itself, directly or through others) is never called: its error is reported once
     * and its calls are unknown.
     */
    record FunctionBinding(Path file, Span span, Statement.Function def, Scope scope, boolean circular)
        implements Binding {
    }

    /** A built-in function such as sqrt. */
    record BuiltinFunction(String name, int minArgs, int maxArgs, String signature) implements Binding {
        @Override
        public Path file() {
            return null;
        }

        @Override
        public Span span() {
            return Span.NONE;
        }
    }
}
