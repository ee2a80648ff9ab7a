package dev.plumb;

import dev.plumb.analysis.DiskReadsTest;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * A workspace built to leak, once per test run, in a temporary folder: a folder outside it holding
 * a secret calc, and inside it links to that folder, to `/`, to /dev/zero and /dev/stdin, a FIFO,
 * and a `.plumb` link to a `.env` file. What any of them holds must never be shown.
 */
record HostileWorkspace(Path root) {
    /** A name the secret files define; a document that uses it must find it unknown. */
    static final String SECRET = "hunter2_token";
    /** Texts that exist only in files that must not be read. */
    static final List<String> CONTENTS = List.of(SECRET + " = ", "root:x:0:0", "ENV_PASSWORD_VALUE");
    /** The paths a fuzzed document may `use`. */
    static final List<String> PATHS = List.of("linkdir/secret.plumb", "rootlink/etc/passwd", "rootlink/etc/hostname",
        "creds.plumb", "env.plumb", "zero.plumb", "stdin.plumb", "pipe.plumb", "../outside/secret.plumb", "ok.plumb");

    private static final class Holder {
        static final HostileWorkspace INSTANCE = build();
    }

    static HostileWorkspace get() {
        return Holder.INSTANCE;
    }

    private static HostileWorkspace build() {
        try {
            Path dir = Files.createTempDirectory("plumb-hostile");
            dir.toFile().deleteOnExit();
            Path outside = Files.createDirectories(dir.resolve("outside"));
            Files.writeString(outside.resolve("secret.plumb"), SECRET + " = 1\n");
            Path ws = Files.createDirectories(dir.resolve("ws"));
            Files.writeString(ws.resolve("plumb.toml"), "");
            Files.writeString(ws.resolve("ok.plumb"), "input L = 2 m\n");
            Files.writeString(ws.resolve(".env"), "ENV_PASSWORD_VALUE = 1\n");
            Files.createSymbolicLink(ws.resolve("linkdir"), outside);
            Files.createSymbolicLink(ws.resolve("rootlink"), Path.of("/"));
            Files.createSymbolicLink(ws.resolve("creds.plumb"), outside.resolve("secret.plumb"));
            Files.createSymbolicLink(ws.resolve("env.plumb"), ws.resolve(".env"));
            Files.createSymbolicLink(ws.resolve("zero.plumb"), Path.of("/dev/zero"));
            Files.createSymbolicLink(ws.resolve("stdin.plumb"), Path.of("/dev/stdin"));
            DiskReadsTest.mkfifo(ws.resolve("pipe.plumb"));
            return new HostileWorkspace(ws);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
