package io.github.eigengate.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.parser.Parser;
import org.junit.jupiter.api.Test;

/**
 * The SVG pictures: points where they belong, a flagged prime drawn distinctly, and the density curves equal to the
 * formulas evaluated here independently.
 */
class PlotsTest {

    /**
     * a_p of the weight-2 newform of level 11 for p = 2, 3, 5, 7, 13: OEIS A006571 (also PARI/GP 2.15.2:
     * mfcoefs(mfeigenbasis(mfinit([11,2],0))[1], 13)); x_p = a_p / (2√p).
     */
    private static FormSeries level11() {
        long[] p = {2, 3, 5, 7, 13};
        long[] ap = {-2, -1, 1, -2, 4};
        double[] x = new double[p.length];
        for (int i = 0; i < p.length; i++) {
            x[i] = ap[i] / (2 * Math.sqrt(p[i]));
        }
        return new FormSeries("data", 0, 0, "lev11<&>", 11, 2, 1, p, new double[][] {x}, 0, "", new double[0]);
    }

    private static Document svg(Html h) {
        return Jsoup.parse(h.toString(), "", Parser.xmlParser());
    }

    @Test
    void everyPrimeIsAPointAndTheFlaggedOneADiamond() {
        Document d = svg(Plots.scatter(level11(), Set.of(7L)));
        assertEquals(List.of("2", "3", "5", "13"), d.select("circle.eg-pt").eachAttr("data-p"));
        Element flag = d.selectFirst("polygon.eg-flag");
        assertEquals("7", flag.attr("data-p"));
        assertEquals("p=7", d.selectFirst("text.eg-flag-label").text());
        assertTrue(d.selectFirst("title").text().contains("lev11<&>"), "title escaped and read back");
    }

    @Test
    void pointsSitAtTheirNormalisedValue() {
        Document d = svg(Plots.scatter(level11(), Set.of()));
        // y = TOP + (yMax - v)/(2 yMax) * plot height, yMax = 1.1 (no |x_p| near it), TOP 14, plot height 178
        for (Element c : d.select("circle.eg-pt")) {
            long p = Long.parseLong(c.attr("data-p"));
            long ap = switch ((int) p) {
                case 2, 7 -> -2;
                case 3 -> -1;
                case 5 -> 1;
                default -> 4;
            };
            double v = ap / (2 * Math.sqrt(p));
            assertEquals(14 + (1.1 - v) / 2.2 * 178, Double.parseDouble(c.attr("cy")), 0.006, "p=" + p);
        }
    }

    @Test
    void satoTateDensityIsTheSemicircle() {
        // (2/π)√(1−x²) at 0, 1/2 and 1: 2/π, √3/π, 0
        assertEquals(2 / Math.PI, Distributions.satoTate(0), 1e-15);
        assertEquals(Math.sqrt(3) / Math.PI, Distributions.satoTate(0.5), 1e-15);
        assertEquals(0, Distributions.satoTate(1), 0);
        assertEquals(0, Distributions.satoTate(-1.5), 0);
    }

    @Test
    void bothDensitiesHaveMassOne() {
        // midpoint rule; the CM density's integral is (1/π)(arcsin b − arcsin a), here over (−1+h, 1−h)
        int n = 200_000;
        double h = 2.0 / n;
        double st = 0;
        double cm = 0;
        for (int i = 0; i < n; i++) {
            double x = -1 + (i + 0.5) * h;
            st += Distributions.satoTate(x) * h;
            cm += Distributions.cmContinuous(x) * h;
        }
        assertEquals(1.0, st, 1e-6);
        assertEquals(1.0, cm, 2e-3);
        assertEquals(1 / Math.PI, Distributions.cmContinuous(0), 1e-15);
        assertEquals(2 / (Math.PI * Math.sqrt(3)), Distributions.cmContinuous(0.5), 1e-15);
    }

    @Test
    void theDrawnCurveIsMassTimesDensityTimesBinWidth() {
        List<double[]> pts = Plots.curve(false, 34);
        assertEquals(Plots.CURVE_SAMPLES, pts.size());
        double width = 2.0 / Plots.BINS;
        for (double[] pt : pts) {
            assertEquals(34 * (2 / Math.PI) * Math.sqrt(Math.max(0, 1 - pt[0] * pt[0])) * width, pt[1], 1e-12);
        }
        double[] middle = pts.get(Plots.CURVE_SAMPLES / 2);
        assertEquals(0, middle[0], 1e-15);
        assertEquals(34 * 2 / Math.PI / 8, middle[1], 1e-12);
        for (double[] pt : Plots.curve(true, 17)) {
            assertEquals(17 / (Math.PI * Math.sqrt(1 - pt[0] * pt[0])) * width, pt[1], 1e-12);
        }
    }

    @Test
    void histogramCountsEveryValueOnce() {
        Document d = svg(Plots.histogram(level11()));
        int sum = 0;
        for (Element bar : d.select("rect.eg-bar")) {
            sum += Integer.parseInt(bar.attr("data-count"));
        }
        assertEquals(5, sum);
        assertEquals("n = 5 primes", d.select("text.eg-label").last().text());
        assertEquals(1, d.select("polyline.eg-curve").size());
    }

    @Test
    void aCmFormShowsItsMassAtZeroApart() {
        // level 32, weight 2 (CM by Q(i)): a_p for p = 3, 5, 7, 11, 13, 17, 19, 23 from PARI/GP 2.15.2,
        // mfcoefs(mfeigenbasis(mfinit([32,2,1],0))[1], 23): 0, -2, 0, 0, 6, 2, 0, 0
        long[] p = {3, 5, 7, 11, 13, 17, 19, 23};
        long[] ap = {0, -2, 0, 0, 6, 2, 0, 0};
        double[] x = new double[p.length];
        int zeros = 0;
        for (int i = 0; i < p.length; i++) {
            x[i] = ap[i] / (2 * Math.sqrt(p[i]));
            zeros += ap[i] == 0 ? 1 : 0;
        }
        FormSeries s = new FormSeries("data", 0, 0, "lev32_wt2_o1", 32, 2, 1, p, new double[][] {x}, zeros, "",
                new double[0]);
        assertTrue(s.looksCm());
        Document d = svg(Plots.histogram(s));
        assertEquals("5", d.selectFirst("line.eg-zero-observed").attr("data-count"));
        int sum = 0;
        for (Element bar : d.select("rect.eg-bar")) {
            sum += Integer.parseInt(bar.attr("data-count"));
        }
        assertEquals(3, sum);
        assertTrue(d.text().contains("5 at 0 (expected 4.00)"), d.text());
    }

    @Test
    void ticksAreRound() {
        assertEquals(List.of(20L, 40L, 60L, 80L, 100L, 120L, 140L), Plots.ticks(149));
        assertEquals(List.of(1L, 2L, 3L, 4L, 5L), Plots.ticks(5));
        assertEquals(List.of(500L, 1000L, 1500L, 2000L), Plots.ticks(2000));
    }

    @Test
    void aLongSeriesIsThinnedButKeepsItsFlaggedPrime() {
        // layout only: 5000 indices standing for primes, all at x = 0
        long[] p = new long[5000];
        for (int i = 0; i < p.length; i++) {
            p[i] = i + 2;
        }
        FormSeries s = new FormSeries("data", 0, 0, "long", 1, 12, 1, p, new double[][] {new double[p.length]}, 0,
                "", new double[0]);
        Document d = svg(Plots.scatter(s, Set.of(4003L)));
        assertEquals(1000, d.select("circle.eg-pt").size(), "every 5th of 5000 (stride ceil(5000/1200))");
        assertEquals(List.of("4003"), d.select("polygon.eg-flag").eachAttr("data-p"));
        assertEquals("n = 5000 primes", svg(Plots.histogram(s)).select("text.eg-label").last().text());
    }
}
