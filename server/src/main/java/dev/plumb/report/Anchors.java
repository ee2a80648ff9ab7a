package dev.plumb.report;

/** Fragment identifiers for the page's parts: a value's name made safe for an `id` attribute. */
final class Anchors {
    private Anchors() {
    }

    static String of(String name) {
        StringBuilder out = new StringBuilder("v-");
        name.codePoints().forEach(cp -> {
            if (cp < 128 && (Character.isLetterOrDigit(cp) || cp == '_' || cp == '-')) out.appendCodePoint(cp);
            else out.append('.').append(Integer.toHexString(cp));
        });
        return out.toString();
    }
}
