package io.github.eigengate.engine;

import io.github.eigengate.arith.Work;
import io.github.eigengate.cache.ContentStore;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.FormCheck;
import io.github.eigengate.check.Measure;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.CatalogReader;
import io.github.eigengate.data.CoefficientReader;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import io.github.eigengate.data.Problems;
import io.github.eigengate.data.SourceLocation;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.FutureTask;

/**
 * Runs every enabled check over every dataset: read → check → report, in one direction. Plain Java, no Maven
 * types, so the same engine can serve a command line.
 *
 * <p><b>Threads.</b> The coefficients are read in one streaming pass on the calling thread. Each complete form is
 * handed to a pool that runs the per-form checks ({@link FormCheck}) on it; at most {@code 2 · threads} forms are in
 * flight, so memory stays bounded by a few forms. Checks that need several forms receive them on the reading
 * thread, in stream order, and judge in {@code finish}, the passes' finishes running in parallel. Every part of the
 * work reports into its own {@link Collector}, merged in a fixed order (forms in stream order, then passes in check
 * order), so the report is the same whatever the number of threads and whatever the timing.
 *
 * <p><b>Budget.</b> Each form's run of each check, the reading of each field polynomial, and each pass's finish
 * (with the budget times the number of forms) are metered by {@link Work}; one that spends its allowance is
 * reported as not decided within the budget, never as passed.
 */
public final class Gate {

    /** The reason of a finding about a form not decided within the budget; a tested contract. */
    static final String OVER_BUDGET = "not decided within the work budget of %d units (parameter workBudget): the "
            + "check was stopped for this %s, which is therefore not passed";

    /** The start of the reason of a finding about a defect of Eigengate. */
    static final String INTERNAL = "internal error of the check";

    private final Settings settings;
    private final List<Check> checks;
    private final List<String> ids;
    private final List<Observer> observers;

    public Gate(Settings settings) {
        this(settings, Checks.all(settings));
    }

    public Gate(Settings settings, List<Check> available) {
        this(settings, available, List.of());
    }

    /**
     * A gate whose observers see every form beside the checks (report data, progress). With observers a dataset is
     * always streamed (its per-form results may still come from the cache), since they need the coefficients.
     */
    public Gate(Settings settings, List<Check> available, List<Observer> observers) {
        this.settings = settings;
        this.observers = List.copyOf(observers);
        List<Check> enabled = new ArrayList<>();
        for (Check c : available) {
            if (!settings.skip().contains(c.id())) {
                enabled.add(c);
            }
        }
        this.checks = List.copyOf(enabled);
        this.ids = checks.stream().map(Check::id).toList();
    }

    /** The ids of the checks that can be named in a skip list. */
    public static List<String> knownIds() {
        return Checks.all(Settings.defaults()).stream().map(Check::id).toList();
    }

    /** A dataset directory and how reports name it. */
    public record Dataset(Path directory, String display) {
    }

    public Report run(List<Dataset> datasets) {
        return Work.withBudget(settings.workBudget(), () -> runAll(datasets));
    }

    private Report runAll(List<Dataset> datasets) {
        Collector collector = new Collector(settings.maxFindings(), ids);
        List<String> notices = java.util.Collections.synchronizedList(new ArrayList<>());
        ResultCache cache = settings.cacheDirectory() == null ? ResultCache.NONE
                : new ResultCache(new ContentStore(settings.cacheDirectory(), notices::add), settings, ids);
        long rows = 0;
        int forms = 0;
        Map<String, Map<String, Set<Subject>>> examinedIn = new LinkedHashMap<>();
        List<Measure> measures = new ArrayList<>();
        ExecutorService pool = settings.threads() > 1 ? Executors.newFixedThreadPool(settings.threads(), r -> {
            Thread t = new Thread(r, "eigengate-check");
            t.setDaemon(true);
            return t;
        }) : null;
        try {
            for (int i = 0; i < datasets.size(); i++) {
                Dataset d = datasets.get(i);
                String key = observers.isEmpty() ? cache.datasetKey(d) : null;
                ResultCache.DatasetResult done = key == null ? null : cache.dataset(key);
                if (done == null) {
                    done = checkDataset(d, pool, cache);
                    if (key != null
                            && done.collected().findings().stream().noneMatch(f -> f.reason().startsWith(INTERNAL))) {
                        cache.putDataset(key, done); // a defect is reported afresh on every run, never cached
                    }
                }
                collector.absorb(done.collected(), i);
                Map<String, Set<Subject>> here = examinedIn.computeIfAbsent(d.display(), k -> new LinkedHashMap<>());
                done.collected().examined().forEach((check, units) ->
                        here.computeIfAbsent(check, k -> new LinkedHashSet<>()).addAll(units));
                for (Measure m : done.collected().measures()) {
                    measures.add(new Measure(d.display(), m.check(), m.unit(), m.quantity(), m.value()));
                }
                rows += done.rows();
                forms += done.forms();
            }
        } finally {
            if (pool != null) {
                pool.shutdownNow();
            }
        }
        return new Report(datasets.stream().map(Dataset::display).toList(), ids, collector.kept(),
                collector.counts(), collector.dropped(), collector.examined(), rows, forms,
                List.copyOf(collector.certificates()), notices.stream().distinct().sorted().toList(), examinedIn,
                List.copyOf(measures));
    }

    private ResultCache.DatasetResult checkDataset(Dataset d, ExecutorService pool, ResultCache cache) {
        Collector out = new Collector(settings.maxFindings(), ids);
        try {
            Catalog catalog = CatalogReader.read(d.directory(), d.display(), settings.root(), out);
            if (catalog == null) {
                return new ResultCache.DatasetResult(out.snapshot(), 0, 0);
            }
            long rows = runChecks(catalog, out, pool, cache);
            return new ResultCache.DatasetResult(out.snapshot(), rows, catalog.forms().size());
        } catch (RuntimeException | StackOverflowError e) { // a defect of the reader: an error, never a pass
            Collector failed = new Collector(settings.maxFindings(), ids);
            internal(failed, Problems.CHECK_ID, SourceLocation.file(d.display()),
                    new Subject("dataset", d.display(), ""), e);
            return new ResultCache.DatasetResult(failed.snapshot(), 0, 0);
        }
    }

    /**
     * What one form produced, merged in this order: what the reader reported since the previous form, the per-form
     * checks' findings (computed on the pool), then the other passes'.
     */
    private record Slot(Collector.Snapshot read, Future<Collector.Snapshot> perForm, Collector.Snapshot others) {
    }

    /**
     * Streams the coefficients once; if some form's rows turn out not to be contiguous, everything this dataset
     * produced is discarded and it is streamed again with those forms held back until the end (correct for any
     * row order; memory bounded by the largest form when rows are grouped).
     */
    private long runChecks(Catalog catalog, Collector outer, ExecutorService pool, ResultCache cache) {
        Set<String> holdBack = Set.of();
        int window = 2 * settings.threads();
        while (true) {
            Collector local = outer.fresh();
            List<Check> formChecks = new ArrayList<>();
            List<Check.Pass> formPasses = new ArrayList<>();
            List<Check> crossChecks = new ArrayList<>();
            List<Check.Pass> crossPasses = new ArrayList<>();
            for (Check c : checks) {
                Check.Pass p = c.start(catalog);
                if (c instanceof FormCheck) {
                    formChecks.add(c);
                    formPasses.add(p);
                } else {
                    crossChecks.add(c);
                    crossPasses.add(p);
                }
            }
            List<Check.Pass> watching = new ArrayList<>();
            for (Observer o : observers) {
                watching.add(o.start(catalog));
            }
            boolean[] broken = new boolean[crossPasses.size()];
            Set<String> seen = new HashSet<>();
            long[] rows = {0};
            Deque<Slot> inFlight = new ArrayDeque<>();
            Collector[] reading = {local.fresh()};
            Problems readerProblems = new Problems() {
                @Override
                public void error(SourceLocation at, String subject, String expected, String found, String reason) {
                    reading[0].error(at, subject, expected, found, reason);
                }

                @Override
                public void warning(SourceLocation at, String subject, String expected, String found, String reason) {
                    reading[0].warning(at, subject, expected, found, reason);
                }
            };
            java.util.function.Consumer<FormData<?>> each = data -> {
                Collector.Snapshot read = reading[0].snapshot();
                reading[0] = local.fresh();
                rows[0] += data.coefficients().size();
                Callable<Collector.Snapshot> task = () -> cache.form(data,
                        () -> checkForm(data, formChecks, formPasses, local.fresh()));
                Future<Collector.Snapshot> perForm = submit(pool, task);
                Collector others = local.fresh();
                for (int i = 0; i < crossPasses.size(); i++) {
                    if (broken[i]) {
                        continue;
                    }
                    Check.Pass p = crossPasses.get(i);
                    try {
                        p.form(data, others);
                    } catch (RuntimeException | StackOverflowError e) {
                        broken[i] = true;
                        internal(others, crossChecks.get(i).id(), data.form().location(),
                                Subject.form(data.form().id()), e);
                    }
                }
                for (Check.Pass w : watching) {
                    w.form(data, local.fresh()); // an observer reports nothing
                }
                inFlight.addLast(new Slot(read, perForm, others.snapshot()));
                drain(inFlight, local, window);
            };
            Set<String> scattered = CoefficientReader.stream(catalog, holdBack, readerProblems, data -> {
                seen.add(data.form().id());
                each.accept(data);
            });
            if (!scattered.isEmpty()) {
                inFlight.forEach(s -> s.perForm.cancel(true));
                Set<String> more = new HashSet<>(holdBack);
                more.addAll(scattered);
                holdBack = Set.copyOf(more);
                continue;
            }
            for (Form f : catalog.forms().values()) {
                if (!seen.contains(f.id())) {
                    each.accept(empty(f));
                }
            }
            drain(inFlight, local, 0);
            local.absorb(reading[0], 0);
            finish(catalog, crossChecks, crossPasses, broken, local, pool);
            for (Check.Pass w : watching) {
                w.finish(local.fresh());
            }
            outer.absorb(local);
            return rows[0];
        }
    }

    private static <T> Future<T> submit(ExecutorService pool, Callable<T> task) {
        if (pool != null) {
            return pool.submit(task);
        }
        FutureTask<T> f = new FutureTask<>(task);
        f.run();
        return f;
    }

    /** Merges finished forms in stream order, waiting for the oldest while more than {@code window} are open. */
    private static void drain(Deque<Slot> inFlight, Collector into, int window) {
        while (!inFlight.isEmpty() && (inFlight.size() > window || inFlight.peekFirst().perForm.isDone())) {
            Slot s = inFlight.removeFirst();
            into.absorb(s.read, 0);
            into.absorb(get(s.perForm), 0);
            into.absorb(s.others, 0);
        }
    }

    private static <T> T get(Future<T> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while checking", e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException r) {
                throw r;
            }
            if (c instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(c);
        }
    }

    /** Runs the per-form checks on one form, each within its own allowance of work. */
    private Collector.Snapshot checkForm(FormData<?> data, List<Check> formChecks, List<Check.Pass> passes,
                                         Collector out) {
        return Work.withBudget(settings.workBudget(), () -> {
            for (int i = 0; i < passes.size(); i++) {
                Check.Pass p = passes.get(i);
                String id = formChecks.get(i).id();
                try {
                    Work.unit(() -> {
                        p.form(data, out);
                        return null;
                    });
                } catch (Work.Exceeded e) {
                    overBudget(out, id, data.form().location(), Subject.form(data.form().id()), "form",
                            e.budget());
                } catch (RuntimeException | StackOverflowError e) {
                    internal(out, id, data.form().location(), Subject.form(data.form().id()), e);
                }
            }
            return out.snapshot();
        });
    }

    /** The cross-form passes judge in parallel, each into its own collector, merged in check order. */
    private void finish(Catalog catalog, List<Check> crossChecks, List<Check.Pass> passes, boolean[] broken,
                        Collector into, ExecutorService pool) {
        long budget = saturatedProduct(settings.workBudget(), Math.max(1, catalog.forms().size()));
        SourceLocation at = SourceLocation.file(catalog.display());
        List<Future<Collector.Snapshot>> results = new ArrayList<>();
        for (int i = 0; i < passes.size(); i++) {
            if (broken[i]) {
                results.add(null);
                continue;
            }
            Check.Pass p = passes.get(i);
            String id = crossChecks.get(i).id();
            Collector out = into.fresh();
            results.add(submit(pool, () -> {
                try {
                    Work.unit(budget, () -> {
                        p.finish(out);
                        return null;
                    });
                } catch (Work.Exceeded e) {
                    overBudget(out, id, at, new Subject("dataset", catalog.display(), ""), "dataset", e.budget());
                } catch (RuntimeException | StackOverflowError e) {
                    internal(out, id, at, new Subject("dataset", catalog.display(), ""), e);
                }
                return out.snapshot();
            }));
        }
        for (Future<Collector.Snapshot> f : results) {
            if (f != null) {
                into.absorb(get(f), 0);
            }
        }
    }

    private static long saturatedProduct(long a, long b) {
        long hi = Math.multiplyHigh(a, b);
        long lo = a * b;
        return hi != 0 || lo < 0 ? Long.MAX_VALUE : lo;
    }

    private void overBudget(Collector out, String check, SourceLocation at, Subject subject, String what,
                            long budget) {
        Severity s = settings.overBudgetIsWarning() ? Severity.WARNING : Severity.ERROR;
        out.report(new io.github.eigengate.check.Finding(check, s, at, subject, "a verdict within the budget",
                "work beyond " + budget + " units", String.format(OVER_BUDGET, budget, what)));
    }

    /** A check that throws is a defect of Eigengate, never a pass: it becomes an error naming the exception. */
    private static void internal(Collector out, String check, SourceLocation at, Subject subject, Throwable e) {
        out.report(new io.github.eigengate.check.Finding(check, Severity.ERROR, at, subject, "a verdict",
                e.getClass().getSimpleName(), INTERNAL + " (" + e.getClass().getName()
                        + (e.getMessage() == null ? "" : ": " + e.getMessage())
                        + "): nothing is decided for this unit; please report it"));
    }

    @SuppressWarnings({"unchecked", "rawtypes"})
    private static FormData<?> empty(Form f) {
        return new FormData(f, f.coefficientField(), new Coefficients.Builder<>().build(), f.zeta());
    }
}
