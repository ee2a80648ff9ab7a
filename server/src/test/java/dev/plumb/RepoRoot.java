package dev.plumb;

import java.nio.file.Files;
import java.nio.file.Path;

/** The repository's root folder, for tests that read samples, docs or the README. */
public final class RepoRoot {
    private RepoRoot() {
    }

    /** Set by Surefire as plumb.repo.root; else found by walking up to the folder with samples/ and grammar/. */
    public static Path get() {
        String configured = System.getProperty("plumb.repo.root");
        if (configured != null && !configured.isBlank() && !configured.contains("${") && isRoot(Path.of(configured))) {
            return Path.of(configured);
        }
        for (Path p = Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            if (isRoot(p)) return p;
        }
        throw new IllegalStateException("cannot find the repository root (a folder with samples/ and grammar/)");
    }

    /** Every calc of the samples and of the diagnostics fixtures, in path order: what whole-engine tests run over. */
    public static java.util.List<Path> calcs() throws java.io.IOException {
        Path root = get();
        try (java.util.stream.Stream<Path> s = java.util.stream.Stream.concat(Files.walk(root.resolve("samples")),
            Files.walk(root.resolve("server/src/test/resources/diagnostics")))) {
            return s.filter(p -> p.toString().endsWith(".plumb")).sorted().collect(java.util.stream.Collectors.toList());
        }
    }

    private static boolean isRoot(Path p) {
        return Files.isDirectory(p.resolve("samples")) && Files.isDirectory(p.resolve("grammar"));
    }
}
