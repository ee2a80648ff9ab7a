package dev.plumb.lsp;

import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.util.concurrent.ExecutionException;

/** `plumb lsp`: the language server on stdin/stdout. Stray prints go to stderr, never the protocol. */
public final class LspMain {
    private LspMain() {
    }

    /** @param version the program's version as the build recorded it, which the server names at initialize */
    public static int run(String version) {
        InputStream in = System.in;
        OutputStream out = new FileOutputStream(FileDescriptor.out);
        // Stray prints and our own notes go to stderr, in UTF-8 whatever the locale.
        PrintStream err = new PrintStream(new FileOutputStream(FileDescriptor.err), true, java.nio.charset.StandardCharsets.UTF_8);
        System.setOut(err);
        System.setErr(err);
        // Read and check the whole standard library while editor and server shake hands, so that
        // neither the first document's diagnostics nor the first completion waits for a file.
        Thread library = new Thread(() -> dev.plumb.analysis.Stdlib.get().files(), "plumb-library");
        library.setDaemon(true);
        library.start();
        PlumbLanguageServer server = new PlumbLanguageServer(version);
        var launcher = PlumbLauncher.create(server, in, out, err);
        try {
            launcher.startListening().get();
            return 0;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return 1;
        } catch (ExecutionException e) {
            System.err.println("plumb lsp: " + e.getCause());
            return 1;
        }
    }
}
