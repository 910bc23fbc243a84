package io.github.eigengate.data;

/**
 * Where readers report malformed input. A reader never throws on bad data: it reports, skips the bad cell or row,
 * and reads on, so that one run shows every problem.
 */
public interface Problems {

    /** The id under which input problems appear in reports. */
    String CHECK_ID = "table-format";

    void error(SourceLocation at, String subject, String expected, String found, String reason);

    void warning(SourceLocation at, String subject, String expected, String found, String reason);
}
