package io.github.eigengate.data;

import io.github.eigengate.arith.DirichletCharacter;
import java.math.BigInteger;

/** Parsing of single cells, reporting what was expected when a cell is malformed. */
final class Cells {

    private Cells() {
    }

    /**
     * A decimal integer in [min, max], or {@code null} after reporting. Empty cells are reported as missing.
     */
    static Integer integer(CsvTable.Row row, String column, long min, long max, String subject, Problems problems) {
        return integer(row, column, row.get(column), min, max, subject, problems);
    }

    /** As above, for a cell already read. */
    static Integer integer(CsvTable.Row row, String column, String text, long min, long max, String subject,
                           Problems problems) {
        if (text.isEmpty()) {
            problems.error(row.at(column), subject, "an integer in " + range(min, max), "an empty cell",
                    "the column '" + column + "' needs a value");
            return null;
        }
        if (!isInteger(text)) {
            problems.error(row.at(column), subject, "an integer in " + range(min, max), text,
                    "'" + column + "' must be a decimal integer");
            return null;
        }
        if (text.length() <= 9) {
            int v = Integer.parseInt(text);
            if (v >= min && v <= max) {
                return v;
            }
        }
        if (significantDigits(text) > 19) { // beyond every long: out of range, decided without BigInteger
            problems.error(row.at(column), subject, "an integer in " + range(min, max), text,
                    "'" + column + "' is out of range");
            return null;
        }
        BigInteger v = new BigInteger(text);
        if (v.compareTo(BigInteger.valueOf(min)) < 0 || v.compareTo(BigInteger.valueOf(max)) > 0) {
            problems.error(row.at(column), subject, "an integer in " + range(min, max), text,
                    "'" + column + "' is out of range");
            return null;
        }
        return v.intValueExact();
    }

    /** The largest weight accepted: powers p^(k-1) stay of a size exact arithmetic handles in a build. */
    static final int MAX_WEIGHT = 10_000;

    /**
     * The weight column with the trivial character: an even integer in [2, 10000]. −I lies in Γ0(N) and acts on S_k
     * as (−1)^k, so there are no forms of odd weight.
     */
    static Integer weight(CsvTable.Row row, String subject, Problems problems) {
        return weight(row, subject, problems, DirichletCharacter.trivial(1));
    }

    /**
     * The weight column of a row with character χ: an integer k in [1, 10000] with (−1)^k = χ(−1), since −I acts on
     * S_k(N, χ) as χ(−1)(−1)^k, so S_k(N, χ) = 0 otherwise (Diamond–Shurman §4.3, Miyake §4.3, from memory). With
     * {@code chi == null} (a malformed character cell, reported already) only the range is checked.
     */
    static Integer weight(CsvTable.Row row, String subject, Problems problems,
                          DirichletCharacter chi) {
        Integer k = integer(row, "weight", 1, MAX_WEIGHT, subject, problems);
        if (k == null || chi == null) {
            return k;
        }
        if (chi.isTrivial() && k % 2 != 0) {
            problems.error(row.at("weight"), subject, "an even weight", Integer.toString(k),
                    "with the trivial character there are no forms of odd weight (−I ∈ Γ0(N) acts as (−1)^k)");
            return null;
        }
        boolean odd = chi.isOdd();
        if (!chi.isTrivial() && (k % 2 != 0) != odd) {
            problems.error(row.at("weight"), subject, odd ? "an odd weight" : "an even weight", Integer.toString(k),
                    "S_k(N, χ) = 0: χ(−1) = " + (odd ? "−1" : "1") + " but (−1)^k = " + (odd ? "1" : "−1")
                            + ", and −I acts on S_k(N, χ) as χ(−1)(−1)^k");
            return null;
        }
        return k;
    }

    /**
     * Whether whitespace separates two digits, as in {@code 1 0}: a typo the rule "whitespace is ignored" would
     * otherwise turn into 10.
     */
    static boolean splitsDigits(String s) {
        for (int i = 1; i < s.length(); i++) {
            if (Character.isWhitespace(s.charAt(i))) {
                int j = i;
                while (j < s.length() && Character.isWhitespace(s.charAt(j))) {
                    j++;
                }
                if (j < s.length() && Character.isDigit(s.charAt(i - 1)) && Character.isDigit(s.charAt(j))) {
                    return true;
                }
                i = j;
            }
        }
        return false;
    }

    /** The value of a plain decimal in [1, 2^31 − 1], else -1 (the caller then takes the reporting path). */
    static int smallPositive(String s) {
        long v = smallInteger(s);
        return v >= 1 && v <= Integer.MAX_VALUE ? (int) v : -1;
    }

    /**
     * The value of an optionally signed decimal of at most 18 digits with no whitespace, else {@link Long#MIN_VALUE}
     * (the caller then takes the general path): the common cell of a rational table, read without allocation.
     */
    static long smallInteger(String s) {
        int len = s.length();
        int i = 0;
        boolean negative = false;
        if (len > 0 && (s.charAt(0) == '-' || s.charAt(0) == '+')) {
            negative = s.charAt(0) == '-';
            i = 1;
        }
        if (i == len || len - i > 18) {
            return Long.MIN_VALUE;
        }
        long v = 0;
        for (; i < len; i++) {
            char c = s.charAt(i);
            if (c < '0' || c > '9') {
                return Long.MIN_VALUE;
            }
            v = v * 10 + (c - '0');
        }
        return negative ? -v : v;
    }

    /** Digits after the sign and leading zeros of a decimal integer. */
    static int significantDigits(String s) {
        int i = s.startsWith("-") || s.startsWith("+") ? 1 : 0;
        while (i < s.length() - 1 && s.charAt(i) == '0') {
            i++;
        }
        return s.length() - i;
    }

    static String range(long min, long max) {
        return max >= Integer.MAX_VALUE ? "[" + min + ", " + Integer.MAX_VALUE + "]" : "[" + min + ", " + max + "]";
    }

    /** Optional sign, then decimal digits. */
    static boolean isInteger(String s) {
        int i = 0;
        int len = s.length();
        if (len > 0 && (s.charAt(0) == '-' || s.charAt(0) == '+')) {
            i = 1;
        }
        if (i == len) {
            return false;
        }
        for (; i < len; i++) {
            char c = s.charAt(i);
            if (c < '0' || c > '9') {
                return false;
            }
        }
        return true;
    }

    /** Removes all whitespace: the contract says whitespace inside a value is ignored. */
    static String compact(String s) {
        int i = 0;
        while (i < s.length() && !Character.isWhitespace(s.charAt(i))) {
            i++;
        }
        if (i == s.length()) {
            return s;
        }
        StringBuilder b = new StringBuilder(s.length());
        for (int j = 0; j < s.length(); j++) {
            char c = s.charAt(j);
            if (!Character.isWhitespace(c)) {
                b.append(c);
            }
        }
        return b.toString();
    }
}
