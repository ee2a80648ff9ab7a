package dev.plumb.present;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;

/**
 * The values of used files that a calc uses by name: they are its inputs as much as its own, so
 * every listing of its values shows them, with where they come from and their notes.
 */
public final class UsedValues {
    private UsedValues() {
    }

    /** One used value: its name, binding (value, display unit, note) and the file that defines it. */
    public record Used(String name, Binding.ValueBinding binding, Path file) {
    }

    /** File by file in the order of the calc's `use` lines, each file's values in the order it defines them. */
    public static List<Used> of(Analysis a) {
        List<Used> out = new ArrayList<>();
        for (Path file : a.imports()) {
            List<Used> fromFile = new ArrayList<>();
            for (String name : a.importedUses().getOrDefault(file, Set.of())) {
                if (a.scope().lookup(name) instanceof Binding.ValueBinding v) fromFile.add(new Used(name, v, file));
            }
            fromFile.sort(Comparator.comparingInt((Used u) -> u.binding().span().start()).thenComparing(Used::name));
            out.addAll(fromFile);
        }
        return out;
    }

    /** The used file's path as seen from the calc's folder (as written in its `use` line, usually). */
    public static String relative(Analysis a, Path file) {
        Path dir = a.file() == null ? null : a.file().toAbsolutePath().getParent();
        try {
            return dir == null ? file.toString() : dir.relativize(file.toAbsolutePath()).toString();
        } catch (IllegalArgumentException e) {
            return file.toString();
        }
    }
}
