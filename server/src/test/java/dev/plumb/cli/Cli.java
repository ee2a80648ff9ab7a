package dev.plumb.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Runs the command line in-process and keeps what it printed. */
record Cli(int exitCode, String out, String err) {

    static Cli run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Cli(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** The repository root: set by Surefire, else found by walking up from the working folder. */
    static Path repoRoot() {
        String prop = System.getProperty("plumb.repo.root");
        if (prop != null && !prop.isBlank() && Files.isDirectory(Path.of(prop, "samples"))) return Path.of(prop);
        for (Path p = Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            if (Files.isDirectory(p.resolve("samples")) && Files.isDirectory(p.resolve("grammar"))) return p;
        }
        throw new IllegalStateException("cannot find the repository root");
    }
}
