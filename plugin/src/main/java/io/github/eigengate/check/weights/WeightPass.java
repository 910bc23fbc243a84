package io.github.eigengate.check.weights;

import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.FormData;

/**
 * The pass shared by the weight checks: collects a_p residues while the forms stream by, resolves the rows at the
 * end, lets the owner of the table report its format problems, then runs one check.
 */
abstract class WeightPass implements Check.Pass {

    private final Analysis analysis;
    private final boolean owner;

    WeightPass(Catalog catalog, boolean owner) {
        this.analysis = new Analysis(catalog);
        this.owner = owner;
    }

    @Override
    public final void form(FormData<?> form, FindingSink out) {
        analysis.accept(form);
    }

    @Override
    public final void finish(FindingSink out) {
        Analysis.Result result = analysis.resolve();
        if (owner) {
            result.tableFindings().forEach(out::report);
        }
        check(result, out);
    }

    abstract void check(Analysis.Result result, FindingSink out);
}
