package dev.plumb.lsp;

import dev.plumb.bench.GeneratedCalc;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Prints the resident memory of the language server as an editor runs it, and how soon a
 * freshly started server answers: {@code java -jar
 * server/target/plumb.jar lsp} as a process of its own, with 50 generated 1,000-line documents
 * open and analysed: with the JVM's default heap settings, with {@code -Xmx256m}, and with a
 * small heap and the serial collector.
 * Run after {@code mvn -B -q install -DskipTests}: {@code mvn -B -q -pl server exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=dev.plumb.lsp.LspMemoryBenchmark}. Linux only
 * (reads /proc); figures only, nothing asserted.
 */
public final class LspMemoryBenchmark {
    private LspMemoryBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        // From the repository root or from server/, as Maven happens to start it.
        Path jar = Path.of(System.getProperty("plumb.jar", Files.exists(Path.of("server")) ? "server/target/plumb.jar"
            : "target/plumb.jar")).toAbsolutePath();
        if (!Files.exists(jar)) throw new IllegalStateException("no server jar at " + jar + ": run mvn install first");
        System.out.printf("Plumb language server memory — %d cores, %s %s%n", Runtime.getRuntime().availableProcessors(),
            System.getProperty("java.vm.name"), System.getProperty("java.version"));
        for (List<String> jvm : List.of(List.<String>of(), List.of("-Xmx256m"), List.of("-Xmx128m", "-XX:+UseSerialGC"))) {
            measure(jar, jvm);
        }
        System.exit(0);
    }

    private static void measure(Path jar, List<String> jvmOptions) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString()));
        command.addAll(jvmOptions);
        command.addAll(List.of("-jar", jar.toString(), "lsp"));
        long started = System.nanoTime();
        Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        TestClient client = new TestClient(p, TestClient.withInlayHints(), null);
        long initialized = System.nanoTime();
        Path dir = Files.createTempDirectory("plumb-lsp-memory");
        Files.createDirectories(dir.resolve(".git"));
        String label = jvmOptions.isEmpty() ? "default heap" : String.join(" ", jvmOptions);
        System.out.printf("%-30s server started:                     resident %s%n", label, rss(p.pid()));
        for (int i = 0; i < 50; i++) {
            client.openAnalysed(dir.resolve("doc" + i + ".plumb"), GeneratedCalc.of(1_000));
            if (i == 0) {
                System.out.printf("%-30s start → initialized %d ms; first document's diagnostics %d ms later%n", label,
                    (initialized - started) / 1_000_000, (System.nanoTime() - initialized) / 1_000_000);
            }
        }
        Thread.sleep(2_000);
        System.out.printf("%-30s 50 open documents of 1,000 lines:   resident %s (peak %s)%n", label, rss(p.pid()),
            status(p.pid(), "VmHWM"));
        client.remote.shutdown().get();
        client.remote.exit();
        p.waitFor();
    }

    private static String rss(long pid) throws Exception {
        return status(pid, "VmRSS");
    }

    private static String status(long pid, String key) throws Exception {
        for (String line : Files.readAllLines(Path.of("/proc", Long.toString(pid), "status"))) {
            if (line.startsWith(key + ":")) return line.substring(key.length() + 1).trim();
        }
        return "?";
    }
}
