package org.hobwright.post.sheet;

import org.hobwright.api.job.Hand;

/**
 * Picture of the hob swivel, seen from the hob toward the work axis, work axis horizontal. The
 * gear's visible tooth traces slope with its helix hand (a right-hand helix runs down to the right
 * on the side facing the viewer), the hob's visible threads with its own hand, and the hob axis is
 * turned from the position square to the work axis by η: clockwise in this view for a positive η
 * (right-hand convention, η = β − γ). This follows from the helix geometry (derived; the hob
 * thread on the far, cutting side of the hob must lie along the gear's tooth trace). Angles under
 * {@value #MIN_DRAWN} degrees are drawn at {@value #MIN_DRAWN} degrees so the direction can be seen.
 */
final class SwivelSvg {

    /** Smallest angle drawn, degrees. */
    static final double MIN_DRAWN = 8;

    private static final double CX = 240;
    private static final double CY = 150;

    private SwivelSvg() {
    }

    /**
     * The picture.
     *
     * @param swivelDeg the swivel angle η, signed, degrees
     * @param gearHelix signed helix angle β of the gear, degrees (0 for spur)
     * @param hobHand   the hob's thread hand
     * @param label     the angle's text for the arc
     * @return an {@code svg} element
     */
    static String svg(double swivelDeg, double gearHelix, Hand hobHand, String label) {
        double drawn = swivelDeg == 0 ? 0 : Math.signum(swivelDeg) * Math.max(Math.abs(swivelDeg), MIN_DRAWN);
        Markup m = new Markup();
        m.open("svg", "xmlns", "http://www.w3.org/2000/svg", "viewBox", "0 0 480 300", "width", "100%",
                "role", "img", "aria-label", "hob swivel direction seen from the hob toward the work axis");
        m.empty("rect", "x", "1", "y", "1", "width", "478", "height", "298", "class", "frame");
        m.open("defs").open("marker", "id", "arrow", "viewBox", "0 0 10 10", "refX", "9", "refY", "5",
                "markerWidth", "7", "markerHeight", "7", "orient", "auto-start-reverse")
                .empty("path", "d", "M0,0 L10,5 L0,10 z", "class", "arrowhead").close("marker").close("defs");
        gear(m, gearHelix);
        m.empty("line", "x1", n(CX), "y1", "18", "x2", n(CX), "y2", "282", "class", "square");
        m.open("g", "transform", "rotate(" + n(drawn) + " " + n(CX) + " " + n(CY) + ")");
        m.empty("rect", "x", n(CX - 30), "y", n(CY - 90), "width", "60", "height", "180", "rx", "4", "class", "hob");
        double rise = (hobHand == Hand.RIGHT ? 1 : -1) * 30 * Math.tan(Math.toRadians(MIN_DRAWN));
        for (int i = -4; i <= 4; i++) {
            double y = CY + i * 18;
            m.empty("line", "x1", n(CX - 30), "y1", n(y + rise), "x2", n(CX + 30), "y2", n(y - rise),
                    "class", "thread");
        }
        m.empty("line", "x1", n(CX), "y1", "28", "x2", n(CX), "y2", "272", "class", "hobaxis");
        m.close("g");
        if (drawn != 0) {
            double r = 118;
            double a = Math.toRadians(drawn);
            m.empty("path", "d", "M" + n(CX) + "," + n(CY - r) + " A" + n(r) + "," + n(r) + " 0 0 "
                    + (drawn > 0 ? 1 : 0) + " " + n(CX + r * Math.sin(a)) + "," + n(CY - r * Math.cos(a)),
                    "class", "sweep", "marker-end", "url(#arrow)");
        }
        m.leaf("text", label, "x", n(drawn >= 0 ? CX + 46 : CX - 46), "y", "22", "class", "label",
                "text-anchor", drawn >= 0 ? "start" : "end");
        m.leaf("text", "work axis", "x", "16", "y", n(CY + 66), "class", "label");
        m.leaf("text", "square to the work axis", "x", n(CX + 6), "y", "292", "class", "note");
        m.close("svg");
        return m.toString();
    }

    private static void gear(Markup m, double helixDeg) {
        m.empty("line", "x1", "10", "y1", n(CY), "x2", "470", "y2", n(CY), "class", "workaxis");
        m.open("clipPath", "id", "gearclip")
                .empty("rect", "x", "40", "y", n(CY - 45), "width", "400", "height", "90").close("clipPath");
        m.empty("rect", "x", "40", "y", n(CY - 45), "width", "400", "height", "90", "class", "gear");
        m.open("g", "clip-path", "url(#gearclip)");
        double b = Math.toRadians(helixDeg);
        double dx = 400 * Math.cos(b);
        double dy = 400 * Math.sin(b);
        if (helixDeg == 0) {
            for (int i = 0; i < 5; i++) {
                m.empty("line", "x1", "40", "y1", n(CY - 36 + i * 18), "x2", "440", "y2", n(CY - 36 + i * 18),
                        "class", "tooth");
            }
        } else {
            double step = Math.min(200, 18 / Math.abs(Math.sin(b)));
            for (double x = 40 - 400; x <= 840; x += step) {
                m.empty("line", "x1", n(x - dx), "y1", n(CY - dy), "x2", n(x + dx), "y2", n(CY + dy), "class", "tooth");
            }
        }
        m.close("g");
    }

    private static String n(double v) {
        return Markup.coordinate(v);
    }
}
