package io.github.eigengate.check;

/**
 * A quantity a check computed about a unit, for the reports to show beside its verdict (never a verdict itself):
 * e.g. the dimension formula of a space, or the Sturm-type bound of a congruence and how far the data reached.
 *
 * @param dataset  the dataset the unit belongs to (filled in by the engine; {@code ""} while a check reports it)
 * @param check    the id of the check that computed it
 * @param unit     the unit, as in {@link FindingSink#examined}
 * @param quantity a short lower-case name, e.g. {@code formula}, {@code bound}, {@code reached}
 * @param value    in table notation
 */
public record Measure(String dataset, String check, Subject unit, String quantity, String value) {

    public Measure {
        dataset = dataset == null ? "" : dataset;
    }
}
