package io.github.eigengate.check.curve;

import io.github.eigengate.check.CatalogCheck;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.CurveRow;
import io.github.eigengate.data.Form;
import io.github.eigengate.theory.curves.Conductors;
import io.github.eigengate.theory.curves.LocalReduction;
import java.math.BigInteger;
import java.util.List;

/**
 * The conductor of the curve equals the level of its form. Modularity (Wiles, Taylor–Wiles, Breuil–Conrad–Diamond–
 * Taylor 2001) with Carayol's theorem on the level: the rational newform attached to E has level N_E. N_E is
 * computed by Tate's algorithm at 2, 3 and every prime of the level (Silverman, <i>Advanced Topics</i>, IV.9;
 * Cremona, <i>Algorithms</i>, §3.2) and Kraus's test at the other primes of Δ ({@link Conductors}).
 */
public final class CurveConductor implements CatalogCheck {

    public static final String ID = "curve-conductor";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "the conductor of each curve (Tate's algorithm) equals the level of its form";
    }

    @Override
    public void check(Catalog catalog, FindingSink out) {
        for (CurveRow row : catalog.curves()) {
            check(catalog.form(row.form()), row, out);
        }
    }

    private static void check(Form form, CurveRow row, FindingSink out) {
        out.examined(ID, Subject.form(row.form()));
        int level = form.level();
        List<Conductors.Mismatch> mismatches = Conductors.against(row.model(), level);
        BigInteger conductor = BigInteger.valueOf(level);
        boolean known = true;
        for (Conductors.Mismatch m : mismatches) {
            if (m.p() == null) {
                known = false;
            } else {
                conductor = conductor.divide(m.p().pow(m.expected())).multiply(m.p().pow(m.local().exponent()));
            }
        }
        String whole = known ? "the conductor of " + row.model() + " is " + conductor
                : "the conductor of " + row.model() + " has a prime outside the level";
        for (Conductors.Mismatch m : mismatches) {
            if (m.p() == null) {
                out.error(ID, row.curveAt(), Subject.form(row.form(), "p|" + m.cofactor()),
                        "good reduction outside " + level, "bad reduction at a prime factor of " + m.cofactor(),
                        whole + " (Kraus's test fails on the part of Δ prime to 6N, which is not factored), but the "
                                + "level of the form is " + level + " (modularity: N_E = level)");
                continue;
            }
            LocalReduction local = m.local();
            String p = m.p().toString();
            out.error(ID, row.curveAt(), Subject.form(row.form(), "p=" + p),
                    "f_" + p + " = " + m.expected() + " (level " + level + ")",
                    "f_" + p + " = " + local.exponent() + " (Kodaira " + local.kodaira() + ", c_" + p + " = "
                            + local.tamagawa() + ")",
                    whole + " by Tate's algorithm, but the level of the form is " + level
                            + " (modularity: N_E = level)");
        }
    }
}
