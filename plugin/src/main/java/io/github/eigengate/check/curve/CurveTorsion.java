package io.github.eigengate.check.curve;

import io.github.eigengate.check.CatalogCheck;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.CurveRow;
import io.github.eigengate.theory.curves.Torsion;

/**
 * The torsion order given for a curve is #E(Q)_tors, computed exactly: bounded by gcd #Ẽ(F_p) over good p ≥ 3
 * (Silverman, AEC VII.3.1, VII.3.4), the points found from the rational roots of division polynomials on the
 * integral short model (Nagell–Lutz, AEC VIII.7.2; Washington §3.2), within Mazur's list (AEC VIII.7.5).
 */
public final class CurveTorsion implements CatalogCheck {

    public static final String ID = "curve-torsion";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "the torsion order given for a curve is the order of E(Q)_tors";
    }

    @Override
    public void check(Catalog catalog, FindingSink out) {
        for (CurveRow row : catalog.curves()) {
            if (row.torsion() == null) {
                continue;
            }
            out.examined(ID, Subject.form(row.form()));
            int order = Torsion.order(row.model());
            if (order != row.torsion()) {
                out.error(ID, row.torsionAt(), Subject.form(row.form(), "torsion"),
                        Integer.toString(order), Integer.toString(row.torsion()),
                        "E(Q)_tors of " + row.model() + " has order " + order
                                + " (division polynomials, bounded by #E(F_p) at good primes)");
            }
        }
    }
}
