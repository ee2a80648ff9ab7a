package dev.plumb.report;

/**
 * Text of a calc made safe inside XML or HTML markup. A calc may come from anyone, and its names,
 * units and the values its reader formats all end up in the report: markup characters are
 * escaped, and every character that is invisible or would change how the text around it reads
 * (controls, format characters such as bidirectional overrides and zero-width joiners, line and
 * paragraph separators), or that XML forbids (lone surrogates, noncharacters), is shown as a
 * visible escape such as {@code \u202E}, so what a reviewer sees is what is there.
 */
final class XmlText {
    private XmlText() {
    }

    /** {@code s} as XML character data (also safe inside a double- or single-quoted attribute). */
    static String escape(String s) {
        StringBuilder out = new StringBuilder(s.length() + 8);
        int i = 0;
        while (i < s.length()) {
            int cp = s.codePointAt(i);
            int width = Character.charCount(cp);
            if (hidden(cp)) {
                for (int k = i; k < i + width; k++) out.append(String.format("\\u%04X", (int) s.charAt(k)));
            } else {
                switch (cp) {
                    case '&' -> out.append("&amp;");
                    case '<' -> out.append("&lt;");
                    case '>' -> out.append("&gt;");
                    case '"' -> out.append("&quot;");
                    case '\'' -> out.append("&#39;");
                    default -> out.appendCodePoint(cp);
                }
            }
            i += width;
        }
        return out.toString();
    }

    /** Whether a code point would not show as itself: invisible, layout-changing or not allowed in XML. */
    static boolean hidden(int cp) {
        int type = Character.getType(cp);
        boolean noncharacter = (cp >= 0xFDD0 && cp <= 0xFDEF) || (cp & 0xFFFE) == 0xFFFE;
        return type == Character.CONTROL || type == Character.FORMAT || type == Character.SURROGATE
            || type == Character.LINE_SEPARATOR || type == Character.PARAGRAPH_SEPARATOR
            || noncharacter;
    }
}
