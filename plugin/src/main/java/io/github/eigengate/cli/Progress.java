package io.github.eigengate.cli;

import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.FormData;
import io.github.eigengate.engine.Observer;
import java.io.PrintStream;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;

/**
 * The progress line on stderr, rewritten in place twice a second: rows read, forms checked, rows per second. Counts
 * forms as the checks receive them (a dataset streamed again is counted again). Silent when not enabled.
 */
final class Progress implements Observer {

    private static final long PERIOD_MS = 500;

    private final PrintStream err;
    private final boolean enabled;
    private final AtomicLong rows = new AtomicLong();
    private final AtomicLong forms = new AtomicLong();
    private final long started = System.nanoTime();
    private Thread ticker;
    private boolean shown;

    Progress(PrintStream err, boolean enabled) {
        this.err = err;
        this.enabled = enabled;
    }

    @Override
    public Check.Pass start(Catalog catalog) {
        return new Check.Pass() {
            @Override
            public void form(FormData<?> form, FindingSink out) {
                rows.addAndGet(form.coefficients().size());
                forms.incrementAndGet();
            }
        };
    }

    void begin() {
        if (!enabled) {
            return;
        }
        ticker = new Thread(() -> {
            try {
                while (!Thread.currentThread().isInterrupted()) {
                    Thread.sleep(PERIOD_MS);
                    print();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "eigengate-progress");
        ticker.setDaemon(true);
        ticker.start();
    }

    void end() {
        if (ticker != null) {
            ticker.interrupt();
            try {
                ticker.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            ticker = null;
            synchronized (this) {
                if (shown) {
                    err.print("\r\033[K");
                    err.flush();
                }
            }
        }
    }

    /** The line as shown, e.g. {@code eigengate: 120000 rows read, 37 forms checked, 48000 rows/s}. */
    String line() {
        double seconds = Math.max((System.nanoTime() - started) / 1e9, 1e-3);
        return String.format(Locale.ROOT, "eigengate: %d rows read, %d forms checked, %.0f rows/s", rows.get(),
                forms.get(), rows.get() / seconds);
    }

    private synchronized void print() {
        err.print("\r\033[K" + line());
        err.flush();
        shown = true;
    }
}
