package io.github.eigengate.check.space;

import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;

/**
 * Two forms of the same level, weight, character and field polynomial whose coefficient tables are identical (the
 * same indices with the same values) are one orbit listed twice: distinct newforms differ at some a_p
 * (multiplicity one, Atkin–Lehner 1970; Diamond–Shurman Thm 5.8.2). The tables are compared by their canonical text
 * (values in lowest terms), through a SHA-256 digest of it: two different tables have the same digest with
 * probability about 2^-128.
 */
public final class DuplicateOrbits implements Check {

    public static final String ID = "duplicate-orbit";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "no two forms of one space have identical coefficient tables (one orbit listed twice)";
    }

    @Override
    public Pass start(Catalog catalog) {
        Map<String, Form> first = new HashMap<>();
        Set<String> seen = new HashSet<>();
        return new Pass() {
            @Override
            public void form(FormData<?> data, FindingSink out) {
                Form f = data.form();
                Coefficients<?> a = data.coefficients();
                if (a.size() < 2 || !seen.add(f.id())) {
                    return;
                }
                String key = f.level() + "/" + f.weight() + "/" + f.character().cell() + "/" + f.fieldPolynomial()
                        + "/" + digest(a);
                Form before = first.putIfAbsent(key, f);
                if (before != null) {
                    out.error(ID, f.location(), Subject.form(f.id()), "a newform differing from " + before.id(),
                            "the same " + a.size() + " coefficients as " + before.id() + " (" + before.location()
                                    + ")", "a duplicated orbit: distinct newforms of one space differ at some a_p "
                                    + "(multiplicity one), so " + f.id() + " repeats " + before.id());
                }
            }
        };
    }

    private static String digest(Coefficients<?> a) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            for (int n : a.indices()) {
                md.update((n + "=" + a.get(n) + ";").getBytes(StandardCharsets.UTF_8));
            }
            StringBuilder b = new StringBuilder();
            for (byte x : md.digest()) {
                b.append(String.format("%02x", x));
            }
            return b.toString();
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
