package org.hobwright.post;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.cycle.PassSummary;
import org.hobwright.api.cycle.Point;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.cycle.ToleranceData;
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
import org.hobwright.api.spi.WriteContext;

/**
 * Planned cycles built by hand, as the planner would return them, for three jobs: a metric spur
 * gear, an inch spur gear and a metric helical gear. Post must not depend on the wizard, so the
 * numbers are written out here, each with its source:
 * <ul>
 *   <li>spur metric: m 2, z 20, 20°, hob Ø70 — FORMULAS.md §1.5 (spur example), §3.1 (W₃ = 2 × 7.66044,
 *       table value, from memory; brute-force check in the wizard's tests), §3.2 (M = 44.9293 over 3.5 mm pins), §4.1 (γ = 1.76323°), §5.1 (n₀ = 272.837),
 *       §6.1 (feed marks at f 1.5: 2.74838 / 8.03571 µm), §7.1 (E = 17.1683);</li>
 *   <li>spur inch: 32 T, 32 DP, 20° fine pitch — FORMULAS.md §1.5 (fine-pitch dedendum 0.0395 in, Mott Table 8-4),
 *       §3.2 (over wires 34.4130 in for 1 DP scaled to 32 DP, Machinery's Handbook);</li>
 *   <li>helical metric: m_n 2, z 30, β 15° RH, x 0.2, ISO 53 A — FORMULAS.md §1.5 table, §2.2, §3.1–3.2,
 *       §4.2 (η = 13.2368° = 13° 14′ 12.4″), §5.1–5.2 (n₂ = 9.09457, 0.494308°/mm), §6.1–6.2, §7.1–7.3
 *       (E 18.1330, U 2.83098, t_h = 3.29603 min), §8.1 (h_max 0.127288), §9.1 (class 6 tolerances).</li>
 * </ul>
 * Values not printed in FORMULAS.md were computed with its formulas (noted "computed, §x").
 * Step times are distance over rate: rapids at the machine's rapid rate, feeds at f · n₂.
 * The machines mirror the invented sample profiles in samples/scenario/machines.
 */
public final class Fixtures {
    private Fixtures() {
    }

    /** Date printed in the outputs. */
    public static final String DATE = "2026-12-01";

    /**
     * One job and its planned cycle.
     *
     * @param id    short name used for golden files
     * @param job   the job
     * @param cycle the cycle
     */
    public record Fixture(String id, HobJob job, HobCycle cycle) {
        /** A context with the named dialect from the sample scenario. */
        public WriteContext context(String dialect) {
            return new WriteContext(job, DATE, "0.1.0-test",
                    Map.of(WriteContext.DIALECT, dialectText(dialect), WriteContext.DIALECT_NAME, dialect));
        }

        /**
         * The shipped dialects this cycle can be posted with: every one that has the axes its steps
         * move (a programmable swivel, a hob-shift axis); a manual swivel holder is set by hand.
         */
        public List<String> dialects() {
            boolean swivel = cycle.steps().stream().anyMatch(s -> s instanceof CycleStep.Swivel sw && sw.programmable());
            boolean shift = cycle.steps().stream().anyMatch(CycleStep.HobShift.class::isInstance);
            return Fixtures.dialects().stream().filter(d -> (!swivel || dialectText(d).contains("\"swivel\": {"))
                    && (!shift || dialectText(d).contains("\"shift\": {"))).toList();
        }

        /** A context without a dialect. */
        public WriteContext plainContext() {
            return new WriteContext(job, DATE, "0.1.0-test", Map.of());
        }
    }

    /** The three fixtures. */
    public static List<Fixture> all() {
        return List.of(spurMetric(), spurInch(), helicalMetric());
    }

    /** The shipped dialects. */
    public static List<String> dialects() {
        return List.of("varrow-ctl", "ottmere-ctl");
    }

    /** Text of a dialect file shipped in samples/scenario/dialects. */
    public static String dialectText(String name) {
        try {
            return Files.readString(Path.of("..", "samples", "scenario", "dialects", name + ".json"),
                    StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Varrow 1605 as in samples/scenario/machines/varrow-1605.json (resolution 0°5′). */
    static MachineProfile varrow() {
        return new MachineProfile("varrow-1605", "varrow-ctl", 5, 10000, 100, 6000, 120, false,
                new SwivelHolder(SwivelHolder.SwivelScale.DEGREES_MINUTES, 5.0 / 60, false, 30,
                        "top of the hob swung toward the main spindle", true),
                0, 32, -10, 120, OptionalDouble.empty(), 12000, 2000, 1.5, 40);
    }

    /** Ottmere 4008 as in samples/scenario/machines/ottmere-4008.json. */
    static MachineProfile ottmere() {
        return new MachineProfile("ottmere-4008", "ottmere-ctl", 2, 4500, 50, 4000, 150, true,
                new SwivelHolder(SwivelHolder.SwivelScale.DECIMAL_DEGREES, 0.001, true, 45,
                        "hob head turned counter-clockwise seen from the operator side", false),
                0, 120, -20, 250, OptionalDouble.of(40), 20000, 5000, 2.0, 80);
    }

    private static CycleSettings settings(double vc, double feed, double clearance, QualityTargets targets) {
        return new CycleSettings("steel-case-hardening", OptionalDouble.of(vc), OptionalDouble.of(feed),
                OptionalDouble.of(feed), OptionalDouble.empty(), 0, HobbingMethod.CLIMB, clearance, clearance, true,
                targets, 0, 1, false);
    }

    private static GearSpec gear(String part, int z, Pitch p, double beta, double x, double face, String system,
                                 OptionalInt toleranceClass) {
        return new GearSpec(part, z, p, 20, beta, Hand.RIGHT, face, x, 0, system, Optional.empty(),
                OptionalDouble.empty(), OptionalDouble.empty(), toleranceClass, DrawingValues.NONE);
    }

    /** Spur, m 2, z 20, on the Ottmere (programmable swivel, shift axis). */
    public static Fixture spurMetric() {
        HobJob job = new HobJob("spur-metric", Units.MM,
                gear("SP-20 idler gear", 20, new Pitch.Module(2), 0, 0, 20, "iso53-a", OptionalInt.empty()),
                new HobSpec(new Pitch.Module(2), 20, 1, Hand.RIGHT, 70, OptionalDouble.empty(), OptionalDouble.empty(),
                        14, 80, OptionalDouble.of(2000), "hss-coated"),
                ottmere(), settings(60, 1.5, 2, QualityTargets.DEFAULTS));
        // d 40, d_b 37.5877, d_a 44, d_f 35 (FORMULAS.md §1.5 spur); s_n = π m / 2; s_a 1.38976 (computed, §2.2)
        GearData gd = new GearData(2, 20, 40, 37.58770483143634, 44, 35, 2, 2.5, 4.5, 0, OptionalDouble.empty(),
                Math.PI, 1.3897599691424858, 20);
        // W₃ 15.32088 (twice the m 1 table value), contact Ø computed §3.1, pins 3.5 → 44.9293 (§3.2), chordal computed §3.3
        InspectionData insp = new InspectionData(3, 15.32087875196761, 40.59020670343618, 3.5, 44.9293, false,
                3.1383638291137976, 2.0616533253374407);
        // γ 1.76323°, spur RH hob η = −γ (§4.2); the Ottmere counts the other way (positiveIsRight false)
        SetupValues setup = new SetupValues(44, 44, 35, 1.76323, -1.76323, 1.763, "1.763°", "-1° 45′ 47.6″",
                "turn the hob head counter-clockwise seen from the operator side by 1.763°", 60, 272.837, 13.64185,
                20, 1, 0, 0);
        Plan plan = new Plan(ottmere(), 2);
        plan.steps.add(new CycleStep.Comment("Pass 1 of 1: full depth, climb"));
        plan.steps.add(new CycleStep.Coolant(true));
        plan.steps.add(new CycleStep.Swivel(1.763, 3.0));
        plan.steps.add(new CycleStep.HobShift(0, 0.5));
        CycleStep.SyncOn sync = new CycleStep.SyncOn(20, 1, 272.837, 13.64185, Rotation.CLOCKWISE,
                Rotation.COUNTER_CLOCKWISE, 0, 2.0);
        PassSummary pass = plan.pass(1, 44 + 4, 35, 4.5, 17.1683, 2, 20, 1.5, sync, 2);
        plan.stop();
        CycleSummary sum = new CycleSummary(plan.seconds(), List.of(pass), 1.5, 17.1683, 2, 2.74838, 8.03571,
                0.43056167242707055, 0.11213275659161108, Optional.empty());
        return new Fixture("spur-metric", job, new HobCycle(Optional.of(gd), Optional.of(insp), Optional.empty(),
                Optional.of(setup), plan.steps, Optional.of(sum), Optional.empty(), List.of(
                Finding.info("GEAR_NO_TOLERANCE_CLASS", "gear.toleranceClass",
                        "No flank tolerance class given; no ISO 1328-1 values are listed", "test fixture"))));
    }

    /** Spur, 32 T, 32 DP, fine pitch, inch job, on the Varrow (manual swivel, no shift axis). */
    public static Fixture spurInch() {
        double in = 25.4;
        HobJob job = new HobJob("spur-inch", Units.IN,
                gear("DR-32 dial drive gear", 32, new Pitch.Diametral(32), 0, 0, 0.25 * in, "agma-fine",
                        OptionalInt.empty()),
                new HobSpec(new Pitch.Diametral(32), 20, 1, Hand.RIGHT, 1.25 * in, OptionalDouble.empty(),
                        OptionalDouble.empty(), 12, 1.0 * in, OptionalDouble.of(8000), "hss"),
                varrow(), settings(80, 0.02 * in, 0.04 * in, new QualityTargets(OptionalDouble.of(2.0),
                OptionalDouble.empty(), OptionalDouble.empty())));
        double m = in / 32;
        // D 1.000 in, OD 1.0625 in, root 0.921 in, whole depth 0.07075 in (FORMULAS.md §1.5, Mott Table 8-4); d_b computed
        GearData gd = new GearData(m, 20, 1.0 * in, 23.868192567962073, 1.0625 * in, 0.921 * in, m, 0.0395 * in,
                0.07075 * in, 0, OptionalDouble.empty(), Math.PI * m / 2, 0.5898139405107246, 32);
        // k 4, W₄ computed (§3.1); wire 1.728/P and 34.4130/32 in over wires (Machinery's Handbook, FORMULAS.md §3.2)
        InspectionData insp = new InspectionData(4, 8.557130844593555, 25.355770640089293, 1.728 / 32 * in,
                34.4130 / 32 * in, false, 1.2463189279164175, 0.8090477061943104);
        // γ = asin(m / d_m0), d_m0 = OD − 2 × 0.0395 in (§4.1, computed); η = −γ; holder reads 5′ steps
        SetupValues setup = new SetupValues(1.0625 * in, 1.0625 * in, 0.921 * in, 1.5292106761428277,
                -1.5292106761428277, -1.5, "-1° 30′", "-1° 31′ 45.2″",
                "swing the bottom of the hob toward the main spindle by 1° 30′", 80, 802.0406581008899,
                25.06377056565281, 32, 1, 0, 0);
        Plan plan = new Plan(varrow(), 1.5);
        plan.steps.add(new CycleStep.Comment("Pass 1 of 1: full depth, climb"));
        plan.steps.add(new CycleStep.Coolant(true));
        CycleStep.SyncOn sync = new CycleStep.SyncOn(32, 1, 802.0406581008899, 25.06377056565281,
                Rotation.CLOCKWISE, Rotation.CLOCKWISE, 0, 1.5);
        double clear = 0.04 * in;
        PassSummary pass = plan.pass(1, 1.0625 * in + 2 * clear, 0.921 * in, 0.07075 * in, 7.3366851368652855,
                clear, 0.25 * in, 0.02 * in, sync, clear);
        plan.stop();
        CycleSummary sum = new CycleSummary(plan.seconds(), List.of(pass), 0.02 * in, 7.3366851368652855, clear,
                0.694984931237759, 2.032, 0.14536595526875326, 0.03540612300047552, Optional.empty());
        return new Fixture("spur-inch", job, new HobCycle(Optional.of(gd), Optional.of(insp), Optional.empty(),
                Optional.of(setup), plan.steps, Optional.of(sum), Optional.empty(), List.of(
                Finding.warning("SETUP_SWIVEL_ROUNDED", "machine.swivel.resolution",
                        "The holder reads in 5′ steps: the setting -1° 30′ is 1′ 45″ off the swivel angle",
                        "check the setting with a protractor; the error is small for a spur gear", "test fixture"))));
    }

    /** Helical, FORMULAS.md §1.5 gear, on the Ottmere, with a simulation. */
    public static Fixture helicalMetric() {
        HobJob job = new HobJob("helical-metric", Units.MM,
                gear("HX-30 pump drive gear", 30, new Pitch.Module(2), 15, 0.2, 20, "iso53-a", OptionalInt.of(6)),
                new HobSpec(new Pitch.Module(2), 20, 1, Hand.RIGHT, 70, OptionalDouble.empty(), OptionalDouble.empty(),
                        14, 80, OptionalDouble.of(2000), "hss-coated"),
                ottmere(), settings(60, 1.5, 2, new QualityTargets(OptionalDouble.of(3.0), OptionalDouble.of(1.0),
                OptionalDouble.of(0.15))));
        GearData gd = new GearData(2.07055, 20.6469, 62.1166, 58.1269, 66.9166, 57.9166, 2.4, 2.1, 4.5, 14.0761,
                OptionalDouble.of(728.291), 3.43277, 1.39188, 33.0109);
        // k 5, W₅ 27.7705, contact Ø 64.0650, ball 3.5 → 67.7794 (§3.1, §3.2); chordal computed §3.3
        InspectionData insp = new InspectionData(5, 27.7705, 64.0650, 3.5, 67.7794, true, 3.4312479963138887,
                2.4442397834340137);
        // ISO 1328-1:2013 class 6 (FORMULAS.md §9.1 worked example, rounded values)
        ToleranceData tol = new ToleranceData(6, 8.5, 25, 7.0, 8.5, 11, 8.5, 9.5, 13);
        SetupValues setup = new SetupValues(66.9166, 66.9166, 57.9166, 1.76323, 13.2368, -13.237, "-13.237°",
                "13° 14′ 12.4″", "turn the hob head clockwise seen from the operator side by 13.237°", 60, 272.837,
                9.09457, 30, 1, 0.494308, 0.5);
        Plan plan = new Plan(ottmere(), 2);
        plan.steps.add(new CycleStep.Comment("Pass 1 of 1: full depth, climb, helical addition on"));
        plan.steps.add(new CycleStep.Coolant(true));
        plan.steps.add(new CycleStep.Swivel(-13.237, 4.0));
        plan.steps.add(new CycleStep.HobShift(0.5, 0.5));
        CycleStep.SyncOn sync = new CycleStep.SyncOn(30, 1, 272.837, 9.09457, Rotation.CLOCKWISE,
                Rotation.COUNTER_CLOCKWISE, 0.494308, 2.0);
        PassSummary pass = plan.pass(1, 66.9166 + 4, 57.9166, 4.5, 18.1330, 2.83098 + 2, 20, 1.5, sync, 2);
        plan.stop();
        CycleSummary sum = new CycleSummary(plan.seconds(), List.of(pass), 1.5, 18.1330, 2.83098 + 2, 2.94570,
                8.03571, 0.258687, 0.127288, Optional.empty());
        return new Fixture("helical-metric", job, new HobCycle(Optional.of(gd), Optional.of(insp), Optional.of(tol),
                Optional.of(setup), plan.steps, Optional.of(sum), Optional.of(simulation(gd, 30)), List.of(
                Finding.warning("CYCLE_SPAN_TIE", "gear.teeth", "k = 4.50088 is close to a tie; k = 5 was chosen, "
                        + "k = 4 (W = 21.8662 mm) is also measurable", null, "FORMULAS.md §3.1"))));
    }

    /**
     * A stand-in for the generating simulation's outline: the true involute flanks of the tooth
     * space (transverse section, ISO 21771 involute, computed here for the drawing only) joined
     * along the root circle, and the same flanks as the nominal profile.
     */
    private static SimulationData simulation(GearData g, int z) {
        double rb = g.baseDiameterMm() / 2;
        double ra = g.tipDiameterMm() / 2;
        double rf = g.rootDiameterMm() / 2;
        double at = Math.toRadians(g.transversePressureAngleDeg());
        double st = g.toothThicknessMm() / Math.cos(Math.toRadians(15));
        double halfTooth = st / g.referenceDiameterMm() + Math.tan(at) - at;
        List<Point> left = new ArrayList<>();
        for (int i = 0; i <= 20; i++) {
            double r = rb + (ra - rb) * i / 20.0;
            double ay = Math.acos(rb / r);
            double phi = Math.PI / z - (halfTooth - (Math.tan(ay) - ay));
            left.add(new Point(-r * Math.sin(phi), r * Math.cos(phi)));
        }
        List<Point> nominal = new ArrayList<>();
        List<Point> simulated = new ArrayList<>();
        for (int i = left.size() - 1; i >= 0; i--) {
            nominal.add(left.get(i));
            simulated.add(left.get(i));
        }
        double phi0 = Math.asin(-left.get(0).x() / rb);
        for (int i = 0; i <= 10; i++) {
            double phi = phi0 - 2 * phi0 * i / 10.0;
            simulated.add(new Point(-rf * Math.sin(phi), rf * Math.cos(phi)));
        }
        for (Point p : left) {
            nominal.add(new Point(-p.x(), p.y()));
            simulated.add(new Point(-p.x(), p.y()));
        }
        return new SimulationData(0.0012, 0.00026, 0.000258687, false, 59.2, simulated, nominal,
                List.of(new Point(0, 0), new Point(5, 0.0012)));
    }

    /** Builds the steps of one pass and times them: rapids at the rapid rate, feeds at f · n₂. */
    private static final class Plan {
        final List<CycleStep> steps = new ArrayList<>();
        private final MachineProfile machine;
        private final double settle;
        private double dia;
        private double axial;
        private double clearDia;
        private double start;

        Plan(MachineProfile machine, double settle) {
            this.machine = machine;
            this.settle = settle;
        }

        PassSummary pass(int no, double clear, double infeed, double depth, double approach, double overrun,
                         double face, double feed, CycleStep.SyncOn sync, double axialClearance) {
            clearDia = clear;
            dia = clear;
            start = -(approach + axialClearance);
            rapid(no, clear, start);
            steps.add(sync);
            steps.add(new CycleStep.Dwell(settle));
            rapid(no, infeed, start);
            double end = face + overrun;
            double travel = end - start;
            double s = travel / (feed * sync.workRpm()) * 60;
            steps.add(new CycleStep.Feed(no, infeed, end, feed, true, s));
            axial = end;
            dia = infeed;
            rapid(no, clear, end);
            double passSeconds = steps.stream().mapToDouble(CycleStep::seconds).sum();
            return new PassSummary(no, infeed, depth, feed, approach, overrun, travel, passSeconds);
        }

        void stop() {
            steps.add(new CycleStep.SyncOff(0.5));
            steps.add(new CycleStep.SpindlesStop(2.0));
            rapid(0, clearDia, start);
            steps.add(new CycleStep.Coolant(false));
        }

        private void rapid(int pass, double d, double a) {
            double dist = Math.hypot((d - dia) / 2, a - axial);
            steps.add(new CycleStep.Rapid(pass, d, a, dist / machine.rapidMmPerMin() * 60));
            dia = d;
            axial = a;
        }

        double seconds() {
            return steps.stream().mapToDouble(CycleStep::seconds).sum();
        }
    }
}
