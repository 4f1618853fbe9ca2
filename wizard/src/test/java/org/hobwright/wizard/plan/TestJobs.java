package org.hobwright.wizard.plan;

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

/** Variations of the test kit's sample jobs, and the invented demo scenario's spur job. */
final class TestJobs {
    private TestJobs() {
    }

    static HobJob with(HobJob j, MachineProfile m) {
        return new HobJob(j.name(), j.units(), j.gear(), j.hob(), m, j.cycle());
    }

    static HobJob with(HobJob j, CycleSettings c) {
        return new HobJob(j.name(), j.units(), j.gear(), j.hob(), j.machine(), c);
    }

    static HobJob with(HobJob j, HobSpec h) {
        return new HobJob(j.name(), j.units(), j.gear(), h, j.machine(), j.cycle());
    }

    static HobJob with(HobJob j, GearSpec g) {
        return new HobJob(j.name(), j.units(), g, j.hob(), j.machine(), j.cycle());
    }

    /** A machine like the test kit's with other speed limits. */
    static MachineProfile speeds(MachineProfile m, double hobMin, double hobMax, double workMin, double workMax) {
        return new MachineProfile(m.name(), m.dialect(), workMin, workMax, hobMin, hobMax, m.maxSyncRatio(),
                m.followsHelix(), m.swivel(), m.radialMinMm(), m.radialMaxMm(), m.axialMinMm(), m.axialMaxMm(),
                m.hobShiftTravelMm(), m.rapidMmPerMin(), m.maxFeedMmPerMin(), m.syncSettleS(), m.maxHobDiameterMm());
    }

    /** A machine like the test kit's with other travels. */
    static MachineProfile travels(MachineProfile m, double radialMax, double axialMin, double axialMax) {
        return new MachineProfile(m.name(), m.dialect(), m.workMinRpm(), m.workMaxRpm(), m.hobMinRpm(), m.hobMaxRpm(),
                m.maxSyncRatio(), m.followsHelix(), m.swivel(), m.radialMinMm(), radialMax, axialMin, axialMax,
                m.hobShiftTravelMm(), m.rapidMmPerMin(), m.maxFeedMmPerMin(), m.syncSettleS(), m.maxHobDiameterMm());
    }

    /** A machine like the test kit's with another swivel holder. */
    static MachineProfile swivel(MachineProfile m, SwivelHolder s) {
        return new MachineProfile(m.name(), m.dialect(), m.workMinRpm(), m.workMaxRpm(), m.hobMinRpm(), m.hobMaxRpm(),
                m.maxSyncRatio(), m.followsHelix(), s, m.radialMinMm(), m.radialMaxMm(), m.axialMinMm(), m.axialMaxMm(),
                m.hobShiftTravelMm(), m.rapidMmPerMin(), m.maxFeedMmPerMin(), m.syncSettleS(), m.maxHobDiameterMm());
    }

    /** The same cycle settings with another hob shift and fastest-cycle choice. */
    static CycleSettings shiftAndFastest(CycleSettings c, double perPart, int everyParts, boolean fastest) {
        return new CycleSettings(c.workMaterial(), c.cuttingSpeedMPerMin(), c.roughFeedMmPerRev(),
                c.finishFeedMmPerRev(), c.roughDepthMm(), c.finishStockMm(), c.method(), c.axialClearanceMm(),
                c.radialClearanceMm(), c.coolant(), c.targets(), perPart, everyParts, fastest);
    }

    /** Cycle settings with every value given. */
    static CycleSettings cycle(String material, OptionalDouble vc, OptionalDouble rough, OptionalDouble finish,
                               OptionalDouble roughDepth, double stock, QualityTargets targets, boolean fastest) {
        return new CycleSettings(material, vc, rough, finish, roughDepth, stock, HobbingMethod.CLIMB, 2, 2, true, targets,
                0, 1, fastest);
    }

    /**
     * The invented demo scenario: the metering-pump spur gear (m 1, z 24, ISO 53 C, blank 26) with a
     * coated 32 mm hob on the invented Varrow 1605 lathe (values of samples/scenario).
     */
    static HobJob meteringPumpOnVarrow() {
        GearSpec gear = new GearSpec("MP-204 metering pump drive gear", 24, new Pitch.Module(1.0), 20, 0, Hand.RIGHT, 8,
                0, -0.03, "iso53-c", Optional.empty(), OptionalDouble.of(26.0), OptionalDouble.of(1.75),
                OptionalInt.of(8), DrawingValues.NONE);
        HobSpec hob = new HobSpec(new Pitch.Module(1.0), 20, 1, Hand.RIGHT, 32, OptionalDouble.empty(),
                OptionalDouble.empty(), 12, 25, OptionalDouble.of(4000), "hss-coated");
        MachineProfile varrow = new MachineProfile("varrow-1605", "varrow-ctl", 5, 10000, 100, 6000, 120, false,
                new SwivelHolder(SwivelHolder.SwivelScale.DEGREES_MINUTES, 5.0 / 60, false, 30,
                        "top of the hob swung toward the main spindle", true),
                0, 32, -10, 120, OptionalDouble.empty(), 12000, 2000, 1.5, 40);
        CycleSettings cycle = new CycleSettings("steel-free-machining", OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty(), 0, HobbingMethod.CLIMB, 1, 1, true,
                QualityTargets.DEFAULTS, 0, 1, true);
        return new HobJob("metering-pump-gear", Units.MM, gear, hob, varrow, cycle);
    }
}
