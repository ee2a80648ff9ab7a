package dev.plumb.analysis;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Documents read from disk as strict UTF-8, inside the workspace and up to a size limit ({@link DiskReads}). */
public final class FileSources implements Sources {
    private final long maxBytes;

    public FileSources() {
        this(DiskReads.DEFAULT_MAX_BYTES);
    }

    /** Sources that refuse a file larger than {@code maxBytes}. */
    public FileSources(long maxBytes) {
        this.maxBytes = maxBytes;
    }

    @Override
    public long maxBytes() {
        return maxBytes;
    }

    @Override
    public Loaded load(Path file, Path root) {
        return DiskReads.read(file, root, maxBytes);
    }

    /** Strict UTF-8 decoding: a NUL byte or a malformed sequence means this is not a calc file. */
    public static Loaded decode(byte[] bytes) {
        for (int i = 0; i < bytes.length; i++) {
            if (bytes[i] == 0) return new NotText("it holds a NUL byte, so it is binary, not a text file", i);
        }
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
            .onMalformedInput(CodingErrorAction.REPORT)
            .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult result = decoder.decode(in, out, true);
        if (result.isError()) {
            return new NotText("it is not valid UTF-8 text; save it as UTF-8", in.position());
        }
        try {
            decoder.flush(out);
        } catch (RuntimeException e) {
            return new NotText("it is not valid UTF-8 text; save it as UTF-8", bytes.length);
        }
        out.flip();
        String text = out.toString();
        // A byte-order mark is an encoding marker, not text: columns count from after it.
        return new Text(text.startsWith("\uFEFF") ? text.substring(1) : text);
    }

    @Override
    public Path workspaceRoot(Path file) {
        Path marked = markedRoot(file);
        return marked != null ? marked : file.toAbsolutePath().normalize().getParent();
    }

    @Override
    public boolean workspaceMarked(Path file) {
        return markedRoot(file) != null;
    }

    /** The nearest folder at or above the file's that holds .git or plumb.toml, or null. */
    private static Path markedRoot(Path file) {
        for (Path p = file.toAbsolutePath().normalize().getParent(); p != null; p = p.getParent()) {
            if (Files.exists(p.resolve(".git")) || Files.exists(p.resolve("plumb.toml"))) return p;
        }
        return null;
    }

}
