package org.hobwright.wizard.store;

import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.MachineTimes;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.SplineSpec;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.api.job.RunSettings;
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
            root.put("part", "spline");
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
        n.put("workMaterial", c.workMaterial());
        optional(n, "cuttingSpeed", c.cuttingSpeedMPerMin(), v -> CycleReader.speedTo(units, v));
        optional(n, "roughFeed", c.roughFeedMmPerRev(), units::fromMm);
        optional(n, "finishFeed", c.finishFeedMmPerRev(), units::fromMm);
        optional(n, "roughDepth", c.roughDepthMm(), units::fromMm);
        number(n, "finishStock", units.fromMm(c.finishStockMm()));
        n.put("method", c.method() == HobbingMethod.CLIMB ? "climb" : "conventional");
        number(n, "axialClearance", units.fromMm(c.axialClearanceMm()));
        number(n, "radialClearance", units.fromMm(c.radialClearanceMm()));
        n.put("coolant", c.coolant());
        QualityTargets t = c.targets();
        ObjectNode targets = NODES.objectNode();
        optional(targets, "feedMarkDepth", t.feedMarkDepthUm(), v -> v);
        optional(targets, "envelopingDepth", t.envelopingDepthUm(), v -> v);
        optional(targets, "maxChipThickness", t.maxChipThicknessMm(), units::fromMm);
        if (!targets.isEmpty()) {
            n.set("targets", targets);
        }
        ObjectNode shift = n.putObject("hobShift");
        number(shift, "perPart", units.fromMm(c.hobShiftPerPartMm()));
        shift.put("everyParts", c.hobShiftEveryParts());
        n.put("fastest", c.fastest());
        RunSettings r = c.run();
        n.put("batchSize", r.batchSize());
        r.programNumber().ifPresent(v -> n.put("programNumber", v));
        r.toolStation().ifPresent(v -> n.put("toolStation", v));
        n.put("hobTurnedRound", r.hobTurnedRound());
        if (r.hobLifePerToothM().isPresent()) {
            number(n.putObject("hobLife"), "lengthPerTooth", r.hobLifePerToothM().getAsDouble());
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
        n.put("partName", g.partName());
        n.put("teeth", g.teeth());
        pitch(n, g.pitch());
        number(n, "pressureAngle", g.pressureAngleDeg());
        number(n, "helixAngle", g.helixAngleDeg());
        n.put("hand", g.hand().word());
        number(n, "faceWidth", units.fromMm(g.faceWidthMm()));
        number(n, "profileShift", g.profileShift());
        number(n, "thicknessAllowance", units.fromMm(g.thicknessAllowanceMm()));
        n.put("toothSystem", g.toothSystem());
        g.customProportions().ifPresent(p -> {
            ObjectNode c = n.putObject("custom");
            number(c, "addendum", p.addendumFactor());
            number(c, "dedendum", p.dedendumFactor());
            number(c, "rootRadius", p.rootRadiusFactor());
        });
        optional(n, "blankDiameter", g.blankDiameterMm(), units::fromMm);
        optional(n, "pinDiameter", g.pinDiameterMm(), units::fromMm);
        g.flankToleranceClass().ifPresent(v -> n.put("toleranceClass", v));
        ObjectNode d = drawingTree(g.drawing(), units);
        if (!d.isEmpty()) {
            n.set("drawing", d);
        }
        return n;
    }

    /** A spline job's {@code spline} object: its gear frame's keys and what makes it a spline. */
    private static ObjectNode splineTree(GearSpec g, SplineSpec s, Units units) {
        ObjectNode n = NODES.objectNode();
        n.put("partName", g.partName());
        n.put("standard", s.standard());
        n.put("teeth", g.teeth());
        if (g.pitch() instanceof Pitch.Diametral d) {
            n.put("diametralPitch", plain(d.perInch()) + "/" + plain(2 * d.perInch()));
        } else {
            pitch(n, g.pitch());
        }
        number(n, "pressureAngle", g.pressureAngleDeg());
        n.put("root", s.root());
        n.put("toleranceClass", s.toleranceClass());
        n.put("fitClass", s.fitClass());
        optional(n, "referenceDiameter", s.referenceDiameterMm(), units::fromMm);
        number(n, "faceWidth", units.fromMm(g.faceWidthMm()));
        optional(n, "pinDiameter", g.pinDiameterMm(), units::fromMm);
        optional(n, "blankDiameter", g.blankDiameterMm(), units::fromMm);
        optional(n, "allowance", s.allowanceMm(), units::fromMm);
        optional(n, "totalTolerance", s.totalToleranceMm(), units::fromMm);
        optional(n, "effectiveVariation", s.effectiveVariationMm(), units::fromMm);
        return n;
    }

    /** A number as a short text: 16, 2.5. */
    private static String plain(double v) {
        double t = JsonNumbers.tidy(v);
        return t == Math.rint(t) ? Long.toString((long) t) : Double.toString(t);
    }

    private static ObjectNode drawingTree(DrawingValues d, Units units) {
        ObjectNode n = NODES.objectNode();
        optional(n, "pitchDiameter", d.pitchDiameterMm(), units::fromMm);
        optional(n, "outsideDiameter", d.outsideDiameterMm(), units::fromMm);
        optional(n, "rootDiameter", d.rootDiameterMm(), units::fromMm);
        optional(n, "wholeDepth", d.wholeDepthMm(), units::fromMm);
        OptionalInt span = d.spanTeeth();
        span.ifPresent(v -> n.put("spanTeeth", v));
        optional(n, "span", d.spanWidthMm(), units::fromMm);
        optional(n, "pinDiameter", d.pinDiameterMm(), units::fromMm);
        optional(n, "overPins", d.overPinsMm(), units::fromMm);
        return n;
    }

    private static ObjectNode hobTree(HobSpec h, Units units) {
        ObjectNode n = NODES.objectNode();
        pitch(n, h.pitch());
        number(n, "pressureAngle", h.pressureAngleDeg());
        n.put("starts", h.starts());
        n.put("hand", h.hand().word());
        number(n, "outsideDiameter", units.fromMm(h.outsideDiameterMm()));
        optional(n, "leadAngle", h.leadAngleDeg(), v -> v);
        optional(n, "referenceDiameter", h.referenceDiameterMm(), units::fromMm);
        n.put("gashes", h.gashes());
        number(n, "length", units.fromMm(h.lengthMm()));
        optional(n, "maxRpm", h.maxRpm(), v -> v);
        n.put("material", h.material());
        h.cuttingSense().ifPresent(v -> n.put("cuttingSense", v.word()));
        h.identifier().ifPresent(v -> n.put("identifier", v));
        h.splineProfile().ifPresent(p -> {
            n.put("root", p.root());
            number(n, "tipRadius", units.fromMm(p.tipRadiusMm()));
            optional(n, "addendum", p.addendumMm(), units::fromMm);
        });
        return n;
    }

    private static ObjectNode machineBody(MachineProfile m, Units units, String description) {
        ObjectNode n = NODES.objectNode();
        n.put("name", m.name());
        if (!description.isEmpty()) {
            n.put("description", description);
        }
        n.put("dialect", m.dialect());
        ObjectNode work = n.putObject("workSpindle");
        number(work, "minRpm", m.workMinRpm());
        number(work, "maxRpm", m.workMaxRpm());
        work.put("phasedSync", m.phasedSync());
        ObjectNode hob = n.putObject("hobSpindle");
        number(hob, "minRpm", m.hobMinRpm());
        number(hob, "maxRpm", m.hobMaxRpm());
        hob.put("clockwiseTeethMove", m.clockwiseTeethTowardChuck() ? MachineReader.TOWARD_CHUCK
                : MachineReader.AWAY_FROM_CHUCK);
        number(n, "maxSyncRatio", m.maxSyncRatio());
        n.put("followsHelix", m.followsHelix());
        SwivelHolder s = m.swivel();
        ObjectNode sw = n.putObject("swivel");
        sw.put("scale", s.scale() == SwivelHolder.SwivelScale.DEGREES_MINUTES ? MachineReader.SCALE_DM
                : MachineReader.SCALE_DEC);
        number(sw, "resolution", s.resolutionDeg());
        sw.put("programmable", s.programmable());
        number(sw, "maxAngle", s.maxAngleDeg());
        sw.put("positiveSense", s.positiveSense());
        sw.put("positiveIsRight", s.positiveIsRight());
        ObjectNode tr = n.putObject("travel");
        number(tr, "radialMin", units.fromMm(m.radialMinMm()));
        number(tr, "radialMax", units.fromMm(m.radialMaxMm()));
        number(tr, "axialMin", units.fromMm(m.axialMinMm()));
        number(tr, "axialMax", units.fromMm(m.axialMaxMm()));
        number(tr, "hobShift", units.fromMm(m.hobShiftTravelMm().orElse(0)));
        number(n, "rapid", units.fromMm(m.rapidMmPerMin()));
        number(n, "maxFeed", units.fromMm(m.maxFeedMmPerMin()));
        number(n, "syncSettle", m.syncSettleS());
        number(n, "maxHobDiameter", units.fromMm(m.maxHobDiameterMm()));
        MachineTimes t = m.times();
        ObjectNode times = NODES.objectNode();
        optional(times, "load", t.loadS(), v -> v);
        optional(times, "unload", t.unloadS(), v -> v);
        optional(times, "swivel", t.swivelS(), v -> v);
        optional(times, "hobShift", t.hobShiftS(), v -> v);
        optional(times, "hobChange", t.hobChangeS(), v -> v);
        if (!times.isEmpty()) {
            n.set("times", times);
        }
        return n;
    }

    private static void pitch(ObjectNode n, Pitch p) {
        if (p instanceof Pitch.Diametral d) {
            number(n, "diametralPitch", d.perInch());
        } else {
            number(n, "module", p.moduleMm());
        }
    }

    private static void optional(ObjectNode n, String key, OptionalDouble v,
                                 java.util.function.DoubleUnaryOperator convert) {
        if (v.isPresent()) {
            number(n, key, convert.applyAsDouble(v.getAsDouble()));
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
