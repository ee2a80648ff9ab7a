package dev.plumb.report;

/**
 * The presentation MathML elements the typesetter writes, as markup strings. Text passed in is
 * always escaped here, so no caller can forget it; markup passed in as content is trusted, as it
 * was built by these methods.
 */
final class MathElements {
    static final String NAMESPACE = "http://www.w3.org/1998/Math/MathML";
    /** The invisible operator between a function's name and its argument list. */
    static final String APPLY_FUNCTION = "<mo>&#x2061;</mo>";
    /** The gap between a number and its unit, a thin space as in typeset quantities. */
    static final String THIN_SPACE = "<mspace width=\"0.1667em\"></mspace>";

    private MathElements() {
    }

    /** A block formula: the root element. */
    static String math(String content) {
        return "<math xmlns=\"" + NAMESPACE + "\" display=\"block\">" + content + "</math>";
    }

    /** An inline formula, set within a line of text or a table cell. */
    static String inline(String content) {
        return "<math xmlns=\"" + NAMESPACE + "\">" + content + "</math>";
    }

    static String row(String... content) {
        return "<mrow>" + String.join("", content) + "</mrow>";
    }

    /** An identifier; a single character is italic, longer ones upright (MathML's own rule). */
    static String mi(String text) {
        return "<mi>" + XmlText.escape(text) + "</mi>";
    }

    /** An identifier that is upright whatever its length: function names, unit symbols. */
    static String upright(String text) {
        return "<mi mathvariant=\"normal\">" + XmlText.escape(text) + "</mi>";
    }

    static String mn(String text) {
        return "<mn>" + XmlText.escape(text) + "</mn>";
    }

    static String mo(String text) {
        return "<mo>" + XmlText.escape(text) + "</mo>";
    }

    /** An operator with the space on either side given, in em. */
    static String mo(String text, String lspace, String rspace) {
        return "<mo lspace=\"" + lspace + "em\" rspace=\"" + rspace + "em\">" + XmlText.escape(text) + "</mo>";
    }

    /** A bracket that keeps its size, for the small parentheses inside a unit. */
    static String fixedFence(String text) {
        return "<mo stretchy=\"false\">" + XmlText.escape(text) + "</mo>";
    }

    static String mtext(String text) {
        return "<mtext>" + XmlText.escape(text) + "</mtext>";
    }

    static String space(String widthEm) {
        return "<mspace width=\"" + widthEm + "em\"></mspace>";
    }

    static String sup(String base, String exponent) {
        return "<msup>" + base + exponent + "</msup>";
    }

    static String sub(String base, String index) {
        return "<msub>" + base + index + "</msub>";
    }

    static String frac(String numerator, String denominator) {
        return "<mfrac>" + numerator + denominator + "</mfrac>";
    }

    static String sqrt(String radicand) {
        return "<msqrt>" + radicand + "</msqrt>";
    }

    /**
     * Content between a pair of brackets. They grow only round tall content (a fraction, a root,
     * a table): round a line of text, brackets stretched to it stand apart from it and push an
     * exponent away, so there they keep the font's size.
     */
    static String fenced(String open, String content, String close) {
        if (isTall(content)) return row(mo(open), content, mo(close));
        return row(fixedFence(open), content, fixedFence(close));
    }

    /** Whether markup holds something taller than a line. Text is always escaped, so only our own elements match. */
    static boolean isTall(String markup) {
        return markup.contains("<mfrac") || markup.contains("<msqrt") || markup.contains("<mtable");
    }
}
