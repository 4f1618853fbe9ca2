package org.hobwright.wizard.store;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.SplineHobProfile;
import org.hobwright.api.job.SplineSpec;
import tools.jackson.databind.JsonNode;

/**
 * Reads the {@code spline} object of a spline job ({@code "part": "spline"}) into the spline's
 * spur-gear frame ({@link GearSpec}: teeth, pitch, pressure angle, face width, part name, blank, pin;
 * tooth system {@value #TOOTH_SYSTEM}) and its {@link SplineSpec}, and the spline keys of its hob. The
 * keys are the field table's ({@link JobFields}, {@code spline.*}, {@code hob.root}, {@code hob.tipRadius},
 * {@code hob.addendum}). Each bad value is a finding; empty when any was bad.
 */
final class SplineParts {
    /** The tooth-system word of a spline's gear frame (not a gear tooth system: the spline checks apply). */
    static final String TOOTH_SYSTEM = "spline";

    private SplineParts() {
    }

    /** A spline read: its gear frame and what makes it a spline. */
    record Read(GearSpec frame, SplineSpec spline) {
    }

    static Optional<Read> spline(FieldReader f, String jobName, List<Finding> out) {
        int before = JobParts.errors(out);
        String part = f.text(JobFields.SPLINE_PART_NAME).orElse(jobName);
        Optional<String> standard = f.text(JobFields.SPLINE_STANDARD);
        OptionalInt teeth = f.integer(JobFields.SPLINE_TEETH);
        Optional<Pitch> pitch = pitch(f);
        double alpha = f.value(JobFields.SPLINE_PRESSURE_ANGLE);
        Optional<String> root = f.word(JobFields.SPLINE_ROOT);
        OptionalInt tolerance = f.integer(JobFields.SPLINE_TOLERANCE_CLASS);
        String fit = f.word(JobFields.SPLINE_FIT_CLASS).orElse("h");
        OptionalDouble reference = f.number(JobFields.SPLINE_REFERENCE_DIAMETER);
        double width = f.value(JobFields.SPLINE_FACE_WIDTH);
        OptionalDouble pin = f.number(JobFields.SPLINE_PIN_DIAMETER);
        OptionalDouble blank = f.number(JobFields.SPLINE_BLANK_DIAMETER);
        OptionalDouble allowance = f.number(JobFields.SPLINE_ALLOWANCE);
        OptionalDouble total = f.number(JobFields.SPLINE_TOTAL_TOLERANCE);
        OptionalDouble lambda = f.number(JobFields.SPLINE_EFFECTIVE_VARIATION);
        if (JobParts.errors(out) > before || standard.isEmpty() || teeth.isEmpty() || pitch.isEmpty()
                || root.isEmpty() || tolerance.isEmpty()) {
            return Optional.empty();
        }
        GearSpec frame = new GearSpec(part, teeth.getAsInt(), pitch.get(), alpha, 0, Hand.RIGHT, width, 0, 0,
                TOOTH_SYSTEM, Optional.empty(), blank, pin, OptionalInt.empty(), DrawingValues.NONE);
        return Optional.of(new Read(frame, new SplineSpec(standard.get(), root.get(), tolerance.getAsInt(), fit,
                reference, allowance, total, lambda)));
    }

    /**
     * The pitch: {@code module} (mm), or {@code diametralPitch} as the standard writes it, {@code "16/32"}
     * (P over the stub pitch 2P), or as the number P.
     */
    static Optional<Pitch> pitch(FieldReader f) {
        String dpKey = JobFields.SPLINE_DIAMETRAL_PITCH.leaf();
        JsonNode dp = f.raw(dpKey);
        boolean module = f.has(JobFields.SPLINE_MODULE);
        if (module == (dp != null)) {
            f.problem(InputCode.INPUT_PITCH, module ? dpKey : "module", f.path("module") + " and " + f.path(dpKey)
                    + (module ? " are both given" : " are both missing") + "; exactly one gives the pitch",
                    module ? "keep one of them" : "add \"module\" (mm) or \"diametralPitch\" (e.g. \"16/32\")");
            return Optional.empty();
        }
        if (module) {
            OptionalDouble v = f.number(JobFields.SPLINE_MODULE);
            return v.isPresent() ? Optional.of(new Pitch.Module(v.getAsDouble())) : Optional.empty();
        }
        String text = dp.isNumber() ? Double.toString(dp.doubleValue()) : dp.isString() ? dp.stringValue() : "";
        String[] parts = text.split("/");
        try {
            double p = Double.parseDouble(parts[0].strip());
            double stub = parts.length == 2 ? Double.parseDouble(parts[1].strip()) : 2 * p;
            if (parts.length > 2 || !(p >= 0.254 && p <= 508) || Math.abs(stub - 2 * p) > 1e-9 * p) {
                throw new NumberFormatException(text);
            }
            return Optional.of(new Pitch.Diametral(p));
        } catch (NumberFormatException e) {
            f.problem(InputCode.INPUT_VALUE, dpKey, "\"" + text + "\" is not a spline pitch P/2P",
                    "write it as the drawing does, e.g. \"16/32\"");
            return Optional.empty();
        }
    }

    /** The spline keys of a hob ({@code root}, {@code tipRadius}, {@code addendum}); empty for a gear hob. */
    static Optional<SplineHobProfile> hobProfile(FieldReader f) {
        if (!f.has(JobFields.HOB_ROOT) && !f.has(JobFields.HOB_TIP_RADIUS) && !f.has(JobFields.HOB_ADDENDUM)) {
            return Optional.empty();
        }
        Optional<String> root = f.text(JobFields.HOB_ROOT);
        if (!f.has(JobFields.HOB_ROOT)) {
            f.missing(JobFields.HOB_ROOT);
        }
        OptionalDouble tip = f.number(JobFields.HOB_TIP_RADIUS);
        if (!f.has(JobFields.HOB_TIP_RADIUS)) {
            f.missing(JobFields.HOB_TIP_RADIUS);
        }
        OptionalDouble addendum = f.number(JobFields.HOB_ADDENDUM);
        return root.isPresent() && tip.isPresent()
                ? Optional.of(new SplineHobProfile(root.get(), tip.getAsDouble(), addendum)) : Optional.empty();
    }
}
