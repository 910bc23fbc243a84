package io.github.eigengate.check;

import io.github.eigengate.data.SourceLocation;

/** Where a check reports. Checks never throw on a data problem: they report it here and go on. */
public interface FindingSink {

    void report(Finding finding);

    /** Records that the check examined this unit, so the JUnit report lists it even when it passed. */
    void examined(String check, Subject unit);

    /** Hands over a certificate for a claim proved from the data. */
    default void certificate(Certificate certificate) {
    }

    /** Records a quantity computed about a unit, for the reports (see {@link Measure}); never a verdict. */
    default void measure(String check, Subject unit, String quantity, String value) {
    }

    default void error(String check, SourceLocation at, Subject subject, String expected, String found,
                       String reason) {
        report(new Finding(check, Severity.ERROR, at, subject, expected, found, reason));
    }

    default void warning(String check, SourceLocation at, Subject subject, String expected, String found,
                         String reason) {
        report(new Finding(check, Severity.WARNING, at, subject, expected, found, reason));
    }

    default void note(String check, SourceLocation at, Subject subject, String reason) {
        report(new Finding(check, Severity.NOTE, at, subject, "", "", reason));
    }
}
