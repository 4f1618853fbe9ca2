package org.hobwright.wizard.geometry;

import java.util.List;
import java.util.Optional;
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
            new ToothSystem("agma-fine", 1.0, 1.2, 0.0, 0.002 * 25.4, 20,
                    "AGMA/ANSI 20° fine pitch, b = 1.200/P + 0.002 in (Mott, Machine Elements, 4th ed., Table 8-4)"),
            new ToothSystem("full-depth-14.5", 1.0, 1.157, 0.0, 0, 14.5,
                    "ASA 14½° full depth, b = 1.157/P (from memory)"));

    /** Identifier of the user-defined system. */
    public static final String CUSTOM = "custom";

    /** Every identifier a job may use. */
    public static List<String> ids() {
        return java.util.stream.Stream.concat(BUILT_IN.stream().map(ToothSystem::id), java.util.stream.Stream.of(CUSTOM))
                .toList();
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
}
