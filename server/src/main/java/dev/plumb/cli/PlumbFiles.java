package dev.plumb.cli;

import java.io.IOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;

/** Expands the paths given on the command line into calc files. */
final class PlumbFiles {
    private PlumbFiles() {
    }

    /** A folder (or file) below a given folder that could not be read, and why. */
    record Unreadable(Path path, String reason) {
    }

    /** The calc files found, sorted, and the places below the folders that could not be read. */
    record Expanded(List<Path> files, List<Unreadable> unreadable) {
    }

    /**
     * Files as given, and every *.plumb below each folder, sorted. Links to folders are not
     * followed; a link to a file is listed and left to the engine's reading rules. A folder that
     * cannot be read is listed as unreadable and the walk goes on. Throws for a missing path.
     */
    /**
     * The calcs under {@code paths} for a command that reads them; null after saying on {@code err}
     * why there is nothing to read (a path that does not exist, or no .plumb file anywhere), which
     * is a usage problem (exit 2).
     */
    static Expanded expandOrSay(List<Path> paths, java.io.PrintWriter err) {
        Expanded expanded;
        try {
            expanded = expand(paths);
        } catch (NoSuchPath e) {
            err.println("plumb: " + dev.plumb.diagnostics.Printable.line(e.getMessage()));
            return null;
        }
        if (expanded.files().isEmpty() && expanded.unreadable().isEmpty()) {
            err.println("plumb: no .plumb files in " + dev.plumb.diagnostics.Printable.line(paths.toString()));
            return null;
        }
        return expanded;
    }

    static Expanded expand(List<Path> paths) throws NoSuchPath {
        List<Path> out = new ArrayList<>();
        List<Unreadable> unreadable = new ArrayList<>();
        for (Path p : paths) {
            if (Files.isDirectory(p)) {
                List<Path> found = new ArrayList<>();
                walk(p, found, unreadable);
                found.stream().sorted().forEach(out::add);
            } else if (Files.exists(p) || Files.isSymbolicLink(p)) {
                out.add(p);
            } else {
                throw new NoSuchPath(p);
            }
        }
        return new Expanded(out, unreadable);
    }

    private static void walk(Path folder, List<Path> found, List<Unreadable> unreadable) {
        try {
            Files.walkFileTree(folder, new Walk(found, unreadable));
        } catch (IOException e) {
            unreadable.add(new Unreadable(folder, reason(e)));
        }
    }

    /** Collects calc files; a place that cannot be read is noted and the walk goes on. */
    static final class Walk extends SimpleFileVisitor<Path> {
        private final List<Path> found;
        private final List<Unreadable> unreadable;

        Walk(List<Path> found, List<Unreadable> unreadable) {
            this.found = found;
            this.unreadable = unreadable;
        }

        @Override
        public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
            if (file.getFileName().toString().endsWith(".plumb") && (attrs.isRegularFile() || attrs.isSymbolicLink())) {
                found.add(file);
            }
            return FileVisitResult.CONTINUE;
        }

        @Override
        public FileVisitResult visitFileFailed(Path file, IOException e) {
            unreadable.add(new Unreadable(file, reason(e)));
            return FileVisitResult.CONTINUE;
        }

        @Override
        public FileVisitResult postVisitDirectory(Path dir, IOException e) {
            if (e != null) unreadable.add(new Unreadable(dir, reason(e)));
            return FileVisitResult.CONTINUE;
        }
    }

    private static String reason(IOException e) {
        return e instanceof java.nio.file.AccessDeniedException ? "permission denied" : e.getClass().getSimpleName();
    }

    static final class NoSuchPath extends Exception {
        NoSuchPath(Path p) {
            super("no such file or folder: " + p);
        }
    }
}
