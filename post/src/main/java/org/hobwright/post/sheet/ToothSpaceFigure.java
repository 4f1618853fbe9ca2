package org.hobwright.post.sheet;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.Point;
import org.hobwright.api.cycle.SimulationData;

/**
 * Drawing of one tooth space in the transverse section: arcs of the tip, reference, base and root
 * circles over one and a half pitches, and, when the generating simulation ran, its tooth space
 * outline beside the true involute. Gear centre below the picture, tooth space centred on the
 * vertical, as in {@link SimulationData}. Drawing only: every value comes from the cycle.
 */
final class ToothSpaceFigure {

    private static final double W = 480;
    private static final double H = 250;
    private static final double LEGEND = 132;
    private static final double PAD = 14;
    private static final int SAMPLES = 72;

    private final double cx;
    private final double cy;
    private final double k;

    private ToothSpaceFigure(double halfWidth, double yLow, double yHigh) {
        this.k = Math.min((W - 2 * PAD) / (2 * halfWidth), (H - 2 * PAD) / (yHigh - yLow));
        this.cx = 0;
        this.cy = (yLow + yHigh) / 2;
    }

    /**
     * The drawing.
     *
     * @param g          the gear data
     * @param teeth      number of teeth
     * @param simulation the simulation, when it ran
     * @param f          display rounding
     * @return an {@code svg} element
     */
    static String svg(GearData g, int teeth, Optional<SimulationData> simulation, SheetFormat f) {
        double ra = g.tipDiameterMm() / 2;
        double rf = Math.min(g.rootDiameterMm(), g.baseDiameterMm()) / 2;
        double theta = 1.5 * Math.PI / teeth;
        double halfWidth = ra * Math.sin(Math.min(theta, Math.PI / 2));
        double margin = 0.08 * (ra - rf * Math.cos(theta));
        ToothSpaceFigure d = new ToothSpaceFigure(halfWidth, rf * Math.cos(theta) - margin, ra + margin);
        Markup m = new Markup();
        m.open("svg", "xmlns", "http://www.w3.org/2000/svg", "viewBox", "0 0 " + n(W) + " " + n(H + LEGEND),
                "width", "100%", "role", "img", "aria-label", "tooth space with tip, reference, base and root circles");
        m.empty("rect", "x", "1", "y", "1", "width", n(W - 2), "height", n(H - 2), "class", "frame");
        m.raw(d.arc(ra, theta, "tip")).raw(d.arc(g.referenceDiameterMm() / 2, theta, "ref"))
                .raw(d.arc(g.baseDiameterMm() / 2, theta, "base")).raw(d.arc(g.rootDiameterMm() / 2, theta, "root"));
        simulation.ifPresent(s -> m.raw(d.polyline(s.nominalProfile(), "nominal"))
                .raw(d.polyline(s.simulatedProfile(), "simulated")));
        double ly = H + 22;
        d.legend(m, ly, "tip", "tip circle ⌀ " + f.lenU(g.tipDiameterMm()));
        d.legend(m, ly + 20, "ref", "reference circle ⌀ " + f.lenU(g.referenceDiameterMm()));
        d.legend(m, ly + 40, "base", "base circle ⌀ " + f.lenU(g.baseDiameterMm()));
        d.legend(m, ly + 60, "root", "root circle ⌀ " + f.lenU(g.rootDiameterMm()));
        if (simulation.isPresent()) {
            d.legend(m, ly + 80, "simulated", "simulated tooth space");
            d.legend(m, ly + 100, "nominal", "true involute flanks");
        } else {
            m.leaf("text", "Flanks are drawn when the generating simulation has run.", "x", "10",
                    "y", n(ly + 84), "class", "note");
        }
        m.close("svg");
        return m.toString();
    }

    private String arc(double r, double theta, String cls) {
        StringBuilder pts = new StringBuilder();
        for (int i = 0; i <= SAMPLES; i++) {
            double a = -theta + 2 * theta * i / SAMPLES;
            pts.append(i == 0 ? "" : " ").append(x(r * Math.sin(a))).append(',').append(y(r * Math.cos(a)));
        }
        return "<polyline class=\"" + cls + "\" points=\"" + pts + "\"/>\n";
    }

    private String polyline(List<Point> points, String cls) {
        StringBuilder pts = new StringBuilder();
        for (Point p : points) {
            pts.append(pts.length() == 0 ? "" : " ").append(x(p.x())).append(',').append(y(p.y()));
        }
        return "<polyline class=\"" + cls + "\" points=\"" + pts + "\"/>\n";
    }

    private void legend(Markup m, double y, String cls, String text) {
        m.empty("line", "x1", "10", "y1", n(y - 5), "x2", "44", "y2", n(y - 5), "class", cls);
        m.leaf("text", text, "x", "52", "y", n(y), "class", "label").nl();
    }

    private String x(double mm) {
        return n(W / 2 + (mm - cx) * k);
    }

    private String y(double mm) {
        return n(H / 2 - (mm - cy) * k);
    }

    private static String n(double v) {
        return Markup.coordinate(v);
    }
}
