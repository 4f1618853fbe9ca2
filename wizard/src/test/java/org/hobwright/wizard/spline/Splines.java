package org.hobwright.wizard.spline;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.Units;
import org.hobwright.wizard.check.Wording;

/** Splines and hobs for tests. */
final class Splines {
    /** Messages in millimetres. */
    static final Wording MM = new Wording(Units.MM);

    private Splines() {
    }

    static SplineDrawing iso(int z, double m, double alpha, SplineRoot root, int cls, String fit) {
        return SplineDrawing.of(SplineStandard.ISO_4156, z, m, alpha, root, cls, fit, 20);
    }

    static SplineDrawing ansi(int z, double p, double alpha, SplineRoot root, int cls) {
        return SplineDrawing.of(SplineStandard.ANSI_B92_1, z, 25.4 / p, alpha, root, cls, "h", 25);
    }

    static SplineDrawing din(double dB, double m, int z, double es, double total, double lambda) {
        return new SplineDrawing(SplineStandard.DIN_5480, z, m, 30, SplineRoot.FILLET, 8, "f", dB, 30,
                OptionalDouble.of(es), OptionalDouble.of(total), OptionalDouble.of(lambda));
    }

    static SplineLimits limits(SplineDrawing s) {
        List<Finding> findings = new ArrayList<>();
        return SplineLimits.of(s, MM, findings).orElseThrow(() -> new AssertionError(findings.toString()));
    }

    /** The hob the standard implies: its addendum and the smallest root radius as tip radius, 1 start, 12 gashes. */
    static SplineHob standardHob(SplineLimits l) {
        SplineDrawing s = l.spec();
        return new SplineHob(s.moduleMm(), s.pressureAngleDeg(), s.root(), l.standardHobAddendumMm(),
                l.minimumRootRadiusMm(), 1, 12);
    }

    static SplineHob withTip(SplineHob h, double addendum, double tipRadius) {
        return new SplineHob(h.moduleMm(), h.pressureAngleDeg(), h.root(), addendum, tipRadius, h.starts(), h.gashes());
    }

    static List<String> codes(List<Finding> findings) {
        return findings.stream().map(Finding::code).toList();
    }
}
