package io.github.eigengate.data;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.engine.Datasets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The streaming contract: grouped rows are delivered form by form as each run ends (one pass, memory bounded by the
 * largest form); scattered rows are detected and, when held back, delivered whole at the end. Values: the level-11
 * newform, OEIS A006571 (a_1..a_4 = 1, -2, -1, 2); τ(1..3) = 1, -24, 252 (OEIS A000594).
 */
class CoefficientReaderTest {

    @TempDir
    Path dir;

    private Catalog catalog(String coefficients) {
        Datasets.write(dir, "forms.csv", "id,level,weight\nf,11,2\ndelta,1,12\n", "coefficients.csv", coefficients);
        return CatalogReader.read(dir, "data", new CsvTableTest.Recorded());
    }

    private static List<String> deliveries(Catalog c, Set<String> holdBack, Set<String>[] scattered) {
        List<String> seen = new ArrayList<>();
        scattered[0] = CoefficientReader.stream(c, holdBack, new CsvTableTest.Recorded(),
                d -> seen.add(d.form().id() + ":" + d.coefficients().size()));
        return seen;
    }

    @Test
    @SuppressWarnings("unchecked")
    void groupedRowsAreDeliveredInOnePass() {
        Catalog c = catalog("form,n,value\nf,1,1\nf,2,-2\nf,3,-1\ndelta,1,1\ndelta,2,-24\n");
        Set<String>[] scattered = new Set[1];
        assertEquals(List.of("f:3", "delta:2"), deliveries(c, Set.of(), scattered));
        assertEquals(Set.of(), scattered[0]);
    }

    @Test
    @SuppressWarnings("unchecked")
    void scatteredRowsAreDetectedThenHeldBackToTheEnd() {
        Catalog c = catalog("form,n,value\nf,1,1\ndelta,1,1\nf,2,-2\ndelta,2,-24\nf,4,2\ndelta,3,252\n");
        Set<String>[] scattered = new Set[1];
        deliveries(c, Set.of(), scattered);
        assertEquals(Set.of("f", "delta"), scattered[0]);
        assertEquals(List.of("f:3", "delta:3"), deliveries(c, Set.of("f", "delta"), scattered));
        assertEquals(Set.of(), scattered[0]);
    }
}
