package io.github.eigengate.check;

import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.FormData;

/** A check that looks at one form at a time and needs nothing from the others. */
public interface FormCheck extends Check {

    /** Reports every finding about this form; examined units are recorded by the caller. */
    <E> void check(FormData<E> form, Catalog catalog, FindingSink out);

    @Override
    default Pass start(Catalog catalog) {
        FormCheck self = this;
        return new Pass() {
            @Override
            public void form(FormData<?> form, FindingSink out) {
                out.examined(self.id(), Subject.form(form.form().id()));
                check(form, catalog, out);
            }
        };
    }
}
