package io.github.eigengate.arith;

import java.util.function.Supplier;

/**
 * A deterministic work meter. Expensive operations {@link #charge} units of work: a unit is about one operation on
 * machine words (a nanosecond or so), an operation on big integers or rationals counts {@link #BIG}, so a product
 * of polynomials over Q of lengths m and n costs 20·m·n; a task run by {@link #unit} may spend at
 * most the thread's configured budget and is stopped with {@link Exceeded} beyond it. Counting work instead of
 * measuring time keeps every verdict, and every report, independent of the machine and of its load.
 */
public final class Work {

    /** Thrown inside a task that spent its allowance. The caller of {@link #unit} reports it; nothing else may. */
    public static final class Exceeded extends RuntimeException {
        private final long budget;

        Exceeded(long budget) {
            super("work budget of " + budget + " units exceeded", null, false, false);
            this.budget = budget;
        }

        public long budget() {
            return budget;
        }
    }

    private static final class Meter {
        final long budget;
        long left;

        Meter(long budget) {
            this.budget = budget;
            this.left = budget;
        }
    }

    /** The charge of one operation on big integers or rationals, relative to one on machine words (about 1 ns). */
    public static final long BIG = 20;

    private static final ThreadLocal<Meter> METER = new ThreadLocal<>();
    private static final ThreadLocal<Long> UNIT_BUDGET = new ThreadLocal<>();

    private Work() {
    }

    /** Spends units of the current task's allowance; a no-op outside a metered task. */
    public static void charge(long units) {
        Meter m = METER.get();
        if (m != null) {
            m.left -= units;
            if (m.left < 0) {
                m.left = 0; // further charges in a finally block or a catch-all keep throwing
                throw new Exceeded(m.budget);
            }
        }
    }

    /**
     * Runs a task with a fresh allowance of the thread's configured budget (see {@link #withBudget}); unmetered
     * when none is configured. The allowance of an enclosing task is restored afterwards and is not charged.
     *
     * @throws Exceeded when the task spent more than its allowance
     */
    public static <T> T unit(Supplier<T> task) {
        Long budget = UNIT_BUDGET.get();
        Meter outer = METER.get();
        METER.set(budget == null ? null : new Meter(budget));
        try {
            return task.get();
        } finally {
            METER.set(outer);
        }
    }

    /** Runs a task with a fresh allowance of {@code budget} units. */
    public static <T> T unit(long budget, Supplier<T> task) {
        return withBudget(budget, () -> unit(task));
    }

    /** Configures, for the duration of the task on this thread, the allowance each {@link #unit} receives. */
    public static <T> T withBudget(long unitBudget, Supplier<T> task) {
        Long before = UNIT_BUDGET.get();
        UNIT_BUDGET.set(unitBudget);
        try {
            return task.get();
        } finally {
            if (before == null) {
                UNIT_BUDGET.remove();
            } else {
                UNIT_BUDGET.set(before);
            }
        }
    }

    /** The allowance a unit of work receives on this thread, or -1 when unmetered. */
    public static long unitBudget() {
        Long b = UNIT_BUDGET.get();
        return b == null ? -1 : b;
    }
}
