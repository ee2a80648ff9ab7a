package dev.plumb.analysis;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;

/**
 * The one way a document is read from disk, with the rules that make a calc written by someone
 * else safe to open (see ARCHITECTURE.md, "Untrusted calcs"):
 *
 * <ul>
 *   <li>the file's real path (every symbolic link followed) lies inside the real path of the
 *       workspace root, so a link cannot lead out of the workspace;</li>
 *   <li>a file outside is answered exactly as a missing one, so nothing can be learnt of what
 *       exists outside;</li>
 *   <li>only a regular file whose real name ends in {@code .plumb} is read: a link to a device,
 *       a pipe or the standard input would block or never end, and a link to a file that is not
 *       a calc ({@code .env}) would echo its contents in messages;</li>
 *   <li>at most {@code maxBytes} are read.</li>
 * </ul>
 */
public final class DiskReads {
    /** What a file outside the workspace and a missing file both get. */
    public static final String NO_SUCH_FILE = "no such file in the workspace";
    /** The default size limit of one calc: far above any hand-written calc, far below the heap. */
    public static final long DEFAULT_MAX_BYTES = 2L * 1024 * 1024;

    private DiskReads() {
    }

    /** The document under {@code root}, or why it may not be read. Never blocks on a special file. */
    static Sources.Loaded read(Path file, Path root, long maxBytes) {
        if (!insideRoot(file, root)) return new Sources.Missing(NO_SUCH_FILE);
        Path real;
        try {
            real = file.toRealPath();
        } catch (IOException | SecurityException e) {
            return new Sources.Missing(NO_SUCH_FILE);
        }
        // The real path holds no links, so NOFOLLOW only guards against one appearing in between.
        if (!Files.isRegularFile(real, LinkOption.NOFOLLOW_LINKS)) {
            return new Sources.Missing("it is not a regular file (a folder, a device or a pipe): use a .plumb file");
        }
        if (!real.getFileName().toString().endsWith(".plumb")) {
            // A file the pipeline wrote (.env, credentials) must never be shown as a calc's text.
            return new Sources.Missing(file.getFileName().toString().endsWith(".plumb")
                ? "it is a link to a file that is not a .plumb file: use the calc itself"
                : "it is not a .plumb file: only calcs are read, so give the file the .plumb extension");
        }
        byte[] bytes;
        try (InputStream in = Files.newInputStream(real, LinkOption.NOFOLLOW_LINKS)) {
            bytes = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, maxBytes + 1));
        } catch (IOException | SecurityException e) {
            return new Sources.Missing("it cannot be read (" + e.getClass().getSimpleName() + "): check its permissions");
        }
        if (bytes.length > maxBytes) return new Sources.Missing(tooLarge(maxBytes));
        return FileSources.decode(bytes);
    }

    /** Whether a text, as UTF-8, is longer than {@code maxBytes}. */
    public static boolean exceeds(String text, long maxBytes) {
        if (text.length() <= maxBytes / 3) return false;
        return text.getBytes(java.nio.charset.StandardCharsets.UTF_8).length > maxBytes;
    }

    /** Why a document is refused for its size. */
    public static String tooLarge(long maxBytes) {
        return "it is larger than " + size(maxBytes) + ", the limit for one calc: split it into files that `use` "
            + "each other, or raise the limit (--max-file-bytes on the command line, maxFileBytes in the editor)";
    }

    private static String size(long bytes) {
        if (bytes >= 1024 * 1024 && bytes % (1024 * 1024) == 0) return bytes / (1024 * 1024) + " MiB";
        if (bytes >= 1024 && bytes % 1024 == 0) return bytes / 1024 + " KiB";
        return bytes + " bytes";
    }

    /**
     * Whether the file, with every link followed, lies inside the root (also with links
     * followed). For a file that does not exist, its nearest existing folder decides, so an
     * editor's unsaved buffer in the workspace still counts as inside.
     */
    public static boolean insideRoot(Path file, Path root) {
        try {
            Path realRoot = root.toAbsolutePath().normalize().toRealPath();
            Path existing = file.toAbsolutePath().normalize();
            while (existing != null && !Files.exists(existing)) existing = existing.getParent();
            return existing != null && existing.toRealPath().startsWith(realRoot);
        } catch (IOException | SecurityException e) {
            return false;
        }
    }
}
