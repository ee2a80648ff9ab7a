package dev.plumb.cli;

import dev.plumb.diagnostics.Printable;
import java.io.PrintWriter;
import java.io.Writer;
import java.util.Set;

/**
 * Everything the command line prints for people goes through this writer, so no control or
 * bidirectional-override character from a calc reaches the terminal: each is written as a
 * visible escape ({@link Printable}). Line breaks and tabs pass. With colour on, the exact
 * colour sequences of {@link Style} pass too, and nothing else that starts with ESC.
 */
final class NeutralWriter extends PrintWriter {
    private final Set<String> allowed;

    NeutralWriter(Writer out, Set<String> allowedSequences) {
        super(out, true);
        this.allowed = allowedSequences;
    }

    @Override
    public void write(String s, int off, int len) {
        String safe = neutral(s.substring(off, off + len));
        super.write(safe, 0, safe.length());
    }

    @Override
    public void write(char[] buf, int off, int len) {
        write(new String(buf, off, len), 0, len);
    }

    @Override
    public void write(int c) {
        write(String.valueOf((char) c), 0, 1);
    }

    private String neutral(String s) {
        if (s.equals(System.lineSeparator())) return s; // println's own line end, also \r\n
        if (s.indexOf('\u001b') < 0 || allowed.isEmpty()) return Printable.text(s);
        StringBuilder out = new StringBuilder(s.length());
        int from = 0;
        for (int i = s.indexOf('\u001b'); i >= 0; i = s.indexOf('\u001b', i + 1)) {
            for (String seq : allowed) {
                if (s.startsWith(seq, i)) {
                    out.append(Printable.text(s.substring(from, i))).append(seq);
                    from = i + seq.length();
                    break;
                }
            }
        }
        return out.append(Printable.text(s.substring(from))).toString();
    }
}
