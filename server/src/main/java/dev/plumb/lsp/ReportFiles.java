package dev.plumb.lsp;

import dev.plumb.analysis.DiskReads;
import dev.plumb.analysis.Sources;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Where the editor's report of a calc is written, and how. Beside the calc as NAME.html when
 * the calc is a saved file that, like its folder, lies inside its workspace (real paths, as for
 * every read: {@link DiskReads#insideRoot}) and the folder can be written; otherwise in a
 * temporary folder of this server's own. Nothing is written anywhere else.
 *
 * <p>A calc from someone else may come with a NAME.html that is a link to a file of the
 * engineer's outside the workspace. The report is therefore written to a new file of its own
 * (created exclusively, so never through a link) and then renamed over NAME.html: a rename
 * replaces a link, it never writes to where the link points.
 */
final class ReportFiles {
    /** A written report: the file, and when it is not beside the calc, why not (in words). */
    record Written(Path file, String whyNotBeside) {
        boolean beside() {
            return whyNotBeside == null;
        }
    }

    private final Sources workspaces;
    private Path temporary;

    /** {@code workspaces} decides each calc's workspace root, as it does for reading. */
    ReportFiles(Sources workspaces) {
        this.workspaces = workspaces;
    }

    /** The report's file name: the calc's name with .html for .plumb, as `plumb report` names it. */
    static String name(Path calc) {
        return calc.getFileName().toString().replaceFirst("\\.plumb$", "") + ".html";
    }

    /** The calc's path as a reader of the report knows it: from its workspace root, else its name. */
    String shownPath(Path calc) {
        if (!workspaces.workspaceMarked(calc)) return calc.getFileName().toString();
        Path relative = workspaces.workspaceRoot(calc).relativize(calc.toAbsolutePath().normalize());
        return relative.toString().replace(java.io.File.separatorChar, '/');
    }

    /** Writes the page beside the calc if it may go there, else to the temporary folder. */
    Written write(Path calc, String html) throws IOException {
        String why = whyNotBeside(calc);
        if (why == null) {
            try {
                return new Written(replace(calc.toAbsolutePath().normalize().getParent(), name(calc), html), null);
            } catch (IOException | SecurityException e) {
                why = "writing beside it failed (" + reason(e) + ")";
            }
        }
        return new Written(replace(temporaryFolder(), name(calc), html), why);
    }

    /** Null when the report may be written beside the calc, else the reason it may not. */
    private String whyNotBeside(Path calc) {
        try {
            Path file = calc.toAbsolutePath().normalize();
            Path folder = file.getParent();
            if (folder == null || !Files.isRegularFile(file)) return "the calc is not saved as a file";
            Path root = workspaces.workspaceRoot(file);
            if (!DiskReads.insideRoot(file, root) || !DiskReads.insideRoot(folder, root)) {
                return "the calc or its folder lies outside the workspace";
            }
            if (!Files.isWritable(folder)) return "its folder cannot be written";
            return null;
        } catch (SecurityException e) {
            return "its folder cannot be checked";
        }
    }

    /** The server's own folder for reports that cannot go beside their calc; made on first use, private to the user. */
    private synchronized Path temporaryFolder() throws IOException {
        if (temporary == null || !Files.isDirectory(temporary)) temporary = Files.createTempDirectory("plumb-reports-");
        return temporary;
    }

    /** Writes {@code folder/name} whole or not at all, replacing what is there (a link included) without following it. */
    private static Path replace(Path folder, String name, String html) throws IOException {
        Path target = folder.resolve(name);
        Path part = folder.resolve(".plumb-report-" + Long.toHexString(ThreadLocalRandom.current().nextLong()) + ".part");
        try {
            Files.writeString(part, html, StandardCharsets.UTF_8, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
            Files.move(part, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            try {
                Files.deleteIfExists(part);
            } catch (IOException e) {
                // Only a failed write leaves the part behind; the failure itself is what the caller hears of.
            }
        }
        return target;
    }

    private static String reason(Exception e) {
        if (e instanceof FileSystemException f && f.getReason() != null) return f.getReason();
        return e.getClass().getSimpleName();
    }
}
