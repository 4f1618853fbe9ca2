package org.hobwright.wizard.setup;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.OptionalDouble;
import java.util.SplittableRandom;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.testkit.SampleJobs;
import org.hobwright.wizard.geometry.ToothSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class HobSetupTest {
    private static final ToothSystem ISO_A = ToothSystem.builtIn("iso53-a").orElseThrow();

    // Hob lead angle sin γ = z₀ m_n / d_m0 (thread helix, FORMULAS.md §4.1, case 26): m 2, d_a0 70 →
    // d_m0 = 70 − 2·2.5 = 65, γ = 1.76323° = 1° 45′ 47.6″; two starts 3.52812° = 3° 31′ 41.2″ (FORMULAS.md section 4.1).
    @ParameterizedTest
    @CsvSource({"1, 1.76323, 1° 45′ 47.6″", "2, 3.52812, 3° 31′ 41.2″"})
    void leadAngleFromStartsModuleAndReferenceDiameter(int starts, double gamma, String dms) {
        HobSpec hob = new HobSpec(new Pitch.Module(2), 20, starts, Hand.RIGHT, 70, OptionalDouble.empty(),
                OptionalDouble.empty(), 14, 80, OptionalDouble.empty(), "hss");
        HobSetup s = HobSetup.of(SampleJobs.gear(30, 2, 0, Hand.RIGHT, 0), hob, ISO_A);
        assertEquals(65, s.referenceDiameterMm(), 1e-12);
        assertEquals(gamma, s.leadAngleDeg(), 5e-6);
        assertEquals(dms, s.leadAngleDms());
    }

    // Swivel η = β − γ (FORMULAS.md section 4.2, case 27): β +15°, RH hob → 13.2368° (13° 14′ 12.4″);
    // LH hob → 16.7632°; spur with RH hob → −1.76323°; LH gear with LH hob → −13.2368°.
    @ParameterizedTest
    @CsvSource({
        "15, RIGHT, RIGHT, 13.2368", "15, RIGHT, LEFT, 16.7632", "0, RIGHT, RIGHT, -1.76323",
        "15, LEFT, LEFT, -13.2368", "15, LEFT, RIGHT, -16.7632", "0, RIGHT, LEFT, 1.76323"})
    void swivelForSpurAndHelicalSameAndOppositeHand(double beta, Hand gearHand, Hand hobHand, double eta) {
        HobSetup s = HobSetup.of(SampleJobs.gear(30, 2, beta, gearHand, 0.2), SampleJobs.hob(2, hobHand), ISO_A);
        assertEquals(eta, s.swivelAngleDeg(), 5e-5);
    }

    // DMS of the worked swivel: 13.23677° → 13° 14′ 12.4″ (FORMULAS.md section 4.3, 12.39″ rounded to 0.1″).
    @Test
    void swivelInDegreesMinutesSeconds() {
        HobSetup s = HobSetup.of(SampleJobs.gear(30, 2, 15, Hand.RIGHT, 0.2), SampleJobs.hob(2, Hand.RIGHT), ISO_A);
        assertEquals("13° 14′ 12.4″", s.swivelAngleDms());
        assertEquals(s.swivelAngleDeg(), Angles.parse(s.swivelAngleDms()).orElseThrow(), 0.05 / 3600);
    }

    // A lead angle as marked on the hob wins over the computed one.
    @Test
    void markedLeadAngleIsUsed() {
        HobSpec hob = new HobSpec(new Pitch.Module(1), 20, 1, Hand.RIGHT, 32, OptionalDouble.of(1.9),
                OptionalDouble.of(29.5), 12, 25, OptionalDouble.empty(), "hss");
        HobSetup s = HobSetup.of(SampleJobs.gear(24, 1, 0, Hand.RIGHT, 0), hob, ISO_A);
        assertEquals(1.9, s.leadAngleDeg(), 0);
        assertEquals(-1.9, s.swivelAngleDeg(), 0);
    }

    // Sign properties (FORMULAS.md §4.2; the rule is the definition η = β − γ): reversing both hands reverses η;
    // same hand |η| = |β| − γ, opposite |η| = |β| + γ, spur |η| = γ. 10,000 fixed-seed cases.
    @Test
    void signRulesHoldForRandomGearsAndHobs() {
        SplittableRandom r = new SplittableRandom(4242);
        for (int i = 0; i < 10_000; i++) {
            double beta = r.nextInt(4) == 0 ? 0 : r.nextDouble(0.5, 45);
            double m = r.nextDouble(0.2, 8);
            Hand gh = r.nextBoolean() ? Hand.RIGHT : Hand.LEFT;
            Hand hh = r.nextBoolean() ? Hand.RIGHT : Hand.LEFT;
            GearSpec g = SampleJobs.gear(30, m, beta, gh, 0);
            HobSetup s = HobSetup.of(g, SampleJobs.hob(m, hh), ISO_A);
            HobSetup mirror = HobSetup.of(SampleJobs.gear(30, m, beta, gh.opposite(), 0),
                    SampleJobs.hob(m, hh.opposite()), ISO_A);
            String c = "case " + i + ": β " + beta + " " + gh + " hob " + hh;
            if (beta > 0) {
                assertEquals(-s.swivelAngleDeg(), mirror.swivelAngleDeg(), 1e-12, c);
            }
            double expected = beta == 0 ? s.leadAngleDeg() : gh == hh ? Math.abs(beta - s.leadAngleDeg())
                    : beta + s.leadAngleDeg();
            assertEquals(expected, Math.abs(s.swivelAngleDeg()), 1e-9, c);
        }
    }
}
