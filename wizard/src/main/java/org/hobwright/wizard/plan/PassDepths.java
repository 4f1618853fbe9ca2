package org.hobwright.wizard.plan;

import java.util.Arrays;

/**
 * Radial depths of the axial passes, measured from the touch-off (blank) diameter, deepest last.
 *
 * <p>The roughing region (total depth minus finishing stock) is split into equal passes no deeper
 * than the roughing depth; a finishing pass at full depth follows when there is finishing stock.
 * Without stock the last roughing pass reaches full depth. The last pass always runs at the
 * finishing feed (FORMULAS.md §7.5: a roughing pass leaving a radial stock, then a finishing pass at full
 * depth; common practice, no source for the equal split).
 *
 * @param depthsMm cumulative depth of each pass, increasing, the last equal to the total depth
 */
public record PassDepths(double[] depthsMm) {

    /** Roughing depths closer than this to a whole number of passes do not add a pass, mm. */
    private static final double SLACK = 1e-9;

    /**
     * Most passes a cycle may have. A bound of Hobwright's, not a trade rule: it keeps the program
     * and the planning bounded (about six blocks a pass); no hobbing cycle needs as many, and a
     * depth split finer than this is a typing error (common practice, no source).
     */
    public static final int MAX_PASSES = 200;

    public PassDepths {
        depthsMm = depthsMm.clone();
    }

    /**
     * Splits a depth into passes.
     *
     * @param totalMm     depth from touch-off to the final root diameter, greater than 0
     * @param roughMm     largest depth of one roughing pass, greater than 0
     * @param stockMm     finishing stock, 0 or more (at least the total depth means one finishing pass to full depth)
     */
    public static PassDepths of(double totalMm, double roughMm, double stockMm) {
        double count = count(totalMm, roughMm, stockMm);
        if (!(count <= MAX_PASSES)) {
            throw new IllegalArgumentException("a roughing depth of " + roughMm + " mm splits " + totalMm + " mm into "
                    + count + " passes, more than " + MAX_PASSES);
        }
        if (stockMm >= totalMm) {
            return new PassDepths(new double[] {totalMm});
        }
        double stock = stockMm;
        double roughRegion = totalMm - stock;
        int rough = (int) roughPasses(roughRegion, roughMm);
        int n = rough + (stock > 0 ? 1 : 0);
        double[] d = new double[n];
        for (int i = 0; i < rough; i++) {
            d[i] = roughRegion * (i + 1) / rough;
        }
        d[n - 1] = totalMm;
        return new PassDepths(d);
    }

    /**
     * The number of passes {@link #of} would make, computed without making them (it may be huge:
     * check it against {@link #MAX_PASSES} first).
     */
    public static double count(double totalMm, double roughMm, double stockMm) {
        if (stockMm >= totalMm) {
            return 1;
        }
        return roughPasses(totalMm - stockMm, roughMm) + (stockMm > 0 ? 1 : 0);
    }

    private static double roughPasses(double roughRegionMm, double roughMm) {
        return Math.max(1, Math.ceil(roughRegionMm / roughMm - SLACK));
    }

    /** Number of passes. */
    public int count() {
        return depthsMm.length;
    }

    /** Cumulative depth of pass {@code i} (0-based), mm. */
    public double depth(int i) {
        return depthsMm[i];
    }

    /** Depth cut by pass {@code i} alone (0-based), mm. */
    public double increment(int i) {
        return i == 0 ? depthsMm[0] : depthsMm[i] - depthsMm[i - 1];
    }

    /** True for the last (finishing) pass. */
    public boolean isLast(int i) {
        return i == depthsMm.length - 1;
    }

    /** The depths array (a copy). */
    @Override
    public double[] depthsMm() {
        return depthsMm.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof PassDepths p && Arrays.equals(depthsMm, p.depthsMm);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(depthsMm);
    }

    @Override
    public String toString() {
        return "PassDepths" + Arrays.toString(depthsMm);
    }
}
