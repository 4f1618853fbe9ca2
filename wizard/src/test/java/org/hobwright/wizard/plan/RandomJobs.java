package org.hobwright.wizard.plan;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.SplittableRandom;
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

/** Random valid jobs and invented machines for the property tests, drawn from a fixed seed. */
final class RandomJobs {
    private static final double[] MODULES = {0.3, 0.5, 0.8, 1, 1.25, 1.5, 2, 2.5, 3, 4, 5, 6};
    private static final List<String> SYSTEMS = List.of("iso53-a", "iso53-b", "iso53-c", "iso53-d", "agma-coarse");
    private static final List<String> HOB_MATERIALS = List.of("hss", "hss-coated", "carbide");
    private static final List<String> WORK_MATERIALS = List.of("steel-free-machining", "steel-case-hardening",
            "steel-quenched-tempered", "brass", "aluminium", "plastic", "unlisted-alloy");
    private static final double[] RESOLUTIONS = {0.001, 1.0 / 60, 1.0 / 12, 1.0 / 3600};

    private final SplittableRandom rnd;

    RandomJobs(long seed) {
        this.rnd = new SplittableRandom(seed);
    }

    private double opt(double lo, double hi) {
        return rnd.nextDouble(lo, hi);
    }

    private OptionalDouble maybe(double lo, double hi) {
        return rnd.nextBoolean() ? OptionalDouble.of(rnd.nextDouble(lo, hi)) : OptionalDouble.empty();
    }

    private Hand hand() {
        return rnd.nextBoolean() ? Hand.RIGHT : Hand.LEFT;
    }

    HobJob next(int index) {
        double m = MODULES[rnd.nextInt(MODULES.length)];
        int z = rnd.nextInt(8, 121);
        double pa = rnd.nextBoolean() ? 20 : new double[] {14.5, 17.5, 22.5, 25}[rnd.nextInt(4)];
        double beta = rnd.nextBoolean() ? 0 : opt(5, 35);
        double x = opt(-0.3, 0.6);
        double tip = z * m / Math.cos(Math.toRadians(beta)) + 2 * (x * m + m);
        OptionalDouble blank = rnd.nextBoolean() ? OptionalDouble.of(tip + opt(-0.3, 0.5) * m) : OptionalDouble.empty();
        GearSpec gear = new GearSpec("part-" + index, z, new Pitch.Module(m), pa, beta, hand(), opt(3, 60), x, 0,
                SYSTEMS.get(rnd.nextInt(SYSTEMS.size())), Optional.empty(), blank, OptionalDouble.empty(),
                OptionalInt.empty(), DrawingValues.NONE);
        double od = Math.min(150, Math.max(16, m * opt(10, 25)));
        HobSpec hob = new HobSpec(new Pitch.Module(m), pa, rnd.nextInt(1, 4), hand(), od, OptionalDouble.empty(),
                OptionalDouble.empty(), rnd.nextInt(8, 21), opt(20, 150), maybe(800, 8000),
                HOB_MATERIALS.get(rnd.nextInt(HOB_MATERIALS.size())));
        SwivelHolder swivel = new SwivelHolder(rnd.nextBoolean() ? SwivelHolder.SwivelScale.DECIMAL_DEGREES
                : SwivelHolder.SwivelScale.DEGREES_MINUTES, RESOLUTIONS[rnd.nextInt(RESOLUTIONS.length)],
                rnd.nextBoolean(), opt(20, 45), "top of the hob toward the chuck (invented)", rnd.nextBoolean());
        double workMax = opt(50, 6000);
        double hobMax = opt(500, 12000);
        MachineProfile machine = new MachineProfile("random-" + index, "test-dialect", opt(0, 5), workMax, opt(0, 150),
                hobMax, opt(40, 300), rnd.nextInt(4) > 0, swivel, 0, opt(50, 400), -opt(10, 300), opt(50, 400),
                maybe(10, 100), opt(2000, 30000), opt(100, 5000), opt(0, 3), 160);
        QualityTargets targets = new QualityTargets(maybe(0.5, 10), maybe(0.2, 5), maybe(0.05, 0.3));
        CycleSettings cycle = new CycleSettings(WORK_MATERIALS.get(rnd.nextInt(WORK_MATERIALS.size())),
                maybe(10, 300), maybe(0.2, 4), maybe(0.1, 2), maybe(0.3, 5), rnd.nextBoolean() ? 0 : opt(0.05, 0.5),
                rnd.nextBoolean() ? HobbingMethod.CLIMB : HobbingMethod.CONVENTIONAL, opt(0, 3), opt(0, 3),
                rnd.nextBoolean(), targets, rnd.nextBoolean() ? 0 : opt(0.1, 3), rnd.nextInt(1, 21), rnd.nextInt(5) > 0);
        return new HobJob("random-" + index, Units.MM, gear, hob, machine, cycle);
    }
}
