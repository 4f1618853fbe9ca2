package org.hobwright.wizard.steps;

import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.Units;

/**
 * Answers taken from an existing job, in the job's own units, so a host can start the wizard from
 * the job it already has. The machine is answered by its profile name. A cutting speed in an inch
 * job is in ft/min (1 ft = 0.3048 m exactly, 1959 international yard and pound agreement).
 */
public final class JobAnswers {
    private static final double M_PER_FT = 0.3048;

    private final Answers answers = new Answers();
    private final Units units;

    private JobAnswers(Units units) {
        this.units = units;
    }

    /** The answers that describe a job. */
    public static Answers from(HobJob job) {
        JobAnswers a = new JobAnswers(job.units());
        a.put("name", job.name());
        a.put(Fields.UNITS, job.units().symbol());
        a.gear(job.gear());
        a.hob(job.hob());
        a.put(Fields.MACHINE, job.machine().name());
        a.cycle(job.cycle());
        return a.answers;
    }

    private void gear(GearSpec g) {
        put("gear.partName", g.partName());
        put("gear.teeth", Integer.toString(g.teeth()));
        pitch("gear", g.pitch());
        put("gear.pressureAngle", plain(g.pressureAngleDeg()));
        put("gear.helixAngle", plain(g.helixAngleDeg()));
        put("gear.hand", g.hand().word());
        length("gear.faceWidth", g.faceWidthMm());
        put("gear.profileShift", plain(g.profileShift()));
        length("gear.thicknessAllowance", g.thicknessAllowanceMm());
        put("gear.toothSystem", g.toothSystem());
        g.customProportions().ifPresent(p -> {
            put("gear.custom.addendum", plain(p.addendumFactor()));
            put("gear.custom.dedendum", plain(p.dedendumFactor()));
            put("gear.custom.rootRadius", plain(p.rootRadiusFactor()));
        });
        length("gear.blankDiameter", g.blankDiameterMm());
        length("gear.pinDiameter", g.pinDiameterMm());
        count("gear.toleranceClass", g.flankToleranceClass());
        DrawingValues d = g.drawing();
        length("gear.drawing.pitchDiameter", d.pitchDiameterMm());
        length("gear.drawing.outsideDiameter", d.outsideDiameterMm());
        length("gear.drawing.rootDiameter", d.rootDiameterMm());
        length("gear.drawing.wholeDepth", d.wholeDepthMm());
        count("gear.drawing.spanTeeth", d.spanTeeth());
        length("gear.drawing.span", d.spanWidthMm());
        length("gear.drawing.pinDiameter", d.pinDiameterMm());
        length("gear.drawing.overPins", d.overPinsMm());
    }

    private void hob(HobSpec h) {
        pitch("hob", h.pitch());
        put("hob.pressureAngle", plain(h.pressureAngleDeg()));
        put("hob.starts", Integer.toString(h.starts()));
        put("hob.hand", h.hand().word());
        length("hob.outsideDiameter", h.outsideDiameterMm());
        h.leadAngleDeg().ifPresent(v -> put("hob.leadAngle", plain(v)));
        length("hob.referenceDiameter", h.referenceDiameterMm());
        put("hob.gashes", Integer.toString(h.gashes()));
        length("hob.length", h.lengthMm());
        h.maxRpm().ifPresent(v -> put("hob.maxRpm", plain(v)));
        put("hob.material", h.material());
    }

    private void cycle(CycleSettings c) {
        put("cycle.workMaterial", c.workMaterial());
        c.cuttingSpeedMPerMin().ifPresent(v -> put("cycle.cuttingSpeed",
                plain(units == Units.IN ? v / M_PER_FT : v)));
        length("cycle.roughFeed", c.roughFeedMmPerRev());
        length("cycle.finishFeed", c.finishFeedMmPerRev());
        length("cycle.roughDepth", c.roughDepthMm());
        length("cycle.finishStock", c.finishStockMm());
        put("cycle.method", c.method().name().toLowerCase(java.util.Locale.ROOT));
        length("cycle.axialClearance", c.axialClearanceMm());
        length("cycle.radialClearance", c.radialClearanceMm());
        put("cycle.coolant", c.coolant() ? "yes" : "no");
        c.targets().feedMarkDepthUm().ifPresent(v -> put("cycle.targets.feedMarkDepth", plain(v)));
        c.targets().envelopingDepthUm().ifPresent(v -> put("cycle.targets.envelopingDepth", plain(v)));
        length("cycle.targets.maxChipThickness", c.targets().maxChipThicknessMm());
        length("cycle.hobShift.perPart", c.hobShiftPerPartMm());
        put("cycle.hobShift.everyParts", Integer.toString(c.hobShiftEveryParts()));
        put("cycle.fastest", c.fastest() ? "yes" : "no");
    }

    private void pitch(String part, Pitch p) {
        if (p instanceof Pitch.Diametral d) {
            put(part + ".diametralPitch", plain(d.perInch()));
        } else {
            put(part + ".module", plain(p.moduleMm()));
        }
    }

    private void length(String key, double mm) {
        put(key, plain(units.fromMm(mm)));
    }

    private void length(String key, OptionalDouble mm) {
        mm.ifPresent(v -> length(key, v));
    }

    private void count(String key, OptionalInt n) {
        n.ifPresent(v -> put(key, Integer.toString(v)));
    }

    private void put(String key, String value) {
        answers.put(key, value);
    }

    private static String plain(double v) {
        return FieldCheck.plain(v);
    }
}
