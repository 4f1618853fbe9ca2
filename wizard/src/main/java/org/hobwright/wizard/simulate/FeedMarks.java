package org.hobwright.wizard.simulate;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.cycle.Point;

/**
 * Feed marks at the root along the face: each work revolution the hob tip circle (radius r_a0)
 * sweeps the root once, the sweeps spaced by the feed along the tooth trace, f_a / cos β for a
 * helical gear (the hob is set square to the tooth trace; FORMULAS.md §6.1). The axial section of
 * the root is the upper envelope of those arcs; its scallop depth is the sagitta
 * r_a0 − √(r_a0² − (s/2)²) ≈ s² / (8 r_a0), s = f_a / cos β (turning rule R_z = f²/(8r)).
 *
 * @param profile axial section: x = position along the gear axis, mm; y = depth below the deepest cut, mm (≤ 0)
 * @param depthMm measured scallop depth, mm
 * @param feedMm  axial feed per work revolution, mm
 */
public record FeedMarks(List<Point> profile, double depthMm, double feedMm) {
    /** Number of feed spacings drawn. */
    static final int MARKS = 4;

    public FeedMarks {
        profile = List.copyOf(profile);
    }

    /**
     * Computes the axial section of the root over {@link #MARKS} feed spacings.
     *
     * @param hobTipRadiusMm r_a0, mm
     * @param feedMm         f_a per work revolution, mm
     * @param helixAngleRad  β, rad
     * @param resolutionMm   spacing of the profile points along the axis, mm
     */
    public static FeedMarks of(double hobTipRadiusMm, double feedMm, double helixAngleRad, double resolutionMm) {
        double cosB = Math.cos(helixAngleRad);
        double spacing = feedMm / cosB;
        int n = Math.min(20_000, Math.max(8, (int) Math.ceil(MARKS * feedMm / resolutionMm)));
        List<Point> pts = new ArrayList<>(n + 1);
        for (int j = 0; j <= n; j++) {
            double z = MARKS * feedMm * j / n;
            pts.add(new Point(z, -cutDepth(z / cosB, spacing, hobTipRadiusMm)));
        }
        double deepest = 0;
        for (int m = 0; m < MARKS; m++) {
            // where the sweeps m and m + 1 leave the same depth: bisection on the trace position
            double lo = m * spacing;
            double hi = (m + 1) * spacing;
            for (int it = 0; it < 80; it++) {
                double mid = (lo + hi) / 2;
                if (arc(mid - m * spacing, hobTipRadiusMm) < arc(mid - (m + 1) * spacing, hobTipRadiusMm)) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            deepest = Math.max(deepest, cutDepth(lo, spacing, hobTipRadiusMm));
        }
        return new FeedMarks(pts, deepest, feedMm);
    }

    /** Material left above the deepest cut at trace position s: the shallowest of all sweeps. */
    private static double cutDepth(double s, double spacing, double radius) {
        int nearest = (int) Math.floor(s / spacing);
        return Math.min(arc(s - nearest * spacing, radius), arc(s - (nearest + 1) * spacing, radius));
    }

    /** Height of a circle of radius r above its lowest point at horizontal offset e: r − √(r² − e²). */
    private static double arc(double offset, double radius) {
        double e = Math.min(Math.abs(offset), radius);
        return radius - Math.sqrt(radius * radius - e * e);
    }
}
