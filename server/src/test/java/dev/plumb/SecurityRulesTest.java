package dev.plumb;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Rules of ARCHITECTURE.md "Untrusted calcs" that the code's text can show: nothing reaches the
 * network or runs a program, and only DiskReads reads a file from disk, so its rules (real paths
 * inside the workspace, regular .plumb files, size limit) hold for every read.
 */
class SecurityRulesTest {
    /** Text that would reach the network, run a program, or load code. */
    private static final List<String> NEVER = List.of("java.net.Socket", "java.net.URL;", "java.net.http", "HttpURLConnection",
        "ProcessBuilder", "Runtime.getRuntime().exec", "URLClassLoader", "javax.script", "ServerSocket", "DatagramSocket");

    /** Calls that read a file's contents, with the one class allowed to make them. */
    private static final Map<String, String> READS = Map.of("Files.readAllBytes", "DiskReads.java",
        "Files.readString", "DiskReads.java", "Files.newInputStream", "DiskReads.java", "Files.lines", "DiskReads.java",
        "Files.newBufferedReader", "DiskReads.java", "FileInputStream", "DiskReads.java", "FileReader", "DiskReads.java",
        "Files.newByteChannel", "DiskReads.java");

    @Test
    void nothingReachesTheNetworkOrRunsAProgramAndOnlyDiskReadsReadsFiles() throws IOException {
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(Path.of("src/main/java/dev/plumb"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String text = Files.readString(f);
                for (String never : NEVER) {
                    if (text.contains(never)) violations.add(f + " uses " + never);
                }
                for (var read : READS.entrySet()) {
                    if (text.contains(read.getKey()) && !f.getFileName().toString().equals(read.getValue())) {
                        violations.add(f + " reads with " + read.getKey() + "; read calcs through Sources (DiskReads)");
                    }
                }
            }
        }
        assertEquals(List.of(), violations);
    }
}
