package org.hobwright.wizard.store;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.api.job.RunSettings;
import org.hobwright.api.job.Units;
import org.hobwright.wizard.store.FieldReader.Kind;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Reads the cycle keys of a job or template, and converts a template's cycle keys into another
 * unit so that they can fill a job's missing keys.
 *
 * <p>Defaults for keys left out (common practice, no source): finish stock 0 (one pass to full
 * depth), climb hobbing, 1 mm axial and radial clearance, coolant on, no hob shift, no
 * optimiser proposal. Speeds, feeds and depths left out are chosen by the planner.
 */
final class CycleReader {
    /** Default axial and radial clearance, mm (common practice, no source). */
    static final double DEFAULT_CLEARANCE_MM = 1.0;

    /** Numeric cycle keys (dotted below the cycle object) and how their values convert between units. */
    static final Map<String, Kind> NUMERIC_KEYS = Map.ofEntries(
            Map.entry("cuttingSpeed", Kind.CUTTING_SPEED), Map.entry("roughFeed", Kind.LENGTH),
            Map.entry("finishFeed", Kind.LENGTH), Map.entry("roughDepth", Kind.LENGTH),
            Map.entry("finishStock", Kind.LENGTH), Map.entry("axialClearance", Kind.LENGTH),
            Map.entry("radialClearance", Kind.LENGTH), Map.entry("targets.feedMarkDepth", Kind.PLAIN),
            Map.entry("targets.envelopingDepth", Kind.PLAIN), Map.entry("targets.maxChipThickness", Kind.LENGTH),
            Map.entry("hobShift.perPart", Kind.LENGTH), Map.entry("hobShift.everyParts", Kind.PLAIN),
            Map.entry("batchSize", Kind.PLAIN), Map.entry("programNumber", Kind.PLAIN),
            Map.entry("toolStation", Kind.PLAIN), Map.entry("hobLife.lengthPerTooth", Kind.PLAIN));

    static final List<String> METHODS = List.of("climb", "conventional");

    /** Largest batch one plan covers. */
    static final int MAX_BATCH = 1_000_000;

    private CycleReader() {
    }

    /** Whatever the reading found; {@code workMaterial} may be missing in a template. */
    record Values(Optional<String> workMaterial, OptionalDouble cuttingSpeed, OptionalDouble roughFeed,
                  OptionalDouble finishFeed, OptionalDouble roughDepth, double finishStock, HobbingMethod method,
                  double axialClearance, double radialClearance, boolean coolant, QualityTargets targets,
                  double shiftPerPart, int shiftEvery, boolean fastest, RunSettings run) {

        CycleSettings settings() {
            return new CycleSettings(workMaterial.orElseThrow(), cuttingSpeed, roughFeed, finishFeed, roughDepth,
                    finishStock, method, axialClearance, radialClearance, coolant, targets, shiftPerPart, shiftEvery,
                    fastest, run);
        }
    }

    /** Reads the cycle keys of {@code f}; when {@code needMaterial}, a missing work material is an error. */
    static Values read(FieldReader f, boolean needMaterial) {
        Optional<String> material = needMaterial
                ? f.requiredText("workMaterial", "name the work material, e.g. steel-free-machining or brass, in the"
                        + " job's cycle or in its template")
                : f.text("workMaterial");
        OptionalDouble speed = f.number("cuttingSpeed", Kind.CUTTING_SPEED, Limit.POSITIVE);
        OptionalDouble rough = f.number("roughFeed", Kind.LENGTH, Limit.POSITIVE);
        OptionalDouble finish = f.number("finishFeed", Kind.LENGTH, Limit.POSITIVE);
        OptionalDouble depth = f.number("roughDepth", Kind.LENGTH, Limit.POSITIVE);
        double stock = f.number("finishStock", Kind.LENGTH, Limit.NON_NEGATIVE, 0);
        HobbingMethod method = f.choice("method", METHODS)
                .map(m -> m.equals("climb") ? HobbingMethod.CLIMB : HobbingMethod.CONVENTIONAL)
                .orElse(HobbingMethod.CLIMB);
        double axial = f.number("axialClearance", Kind.LENGTH, Limit.NON_NEGATIVE, DEFAULT_CLEARANCE_MM);
        double radial = f.number("radialClearance", Kind.LENGTH, Limit.NON_NEGATIVE, DEFAULT_CLEARANCE_MM);
        boolean coolant = f.bool("coolant", true);
        FieldReader t = f.child("targets");
        OptionalDouble mark = t.number("feedMarkDepth", Kind.PLAIN, Limit.POSITIVE);
        OptionalDouble env = t.number("envelopingDepth", Kind.PLAIN, Limit.POSITIVE);
        OptionalDouble chip = t.number("maxChipThickness", Kind.LENGTH, Limit.POSITIVE);
        FieldReader s = f.child("hobShift");
        double perPart = s.number("perPart", Kind.LENGTH, Limit.NON_NEGATIVE, 0);
        int every = s.integer("everyParts", 1, Integer.MAX_VALUE, 1);
        boolean fastest = f.bool("fastest", false);
        int batch = f.integer("batchSize", 1, MAX_BATCH, 1);
        OptionalInt program = f.integer("programNumber", 0, 99_999_999);
        OptionalInt station = f.integer("toolStation", 0, 99_999);
        boolean turnedRound = f.bool("hobTurnedRound", false);
        OptionalDouble life = f.child("hobLife").number("lengthPerTooth", Kind.PLAIN, Limit.POSITIVE);
        return new Values(material, speed, rough, finish, depth, stock, method, axial, radial, coolant,
                new QualityTargets(mark, env, chip), perPart, every, fastest,
                new RunSettings(batch, program, station, turnedRound, life));
    }

    /**
     * A copy of a cycle tree with its numbers converted from one unit to another (lengths, and
     * cutting speed between m/min and ft/min). Non-numeric values are copied as they are.
     */
    static ObjectNode convert(ObjectNode cycle, Units from, Units to) {
        ObjectNode copy = cycle.deepCopy();
        if (from == to) {
            return copy;
        }
        NUMERIC_KEYS.forEach((key, kind) -> {
            String[] parts = key.split("\\.");
            JsonNode parent = parts.length == 1 ? copy : copy.get(parts[0]);
            String leaf = parts[parts.length - 1];
            if (parent instanceof ObjectNode p && p.has(leaf) && p.get(leaf).isNumber()) {
                double v = p.get(leaf).doubleValue();
                double out = switch (kind) {
                    case PLAIN -> v;
                    case LENGTH, LENGTH_PER_MIN -> to.fromMm(from.toMm(v));
                    case CUTTING_SPEED -> speedTo(to, speedToMPerMin(from, v));
                };
                if (kind == Kind.PLAIN) {
                    return;
                }
                p.put(leaf, JsonNumbers.tidy(out));
            }
        });
        return copy;
    }

    /** m/min from a cutting speed in a file's speed unit (ft/min in inch files; 1 ft = 0.3048 m). */
    static double speedToMPerMin(Units units, double v) {
        return units == Units.IN ? v * FieldReader.M_PER_FT : v;
    }

    /** A cutting speed in m/min, in a file's speed unit. */
    static double speedTo(Units units, double mPerMin) {
        return units == Units.IN ? mPerMin / FieldReader.M_PER_FT : mPerMin;
    }

    /** Fills the keys {@code job} leaves out with the values of {@code template} (one level of objects deep). */
    static void fill(ObjectNode job, ObjectNode template) {
        for (Map.Entry<String, JsonNode> e : template.properties()) {
            JsonNode mine = job.get(e.getKey());
            if (mine == null) {
                job.set(e.getKey(), e.getValue().deepCopy());
            } else if (mine instanceof ObjectNode m && e.getValue() instanceof ObjectNode t) {
                fill(m, t);
            }
        }
    }
}
