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

    static List<Form> formsOf(Catalog catalog, SpaceKey space) {
        List<Form> forms = new ArrayList<>();
        for (Form f : catalog.forms().values()) {
            if (f.space().equals(space)) {
                forms.add(f);
            }
        }
        return forms;
    }
}
