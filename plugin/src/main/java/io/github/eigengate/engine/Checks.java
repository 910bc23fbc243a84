package io.github.eigengate.engine;

import io.github.eigengate.check.Check;
import io.github.eigengate.check.congruence.CongruenceCheck;
import io.github.eigengate.check.congruence.ReducibleCheck;
import io.github.eigengate.check.curve.CurveConductor;
import io.github.eigengate.check.curve.CurveTorsion;
import io.github.eigengate.check.curve.CurveTraces;
import io.github.eigengate.check.form.AtkinLehner;
import io.github.eigengate.check.form.FieldSanity;
import io.github.eigengate.check.form.HeckeRelations;
import io.github.eigengate.check.form.LevelPrimes;
import io.github.eigengate.check.form.Normalisation;
import io.github.eigengate.check.form.RamanujanBound;
import io.github.eigengate.check.space.AtkinLehnerCount;
import io.github.eigengate.check.space.DuplicateOrbits;
import io.github.eigengate.check.space.SpaceDimension;
import io.github.eigengate.check.space.SpaceTraceProducts;
import io.github.eigengate.check.space.SpaceTraceSquares;
import io.github.eigengate.check.space.SpaceTraces;
import io.github.eigengate.check.space.SpaceTracesAtLevel;
import io.github.eigengate.check.weights.WeightChecks;
import java.util.ArrayList;
import java.util.List;

/** The checks Eigengate runs, in report order. A new check is added here (see DEVELOPERS.md). */
public final class Checks {

    private Checks() {
    }

    public static List<Check> all(Settings settings) {
        List<Check> checks = new ArrayList<>(List.of(
                new Normalisation(),
                new FieldSanity(),
                new HeckeRelations(),
                new RamanujanBound(),
                new LevelPrimes(),
                new SpaceDimension(),
                new SpaceTraces(),
                new SpaceTraceProducts(),
                new SpaceTraceSquares(),
                new SpaceTracesAtLevel(),
                new AtkinLehner(),
                new AtkinLehnerCount(),
                new DuplicateOrbits(),
                new CongruenceCheck(settings.uncertifiedIsWarning()),
                new ReducibleCheck(settings.uncertifiedIsWarning())));
        // the weight checks share the reporting of their table's problems, so they need to know which are skipped
        checks.addAll(WeightChecks.all(settings.skip()));
        checks.addAll(List.of(new CurveConductor(), new CurveTraces(), new CurveTorsion()));
        return List.copyOf(checks);
    }
}
