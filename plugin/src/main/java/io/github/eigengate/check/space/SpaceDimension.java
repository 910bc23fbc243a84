package io.github.eigengate.check.space;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.check.CatalogCheck;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.SpaceRow;
import io.github.eigengate.theory.spaces.Dimensions;
import java.util.ArrayList;
import java.util.List;

/**
 * A declared space lists every newform orbit: the field degrees of its forms add up to dim S_k^new(Γ0(N)), computed
 * from the genus, elliptic points and cusps (Diamond–Shurman §3.9) and the σ0-inversion over the levels dividing N
 * (G. Martin, J. Number Theory 112 (2005)). Every newform orbit of degree d contributes d eigenforms, and the
 * newforms form a basis of the new subspace (Atkin–Lehner 1970).
 *
 * <p>With a character χ the row stands for the Galois orbit of χ: the forms whose character is conjugate to χ span
 * ⊕_{χ'} S_k^new(N, χ'), of dimension [Q(χ):Q]·dim S_k^new(N, χ) (Galois conjugation maps S_k^new(N, χ) onto
 * S_k^new(N, χ^σ)); the dimension is the Cohen–Oesterlé formula made new ({@link Dimensions#newforms(
 * io.github.eigengate.arith.DirichletCharacter, int)}). Weight 1 has no dimension formula: a note, never a pass.
 */
public final class SpaceDimension implements CatalogCheck {

    public static final String ID = "space-dimension";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "the field degrees of a declared space's forms add up to [Q(χ):Q]·dim S_k^new(Γ0(N), χ)";
    }

    @Override
    public void check(Catalog catalog, FindingSink out) {
        for (SpaceRow row : catalog.spaces()) {
            check(catalog, row, out);
        }
    }

    private static void check(Catalog catalog, SpaceRow row, FindingSink out) {
        Subject subject = Spaces.subject(row.space());
        out.examined(ID, subject);
        int level = row.space().level();
        int weight = row.space().weight();
        DirichletCharacter chi = row.space().character();
        if (weight == 1) {
            out.note(ID, row.location(), subject, "completeness of weight 1 not checkable: no formula gives "
                    + "dim S_1(N, χ), so the listing is neither passed nor failed");
            return;
        }
        long dim;
        String expected;
        if (chi.isTrivial()) {
            dim = Dimensions.newforms(level, weight);
            expected = "dim S_k^new(Γ0(N)) = " + dim;
        } else {
            long one = Dimensions.newforms(chi, weight);
            dim = chi.orbitSize() * one;
            expected = "[Q(χ):Q]·dim S_k^new(N, χ) = " + chi.orbitSize() + "·" + one + " = " + dim;
        }
        List<Form> forms = Spaces.formsOf(catalog, row.space());
        long sum = 0;
        List<String> parts = new ArrayList<>();
        for (Form f : forms) {
            sum += f.degree();
            parts.add(f.id() + ":" + f.degree());
        }
        out.measure(ID, subject, "formula", Long.toString(dim));
        out.measure(ID, subject, "found", Long.toString(sum));
        if (sum != dim) {
            String listing = parts.isEmpty() ? "no forms" : String.join(", ", parts);
            out.error(ID, row.location(), subject, expected,
                    "sum of field degrees = " + sum + " (" + listing + ")",
                    sum < dim ? "the declared forms do not fill the new subspace: an orbit is missing (or a field is "
                            + "too small)" : "the declared forms exceed the new subspace: an orbit is listed twice "
                            + "or a form is not new of this level and weight");
        } else if (dim == 0) {
            out.note(ID, row.location(), subject, "the space is empty (dimension 0) and no forms are declared");
        }
    }
}
