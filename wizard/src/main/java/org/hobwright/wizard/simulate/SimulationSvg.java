package org.hobwright.wizard.simulate;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.cycle.Point;
import org.hobwright.text.Decimal;
import org.hobwright.text.Xml;

/**
 * Draws a simulated tooth space as SVG: the profile continuous rolling would cut beside the cut
 * profile with its deviation exaggerated by a stated factor, the deviation along the roll length,
 * and (when a feed is known) the feed marks in the axial section of the root. Deterministic output
 * (numbers through {@link Decimal}, lines ending in a line feed).
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
        s.append("<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"" + Decimal.fixed(width, 0) + "\" height=\""
                + Decimal.fixed(height, 0) + "\" viewBox=\"0 0 " + Decimal.fixed(width, 0) + " "
                + Decimal.fixed(height, 0) + "\" font-family=\"sans-serif\" font-size=\"11\">\n");
        s.append("<rect width=\"100%\" height=\"100%\" fill=\"white\"/>\n");
        text(s, MARGIN, 22, 14, Xml.escape(title) + " — generating simulation, one tooth space (transverse section)");
        GeneratingSetup st = sim.setup();
        text(s, MARGIN, height - 28, 11, "z " + st.teeth() + ", m_n " + num(st.normalModuleMm()) + " mm, β "
                + num(Math.toDegrees(st.helixAngleRad())) + "°, x " + num(st.profileShift())
                + " (with the thickness allowance), hob " + st.starts() + " start(s), " + st.gashes() + " gashes.");
        text(s, MARGIN, height - 12, 11, "Blue: true involute; grey: continuous rolling; red: cut profile with its"
                + " deviation × " + num(k) + ".");
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
        text(s, ox, oy - 8, 12, "Tooth space: deviation × " + num(k));
        s.append("<rect x=\"" + Decimal.fixed(ox, 1) + "\" y=\"" + Decimal.fixed(oy, 1) + "\" width=\""
                + Decimal.fixed(PANEL, 1) + "\" height=\"" + Decimal.fixed(PANEL, 1)
                + "\" fill=\"none\" stroke=\"#ccc\"/>\n");
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
            "profile deviation max " + num(sim.profileDeviationMaxMm() * 1000) + " µm",
            "enveloping depth " + num(sim.envelopingDepthMm() * 1000) + " µm (closed form "
                    + num(sim.closedFormEnvelopingDepthMm() * 1000) + " µm)",
            sim.undercut() ? "UNDERCUT, " + num(sim.undercutDepthMm() * 1000) + " µm deep"
                    : "no undercut",
            "active involute from Ø " + num(sim.activeInvoluteStartDiameterMm()) + " mm (form circle Ø "
                    + num(sim.rootFormDiameterMm()) + " mm)"}) {
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
        s.append("<line x1=\"" + Decimal.fixed(f.x(ref), 2) + "\" y1=\"" + Decimal.fixed(oy, 2) + "\" x2=\""
                + Decimal.fixed(f.x(ref), 2) + "\" y2=\"" + Decimal.fixed(oy + PANEL, 2)
                + "\" stroke=\"#8a8\" stroke-dasharray=\"3 3\"/>\n");
        text(s, f.x(ref) + 3, oy + 12, 10, "reference circle");
        text(s, ox + 4, oy + PANEL - 4, 10, "roll " + num(box.minX) + " … " + num(box.maxX) + " mm, deviation 0 … "
                + num(box.maxY) + " µm");
    }

    private static void feedMarks(StringBuilder s, FeedMarks m, double ox, double oy) {
        List<Point> pts = m.profile().stream().map(p -> new Point(p.x(), p.y() * 1000)).toList();
        text(s, ox, oy - 8, 12, "Root along the face: feed marks, feed " + num(m.feedMm()) + " mm");
        axes(s, ox, oy);
        Box box = Box.of(pts);
        Frame f = new Frame(ox, oy + PANEL * 0.75, box.minX, box.minY, PANEL / Math.max(box.width(), 1e-12),
                0.5 * PANEL / Math.max(box.height(), 1e-12));
        polyline(s, f, pts, "#c00", 0.8);
        text(s, ox + 4, oy + PANEL - 4, 10, "scallop depth " + num(m.depthMm() * 1000) + " µm");
    }

    private static void axes(StringBuilder s, double ox, double oy) {
        s.append("<rect x=\"" + Decimal.fixed(ox, 1) + "\" y=\"" + Decimal.fixed(oy, 1) + "\" width=\""
                + Decimal.fixed(PANEL, 1) + "\" height=\"" + Decimal.fixed(PANEL, 1)
                + "\" fill=\"none\" stroke=\"#ccc\"/>\n");
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
            pts.append(Decimal.fixed(f.x(radius * Math.sin(a)), 2) + "," + Decimal.fixed(f.y(radius * Math.cos(a)), 2)
                    + " ");
        }
        s.append("<polyline points=\"" + pts.toString().trim() + "\" fill=\"none\" stroke=\"" + colour
                + "\" stroke-width=\"0.6\" stroke-dasharray=\"4 3\"><title>" + label + "</title></polyline>\n");
    }

    private static void polyline(StringBuilder s, Frame f, List<Point> points, String colour, double width) {
        int stride = Math.max(1, points.size() / MAX_POINTS);
        StringBuilder pts = new StringBuilder();
        for (int i = 0; i < points.size(); i += stride) {
            Point p = points.get(i);
            pts.append(Decimal.fixed(f.x(p.x()), 2) + "," + Decimal.fixed(f.y(p.y()), 2) + " ");
        }
        Point last = points.get(points.size() - 1);
        pts.append(Decimal.fixed(f.x(last.x()), 2) + "," + Decimal.fixed(f.y(last.y()), 2));
        s.append("<polyline points=\"" + pts + "\" fill=\"none\" stroke=\"" + colour + "\" stroke-width=\""
                + num(width) + "\"/>\n");
    }

    private static void text(StringBuilder s, double x, double y, int size, String content) {
        s.append("<text x=\"" + Decimal.fixed(x, 1) + "\" y=\"" + Decimal.fixed(y, 1) + "\" font-size=\"" + size
                + "\">" + content + "</text>\n");
    }

    /** A number in a caption: whole numbers as they are, others to four significant digits. */
    private static String num(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e9) {
            return Decimal.fixed(v, 0);
        }
        return Decimal.significant(v, 4);
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
