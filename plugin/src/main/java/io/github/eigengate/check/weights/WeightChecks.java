package io.github.eigengate.check.weights;

import io.github.eigengate.check.Check;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * The mod-p weight checks of {@code modp-weights.csv}, in report order. The four share one parse of the table; its
 * {@code table-format} findings (malformed cells, rows that cannot be checked, rows skipped as reducible) are
 * reported once, by the first of the four that is not skipped.
 */
public final class WeightChecks {

    private WeightChecks() {
    }

    /** The ids, in report order. */
    public static final List<String> IDS =
            List.of(SerreWeightCheck.ID, WeightSetCheck.ID, WeightOfFormCheck.ID, WeightCongruenceCheck.ID);

    /**
     * @param skip the ids the run skips (the table's problems go to the first check not in it)
     * @return the four checks, in the order of {@link #IDS}
     */
    public static List<Check> all(Set<String> skip) {
        String owner = null;
        for (String id : IDS) {
            if (!skip.contains(id)) {
                owner = id;
                break;
            }
        }
        List<Check> out = new ArrayList<>();
        out.add(new SerreWeightCheck(SerreWeightCheck.ID.equals(owner)));
        out.add(new WeightSetCheck(WeightSetCheck.ID.equals(owner)));
        out.add(new WeightOfFormCheck(WeightOfFormCheck.ID.equals(owner)));
        out.add(new WeightCongruenceCheck(WeightCongruenceCheck.ID.equals(owner)));
        return List.copyOf(out);
    }
}
