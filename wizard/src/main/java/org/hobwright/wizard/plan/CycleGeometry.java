package org.hobwright.wizard.plan;

/**
 * What stays fixed for a job whatever the speeds and feeds: diameters, face width, hob, swivel,
 * clearances, the machine's rapid rate and the sync settle time.
 *
 * @param touchOffDiameterMm  diameter at which the hob tip touches the blank, mm
 * @param rootDiameterMm      final root diameter, mm
 * @param faceWidthMm         face width b, mm
 * @param hobOutsideDiameterMm d_a0, mm
 * @param pressureAngleDeg    normal pressure angle α_n, degrees
 * @param swivelAngleDeg      η, degrees (signed)
 * @param helical             true for a helical gear (exact helical approach), false for spur
 * @param axialClearanceMm    air gap before the approach and after the overrun, mm
 * @param radialClearanceMm   radial gap above the blank for rapid moves, mm
 * @param safeDiameterMm      fully retracted diameter the cycle starts from (the machine's radial maximum), mm
 * @param rapidMmPerMin       rapid rate, mm/min
 * @param syncSettleS         dwell after synchronisation on, s
 */
public record CycleGeometry(double touchOffDiameterMm, double rootDiameterMm, double faceWidthMm,
                            double hobOutsideDiameterMm, double pressureAngleDeg, double swivelAngleDeg,
                            boolean helical, double axialClearanceMm, double radialClearanceMm,
                            double safeDiameterMm, double rapidMmPerMin, double syncSettleS) {

    /** Depth from the touch-off diameter to the root, mm. */
    public double totalDepthMm() {
        return (touchOffDiameterMm - rootDiameterMm) / 2;
    }

    /** Diameter of the hob tip for rapid moves over the blank, mm. */
    public double retractDiameterMm() {
        return touchOffDiameterMm + 2 * radialClearanceMm;
    }

    /** Approach length for a pass reaching {@code depthMm}: exact helical construction or spur formula, mm. */
    public double approachMm(double depthMm) {
        return helical ? CutGeometry.approachHelical(depthMm, hobOutsideDiameterMm, touchOffDiameterMm, swivelAngleDeg)
                : CutGeometry.approachSpur(depthMm, hobOutsideDiameterMm);
    }

    /** Overrun length for a pass reaching {@code depthMm}, mm. */
    public double overrunMm(double depthMm) {
        return CutGeometry.overrun(depthMm, pressureAngleDeg, swivelAngleDeg);
    }
}
