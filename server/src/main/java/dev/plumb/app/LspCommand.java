package dev.plumb.app;

import dev.plumb.lsp.LspMain;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;

/** `plumb lsp`: start the language server on stdin/stdout for an editor. */
@Command(name = "lsp", mixinStandardHelpOptions = true,
    description = "Start the language server (LSP over stdin/stdout) for an editor.")
final class LspCommand implements Callable<Integer> {
    @Override
    public Integer call() {
        return LspMain.run(BuildInfo.load().version());
    }
}
