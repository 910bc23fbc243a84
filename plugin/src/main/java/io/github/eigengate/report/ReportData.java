package io.github.eigengate.report;

import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import io.github.eigengate.engine.Observer;
import io.github.eigengate.theory.Arith;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Gathers the per-form plot data of the HTML report while the checks run. Thread-safe; the order of the result is
 * the run's dataset order, then forms.csv order, whatever order the forms arrived in.
 */
public final class ReportData implements Observer {

    /** Fields of larger degree are not plotted: isolating their real roots would cost more than the picture is worth. */
    static final int MAX_PLOTTED_DEGREE = 48;

    private final List<String> datasets;
    private final List<FormSeries> series = new ArrayList<>();

    /** @param datasets the display names of the run's datasets, in run order */
    public ReportData(List<String> datasets) {
        this.datasets = List.copyOf(datasets);
    }

    @Override
    public Check.Pass start(Catalog catalog) {
        int setIndex = Math.max(datasets.indexOf(catalog.display()), 0);
        Map<String, Integer> order = new HashMap<>();
        for (String id : catalog.forms().keySet()) {
            order.put(id, order.size());
        }
        List<FormSeries> mine = new ArrayList<>();
        Map<String, double[]> rootsByField = new HashMap<>();
        return new Check.Pass() {
            @Override
            public void form(FormData<?> data, FindingSink out) {
                FormSeries s = series(catalog.display(), setIndex, order.getOrDefault(data.form().id(), -1), data,
                        rootsByField);
                synchronized (mine) {
                    mine.add(s);
                }
            }

            @Override
            public void finish(FindingSink out) {
                synchronized (series) {
                    synchronized (mine) {
                        series.addAll(mine);
                    }
                }
            }
        };
    }

    /** For tests of the ordering: forms as if they had arrived in this order. */
    void addAllForTest(List<FormSeries> arrived) {
        synchronized (series) {
            series.addAll(arrived);
        }
    }

    /** The forms seen, by dataset and then forms.csv order. */
    public List<FormSeries> forms() {
        synchronized (series) {
            List<FormSeries> out = new ArrayList<>(series);
            out.sort(Comparator.comparingInt(FormSeries::datasetIndex).thenComparingInt(FormSeries::formIndex)
                    .thenComparing(FormSeries::id));
            return List.copyOf(out);
        }
    }

    static FormSeries series(String dataset, int setIndex, int formIndex, FormData<?> data,
                             Map<String, double[]> rootsByField) {
        Form f = data.form();
        Coefficients<?> a = data.coefficients();
        List<Long> primes = new ArrayList<>();
        for (int n : a.indices()) {
            if (n >= 2 && f.level() % n != 0 && Arith.isPrime(n)) {
                primes.add((long) n);
            }
        }
        double[] roots;
        String note = "";
        if (f.rational()) {
            roots = new double[] {0};
        } else if (f.degree() > MAX_PLOTTED_DEGREE) {
            roots = new double[0];
            note = "coefficient field of degree " + f.degree() + " > " + MAX_PLOTTED_DEGREE + ": not plotted";
        } else {
            String key = f.fieldPolynomial().toString();
            synchronized (rootsByField) {
                roots = rootsByField.computeIfAbsent(key, k -> Embeddings.realRoots(f.fieldPolynomial()));
            }
            if (roots.length == 0) {
                note = "the coefficient field has no real embedding: nothing to plot";
            }
        }
        if (!f.character().isTrivial() && note.isEmpty()) {
            note = "a form with a character: a_p is not real, nothing to plot";
            roots = new double[0];
        }
        long[] ps = new long[primes.size()];
        double[][] values = new double[roots.length][primes.size()];
        int zeros = 0;
        for (int i = 0; i < ps.length; i++) {
            long p = primes.get(i);
            ps[i] = p;
            Object ap = a.get(p);
            List<Rational> coords = coordinates(ap);
            if (coords.stream().allMatch(q -> q.signum() == 0)) {
                zeros++;
            }
            double scale = 2 * Math.pow(p, (f.weight() - 1) / 2.0);
            for (int e = 0; e < roots.length; e++) {
                values[e][i] = Embeddings.evaluate(coords, roots[e]) / scale;
            }
        }
        return new FormSeries(dataset, setIndex, formIndex, f.id(), f.level(), f.weight(), f.degree(), ps, values,
                zeros, note, f.rational() ? new double[0] : roots.clone());
    }

    private static List<Rational> coordinates(Object ap) {
        if (ap instanceof Rational q) {
            return List.of(q);
        }
        if (ap instanceof NumberField.Element e) {
            return e.coordinates();
        }
        return List.of();
    }
}
