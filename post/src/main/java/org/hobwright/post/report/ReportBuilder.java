package org.hobwright.post.report;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.FastestProposal;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.GearPairData;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.cycle.InspectionLimits;
import org.hobwright.api.cycle.PassSummary;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.cycle.SplineData;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.SplineSpec;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.post.Batch;
import org.hobwright.post.JobUnits;
import org.hobwright.post.nc.JobNumbers;
import org.hobwright.post.TargetsGiven;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Builds the JSON report tree. Lengths in the job's units, angles in degrees, times in seconds,
 * speeds in rpm, cutting speed in m/min or ft/min, quality values (feed marks, enveloping cuts,
 * tolerances) in micrometres; numbers unrounded. Parts of the cycle that could not be computed are
 * left out. The pointers listed in post/README.md ("The JSON report") are a contract.
 */
final class ReportBuilder {
    /** Micrometres in a millimetre: quality values (feed marks, enveloping cuts, deviations) are in µm. */
    private static final double MICROMETRES_PER_MM = 1000;


    /** The {@code format} of the report. */
    static final String FORMAT = "hobwright-report";

    /** The report version. */
    static final int VERSION = 1;

    private final JsonNodeFactory nodes = JsonNodeFactory.instance;
    private final HobJob job;
    private final JobUnits u;

    ReportBuilder(HobJob job) {
        this.job = job;
        this.u = new JobUnits(job.units());
    }

    ObjectNode build(HobCycle cycle, WriteContext context) {
        ObjectNode root = nodes.objectNode();
        root.put("format", FORMAT);
        root.put("version", VERSION);
        root.put("generatedOn", context.generatedOn());
        root.put("toolVersion", context.toolVersion());
        root.put("job", job.name());
        root.put("part", job.gear().partName());
        if (job.spline().isPresent()) {
            root.put("partKind", job.part());
        }
        root.put("machine", job.machine().name());
        ObjectNode units = root.putObject("units");
        units.put("length", u.lengthSymbol());
        units.put("angle", "deg");
        units.put("time", "s");
        units.put("speed", "rpm");
        units.put("cuttingSpeed", u.speedSymbol());
        units.put("quality", "um");
        // plain conditions rather than lambdas: each lambda's first linkage is start-up time
        if (cycle.gear().isPresent()) {
            root.set("gear", gear(cycle.gear().get()));
        }
        if (cycle.inspection().isPresent()) {
            root.set("inspection", inspection(cycle.inspection().get()));
        }
        if (cycle.pair().isPresent()) {
            root.set("pair", pair(cycle.pair().get()));
        }
        if (cycle.tolerances().isPresent()) {
            root.set("tolerances", tolerances(cycle.tolerances().get()));
        }
        if (cycle.setup().isPresent()) {
            root.set("setup", setup(cycle.setup().get()));
        }
        if (cycle.summary().isPresent()) {
            root.set("cycle", cycle(cycle.summary().get(), cycle.steps(), cycle.setup()));
        }
        if (cycle.spline().isPresent()) {
            root.set("spline", spline(cycle.spline().get()));
        }
        if (cycle.simulation().isPresent()) {
            ObjectNode sim = simulation(cycle.simulation().get());
            if (cycle.spline().isPresent() && cycle.spline().get().form().isPresent()) {
                SplineData.Form f = cycle.spline().get().form().get();
                sim.put("formReached", f.formReached());
                sim.put("rootDiameter", u.length(f.rootDiameterMm()));
            }
            root.set("simulation", sim);
        }
        if (!cycle.steps().isEmpty()) {
            root.set("batch", batch(Batch.of(cycle, job)));
        }
        Optional<JobNumbers> numbers = JobNumbers.of(context);
        if (numbers.isPresent()) {
            ObjectNode program = root.putObject("program");
            program.put("number", numbers.get().programNumber());
            program.put("toolStation", numbers.get().toolStation());
        }
        root.set("findings", findings(cycle.findings()));
        return root;
    }

    private ObjectNode batch(Batch b) {
        ObjectNode n = nodes.objectNode();
        n.put("parts", b.parts());
        n.put("cycleTime", b.cycleS());
        if (b.loadS().isPresent()) {
            n.put("loadTime", b.loadS().getAsDouble());
        }
        if (b.unloadS().isPresent()) {
            n.put("unloadTime", b.unloadS().getAsDouble());
        }
        n.put("timePerPart", b.timePerPartS());
        n.put("batchTime", b.batchTimeS());
        return n;
    }

    private ObjectNode gear(GearData g) {
        GearSpec spec = job.gear();
        ObjectNode n = nodes.objectNode();
        n.put("teeth", spec.teeth());
        n.put("module", spec.moduleMm());
        n.put("diametralPitch", spec.pitch().diametralPitch());
        n.put("pressureAngle", spec.pressureAngleDeg());
        n.put("helixAngle", spec.signedHelixAngleDeg());
        n.put("hand", spec.isSpur() ? "spur" : spec.hand().word());
        n.put("profileShift", spec.profileShift());
        n.put("faceWidth", u.length(spec.faceWidthMm()));
        n.put("referenceDiameter", u.length(g.referenceDiameterMm()));
        n.put("baseDiameter", u.length(g.baseDiameterMm()));
        n.put("tipDiameter", u.length(g.tipDiameterMm()));
        n.put("rootDiameter", u.length(g.rootDiameterMm()));
        n.put("wholeDepth", u.length(g.wholeDepthMm()));
        n.put("toothThickness", u.length(g.toothThicknessMm()));
        n.put("tipThickness", u.length(g.tipThicknessMm()));
        n.put("addendum", u.length(g.addendumMm()));
        n.put("dedendum", u.length(g.dedendumMm()));
        n.put("transverseModule", g.transverseModuleMm());
        n.put("transversePressureAngle", g.transversePressureAngleDeg());
        n.put("baseHelixAngle", g.baseHelixAngleDeg());
        if (g.leadMm().isPresent()) {
            n.put("lead", u.length(g.leadMm().getAsDouble()));
        }
        n.put("virtualTeeth", g.virtualTeeth());
        return n;
    }

    private ObjectNode inspection(InspectionData i) {
        ObjectNode n = nodes.objectNode();
        n.put("spanTeeth", i.spanTeeth());
        n.put("spanWidth", u.length(i.spanWidthMm()));
        n.put("spanContactDiameter", u.length(i.spanContactDiameterMm()));
        n.put("pinDiameter", u.length(i.pinDiameterMm()));
        n.put("overPins", u.length(i.overPinsMm()));
        n.put("balls", i.balls());
        n.put("chordalThickness", u.length(i.chordalThicknessMm()));
        n.put("chordalHeight", u.length(i.chordalHeightMm()));
        if (i.limits().isPresent()) {
            InspectionLimits l = i.limits().get();
            n.put("thicknessAllowanceUpper", u.length(l.upperAllowanceMm()));
            n.put("thicknessAllowanceLower", u.length(l.lowerAllowanceMm()));
            n.put("limitsFrom", l.basis());
            n.put("spanWidthUpper", u.length(l.spanWidthUpperMm()));
            n.put("spanWidthLower", u.length(l.spanWidthLowerMm()));
            n.put("overPinsUpper", u.length(l.overPinsUpperMm()));
            n.put("overPinsLower", u.length(l.overPinsLowerMm()));
            n.put("chordalThicknessUpper", u.length(l.chordalThicknessUpperMm()));
            n.put("chordalThicknessLower", u.length(l.chordalThicknessLowerMm()));
            n.put("rootDiameterUpper", u.length(l.rootDiameterUpperMm()));
            n.put("rootDiameterLower", u.length(l.rootDiameterLowerMm()));
        }
        return n;
    }

    private ObjectNode pair(GearPairData p) {
        ObjectNode n = nodes.objectNode();
        n.put("mateTeeth", p.mateTeeth());
        n.put("mateProfileShift", p.mateProfileShift());
        n.put("mateProfileShiftGiven", p.mateProfileShiftGiven());
        n.put("referenceCentreDistance", u.length(p.referenceCentreDistanceMm()));
        n.put("centreDistance", u.length(p.centreDistanceMm()));
        n.put("centreDistanceGiven", p.centreDistanceGiven());
        n.put("workingPressureAngle", p.workingPressureAngleDeg());
        n.put("profileShiftSum", p.profileShiftSum());
        n.put("backlashMin", u.length(p.backlashMinMm()));
        n.put("backlashMax", u.length(p.backlashMaxMm()));
        n.put("mateTipDiameter", u.length(p.mateTipDiameterMm()));
        n.put("mateRootDiameter", u.length(p.mateRootDiameterMm()));
        n.put("tipClearance", u.length(p.tipClearanceMm()));
        n.put("mateTipClearance", u.length(p.mateTipClearanceMm()));
        return n;
    }

    private ObjectNode tolerances(ToleranceData t) {
        ObjectNode n = nodes.objectNode();
        n.put("standard", "ISO 1328-1:2013");
        n.put("flankToleranceClass", t.flankToleranceClass());
        n.put("singlePitchUm", t.singlePitchUm());
        n.put("totalPitchUm", t.totalPitchUm());
        n.put("profileSlopeUm", t.profileSlopeUm());
        n.put("profileFormUm", t.profileFormUm());
        n.put("profileTotalUm", t.profileTotalUm());
        n.put("helixSlopeUm", t.helixSlopeUm());
        n.put("helixFormUm", t.helixFormUm());
        n.put("helixTotalUm", t.helixTotalUm());
        return n;
    }

    private ObjectNode setup(SetupValues s) {
        ObjectNode n = nodes.objectNode();
        n.put("blankDiameter", u.length(s.blankDiameterMm()));
        n.put("touchOffDiameter", u.length(s.touchOffDiameterMm()));
        n.put("finalInfeedDiameter", u.length(s.finalInfeedDiameterMm()));
        n.put("leadAngle", s.leadAngleDeg());
        n.put("swivelAngle", s.swivelAngleDeg());
        n.put("swivelAngleDms", s.swivelAngleDms());
        n.put("swivelSetting", s.swivelSettingDeg());
        n.put("swivelSettingText", s.swivelSettingText());
        n.put("swivelDirection", s.swivelDirection());
        n.put("swivelPositiveSense", job.machine().swivel().positiveSense());
        n.put("cuttingSpeed", u.cuttingSpeed(s.cuttingSpeedMPerMin()));
        n.put("hobRpm", s.hobRpm());
        n.put("workRpm", s.workRpm());
        n.put("syncHobTurns", s.syncHobTurns());
        n.put("syncWorkTurns", s.syncWorkTurns());
        n.put("differential", s.differentialDegPerMm() * job.units().toMm(1));
        n.put("hobShift", u.length(s.hobShiftMm()));
        return n;
    }

    private ObjectNode cycle(CycleSummary s, List<CycleStep> steps, Optional<SetupValues> setup) {
        ObjectNode n = nodes.objectNode();
        if (setup.isPresent()) {
            n.put("hobRpm", setup.get().hobRpm());
            n.put("workRpm", setup.get().workRpm());
        }
        n.put("axialFeed", u.length(s.finishFeedMmPerRev()));
        n.put("passes", s.passes().size());
        n.put("approachLength", u.length(s.approachLengthMm()));
        n.put("overrunLength", u.length(s.overrunLengthMm()));
        double cuttingTime = 0;
        for (CycleStep step : steps) {
            cuttingTime += step instanceof CycleStep.Feed ? step.seconds() : 0;
        }
        n.put("cuttingTime", cuttingTime);
        n.put("cycleTime", s.cycleTimeS());
        n.put("feedMarkDepth", s.feedMarkFlankUm());
        n.put("feedMarkRootDepth", s.feedMarkRootUm());
        n.put("envelopingDepth", s.envelopingDepthUm());
        n.put("maxChipThickness", u.length(s.maxChipThicknessMm()));
        n.put("steps", steps.size());
        ArrayNode passes = n.putArray("passList");
        for (PassSummary p : s.passes()) {
            ObjectNode pn = passes.addObject();
            pn.put("pass", p.pass());
            pn.put("infeedDiameter", u.length(p.infeedDiameterMm()));
            pn.put("radialDepth", u.length(p.radialDepthMm()));
            pn.put("axialFeed", u.length(p.feedMmPerRev()));
            pn.put("approachLength", u.length(p.approachMm()));
            pn.put("overrunLength", u.length(p.overrunMm()));
            pn.put("axialTravel", u.length(p.axialTravelMm()));
            pn.put("time", p.seconds());
        }
        if (s.fastest().isPresent()) {
            n.set("fastest", fastest(s.fastest().get()));
        }
        if (!TargetsGiven.none(s.targets())) {
            ObjectNode targets = n.putObject("targets");
            if (s.targets().feedMarkDepthUm().isPresent()) {
                targets.put("feedMarkDepth", s.targets().feedMarkDepthUm().getAsDouble());
            }
            if (s.targets().envelopingDepthUm().isPresent()) {
                targets.put("envelopingDepth", s.targets().envelopingDepthUm().getAsDouble());
            }
            if (s.targets().maxChipThicknessMm().isPresent()) {
                targets.put("maxChipThickness", u.length(s.targets().maxChipThicknessMm().getAsDouble()));
            }
        }
        return n;
    }

    private ObjectNode fastest(FastestProposal f) {
        ObjectNode n = nodes.objectNode();
        n.put("cycleTime", f.cycleTimeS());
        n.put("lowerBound", f.lowerBoundS());
        n.put("bindingLimit", f.bindingLimit());
        n.put("cuttingSpeed", u.cuttingSpeed(f.cuttingSpeedMPerMin()));
        n.put("hobRpm", f.hobRpm());
        n.put("roughFeed", u.length(f.roughFeedMmPerRev()));
        n.put("finishFeed", u.length(f.finishFeedMmPerRev()));
        n.put("passes", f.passes());
        return n;
    }

    private ObjectNode spline(SplineData d) {
        SplineSpec spec = job.spline().orElseThrow();
        ObjectNode n = nodes.objectNode();
        n.put("standard", d.standard());
        n.put("root", spec.root());
        n.put("toleranceClass", spec.toleranceClass());
        n.put("fitClass", spec.fitClass());
        n.put("pitchDiameter", u.length(d.pitchDiameterMm()));
        n.put("baseDiameter", u.length(d.baseDiameterMm()));
        n.put("majorDiameterMax", u.length(d.majorDiameterMaxMm()));
        n.put("majorDiameterMin", u.length(d.majorDiameterMinMm()));
        n.put("minorDiameterMax", u.length(d.minorDiameterMaxMm()));
        n.put("minorDiameterMin", u.length(d.minorDiameterMinMm()));
        n.put("formDiameter", u.length(d.formDiameterMm()));
        n.put("formClearance", u.length(d.formClearanceMm()));
        n.put("basicToothThickness", u.length(d.basicToothThicknessMm()));
        n.put("effectiveThicknessMax", u.length(d.effectiveThicknessMaxMm()));
        n.put("effectiveThicknessMin", u.length(d.effectiveThicknessMinMm()));
        n.put("toothThicknessMax", u.length(d.toothThicknessMaxMm()));
        n.put("toothThicknessMin", u.length(d.toothThicknessMinMm()));
        n.put("allowance", u.length(d.allowanceMm()));
        n.put("totalTolerance", u.length(d.totalToleranceMm()));
        n.put("effectiveVariation", u.length(d.effectiveVariationMm()));
        n.put("pinDiameter", u.length(d.pinDiameterMm()));
        n.put("pinOrigin", d.pinOrigin());
        n.put("overPinsMax", u.length(d.overPinsMaxMm()));
        n.put("overPinsMin", u.length(d.overPinsMinMm()));
        return n;
    }

    private ObjectNode simulation(SimulationData s) {
        ObjectNode n = nodes.objectNode();
        // quality values in µm in every unit system, as /cycle/envelopingDepth and the targets
        n.put("envelopingDepth", s.envelopingDepthMm() * MICROMETRES_PER_MM);
        n.put("closedFormEnvelopingDepth", s.closedFormEnvelopingDepthMm() * MICROMETRES_PER_MM);
        n.put("profileDeviationMax", s.profileDeviationMaxMm() * MICROMETRES_PER_MM);
        n.put("undercut", s.undercut());
        n.put("activeInvoluteStartDiameter", u.length(s.activeInvoluteStartDiameterMm()));
        return n;
    }

    private ArrayNode findings(List<Finding> findings) {
        ArrayNode a = nodes.arrayNode();
        for (Finding f : findings) {
            ObjectNode n = a.addObject();
            n.put("severity", f.severity().word());
            n.put("code", f.code());
            n.put("field", f.field());
            n.put("message", f.message());
            if (f.fix().isPresent()) {
                n.put("fix", f.fix().get());
            }
            n.put("source", f.source());
        }
        return a;
    }
}
