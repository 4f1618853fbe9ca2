package org.hobwright.wizard.store;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.SplineHobProfile;
import org.hobwright.api.job.SplineSpec;
import org.hobwright.wizard.spline.SplineStandard;
import org.hobwright.wizard.store.FieldReader.Kind;

/**
 * Reads the {@code spline} object of a spline job ({@code "part": "spline"}) into the spline's
 * spur-gear frame ({@link GearSpec}: teeth, pitch, pressure angle, face width, part name, blank, pin;
 * tooth system {@value #TOOTH_SYSTEM}) and its {@link SplineSpec}, and the spline keys of its hob.
 * Each bad value is a finding; empty when any was bad.
 */
final class SplineParts {
    /** The tooth-system word of a spline's gear frame (not a gear tooth system: the spline checks apply). */
    static final String TOOTH_SYSTEM = "spline";
    static final List<String> ROOTS = List.of("flat", "fillet");
    static final List<String> PARTS = List.of("gear", "spline");

    private SplineParts() {
    }

    /** A spline read: its gear frame and what makes it a spline. */
    record Read(GearSpec frame, SplineSpec spline) {
    }

    static Optional<Read> spline(FieldReader f, String jobName, List<Finding> out) {
        int before = JobParts.errors(out);
        String part = f.text("partName").orElse(jobName);
        Optional<String> standard = f.has("standard") ? f.choice("standard", SplineStandard.ids())
                : f.requiredText("standard", "use one of " + String.join(", ", SplineStandard.ids()));
        int teeth = f.requiredInt("teeth", 1, 100_000, "give the number of teeth");
        Optional<Pitch> pitch = pitch(f);
        double alpha = f.requiredAngle("pressureAngle", Limit.range(1, 45), "give the pressure angle: 30, 37.5 or 45");
        Optional<String> root = f.has("root") ? f.choice("root", ROOTS) : f.requiredText("root", "flat or fillet");
        int tolerance = f.requiredInt("toleranceClass", 1, 16, "give the tolerance class on the drawing, e.g. 5");
        String fit = f.text("fitClass").orElse("h");
        OptionalDouble reference = f.number("referenceDiameter", Kind.LENGTH, Limit.POSITIVE);
        double width = f.required("faceWidth", Kind.LENGTH, Limit.POSITIVE, "give the spline length (face width)");
        OptionalDouble pin = f.number("pinDiameter", Kind.LENGTH, Limit.POSITIVE);
        OptionalDouble blank = f.number("blankDiameter", Kind.LENGTH, Limit.POSITIVE);
        OptionalDouble allowance = f.number("allowance", Kind.LENGTH, Limit.range(-10, 10));
        OptionalDouble total = f.number("totalTolerance", Kind.LENGTH, Limit.POSITIVE);
        OptionalDouble lambda = f.number("effectiveVariation", Kind.LENGTH, Limit.range(0, 10));
        if (JobParts.errors(out) > before) {
            return Optional.empty();
        }
        GearSpec frame = new GearSpec(part, teeth, pitch.orElseThrow(), alpha, 0, Hand.RIGHT, width, 0, 0, TOOTH_SYSTEM,
                Optional.empty(), blank, pin, OptionalInt.empty(), DrawingValues.NONE);
        return Optional.of(new Read(frame, new SplineSpec(standard.orElseThrow(), root.orElseThrow(), tolerance, fit,
                reference, allowance, total, lambda)));
    }

    /**
     * The pitch: {@code module} (mm), or {@code diametralPitch} as a number or as the standard writes it,
     * {@code "16/32"} (P over the stub pitch 2P).
     */
    static Optional<Pitch> pitch(FieldReader f) {
        JsonText dp = new JsonText(f.raw("diametralPitch"));
        if (!dp.isText()) {
            return JobParts.pitch(f);
        }
        if (f.has("module")) {
            f.problem(InputCode.INPUT_PITCH, "diametralPitch", f.path("module") + " and " + f.path("diametralPitch")
                    + " are both given; exactly one gives the pitch", "keep one of them");
            return Optional.empty();
        }
        String[] parts = dp.text().split("/");
        try {
            double p = Double.parseDouble(parts[0].strip());
            double stub = parts.length == 2 ? Double.parseDouble(parts[1].strip()) : 2 * p;
            if (parts.length > 2 || !(p > 0) || Math.abs(stub - 2 * p) > 1e-9 * p) {
                throw new NumberFormatException(dp.text());
            }
            return Optional.of(new Pitch.Diametral(p));
        } catch (NumberFormatException e) {
            f.problem(InputCode.INPUT_VALUE, "diametralPitch", "\"" + dp.text() + "\" is not a spline pitch P/2P",
                    "write it as the drawing does, e.g. \"16/32\", or as the number 16");
            return Optional.empty();
        }
    }

    /** The spline keys of a hob ({@code root}, {@code tipRadius}, {@code addendum}); empty for a gear hob. */
    static Optional<SplineHobProfile> hobProfile(FieldReader f) {
        if (!f.has("root") && !f.has("tipRadius") && !f.has("addendum")) {
            return Optional.empty();
        }
        Optional<String> root = f.has("root") ? f.choice("root", ROOTS) : f.requiredText("root", "flat or fillet");
        double tip = f.required("tipRadius", Kind.LENGTH, Limit.range(0, 100), "give the hob's tip radius");
        OptionalDouble addendum = f.number("addendum", Kind.LENGTH, Limit.POSITIVE);
        return root.isPresent() && Double.isFinite(tip) ? Optional.of(new SplineHobProfile(root.get(), tip, addendum))
                : Optional.empty();
    }

    /** A JSON value that may be a text. */
    private record JsonText(tools.jackson.databind.JsonNode node) {
        boolean isText() {
            return node != null && node.isString();
        }

        String text() {
            return node.stringValue();
        }
    }
}
