package io.github.eigengate.engine;

import io.github.eigengate.check.Check;
import io.github.eigengate.data.Catalog;

/**
 * Sees every form the checks see, without judging: how the HTML report gathers its plots and the command line its
 * progress. Its pass receives the same calls as a check's (and may receive them from several threads, and again
 * from the start when a dataset is streamed a second time), and must not report findings.
 */
public interface Observer {

    /** A fresh pass for one dataset; only a pass that reached {@link Check.Pass#finish} counts. */
    Check.Pass start(Catalog catalog);
}
