package io.github.eigengate.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * The two inline SVG pictures of a form: x_p against p, and the histogram of the x_p against the distribution they
 * should follow. Coordinates are doubles rounded to hundredths; nothing here decides anything.
 */
final class Plots {

    static final int WIDTH = 440;
    static final int HEIGHT = 220;
    private static final double LEFT = 40;
    private static final double RIGHT = 12;
    private static final double TOP = 14;
    private static final double BOTTOM = 28;
    static final int BINS = 16;
    /** Samples of the density curve across [−1, 1]. */
    static final int CURVE_SAMPLES = 81;
    /** Points drawn per embedding in the scatter plot (the histogram counts all): the first primes, then every k-th. */
    static final int MAX_POINTS = 1200;

    static final String[] EMBEDDING_COLOURS = {"#2f6f8f", "#8a4f9e", "#3f8a4f", "#a06a2c", "#5b6b7a"};

    private Plots() {
    }

    /** x_p against p; the primes in {@code flagged} are drawn as large filled diamonds with their p written beside. */
    static Html scatter(FormSeries s, Set<Long> flagged) {
        Html svg = frame("x_p = a_p / (2 p^((k-1)/2)) against p for " + s.id(), "eg-scatter");
        long maxP = s.primes().length == 0 ? 2 : s.primes()[s.primes().length - 1];
        double yMax = 1.1;
        for (double[] row : s.values()) {
            for (double v : row) {
                yMax = Math.max(yMax, Math.min(Math.abs(v) * 1.08, 3.0));
            }
        }
        double ym = yMax;
        Axis ax = new Axis(0, maxP, -ym, ym);
        // the Ramanujan–Petersson band |x_p| <= 1 and the axis x = 0
        svg.add(rect(ax.x(0), ax.y(1), ax.x(maxP) - ax.x(0), ax.y(-1) - ax.y(1), "eg-band"));
        svg.add(line(ax.x(0), ax.y(0), ax.x(maxP), ax.y(0), "eg-axis"));
        for (double t : new double[] {-1, 1}) {
            svg.add(line(ax.x(0), ax.y(t), ax.x(maxP), ax.y(t), "eg-grid"));
            svg.add(label(LEFT - 4, ax.y(t) + 4, t > 0 ? "+1" : "−1", "end"));
        }
        svg.add(label(LEFT - 4, ax.y(0) + 4, "0", "end"));
        for (long tick : ticks(maxP)) {
            svg.add(line(ax.x(tick), ax.y(-ym), ax.x(tick), ax.y(-ym) + 4, "eg-axis"));
            svg.add(label(ax.x(tick), HEIGHT - BOTTOM + 16, Long.toString(tick), "middle"));
        }
        svg.add(label(WIDTH - RIGHT, HEIGHT - 4, "p", "end"));
        List<Html> marks = new ArrayList<>();
        for (int e = 0; e < s.embeddings(); e++) {
            String colour = EMBEDDING_COLOURS[e % EMBEDDING_COLOURS.length];
            int stride = Math.max(1, (s.primes().length + MAX_POINTS - 1) / MAX_POINTS);
            for (int i = 0; i < s.primes().length; i++) {
                long p = s.primes()[i];
                if (i % stride != 0 && !flagged.contains(p)) {
                    continue;
                }
                double v = s.values()[e][i];
                double cx = ax.x(p);
                double cy = ax.y(Math.max(-ym, Math.min(ym, v)));
                if (flagged.contains(p)) {
                    marks.add(diamond(cx, cy, 7, "eg-flag").attr("data-p", Long.toString(p))
                            .add(Html.el("title").text("p=" + p + ": x_p = " + Html.num(v) + " (a finding)")));
                    marks.add(label(cx + 9, cy - 7, "p=" + p, "start").cls("eg-flag-label"));
                } else {
                    marks.add(Html.el("circle").attr("cx", cx).attr("cy", cy).attr("r", 2.6).cls("eg-pt")
                            .attr("stroke", colour).attr("data-p", Long.toString(p))
                            .add(Html.el("title").text("p=" + p + ": x_p = " + Html.num(v))));
                }
            }
        }
        svg.addAll(marks);
        return svg;
    }

    /**
     * The histogram of every plotted x_p (all embeddings) in {@link #BINS} bins over [−1, 1], with the expected
     * counts of the form's distribution drawn over it: Sato–Tate, or for a CM form the mass at 0 as a separate
     * stick and the arcsine-type density for the rest.
     */
    static Html histogram(FormSeries s) {
        boolean cm = s.looksCm();
        Html svg = frame("histogram of x_p for " + s.id() + (cm ? " against the CM distribution"
                : " against the Sato–Tate density"), "eg-hist");
        int total = s.primes().length * s.embeddings();
        int[] counts = new int[BINS];
        int atZero = 0;
        for (double[] row : s.values()) {
            for (double v : row) {
                if (cm && v == 0) {
                    atZero++;
                    continue;
                }
                counts[bin(v)]++;
            }
        }
        double width = 2.0 / BINS;
        double continuousMass = cm ? total / 2.0 : total;
        double yMax = 1;
        for (int c : counts) {
            yMax = Math.max(yMax, c);
        }
        for (double[] pt : curve(cm, continuousMass)) {
            if (Math.abs(pt[0]) < 0.95) {
                yMax = Math.max(yMax, pt[1]);
            }
        }
        if (cm) {
            yMax = Math.max(yMax, Math.max(atZero, total / 2.0));
        }
        yMax *= 1.1;
        Axis ax = new Axis(-1, 1, 0, yMax);
        svg.add(line(ax.x(-1), ax.y(0), ax.x(1), ax.y(0), "eg-axis"));
        for (double t : new double[] {-1, -0.5, 0, 0.5, 1}) {
            svg.add(label(ax.x(t), HEIGHT - BOTTOM + 16, t == 0 ? "0" : (t < 0 ? "−" : "") + Html.num(Math.abs(t))
                    .replaceAll("0$", ""), "middle"));
        }
        svg.add(label(LEFT - 4, ax.y(yMax / 1.1) + 4, Long.toString(Math.round(yMax / 1.1)), "end"));
        for (int b = 0; b < BINS; b++) {
            double x0 = -1 + b * width;
            if (counts[b] > 0) {
                svg.add(rect(ax.x(x0) + 1, ax.y(counts[b]), ax.x(x0 + width) - ax.x(x0) - 2,
                        ax.y(0) - ax.y(counts[b]), "eg-bar").attr("data-count", Integer.toString(counts[b]))
                        .add(Html.el("title").text(counts[b] + " in [" + Html.num(x0) + ", " + Html.num(x0 + width)
                                + ")")));
            }
        }
        StringBuilder points = new StringBuilder();
        for (double[] pt : curve(cm, continuousMass)) {
            double y = Math.min(pt[1], yMax);
            points.append(Html.num(ax.x(pt[0]))).append(',').append(Html.num(ax.y(y))).append(' ');
        }
        svg.add(Html.el("polyline").attr("points", points.toString().strip()).cls("eg-curve"));
        if (cm) {
            double expected = total / 2.0;
            svg.add(line(ax.x(0), ax.y(0), ax.x(0), ax.y(atZero), "eg-zero-observed")
                    .attr("data-count", Integer.toString(atZero)));
            svg.add(diamond(ax.x(0), ax.y(expected), 5, "eg-zero-expected"));
            svg.add(label(ax.x(0) + 8, ax.y(Math.max(atZero, expected)) + 4, atZero + " at 0 (expected "
                    + Html.num(expected) + ")", "start"));
        }
        svg.add(label(WIDTH - RIGHT, TOP + 4, "n = " + total + (s.embeddings() > 1 ? " (" + s.primes().length
                + " primes × " + s.embeddings() + " embeddings)" : " primes"), "end"));
        return svg;
    }

    /**
     * The expected count per bin at {@link #CURVE_SAMPLES} points of [−1, 1]: {@code mass · density(x) · binWidth},
     * the density being Sato–Tate or, for a CM form, the continuous half's own density.
     */
    static List<double[]> curve(boolean cm, double mass) {
        List<double[]> out = new ArrayList<>();
        double width = 2.0 / BINS;
        for (int i = 0; i < CURVE_SAMPLES; i++) {
            double x = -1 + 2.0 * i / (CURVE_SAMPLES - 1);
            // the CM density is infinite at ±1: sample just inside
            double xs = cm ? Math.max(-0.995, Math.min(0.995, x)) : x;
            double d = cm ? Distributions.cmContinuous(xs) : Distributions.satoTate(xs);
            out.add(new double[] {xs, mass * d * width});
        }
        return out;
    }

    static int bin(double v) {
        int b = (int) Math.floor((v + 1) / 2 * BINS);
        return Math.max(0, Math.min(BINS - 1, b));
    }

    private static Html frame(String title, String cssClass) {
        return Html.el("svg").attr("xmlns", "http://www.w3.org/2000/svg").attr("viewBox", "0 0 " + WIDTH + " "
                        + HEIGHT).attr("width", Integer.toString(WIDTH)).attr("height", Integer.toString(HEIGHT))
                .attr("role", "img").cls("eg-plot " + cssClass).add(Html.el("title").text(title));
    }

    private static Html line(double x1, double y1, double x2, double y2, String cssClass) {
        return Html.el("line").attr("x1", x1).attr("y1", y1).attr("x2", x2).attr("y2", y2).cls(cssClass);
    }

    private static Html rect(double x, double y, double w, double h, String cssClass) {
        return Html.el("rect").attr("x", x).attr("y", y).attr("width", Math.max(w, 0)).attr("height", Math.max(h, 0))
                .cls(cssClass);
    }

    private static Html diamond(double cx, double cy, double r, String cssClass) {
        String pts = Html.num(cx) + "," + Html.num(cy - r) + " " + Html.num(cx + r) + "," + Html.num(cy) + " "
                + Html.num(cx) + "," + Html.num(cy + r) + " " + Html.num(cx - r) + "," + Html.num(cy);
        return Html.el("polygon").attr("points", pts).cls(cssClass);
    }

    private static Html label(double x, double y, String text, String anchor) {
        return Html.el("text").attr("x", x).attr("y", y).attr("text-anchor", anchor).cls("eg-label").text(text);
    }

    /** About five round tick values in (0, max]. */
    static List<Long> ticks(long max) {
        long step = 1;
        for (long decade = 1; max / step > 8; decade *= 10) {
            for (long m : new long[] {1, 2, 5}) {
                step = decade * m;
                if (max / step <= 8) {
                    break;
                }
            }
        }
        List<Long> out = new ArrayList<>();
        for (long t = step; t <= max; t += step) {
            out.add(t);
        }
        return out;
    }

    /** Data coordinates to SVG coordinates inside the margins. */
    private record Axis(double x0, double x1, double y0, double y1) {
        double x(double v) {
            return LEFT + (v - x0) / (x1 - x0 == 0 ? 1 : x1 - x0) * (WIDTH - LEFT - RIGHT);
        }

        double y(double v) {
            return TOP + (y1 - v) / (y1 - y0 == 0 ? 1 : y1 - y0) * (HEIGHT - TOP - BOTTOM);
        }
    }
}
