package org.hobwright.wizard.store;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.CuttingSense;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.MatingGear;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.SplineHobProfile;
import org.hobwright.api.job.ToothProportions;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.tolerance.ThicknessSeries;

/**
 * Reads the gear and the hob of a job by the field table ({@link JobFields}). Each method records a
 * finding for every bad value and returns empty when any value was bad, so that no record
 * constructor sees a wrong value. Ranges, choices and defaults are the table's, as in the api
 * records ({@link GearSpec}, {@link HobSpec}).
 */
final class JobParts {
    private JobParts() {
    }

    /** Reads the pitch: exactly one of {@code module} (mm) and {@code diametralPitch} (1/in), whatever the units. */
    static Optional<Pitch> pitch(FieldReader f, FieldDef module, FieldDef diametral) {
        boolean m = f.has(module);
        boolean dp = f.has(diametral);
        if (m == dp) {
            f.problem(InputCode.INPUT_PITCH, m ? "diametralPitch" : "module",
                    f.path("module") + " and " + f.path("diametralPitch")
                            + (m ? " are both given" : " are both missing")
                            + "; exactly one gives the normal pitch",
                    m ? "keep one of them" : "add \"module\" (mm) or \"diametralPitch\" (1/in)");
            return Optional.empty();
        }
        if (m) {
            OptionalDouble v = f.number(module);
            return v.isPresent() ? Optional.of(new Pitch.Module(v.getAsDouble())) : Optional.empty();
        }
        OptionalDouble v = f.number(diametral);
        return v.isPresent() ? Optional.of(new Pitch.Diametral(v.getAsDouble())) : Optional.empty();
    }

    static Optional<GearSpec> gear(FieldReader f, String jobName, List<Finding> out) {
        int before = errors(out);
        String part = f.text(JobFields.GEAR_PART_NAME).orElse(jobName);
        int teeth = f.integer(JobFields.GEAR_TEETH).orElse(0);
        Optional<Pitch> pitch = pitch(f, JobFields.GEAR_MODULE, JobFields.GEAR_DIAMETRAL_PITCH);
        double alpha = f.value(JobFields.GEAR_PRESSURE_ANGLE);
        double beta = f.value(JobFields.GEAR_HELIX_ANGLE);
        Optional<String> handWord = f.word(JobFields.GEAR_HAND);
        if (beta > 0 && !f.has(JobFields.GEAR_HAND)) {
            f.missing("hand", "a helical gear needs \"hand\": \"right\" or \"left\"");
        }
        double width = f.value(JobFields.GEAR_FACE_WIDTH);
        double shift = f.value(JobFields.GEAR_PROFILE_SHIFT);
        double allowance = f.value(JobFields.GEAR_THICKNESS_ALLOWANCE);
        OptionalDouble lower = f.number(JobFields.GEAR_THICKNESS_ALLOWANCE_LOWER);
        if (lower.isPresent() && lower.getAsDouble() > allowance) {
            f.problem(InputCode.INPUT_CONFLICT, "thicknessAllowanceLower", f.path("thicknessAllowanceLower")
                    + " (" + FieldReader.format(f.raw("thicknessAllowanceLower").doubleValue()) + ") is above "
                    + f.path("thicknessAllowance") + " (" + (f.has(JobFields.GEAR_THICKNESS_ALLOWANCE)
                    ? FieldReader.format(f.raw("thicknessAllowance").doubleValue()) : "0, not given") + ")",
                    "the upper allowance (thicknessAllowance) is the larger one: swap the two values");
        }
        Optional<ThicknessSeries> series = series(f, teeth, pitch, beta);
        if (series.isPresent()) {
            double d = referenceDiameterMm(teeth, pitch.orElseThrow(), beta);
            allowance = series.get().upperAllowanceMm(d);
            lower = OptionalDouble.of(series.get().lowerAllowanceMm(d));
        }
        Optional<String> system = f.text(JobFields.GEAR_TOOTH_SYSTEM);
        Optional<ToothProportions> custom = custom(f, system);
        OptionalDouble blank = f.number(JobFields.GEAR_BLANK_DIAMETER);
        OptionalDouble pin = f.number(JobFields.GEAR_PIN_DIAMETER);
        OptionalInt tolerance = f.integer(JobFields.GEAR_TOLERANCE_CLASS);
        DrawingValues drawing = drawing(f.child("drawing"));
        Optional<MatingGear> mate = f.has("mate") ? mate(f.child("mate")) : Optional.empty();
        if (errors(out) > before) {
            return Optional.empty();
        }
        return Optional.of(new GearSpec(part, teeth, pitch.orElseThrow(), alpha, beta,
                Hand.fromWord(handWord.orElseThrow()), width, shift, allowance, system.orElseThrow(),
                custom, blank, pin, tolerance, drawing, lower, series.map(ThicknessSeries::jobText), mate));
    }

    private static double referenceDiameterMm(int teeth, Pitch pitch, double helixDeg) {
        return teeth * pitch.moduleMm() / Math.cos(Math.toRadians(helixDeg));
    }

    /**
     * Reads {@code thicknessSeries} (e.g. {@code din3967-cd25}), which replaces both allowances: given
     * together with either, it is a conflict. Empty when absent or wrong (with a finding).
     */
    private static Optional<ThicknessSeries> series(FieldReader f, int teeth, Optional<Pitch> pitch, double beta) {
        Optional<String> text = f.text(JobFields.GEAR_THICKNESS_SERIES);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        Optional<ThicknessSeries> series = ThicknessSeries.parse(text.get());
        if (series.isEmpty()) {
            f.problem(InputCode.INPUT_CHOICE, "thicknessSeries", f.path("thicknessSeries") + " \"" + text.get()
                    + "\" is not a DIN 3967 allowance and tolerance series", "write the allowance series (one of "
                    + String.join(", ", ThicknessSeries.allowanceSeries()) + ") and the tolerance series (21 to 30),"
                    + " e.g. \"" + ThicknessSeries.PREFIX + "cd25\"");
            return Optional.empty();
        }
        for (FieldDef key : List.of(JobFields.GEAR_THICKNESS_ALLOWANCE, JobFields.GEAR_THICKNESS_ALLOWANCE_LOWER)) {
            if (f.has(key)) {
                f.problem(InputCode.INPUT_CONFLICT, key.leaf(), f.path(key.leaf()) + " and "
                        + f.path("thicknessSeries") + " both give the tooth-thickness allowances",
                        "keep the drawing's allowances, or the series when the drawing gives none");
                return Optional.empty();
            }
        }
        if (pitch.isEmpty() || teeth < 1 || !Double.isFinite(beta)) {
            return Optional.empty();
        }
        double d = referenceDiameterMm(teeth, pitch.get(), beta);
        if (!ThicknessSeries.covers(d)) {
            f.problem(InputCode.INPUT_CONFLICT, "thicknessSeries", f.path("thicknessSeries") + ": DIN 3967 gives"
                    + " allowances for reference diameters up to 1000 mm, this gear's is "
                    + FieldReader.format(f.units().fromMm(d)) + " " + f.units().symbol(),
                    "give the drawing's allowances in thicknessAllowance and thicknessAllowanceLower");
            return Optional.empty();
        }
        return series;
    }

    /** Reads the mating gear: its teeth, and optionally its shift, allowances and the centre distance. */
    private static Optional<MatingGear> mate(FieldReader m) {
        if (!m.has(JobFields.MATE_TEETH)) {
            m.missing("teeth", "give the mating gear's number of teeth, or leave \"mate\" out");
            return Optional.empty();
        }
        OptionalInt teeth = m.integer(JobFields.MATE_TEETH);
        OptionalDouble shift = m.number(JobFields.MATE_PROFILE_SHIFT);
        OptionalDouble centre = m.number(JobFields.MATE_CENTRE_DISTANCE);
        double upper = m.value(JobFields.MATE_THICKNESS_ALLOWANCE);
        OptionalDouble lower = m.number(JobFields.MATE_THICKNESS_ALLOWANCE_LOWER);
        if (lower.isPresent() && lower.getAsDouble() > upper) {
            m.problem(InputCode.INPUT_CONFLICT, "thicknessAllowanceLower", m.path("thicknessAllowanceLower")
                    + " is above " + m.path("thicknessAllowance"), "the upper allowance is the larger one: swap the"
                    + " two values");
            return Optional.empty();
        }
        if (teeth.isEmpty() || !Double.isFinite(upper)) {
            return Optional.empty();
        }
        return Optional.of(new MatingGear(teeth.getAsInt(), shift, centre, upper, lower));
    }

    private static Optional<ToothProportions> custom(FieldReader f, Optional<String> system) {
        boolean isCustom = system.map(ToothSystem.CUSTOM::equals).orElse(false);
        if (!f.has("custom")) {
            if (isCustom) {
                f.missing("custom", "give \"custom\": { \"addendum\": 1.0, \"dedendum\": 1.25, \"rootRadius\": 0.38 }"
                        + " as factors of the module (ISO 53:1998 profile A)");
            }
            return Optional.empty();
        }
        if (system.isPresent() && !isCustom) {
            f.problem(InputCode.INPUT_CONFLICT, "custom", f.path("custom") + " is only allowed with \"toothSystem\":"
                    + " \"custom\", this gear uses \"" + system.get() + "\"",
                    "remove custom or set toothSystem to custom");
            return Optional.empty();
        }
        FieldReader c = f.child("custom");
        double a = c.value(JobFields.GEAR_CUSTOM_ADDENDUM);
        double d = c.value(JobFields.GEAR_CUSTOM_DEDENDUM);
        double r = c.value(JobFields.GEAR_CUSTOM_ROOT_RADIUS);
        if (Double.isFinite(a) && Double.isFinite(d) && d <= a) {
            c.problem(InputCode.INPUT_CONFLICT, "dedendum", c.path("dedendum") + " (" + FieldReader.format(d)
                    + ") must be greater than " + c.path("addendum") + " (" + FieldReader.format(a) + ")",
                    "the dedendum leaves room for the tip of the mating gear: about 1.25 × the addendum");
        }
        return Double.isFinite(a) && Double.isFinite(d) && Double.isFinite(r) && d > a
                ? Optional.of(new ToothProportions(a, d, r)) : Optional.empty();
    }

    private static DrawingValues drawing(FieldReader d) {
        return new DrawingValues(d.number(JobFields.DRAWING_PITCH_DIAMETER),
                d.number(JobFields.DRAWING_OUTSIDE_DIAMETER),
                d.number(JobFields.DRAWING_ROOT_DIAMETER),
                d.number(JobFields.DRAWING_WHOLE_DEPTH),
                d.integer(JobFields.DRAWING_SPAN_TEETH),
                d.number(JobFields.DRAWING_SPAN),
                d.number(JobFields.DRAWING_PIN_DIAMETER),
                d.number(JobFields.DRAWING_OVER_PINS));
    }

    static Optional<HobSpec> hob(FieldReader f, List<Finding> out) {
        int before = errors(out);
        Optional<Pitch> pitch = pitch(f, JobFields.HOB_MODULE, JobFields.HOB_DIAMETRAL_PITCH);
        double alpha = f.value(JobFields.HOB_PRESSURE_ANGLE);
        int starts = f.integer(JobFields.HOB_STARTS).orElse(0);
        Optional<String> hand = f.text(JobFields.HOB_HAND);
        double outside = f.value(JobFields.HOB_OUTSIDE_DIAMETER);
        OptionalDouble lead = f.number(JobFields.HOB_LEAD_ANGLE);
        OptionalDouble reference = f.number(JobFields.HOB_REFERENCE_DIAMETER);
        int gashes = f.integer(JobFields.HOB_GASHES).orElse(0);
        double length = f.value(JobFields.HOB_LENGTH);
        OptionalDouble maxRpm = f.number(JobFields.HOB_MAX_RPM);
        Optional<String> material = f.text(JobFields.HOB_MATERIAL);
        Optional<CuttingSense> sense = f.text(JobFields.HOB_CUTTING_SENSE)
                .map(w -> w.equals(CuttingSense.CLOCKWISE.word()) ? CuttingSense.CLOCKWISE : CuttingSense.COUNTER_CLOCKWISE);
        Optional<String> identifier = f.text(JobFields.HOB_IDENTIFIER);
        Optional<SplineHobProfile> profile = SplineParts.hobProfile(f);
        if (errors(out) > before) {
            return Optional.empty();
        }
        return Optional.of(new HobSpec(pitch.orElseThrow(), alpha, starts, Hand.fromWord(hand.orElseThrow()), outside,
                lead, reference, gashes, length, maxRpm, material.orElseThrow(), sense, identifier, profile));
    }

    static int errors(List<Finding> out) {
        int n = 0;
        for (Finding f : out) {
            if (f.isError()) {
                n++;
            }
        }
        return n;
    }
}
