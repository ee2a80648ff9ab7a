package dev.plumb.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/** Runs the command line in-process and keeps what it printed. */
record Cli(int exitCode, String out, String err) {

    static Cli run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Cli(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** Writes a calc into a workspace folder (it gets a .git marker), making folders as needed. */
    static java.nio.file.Path write(java.nio.file.Path dir, String name, String text) throws java.io.IOException {
        java.nio.file.Files.createDirectories(dir.resolve(".git"));
        java.nio.file.Path p = dir.resolve(name);
        java.nio.file.Files.createDirectories(p.getParent());
        java.nio.file.Files.writeString(p, text);
        return p;
    }
}
