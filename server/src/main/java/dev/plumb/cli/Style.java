package dev.plumb.cli;

import dev.plumb.diagnostics.Severity;

/** Terminal colours: only on a terminal, never when NO_COLOR is set (no-color.org). */
final class Style {
    private final boolean on;

    Style(boolean on) {
        this.on = on;
    }

    static Style detect() {
        String noColor = System.getenv("NO_COLOR");
        boolean terminal = System.console() != null;
        return new Style(terminal && (noColor == null || noColor.isEmpty()));
    }

    /** The escape sequences this style writes: the only ones {@link NeutralWriter} lets through. */
    java.util.Set<String> sequences() {
        if (!on) return java.util.Set.of();
        java.util.Set<String> all = new java.util.HashSet<>();
        for (String code : new String[] {"0", "1", "2", "31", "32", "33", "36"}) all.add("\u001b[" + code + "m");
        return all;
    }

    /** A writer for people that lets through this style's colours and neutralises every other control. */
    java.io.PrintWriter writer(java.io.Writer out) {
        return new NeutralWriter(out, sequences());
    }

    String severity(Severity s) {
        String code = switch (s) {
            case ERROR -> "31";
            case WARNING -> "33";
            case INFO -> "36";
            case HINT -> "2";
        };
        return paint(code, s.label());
    }

    String bold(String text) {
        return paint("1", text);
    }

    String good(String text) {
        return paint("32", text);
    }

    String bad(String text) {
        return paint("31", text);
    }

    private String paint(String code, String text) {
        return on ? "\u001b[" + code + "m" + text + "\u001b[0m" : text;
    }
}
