package io.github.eigengate.check.space;

import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.SpaceKey;
import java.util.ArrayList;
import java.util.List;

/** Shared by the completeness checks. */
final class Spaces {

    private Spaces() {
    }

    static Subject subject(SpaceKey space) {
        return new Subject("space", space.toString(), "");
    }

    /** The orbit key of the space a form lies in, or null when its character is not one mod its level. */
    static SpaceKey orbitOf(Form f) {
        if (f.character().modulus() != f.level()) {
            return null;
        }
        return new SpaceKey(f.level(), f.weight(), f.character()).orbit();
    }

    /** The forms of the space's Galois orbit: same level and weight, character Galois-conjugate to the space's. */
    static List<Form> formsOf(Catalog catalog, SpaceKey space) {
        List<Form> forms = new ArrayList<>();
        for (Form f : catalog.forms().values()) {
            if (space.contains(f.level(), f.weight(), f.character())) {
                forms.add(f);
            }
        }
        return forms;
    }
}
