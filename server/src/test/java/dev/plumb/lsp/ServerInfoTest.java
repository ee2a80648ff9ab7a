package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.InitializeParams;
import org.junit.jupiter.api.Test;

/** The server names the version the build recorded (passed in by `plumb lsp`), not a number written by hand. */
class ServerInfoTest {
    @Test
    void initializeNamesTheBuildsVersion() throws Exception {
        PlumbLanguageServer server = new PlumbLanguageServer("2.3.4-test");
        var info = server.initialize(new InitializeParams()).get(10, TimeUnit.SECONDS).getServerInfo();
        assertEquals("plumb", info.getName());
        assertEquals("2.3.4-test", info.getVersion());
        server.shutdown().get(10, TimeUnit.SECONDS);
    }
}
