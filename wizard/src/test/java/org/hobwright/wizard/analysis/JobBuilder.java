package org.hobwright.wizard.analysis;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.SwivelHolder;
import org.hobwright.api.job.ToothProportions;
import org.hobwright.api.job.Units;
import org.hobwright.api.testkit.SampleJobs;

/** Builds test jobs field by field, starting from a metric spur gear m 1, z 24 on ISO 53 C. */
final class JobBuilder {
    Units units = Units.MM;
    int teeth = 24;
    Pitch pitch = new Pitch.Module(1);
    double pressureAngle = 20;
    double helix = 0;
    Hand hand = Hand.RIGHT;
    double faceWidth = 8;
    double shift = 0;
    double allowance = 0;
    String system = "iso53-c";
    Optional<ToothProportions> custom = Optional.empty();
    OptionalDouble blank = OptionalDouble.empty();
    OptionalDouble pin = OptionalDouble.empty();
    OptionalInt toleranceClass = OptionalInt.empty();
    DrawingValues drawing = DrawingValues.NONE;
    Pitch hobPitch;
    double hobPressureAngle = 20;
    int starts = 1;
    Hand hobHand = Hand.RIGHT;
    double hobDiameter = 32;
    OptionalDouble leadAngle = OptionalDouble.empty();
    OptionalDouble hobReference = OptionalDouble.empty();
    MachineProfile machine = SampleJobs.machine(true);
    String material = "steel-free-machining";

    /** An invented small lathe like the sample scenario's sliding-headstock machine: no helix, 40 mm hobs, ±30°. */
    static MachineProfile smallLathe() {
        return new MachineProfile("small-lathe", "test-dialect", 5, 10000, 100, 6000, 120, false,
                new SwivelHolder(SwivelHolder.SwivelScale.DEGREES_MINUTES, 1.0 / 12, false, 30,
                        "top of the hob toward the main spindle", true),
                0, 32, -10, 120, OptionalDouble.empty(), 12000, 2000, 1.5, 40);
    }

    HobJob build() {
        GearSpec gear = new GearSpec("test-part", teeth, pitch, pressureAngle, helix, hand, faceWidth, shift, allowance,
                system, custom, blank, pin, toleranceClass, drawing);
        HobSpec hob = new HobSpec(hobPitch == null ? pitch : hobPitch, hobPressureAngle, starts, hobHand, hobDiameter,
                leadAngle, hobReference, 12, 25, OptionalDouble.of(4000), "hss");
        var cycle = SampleJobs.cycle();
        var c = new org.hobwright.api.job.CycleSettings(material, cycle.cuttingSpeedMPerMin(),
                cycle.roughFeedMmPerRev(), cycle.finishFeedMmPerRev(), cycle.roughDepthMm(), cycle.finishStockMm(),
                cycle.method(), cycle.axialClearanceMm(), cycle.radialClearanceMm(), cycle.coolant(), cycle.targets(),
                cycle.hobShiftPerPartMm(), cycle.hobShiftEveryParts(), cycle.fastest());
        return new HobJob("test-job", units, gear, hob, machine, c);
    }

    static DrawingValues drawing(Double pitchDia, Double outside, Double root, Double depth, Integer spanTeeth,
                                 Double span, Double pinDia, Double overPins) {
        return new DrawingValues(opt(pitchDia), opt(outside), opt(root), opt(depth),
                spanTeeth == null ? OptionalInt.empty() : OptionalInt.of(spanTeeth), opt(span), opt(pinDia),
                opt(overPins));
    }

    private static OptionalDouble opt(Double v) {
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }
}
