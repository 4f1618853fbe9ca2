package org.hobwright.api.cycle;

import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * Computed gear geometry (ISO 21771 relations), mm and degrees.
 *
 * @param transverseModuleMm         m_t = m_n / cos β
 * @param transversePressureAngleDeg α_t, tan α_t = tan α_n / cos β
 * @param referenceDiameterMm        d = z m_t
 * @param baseDiameterMm             d_b = d cos α_t
 * @param tipDiameterMm              d_a
 * @param rootDiameterMm             d_f as cut by the hob
 * @param addendumMm                 h_a
 * @param dedendumMm                 h_f
 * @param wholeDepthMm               h = (d_a − d_f) / 2
 * @param baseHelixAngleDeg          β_b, 0 for spur
 * @param leadMm                     helix lead p_z, empty for spur gears
 * @param toothThicknessMm           normal tooth thickness at the reference circle, with profile shift
 *                                   and thickness allowance
 * @param tipThicknessMm             normal tooth thickness at the tip circle
 * @param virtualTeeth               virtual number of teeth z_n
 */
@ApiStatus(since = "1.0")
public record GearData(
        double transverseModuleMm,
        double transversePressureAngleDeg,
        double referenceDiameterMm,
        double baseDiameterMm,
        double tipDiameterMm,
        double rootDiameterMm,
        double addendumMm,
        double dedendumMm,
        double wholeDepthMm,
        double baseHelixAngleDeg,
        OptionalDouble leadMm,
        double toothThicknessMm,
        double tipThicknessMm,
        double virtualTeeth) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param transverseModuleMm m_t = m_n / cos β
     * @param transversePressureAngleDeg α_t, tan α_t = tan α_n / cos β
     * @param referenceDiameterMm d = z m_t
     * @param baseDiameterMm d_b = d cos α_t
     * @param tipDiameterMm d_a
     * @param rootDiameterMm d_f as cut by the hob
     * @param addendumMm h_a
     * @param dedendumMm h_f
     * @param wholeDepthMm h = (d_a − d_f) / 2
     * @param baseHelixAngleDeg β_b, 0 for spur
     * @param leadMm helix lead p_z, empty for spur gears
     * @param toothThicknessMm normal tooth thickness at the reference circle, with profile shift and thickness
     *     allowance
     * @param tipThicknessMm normal tooth thickness at the tip circle
     * @param virtualTeeth virtual number of teeth z_n
     */
    public GearData {
        Checks.positive("transverseModuleMm", transverseModuleMm);
        Checks.finite("transversePressureAngleDeg", transversePressureAngleDeg);
        Checks.positive("referenceDiameterMm", referenceDiameterMm);
        Checks.positive("baseDiameterMm", baseDiameterMm);
        Checks.positive("tipDiameterMm", tipDiameterMm);
        Checks.finite("rootDiameterMm", rootDiameterMm);
        Checks.finite("addendumMm", addendumMm);
        Checks.finite("dedendumMm", dedendumMm);
        Checks.finite("wholeDepthMm", wholeDepthMm);
        Checks.finite("baseHelixAngleDeg", baseHelixAngleDeg);
        Checks.present("leadMm", leadMm);
        leadMm.ifPresent(v -> Checks.finite("leadMm", v));
        Checks.finite("toothThicknessMm", toothThicknessMm);
        Checks.finite("tipThicknessMm", tipThicknessMm);
        Checks.finite("virtualTeeth", virtualTeeth);
    }
}
