package io.github.eigengate.engine;

import java.util.Set;

/**
 * What a run may be told.
 *
 * @param maxFindings          findings kept in full; further ones are only counted
 * @param skip                 ids of checks not to run
 * @param uncertifiedIsWarning report a true-looking but not certifiable congruence as a warning, not an error
 */
public record Settings(int maxFindings, Set<String> skip, boolean uncertifiedIsWarning) {

    public static final int DEFAULT_MAX_FINDINGS = 1000;

    public Settings {
        if (maxFindings < 1) {
            throw new IllegalArgumentException("maxFindings must be at least 1, was " + maxFindings);
        }
        skip = Set.copyOf(skip);
    }

    public static Settings defaults() {
        return new Settings(DEFAULT_MAX_FINDINGS, Set.of(), false);
    }
}
