package io.github.eigengate.check;

import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.FormData;

/**
 * A check that judges from the catalog alone (spaces.csv with the forms' degrees, claims tables, curves) and never
 * needs the coefficients: it runs once, after the last form.
 */
public interface CatalogCheck extends Check {

    /** Reports every finding about the dataset's catalog, recording the units it examined. */
    void check(Catalog catalog, FindingSink out);

    @Override
    default Pass start(Catalog catalog) {
        return new Pass() {
            @Override
            public void form(FormData<?> form, FindingSink out) {
                // needs only the catalog
            }

            @Override
            public void finish(FindingSink out) {
                check(catalog, out);
            }
        };
    }
}
