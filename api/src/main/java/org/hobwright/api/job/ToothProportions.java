package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * Basic rack proportions of a {@code custom} tooth system, as factors of the normal module.
 *
 * @param addendumFactor   h_aP / m_n
 * @param dedendumFactor   h_fP / m_n, greater than the addendum factor
 * @param rootRadiusFactor ρ_fP / m_n
 */
@ApiStatus(since = "1.0")
public record ToothProportions(double addendumFactor, double dedendumFactor, double rootRadiusFactor) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param addendumFactor h_aP / m_n, 0.3 to 2
     * @param dedendumFactor h_fP / m_n, greater than the addendum factor, at most 3
     * @param rootRadiusFactor ρ_fP / m_n, 0 to 1
     */
    public ToothProportions {
        Checks.field(JobFields.GEAR_CUSTOM_ADDENDUM, addendumFactor);
        Checks.field(JobFields.GEAR_CUSTOM_DEDENDUM, dedendumFactor);
        Checks.field(JobFields.GEAR_CUSTOM_ROOT_RADIUS, rootRadiusFactor);
        if (dedendumFactor <= addendumFactor) {
            throw new IllegalArgumentException("dedendumFactor must be greater than addendumFactor ("
                    + addendumFactor + "), was " + dedendumFactor);
        }
    }
}
