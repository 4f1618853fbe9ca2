package org.hobwright.api.testkit;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.api.job.SwivelHolder;
import org.hobwright.api.job.Units;

/**
 * Jobs for tests in every module. The gears are textbook cases (the helical one is the worked
 * example m_n 2, z 30, α_n 20°, β 15° RH, x 0.2 used with ISO 21771 relations); the machine is
 * invented test data.
 */
public final class SampleJobs {
    private SampleJobs() {
    }

    /** An invented test machine that can follow a helix, generous limits. */
    public static MachineProfile machine(boolean followsHelix) {
        return new MachineProfile("test-machine", "test-dialect", 1, 3000, 50, 6000, 200, followsHelix,
                new SwivelHolder(SwivelHolder.SwivelScale.DECIMAL_DEGREES, 0.001, true, 45,
                        "top of the hob toward the chuck", true),
                0, 300, -200, 300, OptionalDouble.of(60), 5000, 2000, 1.0, 120);
    }

    /** Default cycle settings for case-hardening steel, everything else left to the planner. */
    public static CycleSettings cycle() {
        return new CycleSettings("steel-case-hardening", OptionalDouble.of(60), OptionalDouble.of(1.5),
                OptionalDouble.of(1.5), OptionalDouble.empty(), 0, HobbingMethod.CLIMB, 2, 2, true,
                QualityTargets.DEFAULTS, 0, 1, false);
    }

    /** A spur or helical gear on the ISO 53 A rack. */
    public static GearSpec gear(int teeth, double module, double helixDeg, Hand hand, double shift) {
        return new GearSpec("test-gear", teeth, new Pitch.Module(module), 20, helixDeg, hand, 20, shift, 0,
                "iso53-a", Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalInt.of(7),
                DrawingValues.NONE);
    }

    /** A single-start right-hand HSS hob, 70 mm outside diameter, 14 gashes. */
    public static HobSpec hob(double module, Hand hand) {
        return new HobSpec(new Pitch.Module(module), 20, 1, hand, 70, OptionalDouble.empty(),
                OptionalDouble.empty(), 14, 80, OptionalDouble.of(2000), "hss");
    }

    /** Spur: m 2, z 20, x 0. */
    public static HobJob spurMetric() {
        return new HobJob("spur-metric", Units.MM, gear(20, 2, 0, Hand.RIGHT, 0), hob(2, Hand.RIGHT),
                machine(true), cycle());
    }

    /** Helical: m_n 2, z 30, β 15° RH, x 0.2, right-hand hob. */
    public static HobJob helicalMetric() {
        return new HobJob("helical-metric", Units.MM, gear(30, 2, 15, Hand.RIGHT, 0.2), hob(2, Hand.RIGHT),
                machine(true), cycle());
    }

    /** The helical job on a machine that cannot follow a helix. */
    public static HobJob helicalOnSpurMachine() {
        HobJob j = helicalMetric();
        return new HobJob("helical-no-helix", j.units(), j.gear(), j.hob(), machine(false), j.cycle());
    }
}
