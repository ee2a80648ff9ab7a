package dev.plumb.app;

import dev.plumb.cli.Main;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.Map;

/**
 * The `plumb` program: the command line, with the language server as one more command. The only
 * place that knows both adapters; each of them knows only the engine.
 */
public final class Plumb {
    private Plumb() {
    }

    public static void main(String[] args) {
        System.exit(Main.run(args, new PrintStream(System.out, true, StandardCharsets.UTF_8),
            new PrintStream(System.err, true, StandardCharsets.UTF_8), Map.of("lsp", new LspCommand()),
            BuildInfo.load()));
    }
}
