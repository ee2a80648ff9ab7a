package dev.plumb.diagnostics;

/**
 * Text from a calc made safe to show to people. A calc may come from anyone; its names, notes,
 * titles and paths reach terminals and editors inside messages. A control character there could
 * move the cursor, erase a line and forge a summary, set a window title, or (a bidirectional
 * override) show text in another order than it is read. Every such character is replaced by a
 * visible escape such as {@code \u001B}, so what is shown is what is there.
 */
public final class Printable {
    private Printable() {
    }

    /** One line: every control, also a line break or a tab, is escaped. */
    public static String line(String s) {
        return escape(s, false);
    }

    /** A block of lines: line breaks and tabs stay, every other control is escaped. */
    public static String text(String s) {
        return escape(s, true);
    }

    /** Whether a character is escaped by {@link #line}. */
    public static boolean unsafe(int c) {
        return c < 0x20 || (c >= 0x7F && c <= 0x9F) || (c >= 0x202A && c <= 0x202E) || (c >= 0x2066 && c <= 0x2069)
            || c == 0x200E || c == 0x200F || c == 0x061C;
    }

    private static String escape(String s, boolean keepLayout) {
        if (s == null) return null;
        StringBuilder out = null;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            boolean kept = keepLayout && (c == '\n' || c == '\t');
            if (!unsafe(c) || kept) {
                if (out != null) out.append(c);
                continue;
            }
            if (out == null) out = new StringBuilder(s.length() + 16).append(s, 0, i);
            out.append(String.format("\\u%04X", (int) c));
        }
        return out == null ? s : out.toString();
    }
}
