package io.github.eigengate.check;

/**
 * What a finding is about: a unit (a form, a space, a congruence, a table) and, inside it, the detail that breaks
 * (an index n, a prime p). The unit is what the JUnit-XML report turns into one test case.
 *
 * @param kind   {@code form}, {@code space}, {@code congruence}, {@code weights}, {@code table} …
 * @param name   the unit's name in table notation, e.g. a form id or {@code N=11 k=2}
 * @param detail e.g. {@code n=6} or {@code p=5}; may be empty
 */
public record Subject(String kind, String name, String detail) {

    public Subject {
        detail = detail == null ? "" : detail;
    }

    public static Subject form(String id) {
        return new Subject("form", id, "");
    }

    public static Subject form(String id, String detail) {
        return new Subject("form", id, detail);
    }

    public Subject with(String detail) {
        return new Subject(kind, name, detail);
    }

    /** The test-case name of the unit, e.g. {@code form f1}. */
    public String unit() {
        return kind + " " + name;
    }

    /** {@code form=f1 n=6}; for a table problem only the detail, since the location already names the file. */
    @Override
    public String toString() {
        if (kind.equals("table") && !detail.isEmpty()) {
            return detail;
        }
        return detail.isEmpty() ? kind + "=" + name : kind + "=" + name + " " + detail;
    }
}
