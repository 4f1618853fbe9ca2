package org.hobwright.wizard.simulate;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hobwright.api.cycle.Point;
import org.hobwright.text.Xml;

/**
 * Draws a simulated tooth space as SVG: the profile continuous rolling would cut beside the cut
 * profile with its deviation exaggerated by a stated factor, the deviation along the roll length,
 * and (when a feed is known) the feed marks in the axial section of the root. Deterministic output
 * (fixed number format, {@link Locale#ROOT}).
 */
public final class SimulationSvg {
    private static final int MAX_POINTS = 2500;
    private static final double PANEL = 360;
    private static final double MARGIN = 40;

    private SimulationSvg() {
    }

    /**
     * The exaggeration factor used for a simulation: the largest deviation drawn as about 4 % of
     * the tooth depth, rounded down to 1, 2 or 5 times a power of ten, at least 1.
     */
    public static double exaggeration(ToothSpaceSimulation sim) {
        double dev = Math.max(sim.profileDeviationMaxMm(), sim.undercutDepthMm());
        double depth = sim.setup().tipRadiusMm() - (sim.setup().datumDistanceMm() - sim.setup().hobAddendumMm());
        if (!(dev > 0)) {
            return 1;
        }
        double raw = 0.04 * depth / dev;
        if (raw <= 1) {
            return 1;
        }
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        double f = raw / p;
        return (f >= 5 ? 5 : f >= 2 ? 2 : 1) * p;
    }

    /**
     * Renders the picture.
     *
     * @param sim   the simulation
     * @param marks feed marks at the root, if a feed is known
     * @param title heading, e.g. the part name
     * @return the SVG document
     */
    public static String render(ToothSpaceSimulation sim, Optional<FeedMarks> marks, String title) {
        double k = exaggeration(sim);
        int panels = marks.isPresent() ? 3 : 2;
        double width = panels * (PANEL + MARGIN) + MARGIN;
        double height = PANEL + 3 * MARGIN + 56;
        StringBuilder s = new StringBuilder();
        s.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        s.append(String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"%.0f\" height=\"%.0f\""
                + " viewBox=\"0 0 %.0f %.0f\" font-family=\"sans-serif\" font-size=\"11\">%n", width, height, width, height));
        s.append("<rect width=\"100%\" height=\"100%\" fill=\"white\"/>\n");
        text(s, MARGIN, 22, 14, Xml.escape(title) + " — generating simulation, one tooth space (transverse section)");
        GeneratingSetup st = sim.setup();
        text(s, MARGIN, height - 28, 11, String.format(Locale.ROOT,
                "z %d, m_n %s mm, β %s°, x %s (with the thickness allowance), hob %d start(s), %d gashes.",
                st.teeth(), num(st.normalModuleMm()), num(Math.toDegrees(st.helixAngleRad())), num(st.profileShift()),
                st.starts(), st.gashes()));
        text(s, MARGIN, height - 12, 11, String.format(Locale.ROOT,
                "Blue: true involute; grey: continuous rolling; red: cut profile with its deviation × %s.", num(k)));
        toothSpace(s, sim, k, MARGIN, 2 * MARGIN);
        deviation(s, sim, 2 * MARGIN + PANEL, 2 * MARGIN);
        marks.ifPresent(m -> feedMarks(s, m, 3 * MARGIN + 2 * PANEL, 2 * MARGIN));
        s.append("</svg>\n");
        return s.toString();
    }

    private static void toothSpace(StringBuilder s, ToothSpaceSimulation sim, double k, double ox, double oy) {
        List<Point> nominal = sim.nominalProfile();
        List<Point> cut = sim.exaggeratedProfile(k);
        Box box = Box.of(nominal).with(cut);
        double scale = PANEL / Math.max(box.width(), box.height());
        Frame f = new Frame(ox, oy + PANEL, box.minX, box.minY, scale, scale);
        text(s, ox, oy - 8, 12, String.format(Locale.ROOT, "Tooth space: deviation × %s", num(k)));
        s.append(String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" fill=\"none\""
                + " stroke=\"#ccc\"/>%n", ox, oy, PANEL, PANEL));
        GeneratingSetup st = sim.setup();
        circle(s, f, st.baseRadiusMm(), box, "#88a", "base circle");
        circle(s, f, st.referenceRadiusMm(), box, "#8a8", "reference circle");
        circle(s, f, sim.activeInvoluteStartDiameterMm() / 2, box, "#c80", "start of active involute");
        polyline(s, f, nominal, "#999", 1.6);
        List<Point> involute = sim.trueInvolute(96);
        polyline(s, f, involute, "#36c", 0.6);
        polyline(s, f, involute.stream().map(p -> new Point(-p.x(), p.y())).toList(), "#36c", 0.6);
        polyline(s, f, cut, "#c00", 0.8);
        double y = oy + 14;
        for (String line : new String[] {
            String.format(Locale.ROOT, "profile deviation max %s µm", num(sim.profileDeviationMaxMm() * 1000)),
            String.format(Locale.ROOT, "enveloping depth %s µm (closed form %s µm)",
                    num(sim.envelopingDepthMm() * 1000), num(sim.closedFormEnvelopingDepthMm() * 1000)),
            sim.undercut() ? String.format(Locale.ROOT, "UNDERCUT, %s µm deep", num(sim.undercutDepthMm() * 1000))
                    : "no undercut",
            String.format(Locale.ROOT, "active involute from Ø %s mm (form circle Ø %s mm)",
                    num(sim.activeInvoluteStartDiameterMm()), num(sim.rootFormDiameterMm()))}) {
            text(s, ox + 6, y, 10, line);
            y += 13;
        }
    }

    private static void deviation(StringBuilder s, ToothSpaceSimulation sim, double ox, double oy) {
        List<Point> dev = sim.deviation().stream().map(p -> new Point(p.x(), p.y() * 1000)).toList();
        text(s, ox, oy - 8, 12, "Right flank: deviation from the involute (µm) along the roll length (mm)");
        axes(s, ox, oy);
        if (dev.isEmpty()) {
            return;
        }
        Box box = Box.of(dev).with(List.of(new Point(dev.get(0).x(), 0)));
        Frame f = new Frame(ox, oy + PANEL, box.minX, box.minY, PANEL / Math.max(box.width(), 1e-12),
                0.9 * PANEL / Math.max(box.height(), 1e-12));
        polyline(s, f, dev, "#c00", 0.8);
        double ref = sim.referenceRollMm();
        s.append(String.format(Locale.ROOT, "<line x1=\"%.2f\" y1=\"%.2f\" x2=\"%.2f\" y2=\"%.2f\" stroke=\"#8a8\""
                + " stroke-dasharray=\"3 3\"/>%n", f.x(ref), oy, f.x(ref), oy + PANEL));
        text(s, f.x(ref) + 3, oy + 12, 10, "reference circle");
        text(s, ox + 4, oy + PANEL - 4, 10, String.format(Locale.ROOT, "roll %s … %s mm, deviation 0 … %s µm",
                num(box.minX), num(box.maxX), num(box.maxY)));
    }

    private static void feedMarks(StringBuilder s, FeedMarks m, double ox, double oy) {
        List<Point> pts = m.profile().stream().map(p -> new Point(p.x(), p.y() * 1000)).toList();
        text(s, ox, oy - 8, 12, String.format(Locale.ROOT, "Root along the face: feed marks, feed %s mm",
                num(m.feedMm())));
        axes(s, ox, oy);
        Box box = Box.of(pts);
        Frame f = new Frame(ox, oy + PANEL * 0.75, box.minX, box.minY, PANEL / Math.max(box.width(), 1e-12),
                0.5 * PANEL / Math.max(box.height(), 1e-12));
        polyline(s, f, pts, "#c00", 0.8);
        text(s, ox + 4, oy + PANEL - 4, 10, String.format(Locale.ROOT, "scallop depth %s µm",
                num(m.depthMm() * 1000)));
    }

    private static void axes(StringBuilder s, double ox, double oy) {
        s.append(String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" fill=\"none\""
                + " stroke=\"#ccc\"/>%n", ox, oy, PANEL, PANEL));
    }

    private static void circle(StringBuilder s, Frame f, double radius, Box box, String colour, String label) {
        if (radius < box.minY || radius > box.maxY) {
            return;
        }
        double half = Math.min(Math.asin(Math.min(1, Math.max(Math.abs(box.minX), Math.abs(box.maxX)) / radius)),
                Math.PI / 2);
        StringBuilder pts = new StringBuilder();
        for (int i = 0; i <= 64; i++) {
            double a = -half + 2 * half * i / 64;
            pts.append(String.format(Locale.ROOT, "%.2f,%.2f ", f.x(radius * Math.sin(a)), f.y(radius * Math.cos(a))));
        }
        s.append(String.format(Locale.ROOT, "<polyline points=\"%s\" fill=\"none\" stroke=\"%s\" stroke-width=\"0.6\""
                + " stroke-dasharray=\"4 3\"><title>%s</title></polyline>%n", pts.toString().trim(), colour, label));
    }

    private static void polyline(StringBuilder s, Frame f, List<Point> points, String colour, double width) {
        int stride = Math.max(1, points.size() / MAX_POINTS);
        StringBuilder pts = new StringBuilder();
        for (int i = 0; i < points.size(); i += stride) {
            Point p = points.get(i);
            pts.append(String.format(Locale.ROOT, "%.2f,%.2f ", f.x(p.x()), f.y(p.y())));
        }
        Point last = points.get(points.size() - 1);
        pts.append(String.format(Locale.ROOT, "%.2f,%.2f", f.x(last.x()), f.y(last.y())));
        s.append(String.format(Locale.ROOT, "<polyline points=\"%s\" fill=\"none\" stroke=\"%s\" stroke-width=\"%s\"/>%n",
                pts, colour, num(width)));
    }

    private static void text(StringBuilder s, double x, double y, int size, String content) {
        s.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"%d\">%s</text>%n", x, y, size,
                content));
    }

    private static String num(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e9) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        return String.format(Locale.ROOT, "%.4g", v);
    }


    /** Bounding box of points. */
    private record Box(double minX, double minY, double maxX, double maxY) {
        static Box of(List<Point> pts) {
            return new Box(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                    Double.NEGATIVE_INFINITY).with(pts);
        }

        Box with(List<Point> pts) {
            double a = minX;
            double b = minY;
            double c = maxX;
            double d = maxY;
            for (Point p : pts) {
                a = Math.min(a, p.x());
                b = Math.min(b, p.y());
                c = Math.max(c, p.x());
                d = Math.max(d, p.y());
            }
            return new Box(a, b, c, d);
        }

        double width() {
            return maxX - minX;
        }

        double height() {
            return maxY - minY;
        }
    }

    /** Maps drawing units to the page: x to the right, y up from the panel's bottom-left corner. */
    private record Frame(double left, double bottom, double minX, double minY, double sx, double sy) {
        double x(double v) {
            return left + (v - minX) * sx;
        }

        double y(double v) {
            return bottom - (v - minY) * sy;
        }
    }
}
