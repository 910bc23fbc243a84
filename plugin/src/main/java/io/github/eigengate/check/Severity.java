package io.github.eigengate.check;

/** How a finding weighs: only errors fail the build. */
public enum Severity {
    ERROR,
    WARNING,
    NOTE;

    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
