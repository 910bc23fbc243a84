package io.github.eigengate.check;

import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.FormData;

/**
 * A rule the data must satisfy. The id is the name used in configuration, skip lists, reports and the title of the
 * check's section in docs/checks.md.
 *
 * <p>A check holds no state between runs: {@link #start} returns a fresh {@link Pass} for one dataset, which
 * receives every form exactly once (with all of its coefficients) and then {@link Pass#finish}.
 */
public interface Check {

    /** Lower-case, hyphenated, stable: e.g. {@code hecke-relations}. */
    String id();

    /** One line: the statement checked. */
    String title();

    Pass start(Catalog catalog);

    /** One run of a check over one dataset. */
    interface Pass {

        /** Receives a form and all of its coefficients. */
        void form(FormData<?> form, FindingSink out);

        /** Called once after the last form. */
        default void finish(FindingSink out) {
        }
    }
}
