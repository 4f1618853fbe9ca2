package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * What the setter needs before the first part: diameters, swivel, speeds, ratio.
 *
 * @param blankDiameterMm        diameter to turn the blank to, mm
 * @param touchOffDiameterMm     diameter at which the hob tip touches the blank, mm
 * @param finalInfeedDiameterMm  final work diameter of the hob tip (the root diameter), mm
 * @param leadAngleDeg           hob lead angle γ (magnitude), degrees
 * @param swivelAngleDeg         swivel angle η = β − γ (signed: right hand positive), degrees
 * @param swivelSettingDeg       the setting in the machine's sign convention, rounded to the holder's
 *                               resolution, degrees
 * @param swivelSettingText      the setting as the holder's scale reads it (decimal or degrees-minutes)
 * @param swivelAngleDms         η as degrees-minutes-seconds, e.g. {@code 13° 14′ 12.4″}
 * @param swivelDirection        the direction in words for this machine
 * @param cuttingSpeedMPerMin    cutting speed at the hob tip actually used, m/min
 * @param hobRpm                 hob speed, rpm
 * @param workRpm                work speed (from the ratio), rpm
 * @param syncHobTurns           hob turns of the sync ratio
 * @param syncWorkTurns          work turns of the sync ratio
 * @param differentialDegPerMm   helical addition, degrees of work rotation per mm of axial travel (0 for spur)
 * @param hobShiftMm             hob shift position for this part, mm
 */
@ApiStatus(since = "1.0")
public record SetupValues(
        double blankDiameterMm,
        double touchOffDiameterMm,
        double finalInfeedDiameterMm,
        double leadAngleDeg,
        double swivelAngleDeg,
        double swivelSettingDeg,
        String swivelSettingText,
        String swivelAngleDms,
        String swivelDirection,
        double cuttingSpeedMPerMin,
        double hobRpm,
        double workRpm,
        int syncHobTurns,
        int syncWorkTurns,
        double differentialDegPerMm,
        double hobShiftMm) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param blankDiameterMm diameter to turn the blank to, mm
     * @param touchOffDiameterMm diameter at which the hob tip touches the blank, mm
     * @param finalInfeedDiameterMm final work diameter of the hob tip (the root diameter), mm
     * @param leadAngleDeg hob lead angle γ (magnitude), degrees
     * @param swivelAngleDeg swivel angle η = β − γ (signed: right hand positive), degrees
     * @param swivelSettingDeg the setting in the machine's sign convention, rounded to the holder's resolution, degrees
     * @param swivelSettingText the setting as the holder's scale reads it (decimal or degrees-minutes)
     * @param swivelAngleDms η as degrees-minutes-seconds, e.g. {@code 13° 14′ 12.4″}
     * @param swivelDirection the direction in words for this machine
     * @param cuttingSpeedMPerMin cutting speed at the hob tip actually used, m/min
     * @param hobRpm hob speed, rpm
     * @param workRpm work speed (from the ratio), rpm
     * @param syncHobTurns hob turns of the sync ratio
     * @param syncWorkTurns work turns of the sync ratio
     * @param differentialDegPerMm helical addition, degrees of work rotation per mm of axial travel (0 for spur)
     * @param hobShiftMm hob shift position for this part, mm
     */
    public SetupValues {
        Checks.positive("blankDiameterMm", blankDiameterMm);
        Checks.positive("touchOffDiameterMm", touchOffDiameterMm);
        Checks.positive("finalInfeedDiameterMm", finalInfeedDiameterMm);
        Checks.finite("leadAngleDeg", leadAngleDeg);
        Checks.finite("swivelAngleDeg", swivelAngleDeg);
        Checks.finite("swivelSettingDeg", swivelSettingDeg);
        Checks.text("swivelSettingText", swivelSettingText);
        Checks.text("swivelAngleDms", swivelAngleDms);
        Checks.text("swivelDirection", swivelDirection);
        Checks.positive("cuttingSpeedMPerMin", cuttingSpeedMPerMin);
        Checks.positive("hobRpm", hobRpm);
        Checks.positive("workRpm", workRpm);
        Checks.atLeast("syncHobTurns", syncHobTurns, 1);
        Checks.atLeast("syncWorkTurns", syncWorkTurns, 1);
        Checks.finite("differentialDegPerMm", differentialDegPerMm);
        Checks.nonNegative("hobShiftMm", hobShiftMm);
    }
}
