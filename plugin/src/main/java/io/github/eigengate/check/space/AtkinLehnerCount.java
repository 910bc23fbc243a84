package io.github.eigengate.check.space;

import io.github.eigengate.check.CatalogCheck;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.data.AtkinLehnerSigns;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.SpaceRow;
import io.github.eigengate.theory.spaces.Dimensions;
import io.github.eigengate.theory.spaces.HurwitzClassNumbers;
import io.github.eigengate.theory.spaces.NewSpaceTraces;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * In a declared (complete) space whose forms all give {@code atkin_lehner}, for every prime q ‖ N: the number of
 * eigenforms (each orbit counted with its degree, the sign being rational) with w_q = +1 is (dim + Tr W_q)/2 and
 * with w_q = −1 is (dim − Tr W_q)/2, Tr W_q taken on S_k^new(Γ0(N)). Tr W_q = −Tr(U_q | S_k^new)/q^{k/2−1}, since
 * a_q = −w_q q^{k/2−1} on newforms for q ‖ N (Atkin–Lehner 1970, Thm 3); Tr(U_q | S_k^new) comes from
 * {@link NewSpaceTraces}. (Yamauchi 1973 and Skoruppa–Zagier 1988 give Tr W_Q on all of S_k(Γ0(N)) directly by
 * class numbers; that formula is not used here.) For q² | N nothing is compared. Trivial character only.
 */
public final class AtkinLehnerCount implements CatalogCheck {

    public static final String ID = "atkin-lehner-count";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "in a complete space, the forms with w_q = ±1 number (dim ± Tr W_q)/2 for q ‖ N";
    }

    @Override
    public void check(Catalog catalog, FindingSink out) {
        for (SpaceRow row : catalog.spaces()) {
            out.examined(ID, Spaces.subject(row.space()));
            check(catalog, row, out);
        }
    }

    private static void check(Catalog catalog, SpaceRow row, FindingSink out) {
        List<Form> forms = Spaces.formsOf(catalog, row.space());
        List<AtkinLehnerSigns> signs = new ArrayList<>();
        for (Form f : forms) {
            AtkinLehnerSigns s = catalog.atkinLehner().get(f.id());
            if (s == null || s.signs().isEmpty() || !f.character().isTrivial()) {
                return;
            }
            signs.add(s);
        }
        int level = row.space().level();
        int weight = row.space().weight();
        if (forms.isEmpty() || weight % 2 == 1) {
            return;
        }
        long dim = Dimensions.newforms(level, weight);
        NewSpaceTraces nt = null;
        for (int q : signs.get(0).signs().keySet()) {
            if ((level / q) % q == 0) {
                continue;
            }
            if (nt == null) {
                nt = NewSpaceTraces.of(weight, HurwitzClassNumbers.upTo(4L * signs.get(0).signs().keySet().stream()
                        .mapToInt(Integer::intValue).max().orElse(1) + 4));
            }
            long trace = nt.atkinLehnerTrace(level, q).longValueExact();
            long plus = 0;
            long minus = 0;
            List<String> listing = new ArrayList<>();
            for (int i = 0; i < forms.size(); i++) {
                int w = signs.get(i).signs().get(q);
                if (w > 0) {
                    plus += forms.get(i).degree();
                } else {
                    minus += forms.get(i).degree();
                }
                listing.add(forms.get(i).id() + ":" + (w > 0 ? "+" : "-") + forms.get(i).degree());
            }
            if (plus - minus != trace || plus + minus != dim) {
                out.error(ID, row.location(), Spaces.subject(row.space()).with("q=" + q),
                        (dim + trace) / 2 + " with w_" + q + " = +1, " + (dim - trace) / 2 + " with -1",
                        plus + " with +1, " + minus + " with -1 (" + String.join(", ", listing) + ")",
                        "Tr(W_" + q + " | S_k^new) = " + BigInteger.valueOf(trace) + " = -Tr(U_" + q + ")/" + q
                                + "^(k/2-1) (Atkin–Lehner 1970, Thm 3): a sign in atkin_lehner is wrong or an orbit "
                                + "is missing");
            }
        }
    }
}
