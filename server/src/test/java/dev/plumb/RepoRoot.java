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

    private static boolean isRoot(Path p) {
        return Files.isDirectory(p.resolve("samples")) && Files.isDirectory(p.resolve("grammar"));
    }
}
