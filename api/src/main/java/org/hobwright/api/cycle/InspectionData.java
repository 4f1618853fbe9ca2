package org.hobwright.api.cycle;

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
        double chordalHeightMm) {

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
     */
    public InspectionData {
        Checks.atLeast("spanTeeth", spanTeeth, 1);
        Checks.finite("spanWidthMm", spanWidthMm);
        Checks.finite("spanContactDiameterMm", spanContactDiameterMm);
        Checks.positive("pinDiameterMm", pinDiameterMm);
        Checks.finite("overPinsMm", overPinsMm);
        Checks.finite("chordalThicknessMm", chordalThicknessMm);
        Checks.finite("chordalHeightMm", chordalHeightMm);
    }
}
