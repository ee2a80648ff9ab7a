package dev.plumb.diagnostics;

/** How much a finding matters. Errors fail a check run; the rest inform. */
public enum Severity {
    ERROR("error"), WARNING("warning"), INFO("info"), HINT("hint");

    private final String label;

    Severity(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
