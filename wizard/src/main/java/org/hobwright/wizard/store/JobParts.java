package org.hobwright.wizard.store;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.CuttingSense;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.SplineHobProfile;
import org.hobwright.api.job.ToothProportions;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.store.FieldReader.Kind;

/**
 * Reads the gear and the hob of a job. Each method records a finding for every bad value and
 * returns empty when any value was bad, so that no record constructor sees a wrong value.
 * Ranges are those of the api records ({@link GearSpec}, {@link HobSpec}).
 */
final class JobParts {
    static final List<String> HANDS = List.of("right", "left");
    static final List<String> HOB_MATERIALS = List.of("hss", "hss-coated", "carbide");
    static final List<String> SENSES = List.of(CuttingSense.CLOCKWISE.word(), CuttingSense.COUNTER_CLOCKWISE.word());

    private JobParts() {
    }

    /** Reads the pitch: exactly one of {@code module} (mm) and {@code diametralPitch} (1/in), whatever the units. */
    static Optional<Pitch> pitch(FieldReader f) {
        boolean m = f.has("module");
        boolean dp = f.has("diametralPitch");
        if (m == dp) {
            f.problem(InputCode.INPUT_PITCH, m ? "diametralPitch" : "module",
                    f.path("module") + " and " + f.path("diametralPitch")
                            + (m ? " are both given" : " are both missing")
                            + "; exactly one gives the normal pitch",
                    m ? "keep one of them" : "add \"module\" (mm) or \"diametralPitch\" (1/in)");
            return Optional.empty();
        }
        if (m) {
            return f.number("module", Kind.PLAIN, Limit.POSITIVE).stream().boxed().findFirst().map(Pitch.Module::new);
        }
        return f.number("diametralPitch", Kind.PLAIN, Limit.POSITIVE).stream().boxed().findFirst()
                .map(Pitch.Diametral::new);
    }

    static Optional<GearSpec> gear(FieldReader f, String jobName, List<Finding> out) {
        int before = errors(out);
        String part = f.text("partName").orElse(jobName);
        int teeth = f.requiredInt("teeth", 1, 100_000, "give the number of teeth");
        Optional<Pitch> pitch = pitch(f);
        double alpha = f.requiredAngle("pressureAngle", Limit.range(1, 45), "give the normal pressure angle, e.g. 20");
        double beta = f.angle("helixAngle", Limit.range(0, 60), 0);
        Optional<String> handWord = f.choice("hand", HANDS);
        if (beta > 0 && !f.has("hand")) {
            f.missing("hand", "a helical gear needs \"hand\": \"right\" or \"left\"");
        }
        double width = f.required("faceWidth", Kind.LENGTH, Limit.POSITIVE, "give the face width");
        double shift = f.number("profileShift", Kind.PLAIN, Limit.range(-3, 3), 0);
        double allowance = f.number("thicknessAllowance", Kind.LENGTH, Limit.range(-10, 10), 0);
        Optional<String> system = f.has("toothSystem") ? f.choice("toothSystem", ToothSystem.ids())
                : f.requiredText("toothSystem", "use one of " + String.join(", ", ToothSystem.ids()));
        Optional<ToothProportions> custom = custom(f, system);
        OptionalDouble blank = f.number("blankDiameter", Kind.LENGTH, Limit.POSITIVE);
        OptionalDouble pin = f.number("pinDiameter", Kind.LENGTH, Limit.POSITIVE);
        OptionalInt tolerance = f.integer("toleranceClass", 1, 11);
        DrawingValues drawing = drawing(f.child("drawing"));
        if (errors(out) > before) {
            return Optional.empty();
        }
        return Optional.of(new GearSpec(part, teeth, pitch.orElseThrow(), alpha, beta,
                handWord.map(Hand::fromWord).orElse(Hand.RIGHT), width, shift, allowance, system.orElseThrow(),
                custom, blank, pin, tolerance, drawing));
    }

    private static Optional<ToothProportions> custom(FieldReader f, Optional<String> system) {
        boolean isCustom = system.map(ToothSystem.CUSTOM::equals).orElse(false);
        if (!f.has("custom")) {
            if (isCustom) {
                f.missing("custom", "give \"custom\": { \"addendum\": 1.0, \"dedendum\": 1.25, \"rootRadius\": 0.25 }"
                        + " as factors of the module");
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
        double a = c.required("addendum", Kind.PLAIN, Limit.range(0.3, 2), "addendum factor, e.g. 1.0");
        double d = c.required("dedendum", Kind.PLAIN, Limit.range(0.3, 3), "dedendum factor, e.g. 1.25");
        double r = c.required("rootRadius", Kind.PLAIN, Limit.range(0, 1), "root radius factor, e.g. 0.25");
        if (Double.isFinite(a) && Double.isFinite(d) && d <= a) {
            c.problem(InputCode.INPUT_CONFLICT, "dedendum", c.path("dedendum") + " (" + FieldReader.format(d)
                    + ") must be greater than " + c.path("addendum") + " (" + FieldReader.format(a) + ")",
                    "the dedendum leaves room for the tip of the mating gear: about 1.25 × the addendum");
        }
        return Double.isFinite(a) && Double.isFinite(d) && Double.isFinite(r) && d > a
                ? Optional.of(new ToothProportions(a, d, r)) : Optional.empty();
    }

    private static DrawingValues drawing(FieldReader d) {
        return new DrawingValues(d.number("pitchDiameter", Kind.LENGTH, Limit.POSITIVE),
                d.number("outsideDiameter", Kind.LENGTH, Limit.POSITIVE),
                d.number("rootDiameter", Kind.LENGTH, Limit.POSITIVE),
                d.number("wholeDepth", Kind.LENGTH, Limit.POSITIVE),
                d.integer("spanTeeth", 1, 10_000),
                d.number("span", Kind.LENGTH, Limit.POSITIVE),
                d.number("pinDiameter", Kind.LENGTH, Limit.POSITIVE),
                d.number("overPins", Kind.LENGTH, Limit.POSITIVE));
    }

    static Optional<HobSpec> hob(FieldReader f, List<Finding> out) {
        int before = errors(out);
        Optional<Pitch> pitch = SplineParts.pitch(f);
        double alpha = f.requiredAngle("pressureAngle", Limit.range(1, 45), "give the hob's pressure angle, e.g. 20");
        int starts = f.requiredInt("starts", 1, 12, "give the number of starts, usually 1");
        Optional<String> hand = f.has("hand") ? f.choice("hand", HANDS)
                : f.requiredText("hand", "\"right\" or \"left\" as marked on the hob");
        double outside = f.required("outsideDiameter", Kind.LENGTH, Limit.POSITIVE, "give the hob's outside diameter");
        OptionalDouble lead = f.angle("leadAngle", Limit.range(0, 45));
        OptionalDouble reference = f.number("referenceDiameter", Kind.LENGTH, Limit.POSITIVE);
        int gashes = f.requiredInt("gashes", 1, 1000, "give the number of gashes (flutes)");
        double length = f.required("length", Kind.LENGTH, Limit.POSITIVE, "give the usable hob length");
        OptionalDouble maxRpm = f.number("maxRpm", Kind.PLAIN, Limit.POSITIVE);
        Optional<String> material = f.has("material") ? f.choice("material", HOB_MATERIALS)
                : f.requiredText("material", "use one of " + String.join(", ", HOB_MATERIALS));
        Optional<CuttingSense> sense = f.choice("cuttingSense", SENSES)
                .map(w -> w.equals(CuttingSense.CLOCKWISE.word()) ? CuttingSense.CLOCKWISE : CuttingSense.COUNTER_CLOCKWISE);
        Optional<String> identifier = f.text("identifier");
        Optional<SplineHobProfile> profile = SplineParts.hobProfile(f);
        if (errors(out) > before) {
            return Optional.empty();
        }
        return Optional.of(new HobSpec(pitch.orElseThrow(), alpha, starts, Hand.fromWord(hand.orElseThrow()), outside,
                lead, reference, gashes, length, maxRpm, material.orElseThrow(), sense, identifier, profile));
    }

    static int errors(List<Finding> out) {
        return (int) out.stream().filter(Finding::isError).count();
    }
}
