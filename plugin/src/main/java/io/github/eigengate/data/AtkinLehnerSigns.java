package io.github.eigengate.data;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The optional {@code atkin_lehner} and {@code root_number} cells of a form: w_q = ±1 for every prime q | N (empty
 * map when the cell is empty) and the sign ε of the functional equation (0 when the cell is empty).
 *
 * @param signs      q ↦ w_q, in increasing q
 * @param rootNumber +1, −1, or 0 when not given
 */
public record AtkinLehnerSigns(String form, Map<Integer, Integer> signs, SourceLocation signsAt, int rootNumber,
                               SourceLocation rootNumberAt) {

    public AtkinLehnerSigns {
        signs = Map.copyOf(signs);
    }

    /** Parses the two cells; reports malformed ones as {@code table-format} and returns null when both are empty. */
    static AtkinLehnerSigns read(CsvTable.Row row, String id, int level, String subject, Problems problems) {
        String cell = row.has("atkin_lehner") ? row.get("atkin_lehner").trim() : "";
        String root = row.has("root_number") ? row.get("root_number").trim() : "";
        if (cell.isEmpty() && root.isEmpty()) {
            return null;
        }
        TreeMap<Integer, Integer> signs = new TreeMap<>();
        List<Integer> primes = new ArrayList<>();
        for (int m = level, q = 2; m > 1; q++) {
            if (m % q == 0) {
                primes.add(q);
                while (m % q == 0) {
                    m /= q;
                }
            }
        }
        String expected = "q:+1 or q:-1 for every prime q | N, separated by ';' (primes of " + level + ": "
                + (primes.isEmpty() ? "none" : primes.toString().replace(", ", ";").replaceAll("[\\[\\]]", "")) + ")";
        boolean ok = true;
        if (!cell.isEmpty()) {
            for (String part : cell.split(";", -1)) {
                String[] qs = part.trim().split(":", -1);
                Integer q = qs.length == 2 && qs[0].trim().matches("\\d{1,9}") ? Integer.valueOf(qs[0].trim()) : null;
                Integer w = qs.length == 2 ? sign(qs[1].trim()) : null;
                if (q == null || w == null) {
                    problems.error(row.at("atkin_lehner"), subject, expected, cell, "the entry '" + part.trim()
                            + "' is not of the form q:+1 or q:-1");
                    ok = false;
                } else if (!primes.contains(q)) {
                    problems.error(row.at("atkin_lehner"), subject, expected, cell, q + " is not a prime dividing "
                            + "the level " + level);
                    ok = false;
                } else if (signs.put(q, w) != null) {
                    problems.error(row.at("atkin_lehner"), subject, expected, cell, "the prime " + q
                            + " is listed twice");
                    ok = false;
                }
            }
            if (ok && signs.size() != primes.size()) {
                List<Integer> missing = new ArrayList<>(primes);
                missing.removeAll(signs.keySet());
                problems.error(row.at("atkin_lehner"), subject, expected, cell, "no sign for the prime"
                        + (missing.size() > 1 ? "s " : " ") + missing.toString().replaceAll("[\\[\\]]", "")
                        + " of the level");
                ok = false;
            }
        }
        int eps = 0;
        if (!root.isEmpty()) {
            Integer e = sign(root);
            if (e == null) {
                problems.error(row.at("root_number"), subject, "+1 or -1", root, "the root number is a sign");
            } else {
                eps = e;
            }
        }
        if (!ok) {
            signs.clear();
        }
        if (signs.isEmpty() && eps == 0) {
            return null;
        }
        return new AtkinLehnerSigns(id, signs, row.at("atkin_lehner"), eps,
                row.has("root_number") ? row.at("root_number") : row.at());
    }

    private static Integer sign(String s) {
        return switch (s) {
            case "+1", "1" -> 1;
            case "-1" -> -1;
            default -> null;
        };
    }
}
