package io.github.eigengate.check.congruence;

import io.github.eigengate.check.Certificate;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.Finding;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.CatalogReader;
import io.github.eigengate.data.CoefficientReader;
import io.github.eigengate.data.FormData;
import io.github.eigengate.data.Problems;
import io.github.eigengate.data.SourceLocation;
import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Times the certification of a congruence whose Sturm-type bound is about 10^5: the weight-2 newforms of levels 11
 * and 58 mod 5 (B = 114840), on a_ℓ for ℓ ≤ 115000 computed with PARI/GP (congruences/level11-58.csv, command in its
 * header). Reading the tables is timed apart from the check (the pass over both forms and the final evaluation).
 *
 * <p>Run as shown in docs/congruences.md, "Benchmark" (the test classes, the main classes and the plugin's
 * dependencies on the class path; argument: the number of runs, default 5).
 */
public final class CongruenceBench {

    private CongruenceBench() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Files.createTempDirectory("eigengate-bench");
        Datasets.write(dir, "forms.csv", "id,level,weight\nf11,11,2\nf58,58,2\n",
                "coefficients.csv", Fixture.of("congruences/level11-58.csv").text(),
                "congruences.csv", "form,other,p\nf11,f58,5\n");
        Problems quiet = new Problems() {
            @Override
            public void error(SourceLocation at, String subject, String expected, String found, String reason) {
                throw new IllegalStateException(at + ": " + reason);
            }

            @Override
            public void warning(SourceLocation at, String subject, String expected, String found, String reason) {
            }
        };
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 5;
        for (int run = 1; run <= runs; run++) {
            long t0 = System.nanoTime();
            Catalog catalog = CatalogReader.read(dir, "data", quiet);
            List<FormData<?>> forms = new ArrayList<>();
            CoefficientReader.stream(catalog, Set.of(), quiet, forms::add);
            long t1 = System.nanoTime();
            List<String> lines = new ArrayList<>();
            List<Certificate> certificates = new ArrayList<>();
            FindingSink sink = new FindingSink() {
                @Override
                public void report(Finding finding) {
                    lines.add(finding.line());
                }

                @Override
                public void examined(String check, Subject unit) {
                }

                @Override
                public void certificate(Certificate certificate) {
                    certificates.add(certificate);
                }
            };
            Check.Pass pass = new CongruenceCheck(false).start(catalog);
            long ta = System.nanoTime();
            for (FormData<?> f : forms) {
                pass.form(f, sink);
            }
            long tb = System.nanoTime();
            pass.finish(sink);
            long t2 = System.nanoTime();
            System.out.printf("run %d: read %.1f ms, certify %.1f ms (start %.1f, reduce %.1f, finish %.1f; %d "
                            + "certificate)%n", run, (t1 - t0) / 1e6, (t2 - t1) / 1e6, (ta - t1) / 1e6, (tb - ta) / 1e6,
                    (t2 - tb) / 1e6, certificates.size());
            if (run == runs) {
                lines.forEach(System.out::println);
            }
        }
    }
}
