package io.github.eigengate.check.congruence;

import io.github.eigengate.arith.ExpressionSyntaxException;
import io.github.eigengate.arith.FpPoly;
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
import io.github.eigengate.theory.Arith;
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

    /** {@code sha256  <file>} lines for forms.csv and every coefficient file of the dataset. */
    final String checksums() {
        StringBuilder b = new StringBuilder();
        List<Path> files = new ArrayList<>();
        files.add(catalog.directory().resolve("forms.csv"));
        files.addAll(catalog.coefficientFiles());
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
