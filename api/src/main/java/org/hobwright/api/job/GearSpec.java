package org.hobwright.api.job;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.Validate;

/**
 * The gear as the drawing specifies it, in canonical units (mm, degrees). Every number must lie in
 * the range of its field in {@link JobFields} (the constructor refuses others).
 *
 * @param partName              the part name or number, for headers and file names
 * @param teeth                 number of teeth z
 * @param pitch                 normal pitch as given on the drawing
 * @param pressureAngleDeg      normal pressure angle α_n, degrees
 * @param helixAngleDeg         helix angle β at the reference cylinder, magnitude, degrees (0 = spur)
 * @param hand                  helix hand (ignored for spur gears)
 * @param faceWidthMm           face width b, mm
 * @param profileShift          profile shift coefficient x (in normal module)
 * @param thicknessAllowanceMm  normal tooth-thickness allowance E_sn, mm (negative thins the tooth)
 * @param toothSystem           tooth system identifier ({@code iso53-a}, {@code iso53-b}, {@code iso53-c},
 *                              {@code iso53-d}, {@code agma-coarse}, {@code agma-fine},
 *                              {@code full-depth-14.5}, {@code custom})
 * @param customProportions     basic rack factors, present exactly when the tooth system is {@code custom}
 * @param blankDiameterMm       the diameter the blank is turned to before hobbing, if known
 * @param pinDiameterMm         the pin or ball the inspector will use, if chosen
 * @param flankToleranceClass   ISO 1328-1:2013 flank tolerance class, if the drawing gives one
 * @param drawing               values printed on the drawing, for the drawing check
 */
public record GearSpec(
        String partName,
        int teeth,
        Pitch pitch,
        double pressureAngleDeg,
        double helixAngleDeg,
        Hand hand,
        double faceWidthMm,
        double profileShift,
        double thicknessAllowanceMm,
        String toothSystem,
        Optional<ToothProportions> customProportions,
        OptionalDouble blankDiameterMm,
        OptionalDouble pinDiameterMm,
        OptionalInt flankToleranceClass,
        DrawingValues drawing) {

    public GearSpec {
        Validate.text("partName", partName);
        Validate.field(JobFields.GEAR_TEETH, teeth);
        Validate.present("pitch", pitch);
        Validate.field(JobFields.GEAR_PRESSURE_ANGLE, pressureAngleDeg);
        Validate.field(JobFields.GEAR_HELIX_ANGLE, helixAngleDeg);
        Validate.present("hand", hand);
        Validate.field(JobFields.GEAR_FACE_WIDTH, faceWidthMm);
        Validate.field(JobFields.GEAR_PROFILE_SHIFT, profileShift);
        Validate.field(JobFields.GEAR_THICKNESS_ALLOWANCE, thicknessAllowanceMm);
        Validate.text("toothSystem", toothSystem);
        Objects.requireNonNull(customProportions, "customProportions");
        Objects.requireNonNull(blankDiameterMm, "blankDiameterMm");
        Validate.field(JobFields.GEAR_BLANK_DIAMETER, blankDiameterMm);
        Objects.requireNonNull(pinDiameterMm, "pinDiameterMm");
        Validate.field(JobFields.GEAR_PIN_DIAMETER, pinDiameterMm);
        Objects.requireNonNull(flankToleranceClass, "flankToleranceClass");
        Validate.field(JobFields.GEAR_TOLERANCE_CLASS, flankToleranceClass);
        Validate.present("drawing", drawing);
        if (toothSystem.equals("custom") != customProportions.isPresent()) {
            throw new IllegalArgumentException(
                    "customProportions must be given exactly when toothSystem is \"custom\", toothSystem was \""
                            + toothSystem + "\"");
        }
    }

    /** True for a spur gear (helix angle 0). */
    public boolean isSpur() {
        return helixAngleDeg == 0.0;
    }

    /** Helix angle with sign: positive right hand, negative left hand, 0 for spur. */
    public double signedHelixAngleDeg() {
        return isSpur() ? 0.0 : hand.sign() * helixAngleDeg;
    }

    /** Normal module in mm. */
    public double moduleMm() {
        return pitch.moduleMm();
    }
}
