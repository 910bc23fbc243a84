package io.github.eigengate.check;

import io.github.eigengate.data.SourceLocation;
import java.util.Objects;

/**
 * One verdict of one check about one subject.
 *
 * @param check    the id of the check that made it (the same id as in configuration and docs)
 * @param severity error, warning or note
 * @param location where in the data the subject lives
 * @param subject  what it is about, e.g. {@code form=f1 n=6}
 * @param expected what the theorem or the contract requires, in table notation ("" when not applicable)
 * @param found    what the data say ("" when not applicable)
 * @param reason   one plain sentence saying why
 */
public record Finding(String check, Severity severity, SourceLocation location, Subject subject,
                      String expected, String found, String reason) {

    public Finding {
        Objects.requireNonNull(check);
        Objects.requireNonNull(severity);
        Objects.requireNonNull(location);
        Objects.requireNonNull(subject);
        expected = expected == null ? "" : expected;
        found = found == null ? "" : found;
        Objects.requireNonNull(reason);
    }

    /** The console line: {@code file:line: severity [check] subject: expected X, found Y; reason}. */
    public String line() {
        StringBuilder b = new StringBuilder();
        b.append(location).append(": ").append(severity.label()).append(" [").append(check).append(']');
        b.append(' ').append(subject);
        b.append(": ");
        if (!expected.isEmpty() || !found.isEmpty()) {
            b.append("expected ").append(expected.isEmpty() ? "-" : expected)
             .append(", found ").append(found.isEmpty() ? "-" : found).append("; ");
        }
        b.append(reason);
        return b.toString();
    }

    @Override
    public String toString() {
        return line();
    }
}
