package dev.plumb.lsp;

import com.google.gson.JsonObject;
import dev.plumb.bench.GeneratedCalc;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;

/**
 * Prints the language server's latencies over real JSON-RPC in one process: didChange to
 * publishDiagnostics on generated 1,000- and 10,000-line documents (debounce set to 0 so the
 * figure is the server's own work), for the first edits after opening and again once the JIT has
 * compiled the engine; completion; heap with 50 open 1,000-line documents.
 * Run: {@code mvn -B -q -pl server test-compile exec:java -Dexec.classpathScope=test
 * -Dexec.mainClass=dev.plumb.lsp.LspBenchmark}. Figures only; nothing here asserts a time.
 */
public final class LspBenchmark {
    private LspBenchmark() {
    }

    /** Times {@code runs} keystrokes after {@code warmUp} untimed ones; milliseconds, sorted. */
    private static double[] edits(TestClient client, String uri, int[] version, int warmUp, int runs) throws Exception {
        double[] ms = new double[runs];
        for (int i = -warmUp; i < runs; i++) {
            version[0]++;
            // Retype the gust speed on line 7 (`input V_0 = 20 m/s`) back and forth: a keystroke
            // whose value runs through the rest of its case.
            String digit = version[0] % 2 == 0 ? "21" : "22";
            long t0 = System.nanoTime();
            client.remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
                new VersionedTextDocumentIdentifier(uri, version[0]), List.of(new TextDocumentContentChangeEvent(
                    new Range(new Position(6, 12), new Position(6, 14)), digit))));
            client.diagnostics(uri, version[0]);
            if (i >= 0) ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        Arrays.sort(ms);
        return ms;
    }

    private static void report(String phase, int lines, double[] ms) {
        System.out.printf("didChange → publishDiagnostics, %6d lines, %-24s median %6.1f ms  p90 %6.1f ms  min %6.1f ms%n",
            lines, phase + ":", ms[ms.length / 2], ms[(int) (ms.length * 0.9)], ms[0]);
    }

    public static void main(String[] args) throws Exception {
        JsonObject options = new JsonObject();
        options.addProperty("debounceMs", 0);
        // A client with inlay hints, as current editors are: values are not sent as diagnostics.
        TestClient client = new TestClient(TestClient.withInlayHints(), options);
        Path dir = Files.createTempDirectory("plumb-lsp-bench");
        Files.createDirectories(dir.resolve(".git"));
        System.out.printf("Plumb language server benchmark — %d cores, %s %s%n", Runtime.getRuntime().availableProcessors(),
            System.getProperty("java.vm.name"), System.getProperty("java.version"));
        for (int lines : new int[] {1_000, 10_000}) {
            String text = GeneratedCalc.of(lines);
            String uri = client.openAnalysed(dir.resolve("doc" + lines + ".plumb"), text);
            int[] version = {1};
            int runs = lines >= 10_000 ? 30 : 60;
            // The first edits after opening run while the JIT is still compiling: report them
            // apart from the steady state an engineer typing for a minute sees.
            int count = text.split("\n").length;
            report("first edits after open", count, edits(client, uri, version, 10, runs));
            edits(client, uri, version, lines >= 10_000 ? 100 : 300, 0);
            report("warm (after many edits)", count, edits(client, uri, version, 0, runs));
            double[] comp = new double[40];
            for (int i = -10; i < comp.length; i++) {
                long t0 = System.nanoTime();
                client.remote.getTextDocumentService().completion(new CompletionParams(new TextDocumentIdentifier(uri),
                    new Position(6, 12))).get(10, TimeUnit.SECONDS);
                if (i >= 0) comp[i] = (System.nanoTime() - t0) / 1e6;
            }
            Arrays.sort(comp);
            System.out.printf("completion,                      %6d lines, %-24s median %6.1f ms  p90 %6.1f ms%n",
                count, "warm:", comp[comp.length / 2], comp[(int) (comp.length * 0.9)]);
        }
        // A short calc that uses a long file: each keystroke here need not analyse that file again.
        Files.writeString(dir.resolve("lib.plumb"), GeneratedCalc.of(1_000));
        String small = "use \"lib.plumb\"\ntitle \"Uses a long file\"\nsection \"Here\"\n# A short calc on a long one.\n"
            + "x_0 = q_0 * 2   in Pa\ny_0 = F_0 + 1 kN\ninput Z_0 = 20 m/s \"gust\"\ncheck Z_0 < 40 m/s\n";
        String user = client.openAnalysed(dir.resolve("user.plumb"), small);
        int[] userVersion = {1};
        edits(client, user, userVersion, 300, 0);
        System.out.printf("didChange → publishDiagnostics, %6d lines using a file of 1,004 lines, warm: ", small.split("\n").length);
        double[] using = edits(client, user, userVersion, 0, 60);
        System.out.printf("median %6.1f ms  p90 %6.1f ms%n", using[30], using[54]);
        for (int i = 0; i < 50; i++) client.openAnalysed(dir.resolve("open" + i + ".plumb"), GeneratedCalc.of(1_000));
        for (int i = 0; i < 3; i++) {
            System.gc();
            Thread.sleep(200);
        }
        long used = ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
        System.out.printf("heap in use with 52 open documents (50 of 1,000 lines, one of 10,000): %.0f MB%n", used / 1e6);
        // The whole process (client and server share it here), as the operating system counts it.
        Path status = Path.of("/proc/self/status");
        if (Files.exists(status)) {
            Files.readAllLines(status).stream().filter(l -> l.startsWith("VmRSS")).findFirst()
                .ifPresent(l -> System.out.println("resident set of the process: " + l.substring(6).trim()));
        }
        TestClient.close(client);
        System.exit(0);
    }
}
