package org.hobwright.wizard.store;

import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.MachineFields;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.MachineTimes;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.api.job.RunSettings;
import org.hobwright.api.job.SplineSpec;
import org.hobwright.api.job.SwivelHolder;
import org.hobwright.api.job.Units;
import org.hobwright.text.JsonTrees;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Writes jobs, machine profiles and cycle templates as version-1 files, in a chosen unit, so
 * that reading what was written gives back the same values (numbers rounded to 12 significant
 * digits, see {@link JsonNumbers}). Angles are written as decimal degrees; every key is written,
 * so a written file does not depend on defaults.
 */
public final class JobWriter {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    private static final JsonTrees.Layout LAYOUT = new JsonTrees.Layout(false, false);

    private JobWriter() {
    }

    /**
     * A job file tree.
     *
     * @param job             the job
     * @param units           the unit to write lengths (and the cutting speed) in
     * @param machineByName   true to write {@code "machine": NAME} (a library profile), false to
     *                        write the machine inline
     */
    public static ObjectNode jobTree(HobJob job, Units units, boolean machineByName) {
        ObjectNode root = header(FileFormat.JOB);
        root.put("name", job.name());
        root.put("units", units.symbol());
        if (job.spline().isPresent()) {
            root.put(JobFields.PART.leaf(), "spline");
            root.set("spline", splineTree(job.gear(), job.spline().get(), units));
        } else {
            root.set("gear", gearTree(job.gear(), units));
        }
        root.set("hob", hobTree(job.hob(), units));
        if (machineByName) {
            root.put("machine", job.machine().name());
        } else {
            root.set("machine", machineBody(job.machine(), units, ""));
        }
        root.set("cycle", cycleTree(job.cycle(), units));
        return root;
    }

    /** A job file text; see {@link #jobTree}. */
    public static String jobText(HobJob job, Units units, boolean machineByName) {
        return text(jobTree(job, units, machineByName));
    }

    /** A machine profile file tree, in the file's units. */
    public static ObjectNode machineTree(MachineFile machine) {
        ObjectNode root = header(FileFormat.MACHINE);
        root.put("units", machine.units().symbol());
        root.setAll(machineBody(machine.profile(), machine.units(), machine.description()));
        return root;
    }

    /** A cycle template file tree, in the template's units. */
    public static ObjectNode templateTree(CycleTemplate template) {
        ObjectNode root = header(FileFormat.TEMPLATE);
        root.put("units", template.units().symbol());
        root.put("machine", template.machine());
        root.put("name", template.name());
        if (!template.description().isEmpty()) {
            root.put("description", template.description());
        }
        root.set("cycle", template.cycle());
        return root;
    }

    /** The cycle keys of a job or template (without {@code template}), in {@code units}. */
    public static ObjectNode cycleTree(CycleSettings c, Units units) {
        ObjectNode n = NODES.objectNode();
        n.put(JobFields.CYCLE_WORK_MATERIAL.leaf(), c.workMaterial());
        put(n, JobFields.CYCLE_CUTTING_SPEED, c.cuttingSpeedMPerMin(), units);
        put(n, JobFields.CYCLE_ROUGH_FEED, c.roughFeedMmPerRev(), units);
        put(n, JobFields.CYCLE_FINISH_FEED, c.finishFeedMmPerRev(), units);
        put(n, JobFields.CYCLE_ROUGH_DEPTH, c.roughDepthMm(), units);
        put(n, JobFields.CYCLE_FINISH_STOCK, c.finishStockMm(), units);
        n.put(JobFields.CYCLE_METHOD.leaf(), c.method() == HobbingMethod.CLIMB ? "climb" : "conventional");
        put(n, JobFields.CYCLE_AXIAL_CLEARANCE, c.axialClearanceMm(), units);
        put(n, JobFields.CYCLE_RADIAL_CLEARANCE, c.radialClearanceMm(), units);
        n.put(JobFields.CYCLE_COOLANT.leaf(), c.coolant());
        QualityTargets t = c.targets();
        ObjectNode targets = NODES.objectNode();
        put(targets, JobFields.TARGET_FEED_MARK_DEPTH, t.feedMarkDepthUm(), units);
        put(targets, JobFields.TARGET_ENVELOPING_DEPTH, t.envelopingDepthUm(), units);
        put(targets, JobFields.TARGET_MAX_CHIP_THICKNESS, t.maxChipThicknessMm(), units);
        if (!targets.isEmpty()) {
            n.set("targets", targets);
        }
        ObjectNode shift = n.putObject("hobShift");
        put(shift, JobFields.HOB_SHIFT_PER_PART, c.hobShiftPerPartMm(), units);
        shift.put(JobFields.HOB_SHIFT_EVERY_PARTS.leaf(), c.hobShiftEveryParts());
        n.put(JobFields.CYCLE_FASTEST.leaf(), c.fastest());
        RunSettings r = c.run();
        n.put(JobFields.CYCLE_BATCH_SIZE.leaf(), r.batchSize());
        r.programNumber().ifPresent(v -> n.put(JobFields.CYCLE_PROGRAM_NUMBER.leaf(), v));
        r.toolStation().ifPresent(v -> n.put(JobFields.CYCLE_TOOL_STATION.leaf(), v));
        n.put(JobFields.CYCLE_HOB_TURNED_ROUND.leaf(), r.hobTurnedRound());
        if (r.hobLifePerToothM().isPresent()) {
            put(n.putObject("hobLife"), JobFields.HOB_LIFE_PER_TOOTH, r.hobLifePerToothM(), units);
        }
        return n;
    }

    /** Pretty JSON text with a final line break, as library and job files are written. */
    public static String text(JsonNode tree) {
        return JsonTrees.write(tree, LAYOUT) + "\n";
    }

    private static ObjectNode header(FileFormat format) {
        ObjectNode root = NODES.objectNode();
        root.put("format", format.word());
        root.put("version", FileFormat.VERSION);
        return root;
    }

    private static ObjectNode gearTree(GearSpec g, Units units) {
        ObjectNode n = NODES.objectNode();
        n.put(JobFields.GEAR_PART_NAME.leaf(), g.partName());
        n.put(JobFields.GEAR_TEETH.leaf(), g.teeth());
        pitch(n, g.pitch());
        put(n, JobFields.GEAR_PRESSURE_ANGLE, g.pressureAngleDeg(), units);
        put(n, JobFields.GEAR_HELIX_ANGLE, g.helixAngleDeg(), units);
        n.put(JobFields.GEAR_HAND.leaf(), g.hand().word());
        put(n, JobFields.GEAR_FACE_WIDTH, g.faceWidthMm(), units);
        put(n, JobFields.GEAR_PROFILE_SHIFT, g.profileShift(), units);
        if (g.thicknessSeries().isPresent()) {
            n.put(JobFields.GEAR_THICKNESS_SERIES.leaf(), g.thicknessSeries().get());
        } else {
            put(n, JobFields.GEAR_THICKNESS_ALLOWANCE, g.thicknessAllowanceMm(), units);
            put(n, JobFields.GEAR_THICKNESS_ALLOWANCE_LOWER, g.thicknessAllowanceLowerMm(), units);
        }
        n.put(JobFields.GEAR_TOOTH_SYSTEM.leaf(), g.toothSystem());
        g.customProportions().ifPresent(p -> {
            ObjectNode c = n.putObject("custom");
            put(c, JobFields.GEAR_CUSTOM_ADDENDUM, p.addendumFactor(), units);
            put(c, JobFields.GEAR_CUSTOM_DEDENDUM, p.dedendumFactor(), units);
            put(c, JobFields.GEAR_CUSTOM_ROOT_RADIUS, p.rootRadiusFactor(), units);
        });
        put(n, JobFields.GEAR_BLANK_DIAMETER, g.blankDiameterMm(), units);
        put(n, JobFields.GEAR_PIN_DIAMETER, g.pinDiameterMm(), units);
        g.flankToleranceClass().ifPresent(v -> n.put(JobFields.GEAR_TOLERANCE_CLASS.leaf(), v));
        ObjectNode d = drawingTree(g.drawing(), units);
        if (!d.isEmpty()) {
            n.set("drawing", d);
        }
        g.mate().ifPresent(m -> {
            ObjectNode t = n.putObject("mate");
            t.put(JobFields.MATE_TEETH.leaf(), m.teeth());
            put(t, JobFields.MATE_PROFILE_SHIFT, m.profileShift(), units);
            put(t, JobFields.MATE_CENTRE_DISTANCE, m.centreDistanceMm(), units);
            put(t, JobFields.MATE_THICKNESS_ALLOWANCE, m.thicknessAllowanceMm(), units);
            put(t, JobFields.MATE_THICKNESS_ALLOWANCE_LOWER, m.thicknessAllowanceLowerMm(), units);
        });
        return n;
    }

    /** A spline job's {@code spline} object: its gear frame's keys and what makes it a spline. */
    private static ObjectNode splineTree(GearSpec g, SplineSpec s, Units units) {
        ObjectNode n = NODES.objectNode();
        n.put(JobFields.SPLINE_PART_NAME.leaf(), g.partName());
        n.put(JobFields.SPLINE_STANDARD.leaf(), s.standard());
        n.put(JobFields.SPLINE_TEETH.leaf(), g.teeth());
        if (g.pitch() instanceof Pitch.Diametral d) {
            n.put(JobFields.SPLINE_DIAMETRAL_PITCH.leaf(), plain(d.perInch()) + "/" + plain(2 * d.perInch()));
        } else {
            put(n, JobFields.SPLINE_MODULE, g.moduleMm(), units);
        }
        put(n, JobFields.SPLINE_PRESSURE_ANGLE, g.pressureAngleDeg(), units);
        n.put(JobFields.SPLINE_ROOT.leaf(), s.root());
        n.put(JobFields.SPLINE_TOLERANCE_CLASS.leaf(), s.toleranceClass());
        n.put(JobFields.SPLINE_FIT_CLASS.leaf(), s.fitClass());
        put(n, JobFields.SPLINE_REFERENCE_DIAMETER, s.referenceDiameterMm(), units);
        put(n, JobFields.SPLINE_FACE_WIDTH, g.faceWidthMm(), units);
        put(n, JobFields.SPLINE_PIN_DIAMETER, g.pinDiameterMm(), units);
        put(n, JobFields.SPLINE_BLANK_DIAMETER, g.blankDiameterMm(), units);
        put(n, JobFields.SPLINE_ALLOWANCE, s.allowanceMm(), units);
        put(n, JobFields.SPLINE_TOTAL_TOLERANCE, s.totalToleranceMm(), units);
        put(n, JobFields.SPLINE_EFFECTIVE_VARIATION, s.effectiveVariationMm(), units);
        return n;
    }

    /** A number as a short text: 16, 2.5. */
    private static String plain(double v) {
        double t = JsonNumbers.tidy(v);
        return t == Math.rint(t) ? Long.toString((long) t) : Double.toString(t);
    }

    private static ObjectNode drawingTree(DrawingValues d, Units units) {
        ObjectNode n = NODES.objectNode();
        put(n, JobFields.DRAWING_PITCH_DIAMETER, d.pitchDiameterMm(), units);
        put(n, JobFields.DRAWING_OUTSIDE_DIAMETER, d.outsideDiameterMm(), units);
        put(n, JobFields.DRAWING_ROOT_DIAMETER, d.rootDiameterMm(), units);
        put(n, JobFields.DRAWING_WHOLE_DEPTH, d.wholeDepthMm(), units);
        OptionalInt span = d.spanTeeth();
        span.ifPresent(v -> n.put(JobFields.DRAWING_SPAN_TEETH.leaf(), v));
        put(n, JobFields.DRAWING_SPAN, d.spanWidthMm(), units);
        put(n, JobFields.DRAWING_PIN_DIAMETER, d.pinDiameterMm(), units);
        put(n, JobFields.DRAWING_OVER_PINS, d.overPinsMm(), units);
        return n;
    }

    private static ObjectNode hobTree(HobSpec h, Units units) {
        ObjectNode n = NODES.objectNode();
        pitch(n, h.pitch());
        put(n, JobFields.HOB_PRESSURE_ANGLE, h.pressureAngleDeg(), units);
        n.put(JobFields.HOB_STARTS.leaf(), h.starts());
        n.put(JobFields.HOB_HAND.leaf(), h.hand().word());
        put(n, JobFields.HOB_OUTSIDE_DIAMETER, h.outsideDiameterMm(), units);
        put(n, JobFields.HOB_LEAD_ANGLE, h.leadAngleDeg(), units);
        put(n, JobFields.HOB_REFERENCE_DIAMETER, h.referenceDiameterMm(), units);
        n.put(JobFields.HOB_GASHES.leaf(), h.gashes());
        put(n, JobFields.HOB_LENGTH, h.lengthMm(), units);
        put(n, JobFields.HOB_MAX_RPM, h.maxRpm(), units);
        n.put(JobFields.HOB_MATERIAL.leaf(), h.material());
        h.cuttingSense().ifPresent(v -> n.put(JobFields.HOB_CUTTING_SENSE.leaf(), v.word()));
        h.identifier().ifPresent(v -> n.put(JobFields.HOB_IDENTIFIER.leaf(), v));
        h.splineProfile().ifPresent(p -> {
            n.put(JobFields.HOB_ROOT.leaf(), p.root());
            put(n, JobFields.HOB_TIP_RADIUS, p.tipRadiusMm(), units);
            put(n, JobFields.HOB_ADDENDUM, p.addendumMm(), units);
        });
        return n;
    }

    private static ObjectNode machineBody(MachineProfile m, Units units, String description) {
        ObjectNode n = NODES.objectNode();
        n.put(MachineFields.NAME.leaf(), m.name());
        if (!description.isEmpty()) {
            n.put(MachineFields.DESCRIPTION.leaf(), description);
        }
        n.put(MachineFields.DIALECT.leaf(), m.dialect());
        ObjectNode work = n.putObject("workSpindle");
        put(work, MachineFields.WORK_MIN_RPM, m.workMinRpm(), units);
        put(work, MachineFields.WORK_MAX_RPM, m.workMaxRpm(), units);
        work.put(MachineFields.WORK_PHASED_SYNC.leaf(), m.phasedSync());
        ObjectNode hob = n.putObject("hobSpindle");
        put(hob, MachineFields.HOB_MIN_RPM, m.hobMinRpm(), units);
        put(hob, MachineFields.HOB_MAX_RPM, m.hobMaxRpm(), units);
        hob.put(MachineFields.HOB_CLOCKWISE_TEETH_MOVE.leaf(), m.clockwiseTeethTowardChuck() ? MachineReader.TOWARD_CHUCK
                : MachineReader.AWAY_FROM_CHUCK);
        put(n, MachineFields.MAX_SYNC_RATIO, m.maxSyncRatio(), units);
        n.put(MachineFields.FOLLOWS_HELIX.leaf(), m.followsHelix());
        SwivelHolder s = m.swivel();
        ObjectNode sw = n.putObject("swivel");
        sw.put(MachineFields.SWIVEL_SCALE.leaf(), s.scale() == SwivelHolder.SwivelScale.DEGREES_MINUTES
                ? MachineReader.SCALE_DM : MachineReader.SCALE_DEC);
        put(sw, MachineFields.SWIVEL_RESOLUTION, s.resolutionDeg(), units);
        sw.put(MachineFields.SWIVEL_PROGRAMMABLE.leaf(), s.programmable());
        put(sw, MachineFields.SWIVEL_MAX_ANGLE, s.maxAngleDeg(), units);
        sw.put(MachineFields.SWIVEL_POSITIVE_SENSE.leaf(), s.positiveSense());
        sw.put(MachineFields.SWIVEL_POSITIVE_IS_RIGHT.leaf(), s.positiveIsRight());
        ObjectNode tr = n.putObject("travel");
        put(tr, MachineFields.RADIAL_MIN, m.radialMinMm(), units);
        put(tr, MachineFields.RADIAL_MAX, m.radialMaxMm(), units);
        put(tr, MachineFields.AXIAL_MIN, m.axialMinMm(), units);
        put(tr, MachineFields.AXIAL_MAX, m.axialMaxMm(), units);
        put(tr, MachineFields.SHIFT_TRAVEL, m.hobShiftTravelMm().orElse(0), units);
        put(n, MachineFields.RAPID, m.rapidMmPerMin(), units);
        put(n, MachineFields.MAX_FEED, m.maxFeedMmPerMin(), units);
        put(n, MachineFields.SYNC_SETTLE, m.syncSettleS(), units);
        put(n, MachineFields.MAX_HOB_DIAMETER, m.maxHobDiameterMm(), units);
        MachineTimes t = m.times();
        ObjectNode times = NODES.objectNode();
        put(times, MachineFields.TIME_LOAD, t.loadS(), units);
        put(times, MachineFields.TIME_UNLOAD, t.unloadS(), units);
        put(times, MachineFields.TIME_SWIVEL, t.swivelS(), units);
        put(times, MachineFields.TIME_HOB_SHIFT, t.hobShiftS(), units);
        put(times, MachineFields.TIME_HOB_CHANGE, t.hobChangeS(), units);
        if (!times.isEmpty()) {
            n.set("times", times);
        }
        return n;
    }

    private static void pitch(ObjectNode n, Pitch p) {
        if (p instanceof Pitch.Diametral d) {
            number(n, JobFields.GEAR_DIAMETRAL_PITCH.leaf(), d.perInch());
        } else {
            number(n, JobFields.GEAR_MODULE.leaf(), p.moduleMm());
        }
    }

    /** Writes a field's canonical value in {@code units}. */
    private static void put(ObjectNode n, FieldDef f, double canonical, Units units) {
        number(n, f.leaf(), f.unit().fromCanonical(canonical, units));
    }

    /** Writes a field's canonical value in {@code units} when present. */
    private static void put(ObjectNode n, FieldDef f, OptionalDouble canonical, Units units) {
        if (canonical.isPresent()) {
            put(n, f, canonical.getAsDouble(), units);
        }
    }

    /** Writes a number tidied to 12 significant digits; whole numbers without a fraction. */
    static void number(ObjectNode n, String key, double v) {
        double t = JsonNumbers.tidy(v);
        if (t == Math.rint(t) && Math.abs(t) < 1e15) {
            long l = (long) t;
            if (l == (int) l) {
                n.put(key, (int) l);
            } else {
                n.put(key, l);
            }
        } else {
            n.put(key, t);
        }
    }
}
