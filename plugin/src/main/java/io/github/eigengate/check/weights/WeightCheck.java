package io.github.eigengate.check.weights;

import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.data.Catalog;

/**
 * What the four weight checks share: one {@link WeightPass} per run, and whether this check is the one that reports
 * the table's own problems (see {@link WeightChecks}).
 */
abstract class WeightCheck implements Check {

    private final boolean owner;

    WeightCheck(boolean owner) {
        this.owner = owner;
    }

    @Override
    public final Pass start(Catalog catalog) {
        return new WeightPass(catalog, owner) {
            @Override
            void check(Analysis.Result result, FindingSink out) {
                WeightCheck.this.check(result, out);
            }
        };
    }

    /** Judges the resolved rows of one run. */
    abstract void check(Analysis.Result result, FindingSink out);
}
