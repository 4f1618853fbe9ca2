package org.hobwright.wizard.geometry;

import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.ToothProportions;

/**
 * A basic rack tooth system: addendum, dedendum and root-fillet radius as factors of the normal
 * module, plus a constant dedendum addition (the fine-pitch 0.002 in).
 *
 * <p>Sources: ISO 53:1998 profiles A–D (h_aP 1.0 m, h_fP 1.25 m / 1.40 m, ρ_fP 0.38/0.30/0.25/0.39 m);
 * AGMA/ANSI 20° coarse pitch full depth a = 1/P, b = 1.25/P and fine pitch a = 1/P,
 * b = 1.200/P + 0.002 in (R. L. Mott, Machine Elements in Mechanical Design, 4th ed., Table 8-4);
 * 14½° full depth a = 1/P, b = 1.157/P (from memory, ASA B6.1). With a = 1/P the factor of the
 * module is the same number, since m = 25.4/P mm and 1/P in = m mm.
 *
 * <p>Root radii where no standard value was read: AGMA coarse 0.30/P (from memory, AGMA 201.02);
 * AGMA fine pitch 0.30/P (the coarse-pitch value; the largest radius that fits the fine-pitch
 * clearance by the ISO 53 §5.9 rule is 0.304/P + 0.003 in, so 0.30/P fits); 14½° full depth
 * 0.209/P (from memory, and equal to the largest radius that fits its 0.157/P clearance by the
 * ISO 53 §5.9 rule: 0.157/(1 − sin 14.5°) = 0.2094).
 *
 * @param id                      identifier used in job files
 * @param addendumFactor          h_aP / m_n
 * @param dedendumFactor          h_fP / m_n (without the constant addition)
 * @param rootRadiusFactor        ρ_fP / m_n
 * @param dedendumAdditionMm      constant added to the dedendum, mm
 * @param nominalPressureAngleDeg the pressure angle the system is defined for, degrees
 * @param source                  where the factors come from
 */
public record ToothSystem(String id, double addendumFactor, double dedendumFactor, double rootRadiusFactor,
                          double dedendumAdditionMm, double nominalPressureAngleDeg, String source) {

    /** The built-in systems, in the order shown to users. */
    public static final List<ToothSystem> BUILT_IN = List.of(
            new ToothSystem("iso53-a", 1.0, 1.25, 0.38, 0, 20, "ISO 53:1998 profile A"),
            new ToothSystem("iso53-b", 1.0, 1.25, 0.30, 0, 20, "ISO 53:1998 profile B"),
            new ToothSystem("iso53-c", 1.0, 1.25, 0.25, 0, 20, "ISO 53:1998 profile C"),
            new ToothSystem("iso53-d", 1.0, 1.40, 0.39, 0, 20, "ISO 53:1998 profile D"),
            new ToothSystem("agma-coarse", 1.0, 1.25, 0.30, 0, 20,
                    "AGMA/ANSI 20° full depth, coarse pitch (Mott, Machine Elements, 4th ed., Table 8-4);"
                            + " root radius 0.30/P from memory (AGMA 201.02)"),
            new ToothSystem("agma-fine", 1.0, 1.2, 0.30, 0.002 * 25.4, 20,
                    "AGMA/ANSI 20° fine pitch, b = 1.200/P + 0.002 in (Mott, Machine Elements, 4th ed., Table 8-4);"
                            + " root radius 0.30/P assumed (fits the clearance by the ISO 53 fillet rule)"),
            new ToothSystem("full-depth-14.5", 1.0, 1.157, 0.209, 0, 14.5,
                    "ASA 14½° full depth, b = 1.157/P, root radius 0.209/P (from memory)"));

    /** Identifier of the user-defined system. */
    public static final String CUSTOM = "custom";

    /** Every identifier a job may use. */
    public static List<String> ids() {
        return Stream.concat(BUILT_IN.stream().map(ToothSystem::id), Stream.of(CUSTOM)).toList();
    }

    /** Diametral pitch (1/in) from which the fine-pitch system applies (AGMA 207.04 range, from memory). */
    public static final double FINE_PITCH_FROM = 20;

    /**
     * The tooth system a drawing means when it names none, by its pitch: ISO 53:1998 profile A for a
     * module, the AGMA coarse-pitch system below 20 diametral pitch and the fine-pitch one from 20
     * (the ranges of AGMA 201.02 and 207.04, from memory). The table of job fields gives the same rule.
     */
    public static String forPitch(org.hobwright.api.job.Pitch pitch) {
        return pitch instanceof org.hobwright.api.job.Pitch.Diametral d ? forDiametralPitch(d.perInch()) : FOR_MODULE;
    }

    /** The tooth system of a gear given by its module when the drawing names none. */
    public static final String FOR_MODULE = "iso53-a";

    /** The tooth system of a gear given by its diametral pitch (1/in) when the drawing names none. */
    public static String forDiametralPitch(double perInch) {
        return perInch < FINE_PITCH_FROM ? "agma-coarse" : "agma-fine";
    }

    /** The built-in system with this id. */
    public static Optional<ToothSystem> builtIn(String id) {
        return BUILT_IN.stream().filter(t -> t.id.equals(id)).findFirst();
    }

    /** The system of a gear: built in, or its custom proportions. */
    public static Optional<ToothSystem> of(GearSpec gear) {
        if (CUSTOM.equals(gear.toothSystem())) {
            ToothProportions p = gear.customProportions().orElseThrow();
            return Optional.of(new ToothSystem(CUSTOM, p.addendumFactor(), p.dedendumFactor(), p.rootRadiusFactor(), 0,
                    gear.pressureAngleDeg(), "custom proportions from the job"));
        }
        return builtIn(gear.toothSystem());
    }

    /** Basic rack addendum h_aP for a module, mm. */
    public double addendumMm(double moduleMm) {
        return addendumFactor * moduleMm;
    }

    /** Basic rack dedendum h_fP for a module, mm (equals the standard hob's addendum h_aP0). */
    public double dedendumMm(double moduleMm) {
        return dedendumFactor * moduleMm + dedendumAdditionMm;
    }

    /** Basic rack root-fillet radius ρ_fP for a module, mm (equals the standard hob's tip radius ρ_aP0). */
    public double rootRadiusMm(double moduleMm) {
        return rootRadiusFactor * moduleMm;
    }

    /**
     * Height of the straight flank of the standard hob above its datum line, mm: the part of the
     * hob tooth that generates involute.
     *
     * <pre>h_s = h_aP0 − ρ_aP0 (1 − sin α_n),  h_aP0 = h_fP, ρ_aP0 = ρ_fP</pre>
     * Derived from the rack geometry (a tip radius tangent to the flank and the tip line); for
     * ISO 53 A it gives 0.99997 m, the classic "h* = 1" of the undercut rule.
     *
     * @param moduleMm            normal module, mm
     * @param pressureAngleRad    normal pressure angle α_n, rad
     */
    public double straightFlankHeightMm(double moduleMm, double pressureAngleRad) {
        return dedendumMm(moduleMm) - rootRadiusMm(moduleMm) * (1 - Math.sin(pressureAngleRad));
    }

    /**
     * Largest root-fillet radius that fits the basic rack's clearance, mm.
     *
     * <pre>ρ_fPmax = min( c_P / (1 − sin α_P),  (π m/4 − h_fP tan α_P) / tan((90° − α_P)/2) )</pre>
     * The first term is the fillet tangent to the flank and the root line with its top at the
     * datum-plus-addendum level; the second the fillet whose two sides meet in the middle of the tooth
     * space. ISO 53:1998 gives the two forms for c_P ≤ 0.295 m and 0.295 m &lt; c_P ≤ 0.396 m (clause 5.9,
     * from memory); both are re-derived in FORMULAS.md §1.3, and taking the smaller of the two is the same
     * rule for any clearance (derived).
     *
     * @param moduleMm         normal module, mm
     * @param pressureAngleRad profile angle α_P, rad
     */
    public double maxRootRadiusMm(double moduleMm, double pressureAngleRad) {
        double clearance = dedendumMm(moduleMm) - addendumMm(moduleMm);
        double tangent = clearance / (1 - Math.sin(pressureAngleRad));
        double meeting = (Math.PI * moduleMm / 4 - dedendumMm(moduleMm) * Math.tan(pressureAngleRad))
                / Math.tan((Math.PI / 2 - pressureAngleRad) / 2);
        return Math.min(tangent, meeting);
    }
}
