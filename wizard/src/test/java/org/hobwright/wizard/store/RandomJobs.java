package org.hobwright.wizard.store;

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
import org.hobwright.api.job.ToothProportions;
import org.hobwright.api.job.Units;

/** Random valid jobs for property tests, drawn from a fixed-seed generator. */
final class RandomJobs {
    private static final List<String> SYSTEMS =
            List.of("iso53-a", "iso53-b", "iso53-c", "iso53-d", "agma-coarse", "agma-fine", "full-depth-14.5", "custom");

    private final SplittableRandom r;

    RandomJobs(long seed) {
        r = new SplittableRandom(seed);
    }

    private double between(double a, double b) {
        return a + (b - a) * r.nextDouble();
    }

    private OptionalDouble maybe(double a, double b) {
        return r.nextBoolean() ? OptionalDouble.of(between(a, b)) : OptionalDouble.empty();
    }

    private Pitch pitch() {
        return r.nextBoolean() ? new Pitch.Module(between(0.2, 10)) : new Pitch.Diametral(between(2, 120));
    }

    HobJob job() {
        Units units = r.nextBoolean() ? Units.MM : Units.IN;
        return new HobJob("job-" + r.nextInt(1000), units, gear(), hob(), machine(), cycle());
    }

    GearSpec gear() {
        String system = SYSTEMS.get(r.nextInt(SYSTEMS.size()));
        Optional<ToothProportions> custom = system.equals("custom")
                ? Optional.of(new ToothProportions(between(0.8, 1.2), between(1.25, 1.6), between(0, 0.4)))
                : Optional.empty();
        DrawingValues drawing = r.nextBoolean() ? DrawingValues.NONE
                : new DrawingValues(maybe(5, 300), maybe(5, 300), maybe(5, 300), maybe(0.5, 20),
                        r.nextBoolean() ? OptionalInt.of(2 + r.nextInt(8)) : OptionalInt.empty(), maybe(3, 100),
                        maybe(0.5, 10), maybe(5, 300));
        return new GearSpec("part " + r.nextInt(100), 5 + r.nextInt(200), pitch(), between(14.5, 25),
                r.nextBoolean() ? 0 : between(0, 45), r.nextBoolean() ? Hand.RIGHT : Hand.LEFT, between(1, 100),
                between(-1, 1), between(-0.2, 0), system, custom, maybe(5, 300), maybe(0.5, 10),
                r.nextBoolean() ? OptionalInt.of(1 + r.nextInt(11)) : OptionalInt.empty(), drawing);
    }

    HobSpec hob() {
        return new HobSpec(pitch(), between(14.5, 25), 1 + r.nextInt(4), r.nextBoolean() ? Hand.RIGHT : Hand.LEFT,
                between(20, 120), maybe(0.5, 10), maybe(15, 110), 8 + r.nextInt(12), between(10, 150),
                maybe(500, 8000), List.of("hss", "hss-coated", "carbide").get(r.nextInt(3)));
    }

    MachineProfile machine() {
        double workMin = between(0, 50);
        double hobMin = between(0, 200);
        double radialMin = between(0, 10);
        double axialMin = between(-50, 0);
        return new MachineProfile("m-" + r.nextInt(100), "d-" + r.nextInt(10), workMin, workMin + between(100, 9000),
                hobMin, hobMin + between(500, 8000), between(20, 300), r.nextBoolean(),
                new SwivelHolder(r.nextBoolean() ? SwivelHolder.SwivelScale.DEGREES_MINUTES
                        : SwivelHolder.SwivelScale.DECIMAL_DEGREES, between(0.001, 0.5), r.nextBoolean(),
                        between(10, 90), "positive turns the top of the hob toward the chuck", r.nextBoolean()),
                radialMin, radialMin + between(10, 200), axialMin, axialMin + between(50, 300),
                r.nextBoolean() ? OptionalDouble.of(between(5, 60)) : OptionalDouble.empty(), between(1000, 30000),
                between(100, 5000), between(0, 5), between(20, 120));
    }

    CycleSettings cycle() {
        return new CycleSettings(List.of("brass", "steel-free-machining", "aluminium").get(r.nextInt(3)),
                maybe(10, 300), maybe(0.1, 3), maybe(0.1, 3), maybe(0.2, 5), r.nextBoolean() ? 0 : between(0, 0.5),
                r.nextBoolean() ? HobbingMethod.CLIMB : HobbingMethod.CONVENTIONAL, between(0, 5), between(0, 5),
                r.nextBoolean(), new QualityTargets(maybe(0.5, 20), maybe(0.5, 20), maybe(0.01, 0.5)),
                r.nextBoolean() ? 0 : between(0, 2), 1 + r.nextInt(50), r.nextBoolean());
    }
}
