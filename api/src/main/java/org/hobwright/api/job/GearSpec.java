package org.hobwright.api.job;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

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
 * @param thicknessAllowanceLowerMm the lower normal tooth-thickness allowance E_sni, mm, -10 to 10 and not above
 *                              {@code thicknessAllowanceMm} (the upper one, E_sns), when the drawing or a
 *                              tolerance series gives one: the inspection values get upper and lower limits
 * @param thicknessSeries       the tolerance series both allowances were taken from when the drawing gives
 *                              none (e.g. {@code din3967-cd25}), as a label; the allowances carry the values
 * @param mate                  the gear this one runs with, when the drawing gives it
 */
@ApiStatus(since = "1.0")
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
        DrawingValues drawing,
        @ApiStatus(since = "1.1") OptionalDouble thicknessAllowanceLowerMm,
        @ApiStatus(since = "1.1") Optional<String> thicknessSeries,
        @ApiStatus(since = "1.1") Optional<MatingGear> mate) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param partName the part name or number, for headers and file names
     * @param teeth number of teeth z, at least 1 (the wizard's checks ask for far more)
     * @param pitch normal pitch as given on the drawing
     * @param pressureAngleDeg normal pressure angle α_n, degrees, 1 to 45
     * @param helixAngleDeg helix angle β at the reference cylinder, magnitude, degrees, 0 to 60 (0 = spur)
     * @param hand helix hand (ignored for spur gears)
     * @param faceWidthMm face width b, mm, greater than 0
     * @param profileShift profile shift coefficient x (in normal module), -3 to 3
     * @param thicknessAllowanceMm normal tooth-thickness allowance E_sn, mm (negative thins the tooth), -10 to 10
     * @param toothSystem tooth system identifier ({@code iso53-a}, {@code iso53-b}, {@code iso53-c}, {
     * @param customProportions the value
     * @param blankDiameterMm the value
     * @param pinDiameterMm the value
     * @param flankToleranceClass the value
     * @param drawing values printed on the drawing, for the drawing check
     * @param thicknessAllowanceLowerMm the lower normal tooth-thickness allowance E_sni, mm, not above
     *     {@code thicknessAllowanceMm}, if given
     * @param thicknessSeries the tolerance series the allowances were taken from, if any
     * @param mate the gear this one runs with, if the drawing gives it
     */
    public GearSpec {
        Checks.text("partName", partName);
        Checks.field(JobFields.GEAR_TEETH, teeth);
        Checks.present("pitch", pitch);
        Checks.field(JobFields.GEAR_PRESSURE_ANGLE, pressureAngleDeg);
        Checks.field(JobFields.GEAR_HELIX_ANGLE, helixAngleDeg);
        Checks.present("hand", hand);
        Checks.field(JobFields.GEAR_FACE_WIDTH, faceWidthMm);
        Checks.field(JobFields.GEAR_PROFILE_SHIFT, profileShift);
        Checks.field(JobFields.GEAR_THICKNESS_ALLOWANCE, thicknessAllowanceMm);
        Checks.text("toothSystem", toothSystem);
        Objects.requireNonNull(customProportions, "customProportions");
        Objects.requireNonNull(blankDiameterMm, "blankDiameterMm");
        Checks.field(JobFields.GEAR_BLANK_DIAMETER, blankDiameterMm);
        Objects.requireNonNull(pinDiameterMm, "pinDiameterMm");
        Checks.field(JobFields.GEAR_PIN_DIAMETER, pinDiameterMm);
        Objects.requireNonNull(flankToleranceClass, "flankToleranceClass");
        Checks.field(JobFields.GEAR_TOLERANCE_CLASS, flankToleranceClass);
        Checks.present("drawing", drawing);
        Objects.requireNonNull(thicknessAllowanceLowerMm, "thicknessAllowanceLowerMm");
        Checks.field(JobFields.GEAR_THICKNESS_ALLOWANCE_LOWER, thicknessAllowanceLowerMm);
        if (thicknessAllowanceLowerMm.isPresent() && thicknessAllowanceLowerMm.getAsDouble() > thicknessAllowanceMm) {
            throw new IllegalArgumentException("thicknessAllowanceLower must not be above thicknessAllowance ("
                    + thicknessAllowanceMm + "), was " + thicknessAllowanceLowerMm.getAsDouble());
        }
        Objects.requireNonNull(thicknessSeries, "thicknessSeries");
        thicknessSeries.ifPresent(t -> Checks.text("thicknessSeries", t));
        Objects.requireNonNull(mate, "mate");
        if (toothSystem.equals("custom") != customProportions.isPresent()) {
            throw new IllegalArgumentException(
                    "customProportions must be given exactly when toothSystem is \"custom\", toothSystem was \""
                            + toothSystem + "\"");
        }
    }

    /**
     * A gear without lower allowance, tolerance series or mate (the form of api 1.0).
     *
     * @param partName the part name or number
     * @param teeth number of teeth z
     * @param pitch normal pitch
     * @param pressureAngleDeg normal pressure angle α_n, degrees
     * @param helixAngleDeg helix angle β, degrees (0 = spur)
     * @param hand helix hand
     * @param faceWidthMm face width b, mm
     * @param profileShift profile shift coefficient x
     * @param thicknessAllowanceMm normal tooth-thickness allowance E_sn, mm
     * @param toothSystem tooth system identifier
     * @param customProportions basic rack factors of the custom tooth system
     * @param blankDiameterMm blank diameter, if known
     * @param pinDiameterMm pin or ball diameter, if chosen
     * @param flankToleranceClass ISO 1328-1:2013 flank tolerance class, if given
     * @param drawing values printed on the drawing
     */
    public GearSpec(String partName, int teeth, Pitch pitch, double pressureAngleDeg, double helixAngleDeg, Hand hand,
                    double faceWidthMm, double profileShift, double thicknessAllowanceMm, String toothSystem,
                    Optional<ToothProportions> customProportions, OptionalDouble blankDiameterMm,
                    OptionalDouble pinDiameterMm, OptionalInt flankToleranceClass, DrawingValues drawing) {
        this(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm, profileShift,
                thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, OptionalDouble.empty(), Optional.empty(), Optional.empty());
    }

    /** {@return true for a spur gear (helix angle 0)} */
    public boolean isSpur() {
        return helixAngleDeg == 0.0;
    }

    /** {@return helix angle with sign: positive right hand, negative left hand, 0 for spur} */
    public double signedHelixAngleDeg() {
        return isSpur() ? 0.0 : hand.sign() * helixAngleDeg;
    }

    /** {@return normal module in mm} */
    public double moduleMm() {
        return pitch.moduleMm();
    }

    /**
     * This gear spec with another {@code partName}.
     *
     * @param partName the part name or number, for headers and file names
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withPartName(String partName) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code teeth}.
     *
     * @param teeth number of teeth z, at least 1 (the wizard's checks ask for far more)
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withTeeth(int teeth) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code pitch}.
     *
     * @param pitch normal pitch as given on the drawing
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withPitch(Pitch pitch) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code pressureAngleDeg}.
     *
     * @param pressureAngleDeg normal pressure angle α_n, degrees, 1 to 45
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withPressureAngleDeg(double pressureAngleDeg) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code helixAngleDeg}.
     *
     * @param helixAngleDeg helix angle β at the reference cylinder, magnitude, degrees, 0 to 60 (0 = spur)
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withHelixAngleDeg(double helixAngleDeg) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code hand}.
     *
     * @param hand helix hand (ignored for spur gears)
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withHand(Hand hand) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code faceWidthMm}.
     *
     * @param faceWidthMm face width b, mm, greater than 0
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withFaceWidthMm(double faceWidthMm) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code profileShift}.
     *
     * @param profileShift profile shift coefficient x (in normal module), -3 to 3
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withProfileShift(double profileShift) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code thicknessAllowanceMm}.
     *
     * @param thicknessAllowanceMm normal tooth-thickness allowance E_sn, mm (negative thins the tooth), -10 to 10
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withThicknessAllowanceMm(double thicknessAllowanceMm) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code toothSystem}.
     *
     * @param toothSystem tooth system identifier ({@code iso53-a}, {@code iso53-b}, {@code iso53-c}, {
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withToothSystem(String toothSystem) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another {@code customProportions}.
     *
     * @param customProportions basic rack factors, present exactly when the tooth system is {@code custom}
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withCustomProportions(Optional<ToothProportions> customProportions) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with a {@code customProportions} given.
     *
     * @param customProportions the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withCustomProportions(ToothProportions customProportions) {
        return withCustomProportions(Optional.of(customProportions));
    }

    /**
     * This gear spec with another {@code blankDiameterMm}.
     *
     * @param blankDiameterMm the diameter the blank is turned to before hobbing, if known
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withBlankDiameterMm(OptionalDouble blankDiameterMm) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with a {@code blankDiameterMm} given.
     *
     * @param blankDiameterMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withBlankDiameterMm(double blankDiameterMm) {
        return withBlankDiameterMm(OptionalDouble.of(blankDiameterMm));
    }

    /**
     * This gear spec with another {@code pinDiameterMm}.
     *
     * @param pinDiameterMm the pin or ball the inspector will use, if chosen
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withPinDiameterMm(OptionalDouble pinDiameterMm) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with a {@code pinDiameterMm} given.
     *
     * @param pinDiameterMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withPinDiameterMm(double pinDiameterMm) {
        return withPinDiameterMm(OptionalDouble.of(pinDiameterMm));
    }

    /**
     * This gear spec with another {@code flankToleranceClass}.
     *
     * @param flankToleranceClass ISO 1328-1:2013 flank tolerance class 1 to 11, if the drawing gives one
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withFlankToleranceClass(OptionalInt flankToleranceClass) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with a {@code flankToleranceClass} given.
     *
     * @param flankToleranceClass the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withFlankToleranceClass(int flankToleranceClass) {
        return withFlankToleranceClass(OptionalInt.of(flankToleranceClass));
    }

    /**
     * This gear spec with another {@code drawing}.
     *
     * @param drawing values printed on the drawing, for the drawing check
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withDrawing(DrawingValues drawing) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with a lower tooth-thickness allowance.
     *
     * @param thicknessAllowanceLowerMm the lower normal allowance E_sni, mm, not above the upper one
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withThicknessAllowanceLowerMm(OptionalDouble thicknessAllowanceLowerMm) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another tolerance-series label.
     *
     * @param thicknessSeries the series the allowances were taken from, or empty
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withThicknessSeries(Optional<String> thicknessSeries) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }

    /**
     * This gear spec with another mating gear.
     *
     * @param mate the gear this one runs with, or empty
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public GearSpec withMate(Optional<MatingGear> mate) {
        return new GearSpec(partName, teeth, pitch, pressureAngleDeg, helixAngleDeg, hand, faceWidthMm,
                profileShift, thicknessAllowanceMm, toothSystem, customProportions, blankDiameterMm, pinDiameterMm,
                flankToleranceClass, drawing, thicknessAllowanceLowerMm, thicknessSeries, mate);
    }
}
