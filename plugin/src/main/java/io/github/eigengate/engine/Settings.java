package io.github.eigengate.engine;

import java.nio.file.Path;
import java.util.Set;

/**
 * What a run may be told.
 *
 * @param maxFindings          findings kept in full; further ones are only counted
 * @param skip                 ids of checks not to run
 * @param uncertifiedIsWarning report a true-looking but not certifiable congruence as a warning, not an error
 * @param threads              forms checked at the same time (at least 1); the report does not depend on it
 * @param cacheDirectory       where results are kept between runs (see docs/configuration.md), or {@code null}
 *                             for no cache
 * @param workBudget           units of work (see {@link io.github.eigengate.arith.Work}) one form may cost a
 *                             check; beyond it the form is reported as not decided within the budget
 * @param overBudgetIsWarning  report a form not decided within the budget as a warning, not an error
 * @param root                 directory every dataset and every file in it must resolve into (after symbolic
 *                             links), or {@code null}: then each dataset's own directory bounds its files
 */
public record Settings(int maxFindings, Set<String> skip, boolean uncertifiedIsWarning, int threads,
                       Path cacheDirectory, long workBudget, boolean overBudgetIsWarning, Path root) {

    public static final int DEFAULT_MAX_FINDINGS = 1000;

    /** Generous: some tens of seconds of exact arithmetic; a real form of the test datasets costs far less. */
    public static final long DEFAULT_WORK_BUDGET = 10_000_000_000L;

    public Settings {
        if (maxFindings < 1) {
            throw new IllegalArgumentException("maxFindings must be at least 1, was " + maxFindings);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, was " + threads);
        }
        if (workBudget < 1) {
            throw new IllegalArgumentException("workBudget must be at least 1, was " + workBudget);
        }
        skip = Set.copyOf(skip);
    }

    /** One thread, no cache, the default budget, no root. */
    public Settings(int maxFindings, Set<String> skip, boolean uncertifiedIsWarning) {
        this(maxFindings, skip, uncertifiedIsWarning, 1, null, DEFAULT_WORK_BUDGET, false, null);
    }

    public static Settings defaults() {
        return new Settings(DEFAULT_MAX_FINDINGS, Set.of(), false);
    }

    /** The default number of threads: the processors available to the JVM. */
    public static int availableThreads() {
        return Math.max(1, Runtime.getRuntime().availableProcessors());
    }

    public Settings withThreads(int n) {
        return new Settings(maxFindings, skip, uncertifiedIsWarning, n, cacheDirectory, workBudget,
                overBudgetIsWarning, root);
    }

    public Settings withCache(Path directory) {
        return new Settings(maxFindings, skip, uncertifiedIsWarning, threads, directory, workBudget,
                overBudgetIsWarning, root);
    }

    public Settings withWorkBudget(long units, boolean asWarning) {
        return new Settings(maxFindings, skip, uncertifiedIsWarning, threads, cacheDirectory, units, asWarning,
                root);
    }

    public Settings withRoot(Path directory) {
        return new Settings(maxFindings, skip, uncertifiedIsWarning, threads, cacheDirectory, workBudget,
                overBudgetIsWarning, directory);
    }

    /**
     * The settings that can change a verdict or a report line, as text: part of every cache key. Threads, the
     * cache directory and the root are not among them (the root only decides whether a file is read at all, and
     * that is part of the dataset's content key).
     */
    String fingerprint() {
        return "maxFindings=" + maxFindings + ";skip=" + new java.util.TreeSet<>(skip) + ";uncertified="
                + uncertifiedIsWarning + ";budget=" + workBudget + ";overBudget=" + overBudgetIsWarning;
    }
}
