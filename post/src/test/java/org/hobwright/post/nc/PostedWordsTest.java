package org.hobwright.post.nc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.UnaryOperator;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.junit.jupiter.api.Test;

/**
 * The words as posted keep the invariants: the writer rounds each number in its safe direction
 * and refuses, naming the word, the value and the decimals, what its precision cannot write
 * safely. Each case is a cycle that a plain half-up rounding posted unsafely; the program that is
 * written is read back by {@link NcReader}. The spur fixture (m 2, z 20, ratio 20:1, FORMULAS.md
 * §1.5 spur example) is changed one value at a time. The Varrow dialect writes speeds with 0
 * decimals and feeds with 3, the Ottmere dialect lengths as radii with 3 decimals
 * (samples/scenario/dialects).
 */
class PostedWordsTest {

    private static final Fixture SPUR = Fixtures.spurMetric();

    @Test
    void aFeedTooSmallForTheDialectIsRefusedNamingTheWordTheValueAndTheDecimals() {
        // 1.9e-5 mm per revolution, what a feed-mark target of 1e-9 µm makes the planner choose
        Fixture f = change(SPUR, j -> j, steps -> map(steps, s -> s instanceof CycleStep.Feed fd
                ? new CycleStep.Feed(fd.pass(), fd.diameterMm(), fd.axialMm(), 1.9e-5, fd.cutting(), fd.seconds()) : s));
        Finding e = refusedWith(f, "varrow-ctl", "NC_SAFETY_PRECISION");
        assertEquals("dialect.decimals.mmPerRev", e.field());
        assertTrue(e.message().contains("F0.000") && e.message().contains("0.000019")
                && e.message().contains("3 decimals"), e.message());
    }

    @Test
    void aWorkSpeedThatWouldBeWrittenAsZeroIsRefused() {
        // a 250:1 ratio at 100 rpm of the hob turns the work at 0.4 rpm; the Varrow writes whole rpm
        Fixture f = change(SPUR, j -> machine(j, m -> machine(m, 0.01, m.workMaxRpm(), 1, m.hobMaxRpm(), 300,
                m.maxFeedMmPerMin())), steps -> sync(steps, 250, 100, 0.4));
        Finding e = refusedWith(f, "varrow-ctl", "NC_SAFETY_PRECISION");
        assertEquals("dialect.decimals.rpm", e.field());
        assertTrue(e.message().contains("S0") && e.message().contains("0.4") && e.message().contains("0 decimals"),
                e.message());
    }

    @Test
    void aHobSpeedAtTheHobMakersLimitIsRoundedDown() {
        // hob maker's limit 900.6 rpm, planned at it: half-up would write S901
        Fixture f = change(SPUR, j -> new HobJob(j.name(), j.units(), j.gear(), hob(j.hob(), 900.6), j.machine(),
                j.cycle()), steps -> sync(steps, 20, 900.6, 900.6 / 20));
        String text = posted(f, "varrow-ctl");
        assertTrue(text.contains("M143 P900\r\n") && !text.contains("P901"), text);
        assertTrue(text.contains("S45 "), "45.03 rpm of the work is written to the nearest, inside the limits");
    }

    @Test
    void aFeedAtTheMachinesFeedRateIsRoundedDown() {
        // 20.1 mm/min at 37.3 rpm of the work allows 0.538874 mm per revolution; F0.539 would feed 20.105 mm/min
        double feed = 20.1 / 37.3;
        Fixture f = change(SPUR, j -> machine(j, m -> machine(m, m.workMinRpm(), m.workMaxRpm(), m.hobMinRpm(),
                m.hobMaxRpm(), m.maxSyncRatio(), 20.1)), steps -> map(sync(steps, 20, 37.3 * 20, 37.3),
                s -> s instanceof CycleStep.Feed fd ? new CycleStep.Feed(fd.pass(), fd.diameterMm(), fd.axialMm(), feed,
                        fd.cutting(), fd.seconds()) : s));
        String text = posted(f, "varrow-ctl");
        assertTrue(text.contains("F0.538") && !text.contains("F0.539"), text);
    }

    @Test
    void aRootRadiusIsRoundedAwayFromTheAxis() {
        // root diameter 35.0006 mm: as a radius 17.5003, which half-up writes X17.5 (0.0006 mm inside the root)
        double root = 35.0006;
        Fixture f = change(SPUR, j -> j, steps -> map(steps, s -> s instanceof CycleStep.Feed fd
                ? new CycleStep.Feed(fd.pass(), root, fd.axialMm(), fd.feedMmPerRev(), fd.cutting(), fd.seconds())
                : s instanceof CycleStep.Rapid r && r.diameterMm() == 35
                ? new CycleStep.Rapid(r.pass(), root, r.axialMm(), r.seconds()) : s), root);
        String text = posted(f, "ottmere-ctl");
        assertTrue(text.contains("G1 X17.501 ") && !text.contains("X17.5 "), text);
    }

    @Test
    void aRapidIntoTheBlankIsRefused() {
        // the rapid to full depth 1 mm before the front face: the Ø70 hob needs 17.17 mm there (§7.1)
        Fixture f = change(SPUR, j -> j, steps -> map(steps, s -> s instanceof CycleStep.Rapid r && r.diameterMm() == 35
                ? new CycleStep.Rapid(r.pass(), r.diameterMm(), -1, r.seconds()) : s));
        Finding e = refusedWith(f, "ottmere-ctl", "NC_SAFETY_RAPID_IN_BLANK");
        assertTrue(e.message().contains("into the blank"), e.message());
    }

    @Test
    void aRapidThatTouchesTheBlankStaysOutsideWhenRounded() {
        // start exactly where the swivelled hob's section touches the blank at full depth:
        // √(4.5 · 65.5) / cos 1.76323° = 17.176413 mm; half-up would write 17.176, inside
        double touch = Math.sqrt(4.5 * 65.5) / Math.cos(Math.toRadians(1.76323));
        Fixture f = change(SPUR, j -> j, steps -> map(steps, s -> s instanceof CycleStep.Rapid r && r.axialMm() < 0
                ? new CycleStep.Rapid(r.pass(), r.diameterMm(), -touch, r.seconds())
                : s instanceof CycleStep.Feed fd && fd.axialMm() < 0 ? new CycleStep.Feed(fd.pass(), fd.diameterMm(),
                        -touch, fd.feedMmPerRev(), fd.cutting(), fd.seconds()) : s));
        String text = posted(f, "ottmere-ctl");
        assertTrue(text.contains("Z17.177") && !text.contains("Z17.176"), text);
    }

    @Test
    void aDwellIsRoundedUp() {
        // the Varrow writes dwells with 1 decimal; 2.01 s must not become 2.0 s
        Fixture f = change(SPUR, j -> j, steps -> map(steps, s -> s instanceof CycleStep.Dwell
                ? new CycleStep.Dwell(2.01) : s));
        String text = posted(f, "varrow-ctl");
        assertTrue(text.contains("G4 P2.1"), text);
    }

    // ---- helpers ------------------------------------------------------------------------------

    private static String posted(Fixture given, String dialect) {
        Fixture f = fitted(given, dialect);
        WriteResult r = new NcWriter().write(f.cycle(), f.context(dialect));
        assertFalse(Finding.anyError(r.findings()), () -> "written: " + r.findings());
        String text = r.files().get(0).text();
        NcReader.assertSafe(text, Fixtures.dialectText(dialect), NcReader.Limits.of(f.job(), f.cycle()));
        return text;
    }

    private static Finding refusedWith(Fixture given, String dialect, String code) {
        Fixture f = fitted(given, dialect);
        WriteResult r = new NcWriter().write(f.cycle(), f.context(dialect));
        assertTrue(r.files().isEmpty(), "nothing is written");
        return r.findings().stream().filter(x -> x.code().equals(code)).findFirst()
                .orElseThrow(() -> new AssertionError("no " + code + " in " + r.findings()));
    }

    /** The fixture without the swivel and hob-shift moves a dialect without those axes cannot write. */
    private static Fixture fitted(Fixture f, String dialect) {
        return f.dialects().contains(dialect) ? f : change(f, j -> j, steps -> steps.stream()
                .filter(s -> !(s instanceof CycleStep.Swivel) && !(s instanceof CycleStep.HobShift)).toList());
    }

    private static Fixture change(Fixture f, UnaryOperator<HobJob> job, UnaryOperator<List<CycleStep>> steps) {
        return change(f, job, steps, f.cycle().setup().orElseThrow().finalInfeedDiameterMm());
    }

    private static Fixture change(Fixture f, UnaryOperator<HobJob> job, UnaryOperator<List<CycleStep>> steps,
                                  double rootMm) {
        HobCycle c = f.cycle();
        SetupValues s = c.setup().orElseThrow();
        SetupValues setup = new SetupValues(s.blankDiameterMm(), s.touchOffDiameterMm(), rootMm, s.leadAngleDeg(),
                s.swivelAngleDeg(), s.swivelSettingDeg(), s.swivelSettingText(), s.swivelAngleDms(),
                s.swivelDirection(), s.cuttingSpeedMPerMin(), s.hobRpm(), s.workRpm(), s.syncHobTurns(),
                s.syncWorkTurns(), s.differentialDegPerMm(), s.hobShiftMm());
        HobCycle changed = new HobCycle(c.gear(), c.inspection(), c.tolerances(), java.util.Optional.of(setup),
                steps.apply(new ArrayList<>(c.steps())), c.summary(), c.simulation(), c.findings());
        return new Fixture(f.id(), job.apply(f.job()), changed);
    }

    private static List<CycleStep> map(List<CycleStep> steps, UnaryOperator<CycleStep> change) {
        return steps.stream().map(change).toList();
    }

    private static List<CycleStep> sync(List<CycleStep> steps, int hobTurns, double hobRpm, double workRpm) {
        return map(steps, s -> s instanceof CycleStep.SyncOn on ? new CycleStep.SyncOn(hobTurns, 1, hobRpm, workRpm,
                on.hobRotation(), on.workRotation(), on.differentialDegPerMm(), on.seconds()) : s);
    }

    private static HobJob machine(HobJob j, UnaryOperator<MachineProfile> change) {
        return new HobJob(j.name(), j.units(), j.gear(), j.hob(), change.apply(j.machine()), j.cycle());
    }

    private static MachineProfile machine(MachineProfile m, double workMin, double workMax, double hobMin,
                                          double hobMax, double maxRatio, double maxFeed) {
        return new MachineProfile(m.name(), m.dialect(), workMin, workMax, hobMin, hobMax, maxRatio, m.followsHelix(),
                m.swivel(), m.radialMinMm(), m.radialMaxMm(), m.axialMinMm(), m.axialMaxMm(), m.hobShiftTravelMm(),
                m.rapidMmPerMin(), maxFeed, m.syncSettleS(), m.maxHobDiameterMm());
    }

    private static HobSpec hob(HobSpec h, double maxRpm) {
        return new HobSpec(h.pitch(), h.pressureAngleDeg(), h.starts(), h.hand(), h.outsideDiameterMm(),
                h.leadAngleDeg(), h.referenceDiameterMm(), h.gashes(), h.lengthMm(), OptionalDouble.of(maxRpm),
                h.material());
    }
}
