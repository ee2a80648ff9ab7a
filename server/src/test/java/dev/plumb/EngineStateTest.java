package dev.plumb;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The engine keeps no state between calls: every class of the engine's packages has only
 * final static fields, and none of them holds a collection or an array that could still be
 * changed. Context (the library, the units, the settings, cancellation) travels with the call.
 */
class EngineStateTest {
    private static final List<String> ENGINE = List.of("diagnostics", "syntax", "units", "analysis");

    /**
     * Static fields that hold state on purpose, each with its reason. A thread-local flag is not
     * shared between calls: it says whether the current thread already has a deep stack.
     */
    private static final Map<String, String> ALLOWED = Map.of(
        "dev.plumb.analysis.DeepStack.DEEP", "per-thread flag: is this thread one of our deep-stack threads");

    @Test
    void noClassOfTheEngineHoldsChangeableStaticState() throws Exception {
        Path classes = Path.of("target/classes/dev/plumb");
        List<String> problems = new ArrayList<>();
        for (String pkg : ENGINE) {
            for (Class<?> c : classesOf(classes.resolve(pkg), "dev.plumb." + pkg)) {
                for (Field f : c.getDeclaredFields()) {
                    if (!Modifier.isStatic(f.getModifiers()) || f.isSynthetic()) continue;
                    String name = c.getName() + "." + f.getName();
                    if (ALLOWED.containsKey(name) || f.isEnumConstant() || f.getName().equals("$VALUES")) continue;
                    String why = problem(f);
                    if (why != null) problems.add(name + ": " + why);
                }
            }
        }
        assertEquals(List.of(), problems);
    }

    private static String problem(Field f) throws IllegalAccessException {
        if (!Modifier.isFinal(f.getModifiers())) return "a static field that is not final";
        if (f.getType().isArray()) return "a static array (its elements can be changed): use List.of";
        f.setAccessible(true);
        Object value = f.get(null);
        if ((value instanceof Collection || value instanceof Map) && modifiable(value)) {
            return "a static collection that can be changed (" + value.getClass().getName() + ")";
        }
        return null;
    }

    /** Immutable collections of the JDK say so in their class names; everything else may change. */
    private static boolean modifiable(Object collection) {
        String type = collection.getClass().getName();
        return !(type.startsWith("java.util.ImmutableCollections") || type.startsWith("java.util.Collections$Unmodifiable")
            || type.startsWith("java.util.Collections$Empty") || type.startsWith("java.util.Collections$Singleton"));
    }

    private static List<Class<?>> classesOf(Path folder, String pkg) throws IOException, ClassNotFoundException {
        List<Class<?>> out = new ArrayList<>();
        try (Stream<Path> files = Files.list(folder)) {
            for (Path p : files.filter(x -> x.toString().endsWith(".class")).toList()) {
                String simple = p.getFileName().toString().replace(".class", "");
                out.add(Class.forName(pkg + "." + simple, true, EngineStateTest.class.getClassLoader()));
            }
        }
        return out;
    }
}
