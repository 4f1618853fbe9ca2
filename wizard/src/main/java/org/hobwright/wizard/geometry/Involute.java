package org.hobwright.wizard.geometry;

/**
 * The involute function and its inverse.
 *
 * <p>inv α = tan α − α (α in rad). The inverse uses Newton's method on f(α) = tan α − α − q with
 * f′(α) = tan² α, started at α₀ = (3q)^(1/3) (the first term of the series inv α ≈ α³/3), and
 * iterates until the step is below 1e-14 rad. Standard textbook construction (e.g. DIN 3960 /
 * ISO 21771 use the function; the Newton form is elementary calculus).
 */
public final class Involute {
    private Involute() {
    }

    /** inv α = tan α − α, α in rad. */
    public static double inv(double alphaRad) {
        return Math.tan(alphaRad) - alphaRad;
    }

    /**
     * The angle α in [0, π/2) with inv α = q.
     *
     * @param q involute value, 0 or more, finite
     * @return α in rad
     * @throws IllegalArgumentException when q is negative or not finite
     */
    public static double inverse(double q) {
        if (!(q >= 0) || !Double.isFinite(q)) {
            throw new IllegalArgumentException("involute value must be finite and 0 or more, was " + q);
        }
        if (q == 0) {
            return 0;
        }
        double a = Math.min(Math.cbrt(3 * q), 1.5);
        for (int i = 0; i < 100; i++) {
            double t = Math.tan(a);
            double step = (t - a - q) / (t * t);
            double next = a - step;
            if (next <= 0) {
                next = a / 2;
            } else if (next >= Math.PI / 2) {
                next = (a + Math.PI / 2) / 2;
            }
            if (Math.abs(next - a) < 1e-14) {
                return next;
            }
            a = next;
        }
        return a;
    }
}
