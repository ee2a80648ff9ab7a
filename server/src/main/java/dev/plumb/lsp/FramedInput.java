package dev.plumb.lsp;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;

/**
 * The client's byte stream with its framing checked before the protocol library reads it. A
 * message whose headers lack a valid Content-Length cannot be measured, so the reader would take
 * its body for headers and lose every message after it; here such a message is skipped, the
 * stream resumes at the next "Content-Length:" header, and the skip is told on stderr. A body
 * larger than {@link #MAX_BODY} is skipped by its length. What passes on is always one clean
 * "Content-Length: N" header and N bytes.
 */
final class FramedInput extends InputStream {
    /** Far above any document the size limit lets through, escaped as JSON. */
    static final int MAX_BODY = 64 * 1024 * 1024;
    private static final byte[] MARK = "content-length:".getBytes(StandardCharsets.US_ASCII);

    private final InputStream in;
    private final java.io.PrintStream log;
    private byte[] frame = new byte[0];
    private int pos;
    /** Set after a message that could not be measured: the next one is searched for. */
    private boolean resync;

    FramedInput(InputStream in, java.io.PrintStream log) {
        this.in = in;
        this.log = log;
    }

    @Override
    public int read() throws IOException {
        if (!fill()) return -1;
        return frame[pos++] & 0xFF;
    }

    @Override
    public int read(byte[] b, int off, int len) throws IOException {
        if (len == 0) return 0;
        if (!fill()) return -1;
        int n = Math.min(len, frame.length - pos);
        System.arraycopy(frame, pos, b, off, n);
        pos += n;
        return n;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }

    /** Makes sure unread bytes of a clean frame are there; false at the end of the stream. */
    private boolean fill() throws IOException {
        while (pos >= frame.length) {
            byte[] next = nextFrame();
            if (next == null) return false;
            frame = next;
            pos = 0;
        }
        return true;
    }

    /** The next well-framed message, re-framed, or null at the end of the stream. */
    private byte[] nextFrame() throws IOException {
        while (true) {
            if (resync && !skipToMark()) return null;
            long length = -1;
            boolean bad = false;
            boolean any = false;
            String line;
            if (resync) {
                // The mark was consumed: the rest of this line is the value.
                line = "content-length:" + readLine();
                resync = false;
            } else {
                line = readLine();
            }
            while (line != null && !line.isEmpty()) {
                any = true;
                int colon = line.indexOf(':');
                String key = colon < 0 ? "" : line.substring(0, colon).trim();
                if (key.equalsIgnoreCase("Content-Length")) {
                    String value = line.substring(colon + 1).trim();
                    length = value.matches("\\d{1,10}") ? Long.parseLong(value) : -1;
                    bad |= length < 0;
                } else if (colon < 0) {
                    bad = true;
                }
                line = readLine();
            }
            if (line == null) return null;
            if (!any) continue; // blank lines between messages
            if (bad || length < 0) {
                log.println("plumb lsp: skipped a message without a valid Content-Length header; "
                    + "resuming at the next header");
                resync = true;
                continue;
            }
            if (length > MAX_BODY) {
                log.println("plumb lsp: skipped a message of " + length + " bytes (the limit is " + MAX_BODY + ")");
                try {
                    in.skipNBytes(length);
                } catch (java.io.EOFException e) {
                    return null;
                }
                continue;
            }
            byte[] body = in.readNBytes((int) length);
            if (body.length < length) return null;
            byte[] header = ("Content-Length: " + length + "\r\n\r\n").getBytes(StandardCharsets.US_ASCII);
            byte[] out = new byte[header.length + body.length];
            System.arraycopy(header, 0, out, 0, header.length);
            System.arraycopy(body, 0, out, header.length, body.length);
            return out;
        }
    }

    /** Reads up to and including the next case-insensitive "Content-Length:"; false at the end. */
    private boolean skipToMark() throws IOException {
        int matched = 0;
        int c;
        while ((c = in.read()) != -1) {
            int lower = Character.toLowerCase(c);
            if (lower == MARK[matched]) {
                if (++matched == MARK.length) return true;
            } else {
                matched = lower == MARK[0] ? 1 : 0;
            }
        }
        return false;
    }

    /** One header line without its CRLF (or LF); null at the end of the stream. Bounded. */
    private String readLine() throws IOException {
        ByteArrayOutputStream line = new ByteArrayOutputStream();
        int c;
        while ((c = in.read()) != -1) {
            if (c == '\n') break;
            if (c != '\r' && line.size() < 8192) line.write(c);
        }
        if (c == -1 && line.size() == 0) return null;
        return line.toString(StandardCharsets.US_ASCII);
    }
}
