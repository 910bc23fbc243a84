package io.github.eigengate.check.weights;

import io.github.eigengate.arith.ExpressionSyntaxException;
import io.github.eigengate.arith.FpPoly;
import io.github.eigengate.arith.IndexDivisibleException;
import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.ResidueMap;
import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.Problems;
import io.github.eigengate.data.SourceLocation;
import io.github.eigengate.data.TableRow;
import io.github.eigengate.theory.serre.LocalShape;
import io.github.eigengate.theory.serre.Weight;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.StringJoiner;

/**
 * The rows of {@code modp-weights.csv} parsed into {@link WeightRow}s, with the few columns of {@code congruences.csv}
 * and {@code reducible.csv} the weight checks need. Malformed cells of {@code modp-weights.csv} become
 * {@code table-format} findings (kept in {@link #problems()}, reported by one check only); malformed rows of the two
 * other tables are silently left out, since the congruence checks report them.
 */
final class WeightTable {

    /** p = 2 and p = 3 are refused: the recipes of {@code theory.serre} need p ≥ 5. */
    static final String SMALL_PRIME = "p = 2 and p = 3 are not supported: the weight recipes used here assume p ≥ 5";

    /** Largest p with p² − 1 in an int (the bound of {@code theory.serre}). */
    static final int MAX_PRIME = 46337;

    /** A declared congruence a_ℓ(form) ≡ ℓ^twist · a_ℓ(other) mod the given primes above p. */
    record Congruence(TableRow row, Form form, Form other, int p, int twist, Rho left, Rho right) {
        Subject subject() {
            return new Subject("congruence", form.id() + "~" + other.id(), "p=" + p);
        }
    }

    /** A declaration that ρ̄ of a form at a prime above p is reducible. */
    record Reducible(TableRow row, String form, int p, FpPoly prime) {
        boolean covers(Rho rho) {
            return rho.form().equals(form) && rho.p() == p && (prime == null || prime.equals(rho.prime()));
        }
    }

    private final List<WeightRow> rows = new ArrayList<>();
    private final List<Finding> problems = new ArrayList<>();
    private final List<Congruence> congruences = new ArrayList<>();
    private final List<Reducible> reducible = new ArrayList<>();
    private final Map<String, List<ResidueMap>> primesAbove = new HashMap<>();
    private final Map<String, RuntimeException> primesAboveFailure = new HashMap<>();

    private WeightTable() {
    }

    static WeightTable read(Catalog catalog) {
        WeightTable t = new WeightTable();
        Map<Rho, WeightRow> seen = new HashMap<>();
        for (TableRow r : catalog.weights()) {
            WeightRow row = t.parse(catalog, r);
            if (row == null) {
                continue;
            }
            if (row.rho() != null) {
                WeightRow first = seen.putIfAbsent(row.rho(), row);
                if (first != null) {
                    t.problem(r.at(), row.label(), "one row per form, p and prime", "a second row",
                            "this representation already has a row at line " + first.source().line()
                                    + "; this row is left out");
                    continue;
                }
            }
            t.rows.add(row);
        }
        for (TableRow r : catalog.congruences()) {
            Congruence c = t.congruence(catalog, r);
            if (c != null) {
                t.congruences.add(c);
            }
        }
        for (TableRow r : catalog.reducible()) {
            Integer p = smallInteger(r.get("p"));
            String form = r.get("form");
            if (p == null || form.isEmpty() || !isSupportedPrime(p)) {
                continue;
            }
            FpPoly prime = null;
            if (!r.get("prime").isEmpty()) {
                try {
                    prime = FpPoly.parse(r.get("prime"), p);
                } catch (IllegalArgumentException | ArithmeticException e) {
                    continue;
                }
            }
            t.reducible.add(new Reducible(r, form, p, prime));
        }
        return t;
    }

    List<WeightRow> rows() {
        return rows;
    }

    List<Finding> problems() {
        return problems;
    }

    List<Congruence> congruences() {
        return congruences;
    }

    /** The declaration of reducibility covering this representation, or {@code null}. */
    Reducible reducible(Rho rho) {
        for (Reducible r : reducible) {
            if (r.covers(rho)) {
                return r;
            }
        }
        return null;
    }

    private void problem(SourceLocation at, String subject, String expected, String found, String reason) {
        problems.add(new Finding(Problems.CHECK_ID, Severity.ERROR, at, new Subject("table", at.file(), subject),
                expected, found, reason));
    }

    private WeightRow parse(Catalog catalog, TableRow r) {
        String formId = r.get("form");
        String label = formId.isEmpty() ? "" : "form=" + formId + " ";
        String pText = r.get("p");
        Integer p = smallInteger(pText);
        if (p == null || p < 2 || !isPrime(p)) {
            problem(r.at("p"), label + "p=" + (pText.isEmpty() ? "?" : pText), "a prime p ≥ 5",
                    pText.isEmpty() ? "an empty cell" : pText, "'p' must be a prime number");
            return null;
        }
        label = label + "p=" + p;
        if (p == 2 || p == 3) {
            problem(r.at("p"), label, "a prime p ≥ 5", pText, SMALL_PRIME);
            return null;
        }
        if (p > MAX_PRIME) {
            problem(r.at("p"), label, "a prime 5 ≤ p ≤ " + MAX_PRIME, pText,
                    "p² − 1 must fit the exact integer arithmetic of the weight recipes");
            return null;
        }
        String wText = r.get("weights");
        if (wText.startsWith("(") && wText.indexOf(')') < 0) {
            problem(r.at("weights"), label, "(r,s);(r,s);... in one quoted cell", wText, "the weight set was split "
                    + "at its commas: quote the cell, e.g. \"(0,0);(4,0)\"; the row is left out");
            return null;
        }
        boolean ok = true;
        Form form = null;
        if (!formId.isEmpty()) {
            form = catalog.form(formId);
            if (form == null) {
                problem(r.at("form"), label, "a form id from forms.csv", formId, "no form with this id is declared");
                return null;
            }
        }
        LocalShape.Kind local = null;
        String localText = r.get("local");
        if (!localText.isEmpty()) {
            String w = localText.toLowerCase(Locale.ROOT);
            if (w.equals("split") || w.equals("nonsplit") || w.equals("tres")) {
                local = LocalShape.Kind.fromWord(w);
            } else {
                problem(r.at("local"), label, "split, nonsplit or tres", localText,
                        "'local' names the shape of an ordinary ρ̄ at p");
                ok = false;
            }
            if (form == null) {
                problem(r.at("local"), label, "an empty cell", localText,
                        "'local' refines what a form's a_p says; a row without a form gives 'shape' and 'exponents'");
                ok = false;
            }
        }
        LocalShape shape = null;
        String shapeText = r.get("shape");
        String expText = r.get("exponents");
        if (!shapeText.isEmpty() || !expText.isEmpty()) {
            if (shapeText.isEmpty()) {
                problem(r.at("shape"), label, "irreducible, split, nonsplit or tres", "an empty cell",
                        "'exponents' is given, so 'shape' is needed too");
                ok = false;
            } else if (expText.isEmpty()) {
                problem(r.at("exponents"), label, shapeText.equalsIgnoreCase("irreducible") ? "n" : "a;b",
                        "an empty cell", "'shape' is given, so 'exponents' is needed too");
                ok = false;
            } else {
                LocalShape.Kind kind = null;
                try {
                    kind = LocalShape.Kind.fromWord(shapeText);
                } catch (IllegalArgumentException e) {
                    problem(r.at("shape"), label, "irreducible, split, nonsplit or tres", shapeText,
                            "unknown shape word");
                    ok = false;
                }
                if (kind != null) {
                    try {
                        shape = LocalShape.parse(p, shapeText, expText);
                    } catch (IllegalArgumentException e) {
                        problem(r.at("exponents"), label,
                                kind == LocalShape.Kind.IRREDUCIBLE ? "n with n ≢ 0 mod p + 1" : "a;b", expText,
                                e.getMessage());
                        ok = false;
                    }
                }
            }
            if (local != null) {
                problem(r.at("local"), label, "an empty cell", localText,
                        "give either 'local' (with the form's a_p) or 'shape' and 'exponents', not both");
                ok = false;
            }
        } else if (form == null) {
            problem(r.at(), label, "a form or a shape with exponents", "neither",
                    "a row describes ρ̄ by a form's a_p, or directly by 'shape' and 'exponents'");
            return null;
        }
        ResidueMap prime = null;
        String primeText = r.get("prime");
        if (form != null && !form.rational()) {
            prime = namePrime(r, label, form, p, primeText);
            if (prime == null) {
                return null;
            }
            label = label + " prime=" + prime.factor();
        } else if (!primeText.isEmpty()) {
            problem(r.at("prime"), label, "an empty cell", primeText, form == null
                    ? "a row without a form names no prime" : "the form has rational coefficients: reduction is mod p");
            ok = false;
        }
        Integer serreWeight = null;
        String kText = r.get("serre_weight");
        if (!kText.isEmpty()) {
            long max = (long) p * p - 1;
            Integer k = smallInteger(kText);
            if (k == null || k < 2 || k > max) {
                problem(r.at("serre_weight"), label, "an integer in [2, " + max + "]", kText,
                        "Serre's weight is normalised to 2 ≤ k(ρ̄) ≤ p² − 1 (an unramified ρ̄ has k(ρ̄) = p)");
            } else {
                serreWeight = k;
            }
        }
        Set<Weight> weights = null;
        if (!wText.isEmpty()) {
            try {
                weights = Weight.parseSet(wText, p);
            } catch (IllegalArgumentException e) {
                problem(r.at("weights"), label, "(r,s);(r,s);... with 0 ≤ r ≤ " + (p - 1) + ", 0 ≤ s ≤ " + (p - 2),
                        wText, e.getMessage());
            }
        }
        if (!ok) {
            return null;
        }
        Rho rho = form == null ? null : new Rho(form.id(), p, prime == null ? null : prime.factor());
        return new WeightRow(r, form, p, prime, rho, local, shape, serreWeight, weights);
    }

    /** Names the prime above p for a form with a coefficient field, or reports why it cannot. */
    private ResidueMap namePrime(TableRow r, String label, Form form, int p, String text) {
        NumberField field = form.field();
        List<ResidueMap> above;
        try {
            above = primesAbove(field, p);
        } catch (IndexDivisibleException e) {
            problem(r.at("prime"), label, "a prime above " + p + " named by a factor of " + field.polynomial()
                    + " mod " + p, text.isEmpty() ? "an empty cell" : text, e.getMessage());
            return null;
        }
        if (text.isEmpty()) {
            if (above.size() == 1) {
                return above.get(0);
            }
            problem(r.at("prime"), label, "one of " + factors(above), "an empty cell", "several primes lie above "
                    + p + " in " + field.name() + ": name one in 'prime'");
            return null;
        }
        FpPoly g;
        try {
            g = FpPoly.parse(text, p);
        } catch (ExpressionSyntaxException e) {
            problem(r.at("prime"), label, "one of " + factors(above), text, e.getMessage());
            return null;
        } catch (ArithmeticException e) {
            problem(r.at("prime"), label, "one of " + factors(above), text, e.getMessage());
            return null;
        }
        for (ResidueMap m : above) {
            if (m.factor().equals(g)) {
                return m;
            }
        }
        problem(r.at("prime"), label, "one of " + factors(above), text, "not a monic irreducible factor of "
                + field.polynomial() + " modulo " + p);
        return null;
    }

    List<ResidueMap> primesAbove(NumberField field, int p) {
        String key = field.polynomial() + "|" + p;
        RuntimeException failed = primesAboveFailure.get(key);
        if (failed != null) {
            throw failed;
        }
        List<ResidueMap> cached = primesAbove.get(key);
        if (cached != null) {
            return cached;
        }
        try {
            List<ResidueMap> above = ResidueMap.primesAbove(field, p);
            primesAbove.put(key, above);
            return above;
        } catch (IndexDivisibleException e) {
            primesAboveFailure.put(key, e);
            throw e;
        }
    }

    private static String factors(List<ResidueMap> above) {
        StringJoiner j = new StringJoiner("; ");
        for (ResidueMap m : above) {
            j.add(m.factor().toString());
        }
        return j.toString();
    }

    /** Reads the columns form, other, p, twist, prime, other_prime; {@code null} when any is unusable. */
    private Congruence congruence(Catalog catalog, TableRow r) {
        Form form = catalog.form(r.get("form"));
        Form other = catalog.form(r.get("other"));
        Integer p = smallInteger(r.get("p"));
        if (form == null || other == null || p == null || !isSupportedPrime(p)) {
            return null;
        }
        String twistText = r.get("twist");
        int twist = 0;
        if (!twistText.isEmpty()) {
            if (!isInteger(twistText)) {
                return null;
            }
            twist = new BigInteger(twistText).mod(BigInteger.valueOf(p - 1)).intValue();
        }
        Rho left = rhoOf(form, p, r.get("prime"));
        Rho right = rhoOf(other, p, r.get("other_prime"));
        if (left == null || right == null) {
            return null;
        }
        return new Congruence(r, form, other, p, twist, left, right);
    }

    /** The representation of form at the prime named by text (or the only prime above p), or {@code null}. */
    private Rho rhoOf(Form form, int p, String text) {
        if (form.rational()) {
            return text.isEmpty() ? new Rho(form.id(), p, null) : null;
        }
        List<ResidueMap> above;
        try {
            above = primesAbove(form.field(), p);
        } catch (IndexDivisibleException e) {
            return null;
        }
        if (text.isEmpty()) {
            return above.size() == 1 ? new Rho(form.id(), p, above.get(0).factor()) : null;
        }
        try {
            FpPoly g = FpPoly.parse(text, p);
            for (ResidueMap m : above) {
                if (m.factor().equals(g)) {
                    return new Rho(form.id(), p, g);
                }
            }
        } catch (IllegalArgumentException | ArithmeticException e) {
            return null;
        }
        return null;
    }

    static boolean isSupportedPrime(int p) {
        return p >= 5 && p <= MAX_PRIME && isPrime(p);
    }

    /** Trial division; exact for every int. */
    static boolean isPrime(int n) {
        if (n < 2) {
            return false;
        }
        for (long d = 2; d * d <= n; d++) {
            if (n % d == 0) {
                return false;
            }
        }
        return true;
    }

    /** A decimal integer fitting an int, or {@code null}. */
    static Integer smallInteger(String s) {
        if (!isInteger(s)) {
            return null;
        }
        BigInteger v = new BigInteger(s);
        return v.bitLength() < 31 ? v.intValue() : null;
    }

    static boolean isInteger(String s) {
        int i = 0;
        if (!s.isEmpty() && (s.charAt(0) == '-' || s.charAt(0) == '+')) {
            i = 1;
        }
        if (i == s.length()) {
            return false;
        }
        for (; i < s.length(); i++) {
            if (s.charAt(i) < '0' || s.charAt(i) > '9') {
                return false;
            }
        }
        return true;
    }
}
