package io.github.eigengate.check.form;

import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.FormCheck;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.FormData;

/**
 * A newform is normalised: a_1 = 1 (Diamond–Shurman, Def. 5.8.1: a normalised eigenform has a_1(f) = 1; the
 * Fourier coefficients are then the Hecke eigenvalues, Prop. 5.8.5).
 */
public final class Normalisation implements FormCheck {

    public static final String ID = "normalisation";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "a_1 = 1 for every form that lists a_1";
    }

    @Override
    public <E> void check(FormData<E> data, Catalog catalog, FindingSink out) {
        E a1 = data.coefficients().get(1);
        if (a1 != null && !a1.equals(data.field().one())) {
            out.error(ID, data.coefficients().at(1), Subject.form(data.form().id(), "n=1"), "1", a1.toString(),
                    "a newform is normalised so that a_1 = 1");
        }
    }
}
