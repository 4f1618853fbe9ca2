package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * Basic rack proportions of a {@code custom} tooth system, as factors of the normal module.
 *
 * @param addendumFactor   h_aP / m_n, 0.3 to 2
 * @param dedendumFactor   h_fP / m_n, greater than the addendum factor, at most 3
 * @param rootRadiusFactor ρ_fP / m_n, 0 to 1
 */
@ApiStatus(since = "1.0")
public record ToothProportions(double addendumFactor, double dedendumFactor, double rootRadiusFactor) {
    public ToothProportions {
        Checks.range("addendumFactor", addendumFactor, 0.3, 2.0);
        Checks.range("dedendumFactor", dedendumFactor, 0.3, 3.0);
        Checks.range("rootRadiusFactor", rootRadiusFactor, 0.0, 1.0);
        if (dedendumFactor <= addendumFactor) {
            throw new IllegalArgumentException("dedendumFactor must be greater than addendumFactor ("
                    + addendumFactor + "), was " + dedendumFactor);
        }
    }
}
