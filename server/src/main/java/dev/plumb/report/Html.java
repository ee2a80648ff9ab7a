package dev.plumb.report;

/** Small pieces of HTML, every piece of the calc's text escaped (a calc may come from anyone). */
final class Html {
    private Html() {
    }

    /** Text as HTML character data, hidden and control characters shown as visible escapes. */
    static String text(String s) {
        return s == null ? "" : XmlText.escape(s);
    }

    /** A formula on a line of its own, flush left. */
    static String formula(String math) {
        return "<div class=\"formula\">" + math + "</div>";
    }

    static String element(String tag, String cssClass, String innerHtml) {
        return "<" + tag + (cssClass == null ? "" : " class=\"" + cssClass + "\"") + ">" + innerHtml + "</" + tag + ">";
    }
}
