package io.github.eigengate.check.space;

import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Values;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import io.github.eigengate.data.SourceLocation;
import io.github.eigengate.data.SpaceKey;
import io.github.eigengate.data.SpaceRow;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * What the primes-only identities need from the forms of the declared spaces: for each form, which a_n with
 * n ≤ {@link #CAP} are given, and the values (or only their traces) of those a check asks for, with their places,
 * kept until every form has been seen.
 */
final class Listing {

    /** Identities are checked at indices n ≤ CAP (the trace formula is then cheap: class numbers up to 4·CAP). */
    static final int CAP = 20_000;

    /** One form: its a_n, n ≤ CAP, and where each was read. */
    record Entry(Form form, TreeMap<Integer, Object> values, Map<Integer, SourceLocation> at, BitSet given) {

        Object a(int n) {
            return values.get(n);
        }

        int degree() {
            return form.degree();
        }
    }

    private final Map<SpaceKey, SpaceRow> declared = new LinkedHashMap<>();
    private final Map<SpaceKey, List<Entry>> entries = new HashMap<>();
    private final Catalog catalog;
    private final java.util.function.BiPredicate<Integer, Integer> keep;
    private final boolean tracesOnly;

    /**
     * @param keep       (n, N) ↦ whether a_n is kept
     * @param tracesOnly keep Tr(a_n) ∈ Q instead of a_n (bounded memory for fields of large degree)
     */
    Listing(Catalog catalog, java.util.function.BiPredicate<Integer, Integer> keep, boolean tracesOnly) {
        this.catalog = catalog;
        this.keep = keep;
        this.tracesOnly = tracesOnly;
        for (SpaceRow row : catalog.spaces()) {
            declared.put(row.space(), row);
        }
    }

    void add(FormData<?> data) {
        Form form = data.form();
        if (!declared.containsKey(form.space())) {
            return;
        }
        Coefficients<?> a = data.coefficients();
        TreeMap<Integer, Object> values = new TreeMap<>();
        Map<Integer, SourceLocation> at = new HashMap<>();
        BitSet given = new BitSet();
        for (int n : a.indices()) {
            if (n > CAP) {
                break;
            }
            given.set(n);
            if (keep.test(n, form.level())) {
                values.put(n, tracesOnly ? trace(a.get(n)) : a.get(n));
                at.put(n, a.at(n));
            }
        }
        entries.computeIfAbsent(form.space(), k -> new ArrayList<>()).add(new Entry(form, values, at, given));
    }

    private io.github.eigengate.theory.spaces.HurwitzClassNumbers table;

    /** A class-number table good for traces at every index ≤ n, shared by the spaces of one run (grown on demand). */
    io.github.eigengate.theory.spaces.HurwitzClassNumbers table(long n) {
        long need = 4 * Math.max(n, 1) + 4;
        if (table == null || table.bound() < need) {
            long size = table == null ? need : Math.max(need, Math.min(2 * table.bound(), 4L * CAP + 4));
            table = io.github.eigengate.theory.spaces.HurwitzClassNumbers.upTo(size);
        }
        return table;
    }

    /** The declared spaces, in file order. */
    /** What an identity check does with one complete space: its row, its forms' entries, the listing. */
    interface Judge {
        void check(SpaceRow row, List<Entry> entries, Listing listing, FindingSink out);
    }

    /**
     * The pass of an identity check: every form goes into this listing; at the end each declared space is recorded
     * as examined and, when its listing is complete, judged.
     */
    Check.Pass pass(String id, Judge judge) {
        return new Check.Pass() {
            @Override
            public void form(FormData<?> form, FindingSink out) {
                add(form);
            }

            @Override
            public void finish(FindingSink out) {
                for (SpaceRow row : rows()) {
                    out.examined(id, Spaces.subject(row.space()));
                    List<Entry> es = complete(row.space());
                    if (es != null) {
                        judge.check(row, es, Listing.this, out);
                    }
                }
            }
        };
    }

    List<SpaceRow> rows() {
        return List.copyOf(declared.values());
    }

    /** The entries of a space when every form it lists has been seen, else {@code null}. */
    List<Entry> complete(SpaceKey space) {
        List<Entry> e = entries.get(space);
        int forms = Spaces.formsOf(catalog, space).size();
        return e == null || forms == 0 || e.size() != forms ? null : e;
    }

    /** Whether every entry gives a_n. */
    static boolean allGive(List<Entry> entries, int n) {
        for (Entry e : entries) {
            if (!e.given().get(n)) {
                return false;
            }
        }
        return true;
    }

    /** a·b in the form's field (both values of one form). */
    static Object multiply(Object a, Object b) {
        if (a instanceof Rational r && b instanceof Rational s) {
            return r.multiply(s);
        }
        if (a instanceof NumberField.Element x && b instanceof NumberField.Element y) {
            return x.multiply(y);
        }
        NumberField.Element x = a instanceof NumberField.Element e ? e : null;
        NumberField.Element y = b instanceof NumberField.Element e ? e : null;
        NumberField k = x != null ? x.field() : y.field();
        return (x != null ? x : k.fromRational((Rational) a)).multiply(y != null ? y : k.fromRational((Rational) b));
    }

    static Rational trace(Object a) {
        return Values.trace(a);
    }
}
