package org.hobwright.wizard.spline;

/**
 * The tooth-thickness tolerance of an external spline, in the side-fit system that ISO 4156-1, ANSI
 * B92.1 and DIN 5480 share (the effective and actual sizes).
 *
 * <pre>
 * S_v max = S + es              maximum effective tooth thickness (es ≤ 0 for a clearance fit)
 * S_max   = S_v max − λ         maximum actual tooth thickness
 * S_min   = S_v max − (T + λ)   minimum actual tooth thickness
 * S_v min = S_min + λ           minimum effective tooth thickness
 * </pre>
 * ISO 4156-1:2005 Table 3 (from memory); the same relations in ANSI B92.1-1996 with es written as a
 * positive reduction, and in DIN 5480-1:2006 with A_s = es, T_G = T + λ, T_eff = λ (from memory).
 *
 * @param allowanceMm          es, mm, signed
 * @param totalMm              T + λ, mm
 * @param effectiveVariationMm λ, mm
 * @param basis                where the three values come from (classes and clauses, or the drawing)
 */
public record SplineTolerance(double allowanceMm, double totalMm, double effectiveVariationMm, String basis) {

    /** Machining tolerance T = (T + λ) − λ, mm. */
    public double machiningMm() {
        return totalMm - effectiveVariationMm;
    }

    /** S_v max for a basic tooth thickness S, mm. */
    public double effectiveMaxMm(double basicMm) {
        return basicMm + allowanceMm;
    }

    /** S_max, mm. */
    public double actualMaxMm(double basicMm) {
        return effectiveMaxMm(basicMm) - effectiveVariationMm;
    }

    /** S_min, mm. */
    public double actualMinMm(double basicMm) {
        return effectiveMaxMm(basicMm) - totalMm;
    }

    /** S_v min, mm. */
    public double effectiveMinMm(double basicMm) {
        return actualMinMm(basicMm) + effectiveVariationMm;
    }
}
