package org.hobwright.api.job;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.Validate;

/**
 * The gear as the drawing specifies it, in canonical units (mm, degrees).
 *
 * @param partName              the part name or number, for headers and file names
 * @param teeth                 number of teeth z, at least 1 (the wizard's checks ask for far more)
 * @param pitch                 normal pitch as given on the drawing
 * @param pressureAngleDeg      normal pressure angle α_n, degrees, 1 to 45
 * @param helixAngleDeg         helix angle β at the reference cylinder, magnitude, degrees, 0 to 60 (0 = spur)
 * @param hand                  helix hand (ignored for spur gears)
 * @param faceWidthMm           face width b, mm, greater than 0
 * @param profileShift          profile shift coefficient x (in normal module), -3 to 3
 * @param thicknessAllowanceMm  normal tooth-thickness allowance E_sn, mm (negative thins the tooth), -10 to 10
 * @param toothSystem           tooth system identifier ({@code iso53-a}, {@code iso53-b}, {@code iso53-c},
 *                              {@code iso53-d}, {@code agma-coarse}, {@code agma-fine},
 *                              {@code full-depth-14.5}, {@code custom})
 * @param customProportions     basic rack factors, present exactly when the tooth system is {@code custom}
 * @param blankDiameterMm       the diameter the blank is turned to before hobbing, if known
 * @param pinDiameterMm         the pin or ball the inspector will use, if chosen
 * @param flankToleranceClass   ISO 1328-1:2013 flank tolerance class 1 to 11, if the drawing gives one
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
        Validate.atLeast("teeth", teeth, 1);
        Validate.present("pitch", pitch);
        Validate.range("pressureAngle", pressureAngleDeg, 1, 45);
        Validate.range("helixAngle", helixAngleDeg, 0, 60);
        Validate.present("hand", hand);
        Validate.positive("faceWidth", faceWidthMm);
        Validate.range("profileShift", profileShift, -3, 3);
        Validate.range("thicknessAllowance", thicknessAllowanceMm, -10, 10);
        Validate.text("toothSystem", toothSystem);
        Objects.requireNonNull(customProportions, "customProportions");
        Objects.requireNonNull(blankDiameterMm, "blankDiameterMm");
        Validate.positive("blankDiameter", blankDiameterMm);
        Objects.requireNonNull(pinDiameterMm, "pinDiameterMm");
        Validate.positive("pinDiameter", pinDiameterMm);
        Objects.requireNonNull(flankToleranceClass, "flankToleranceClass");
        Validate.range("flankToleranceClass", flankToleranceClass, 1, 11);
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
