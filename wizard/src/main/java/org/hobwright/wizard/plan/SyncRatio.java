package org.hobwright.wizard.plan;

/**
 * The synchronisation ratio as whole numbers, hob turns : work turns, as a control takes it.
 * Generating condition: the work turns z₀/z₂ of a turn per hob turn, so the ratio is z₂ : z₀
 * reduced by the greatest common divisor (e.g. 30 teeth, 2 starts → 15 : 1; 31 teeth, 2 starts → 31 : 2).
 *
 * @param hobTurns  hob turns
 * @param workTurns work turns
 */
public record SyncRatio(int hobTurns, int workTurns) {

    /** The reduced ratio z₂ : z₀ for a gear with {@code teeth} and a hob with {@code starts}. */
    public static SyncRatio of(int teeth, int starts) {
        int g = gcd(teeth, starts);
        return new SyncRatio(teeth / g, starts / g);
    }

    /** Hob turns per work turn, z₂ / z₀. */
    public double hobTurnsPerWorkTurn() {
        return (double) hobTurns / workTurns;
    }

    private static int gcd(int a, int b) {
        return b == 0 ? a : gcd(b, a % b);
    }
}
