package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The differential and the root feed marks (FORMULAS.md §5.2 and §6.1; check cases 31 and 32 of §10)
 * against a second derivation: the slope of the tooth trace on the reference cylinder, and the scallop
 * left between hob tip circles found with commons-math3's minimiser instead of the sagitta formula.
 */
class FeedAndDifferentialCrossCheckTest {

    // While the hob moves Δz along the gear axis the tooth trace moves round the reference cylinder by
    // Δz · tan β (its slope), i.e. by Δz · tan β / r radians, r = z m_n / (2 cos β) (case 31: 0.494308 °/mm).
    @ParameterizedTest(name = "β {0}°, z {1}, m_n {2}")
    @CsvSource({"15, 30, 2", "30, 17, 1.5", "45, 100, 0.5", "8, 12, 3"})
    void differentialIsTheSlopeOfTheToothTrace(double beta, int z, double mn) {
        double b = Math.toRadians(beta);
        double r = z * mn / (2 * Math.cos(b));
        double degPerMm = Math.toDegrees(Math.tan(b) / r);
        assertEquals(degPerMm, Kinematics.differentialDegPerMm(beta, z, mn), 1e-12 * degPerMm);
    }

    // Tip circles of radius d_a0/2 every f_a / cos β along the tooth trace; the root is what the deepest circle
    // leaves, and the scallop is the tip radius minus the shallowest point between two neighbours. The closed
    // form f²/(4 d_a0 cos² β) is the parabolic sagitta, so it may differ by its own approximation, about
    // (s / d_a0)² relative (case 32: f 2, d_a0 70 → 14.2857 µm).
    @ParameterizedTest(name = "f {0}, d_a0 {1}, β {2}°")
    @CsvSource({"2, 70, 0", "1, 70, 0", "3, 70, 0", "1.5, 70, 15", "0.4, 24, 0", "4, 40, 30"})
    void rootFeedMarkIsTheScallopBetweenTipCircles(double feed, double da0, double beta) {
        double r = da0 / 2;
        double s = feed / Math.cos(Math.toRadians(beta));
        UnivariateObjectiveFunction cut = new UnivariateObjectiveFunction(u -> {
            double deepest = 0;
            for (int k = -2; k <= 2; k++) {
                double du = u - k * s;
                if (Math.abs(du) < r) {
                    deepest = Math.max(deepest, Math.sqrt(r * r - du * du));
                }
            }
            return deepest;
        });
        double shallowest = new BrentOptimizer(1e-15, 1e-15).optimize(new MaxEval(1000), cut, GoalType.MINIMIZE,
                new SearchInterval(0.05 * s, 0.95 * s, 0.4 * s)).getValue();
        double scallopUm = (r - shallowest) * 1000;
        double approximation = (s / da0) * (s / da0);
        assertEquals(scallopUm, FinishFormulas.feedMarkRootUm(feed, da0, beta), 2 * approximation * scallopUm);
    }
}
