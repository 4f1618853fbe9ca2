package org.hobwright.api.cycle;

import java.util.OptionalDouble;
import org.hobwright.api.Validate;

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

    public GearData {
        Validate.positive("transverseModuleMm", transverseModuleMm);
        Validate.finite("transversePressureAngleDeg", transversePressureAngleDeg);
        Validate.positive("referenceDiameterMm", referenceDiameterMm);
        Validate.positive("baseDiameterMm", baseDiameterMm);
        Validate.positive("tipDiameterMm", tipDiameterMm);
        Validate.finite("rootDiameterMm", rootDiameterMm);
        Validate.finite("addendumMm", addendumMm);
        Validate.finite("dedendumMm", dedendumMm);
        Validate.finite("wholeDepthMm", wholeDepthMm);
        Validate.finite("baseHelixAngleDeg", baseHelixAngleDeg);
        Validate.present("leadMm", leadMm);
        leadMm.ifPresent(v -> Validate.finite("leadMm", v));
        Validate.finite("toothThicknessMm", toothThicknessMm);
        Validate.finite("tipThicknessMm", tipThicknessMm);
        Validate.finite("virtualTeeth", virtualTeeth);
    }
}
