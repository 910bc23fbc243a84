package io.github.eigengate.check.congruence;

import io.github.eigengate.arith.ExpressionSyntaxException;
import io.github.eigengate.arith.FpPoly;
import io.github.eigengate.check.Certificate;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.Finding;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import io.github.eigengate.data.Problems;
import io.github.eigengate.data.TableRow;
import io.github.eigengate.data.Tables;
import io.github.eigengate.theory.Arith;
import io.github.eigengate.theory.congruence.CongruenceBounds.Plan;
import java.io.IOException;
import java.io.InputStream;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;

/**
 * What the congruence checks share: parsing of claim cells (malformed ones become {@code table-format} findings),
 * one {@link Residues.Store} per (form, p) referenced by a claim, filled while the forms stream past, and the
 * certificate's dataset checksums.
 */
abstract class ClaimPass implements Check.Pass {

    final Catalog catalog;
    final boolean uncertifiedIsWarning;
    final Primes sieve = new Primes();
    final List<Finding> pending = new ArrayList<>();
    private final Map<String, Residues.Store> stores = new LinkedHashMap<>();
    private final Map<String, String> indexProblems = new HashMap<>();
    private final Map<String, List<Residues.Store>> byForm = new HashMap<>();
    private final Set<String> certificateNames = new HashSet<>();

    ClaimPass(Catalog catalog, boolean uncertifiedIsWarning) {
        this.catalog = catalog;
        this.uncertifiedIsWarning = uncertifiedIsWarning;
    }

    /** Registers that claims need a_ℓ of this form mod the primes above p for ℓ ≤ limit. */
    final void need(Form form, long p, long limit) {
        String key = form.id() + "\u0000" + p;
        Residues.Store s = stores.get(key);
        if (s != null) {
            if (s.limit >= limit) {
                return;
            }
            stores.remove(key);
            byForm.get(form.id()).remove(s);
        } else if (indexProblems.containsKey(key)) {
            return;
        }
        try {
            Residues.Store fresh = new Residues.Store(form, p, limit, Residues.primesAbove(form, p));
            stores.put(key, fresh);
            byForm.computeIfAbsent(form.id(), k -> new ArrayList<>()).add(fresh);
        } catch (Residues.IndexDivisible e) {
            indexProblems.put(key, e.getMessage());
        }
    }

    final Residues.Store store(Form form, long p) {
        return stores.get(form.id() + "\u0000" + p);
    }

    /** The reason the primes above p cannot be named for this form, or null. */
    final String indexProblem(Form form, long p) {
        return indexProblems.get(form.id() + "\u0000" + p);
    }

    @Override
    public final void form(FormData<?> data, FindingSink out) {
        List<Residues.Store> mine = byForm.get(data.form().id());
        if (mine != null) {
            for (Residues.Store s : mine) {
                s.fill(data, sieve);
            }
        }
    }

    @Override
    public final void finish(FindingSink out) {
        pending.forEach(out::report);
        evaluate(out);
    }

    abstract void evaluate(FindingSink out);

    // ---- cells ----

    final void cellError(TableRow row, String column, String subject, String expected, String found, String reason) {
        pending.add(new Finding(Problems.CHECK_ID, Severity.ERROR, row.at(column),
                new Subject("table", row.file(), subject), expected, found, reason));
    }

    /** The form named in the cell, or null after reporting it. */
    final Form formCell(TableRow row, String column, String subject) {
        String id = row.get(column);
        Form f = catalog.form(id);
        if (f == null) {
            cellError(row, column, subject, "a form id from forms.csv", id.isEmpty() ? "an empty cell" : id,
                    "no form with this id is declared; the row is skipped");
        }
        return f;
    }

    /** p, a prime below 2^31, or -1 after reporting it. */
    final long primeCell(TableRow row, String subject) {
        String text = row.get("p");
        long p;
        try {
            p = Long.parseLong(text);
        } catch (NumberFormatException e) {
            p = -1;
        }
        if (p < 2 || p > Integer.MAX_VALUE || !Arith.isPrime(p)) {
            cellError(row, "p", subject, "a prime p with 2 <= p < 2^31", text.isEmpty() ? "an empty cell" : text,
                    p >= 2 && p <= Integer.MAX_VALUE ? p + " is not prime" : "'p' must be a decimal prime below 2^31");
            return -1;
        }
        return p;
    }

    /** An integer exponent (default {@code dflt} when the cell is empty), or null after reporting it. */
    final Long integerCell(TableRow row, String column, String subject, Long dflt) {
        String text = row.get(column);
        if (text.isEmpty() && dflt != null) {
            return dflt;
        }
        try {
            long v = Long.parseLong(text);
            if (Math.abs(v) <= 1_000_000_000_000L) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        cellError(row, column, subject, "an integer in [-10^12, 10^12]", text.isEmpty() ? "an empty cell" : text,
                "'" + column + "' must be a decimal integer");
        return null;
    }

    /**
     * The prime above p named by the cell (a monic irreducible factor of the field polynomial mod p, in x), null when
     * the cell is empty (search), or {@link #BAD} after reporting it.
     */
    final FpPoly primeFactorCell(TableRow row, String column, String subject, Form form, long p) {
        String text = row.get(column);
        if (text.isEmpty()) {
            return null;
        }
        FpPoly fbar = FpPoly.fromQPoly(form.fieldPolynomial(), p);
        List<String> choices = new ArrayList<>();
        for (FpPoly.Factor fac : fbar.factor()) {
            choices.add(fac.factor().toString());
        }
        String expected = "a monic irreducible factor of " + fbar + " mod " + p + ": " + String.join(" or ", choices);
        FpPoly g;
        try {
            g = FpPoly.parse(text, p);
        } catch (ExpressionSyntaxException | ArithmeticException e) {
            cellError(row, column, subject, expected, text, "the cell is not a polynomial in x mod " + p + ": "
                    + e.getMessage());
            return BAD;
        }
        if (!choices.contains(g.toString())) {
            cellError(row, column, subject, expected, text, g + " mod " + p + " is not one of these factors of the "
                    + "field polynomial of " + form.id());
            return BAD;
        }
        return g;
    }

    /** Marks a malformed prime cell. */
    static final FpPoly BAD = FpPoly.zero(2);

    // ---- outcome helpers ----

    final void notCertified(FindingSink out, String check, TableRow row, Subject subject, String expected,
                            String found, String reason) {
        out.report(new Finding(check, uncertifiedIsWarning ? Severity.WARNING : Severity.ERROR, row.at(), subject,
                expected, found, reason));
    }

    /**
     * Reports that the primes above p cannot be named for one of the forms (p divides the index of Z[x]); returns
     * whether it did.
     */
    final boolean reportIndexProblem(FindingSink out, String check, TableRow row, Subject subject, long p,
                                     Form... forms) {
        for (Form h : forms) {
            String ip = indexProblem(h, p);
            if (ip != null) {
                out.error(check, row.at(), subject, "primes above " + p + " named by factors of "
                        + h.fieldPolynomial() + " mod " + p, "an index divisible by " + p, "not supported: " + ip);
                return true;
            }
        }
        return false;
    }

    /**
     * Reports an a_l below the bound with p in a denominator (no residue exists, so the data cannot be those of a
     * newform); returns whether it did.
     */
    final boolean reportNotIntegral(FindingSink out, String check, TableRow row, Subject subject, long p,
                                    BigInteger smallestBound, Residues.Store... stores) {
        for (Residues.Store s : stores) {
            if (s.notIntegralAt > 0 && s.notIntegralAt <= asLong(smallestBound)) {
                out.error(check, row.at(), subject, "a_" + s.notIntegralAt + "(" + s.form.id() + ") integral at " + p,
                        s.notIntegralValue, "a_l of a newform is an algebraic integer, so it has a residue mod every "
                                + "prime above p; this one has " + p + " in a denominator");
                return true;
            }
        }
        return false;
    }

    /**
     * The end of an evaluation whose residues agree up to the tables' end x: not certified when x is below the bound
     * of {@code plan}, else a certified note and the certificate (made only then).
     */
    final void conclude(FindingSink out, String check, TableRow row, Subject subject, String claimText, Plan plan,
                        long x, Set<Long> excluded, Supplier<Certificate> certificate) {
        BigInteger b = plan.bound();
        out.measure(check, subject, "bound", b.toString());
        out.measure(check, subject, "reached", Long.toString(x));
        if (BigInteger.valueOf(x).compareTo(b) < 0) {
            notCertified(out, check, row, subject, "a_l for every prime l <= B = " + b,
                    "the tables stop at l = " + x,
                    "not certified: the congruence holds for every l <= " + x + " in the tables, but Sturm's bound "
                            + "needs l <= " + b + " (" + plan.derivation() + "; Sturm, LNM 1240, Thm 1)");
            return;
        }
        out.note(check, row.at(), subject, "certified: " + claimText + " for every prime l not dividing "
                + product(excluded) + ", having checked every l <= B = " + b + " (" + plan.derivation()
                + "; Sturm, LNM 1240, Thm 1)");
        out.certificate(certificate.get());
    }

    /** The certificate lines from the theorem on, the same for every kind of claim; {@code extra} follows the route. */
    final String certificateTail(TableRow row, long p, Plan plan, long x, Set<Long> excluded, String extra) {
        StringBuilder b = new StringBuilder();
        b.append("theorem: J. Sturm, On the congruence of modular forms, LNM 1240 (1987), Theorem 1, applied to ")
                .append(plan.derivation()).append('\n');
        b.append("route: ").append(plan.route()).append('\n');
        b.append(extra);
        b.append("level M: ").append(plan.levelValue()).append(", index [SL2(Z):Gamma0(M)] = ")
                .append(plan.index()).append('\n');
        b.append("weight W: ").append(plan.weight()).append('\n');
        b.append("bound B = floor(W*index/12): ").append(plan.bound()).append('\n');
        b.append("checked: a_l for every prime l <= ").append(plan.bound()).append(" not dividing ")
                .append(product(excluded)).append(plan.comparesAtP() ? ", and a_" + p : "").append('\n');
        b.append("tables: every needed a_l present up to at least l = ").append(x).append('\n');
        b.append("claim row: ").append(row.at()).append('\n');
        b.append("dataset: ").append(catalog.display()).append('\n');
        b.append(checksums());
        return b.toString();
    }

    /** A form as certificates describe it. */
    static String describe(Form f) {
        return f.id() + " (level " + f.level() + ", weight " + f.weight() + ", field "
                + (f.rational() ? "Q" : "Q[x]/(" + f.fieldPolynomial() + ")") + ")";
    }

    /** A file name made of the parts, safe on every file system, and unique within this pass. */
    final String certificateName(String... parts) {
        StringBuilder b = new StringBuilder();
        for (String part : parts) {
            if (b.length() > 0) {
                b.append('-');
            }
            b.append(part.replaceAll("[^A-Za-z0-9._+]", "_"));
        }
        String base = b.toString();
        String name = base + ".txt";
        for (int k = 2; !certificateNames.add(name); k++) {
            name = base + "-" + k + ".txt";
        }
        return name;
    }

    /**
     * {@code sha256  <file>} lines for forms.csv, every coefficient file and the claim tables (congruences.csv,
     * reducible.csv) present in the dataset.
     */
    final String checksums() {
        StringBuilder b = new StringBuilder();
        List<Path> files = new ArrayList<>();
        files.add(catalog.directory().resolve("forms.csv"));
        files.addAll(catalog.coefficientFiles());
        for (String claims : List.of(Tables.CONGRUENCES, Tables.REDUCIBLE)) {
            Path file = catalog.directory().resolve(claims);
            if (Files.isRegularFile(file)) {
                files.add(file);
            }
        }
        for (Path file : files) {
            Path base = catalog.directory().toAbsolutePath().normalize();
            b.append("sha256 ").append(sha256(file)).append("  ")
                    .append(base.relativize(file.toAbsolutePath().normalize()).toString().replace('\\', '/'))
                    .append('\n');
        }
        return b.toString();
    }

    static String sha256(Path file) {
        try (InputStream in = Files.newInputStream(file)) {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            byte[] buf = new byte[1 << 16];
            for (int n = in.read(buf); n >= 0; n = in.read(buf)) {
                md.update(buf, 0, n);
            }
            return HexFormat.of().formatHex(md.digest());
        } catch (IOException e) {
            return "unreadable (" + e.getMessage() + ")";
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every JDK", e);
        }
    }

    /** The primes dividing the product of the given numbers, as a set. */
    static Set<Long> primesDividing(long... ns) {
        Set<Long> out = new HashSet<>();
        for (long n : ns) {
            for (long q : Arith.primeFactors(n)) {
                out.add(q);
            }
        }
        return out;
    }

    /** The bound as a long (Long.MAX_VALUE when it does not fit). */
    static long asLong(BigInteger b) {
        return b.bitLength() < 63 ? b.longValue() : Long.MAX_VALUE;
    }

    /** The product of the primes, written as a number. */
    static String product(Set<Long> primes) {
        BigInteger m = BigInteger.ONE;
        for (long q : primes) {
            m = m.multiply(BigInteger.valueOf(q));
        }
        return m.toString();
    }
}
