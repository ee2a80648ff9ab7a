package dev.plumb.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/** Expands the paths given on the command line into calc files. */
final class PlumbFiles {
    private PlumbFiles() {
    }

    /** Files as given, and every *.plumb below each folder, sorted. Throws for a missing path. */
    static List<Path> expand(List<Path> paths) throws NoSuchPath {
        List<Path> out = new ArrayList<>();
        for (Path p : paths) {
            if (Files.isDirectory(p)) {
                try (Stream<Path> walk = Files.walk(p)) {
                    walk.filter(f -> f.toString().endsWith(".plumb") && Files.isRegularFile(f)).sorted().forEach(out::add);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            } else if (Files.exists(p)) {
                out.add(p);
            } else {
                throw new NoSuchPath(p);
            }
        }
        return out;
    }

    static final class NoSuchPath extends Exception {
        NoSuchPath(Path p) {
            super("no such file or folder: " + p);
        }
    }
}
