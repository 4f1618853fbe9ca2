package org.hobwright.api.cycle;

import java.util.Optional;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * Values for the inspector, mm.
 *
 * @param spanTeeth              number of teeth spanned k
 * @param spanWidthMm            base tangent length W_k over k teeth
 * @param spanContactDiameterMm  diameter where the anvils touch the flanks
 * @param pinDiameterMm          pin (spur) or ball (helical) diameter D_M
 * @param overPinsMm             measurement over two pins or balls M_d
 * @param balls                  true when balls are meant (helical gears)
 * @param chordalThicknessMm     chordal tooth thickness at the reference circle (normal section)
 * @param chordalHeightMm        chordal height from the tip to that chord
 * @param limits                 upper and lower limits, when the job gives a lower tooth-thickness allowance
 *                               or a tolerance series
 */
@ApiStatus(since = "1.0")
public record InspectionData(
        int spanTeeth,
        double spanWidthMm,
        double spanContactDiameterMm,
        double pinDiameterMm,
        double overPinsMm,
        boolean balls,
        double chordalThicknessMm,
        double chordalHeightMm,
        @ApiStatus(since = "1.1") Optional<InspectionLimits> limits) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param spanTeeth number of teeth spanned k
     * @param spanWidthMm base tangent length W_k over k teeth
     * @param spanContactDiameterMm diameter where the anvils touch the flanks
     * @param pinDiameterMm pin (spur) or ball (helical) diameter D_M
     * @param overPinsMm measurement over two pins or balls M_d
     * @param balls true when balls are meant (helical gears)
     * @param chordalThicknessMm chordal tooth thickness at the reference circle (normal section)
     * @param chordalHeightMm chordal height from the tip to that chord
     * @param limits upper and lower limits, when the job gives a lower allowance or a tolerance series
     */
    public InspectionData {
        Checks.atLeast("spanTeeth", spanTeeth, 1);
        Checks.finite("spanWidthMm", spanWidthMm);
        Checks.finite("spanContactDiameterMm", spanContactDiameterMm);
        Checks.positive("pinDiameterMm", pinDiameterMm);
        Checks.finite("overPinsMm", overPinsMm);
        Checks.finite("chordalThicknessMm", chordalThicknessMm);
        Checks.finite("chordalHeightMm", chordalHeightMm);
        Checks.present("limits", limits);
    }

    /**
     * Values without limits (the form of api 1.0).
     *
     * @param spanTeeth number of teeth spanned k
     * @param spanWidthMm base tangent length W_k over k teeth
     * @param spanContactDiameterMm diameter where the anvils touch the flanks
     * @param pinDiameterMm pin (spur) or ball (helical) diameter D_M
     * @param overPinsMm measurement over two pins or balls M_d
     * @param balls true when balls are meant (helical gears)
     * @param chordalThicknessMm chordal tooth thickness at the reference circle (normal section)
     * @param chordalHeightMm chordal height from the tip to that chord
     */
    public InspectionData(int spanTeeth, double spanWidthMm, double spanContactDiameterMm, double pinDiameterMm,
                          double overPinsMm, boolean balls, double chordalThicknessMm, double chordalHeightMm) {
        this(spanTeeth, spanWidthMm, spanContactDiameterMm, pinDiameterMm, overPinsMm, balls, chordalThicknessMm,
                chordalHeightMm, Optional.empty());
    }
}
