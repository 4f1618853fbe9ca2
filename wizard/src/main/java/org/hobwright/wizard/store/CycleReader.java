package org.hobwright.wizard.store;

import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.api.job.RunSettings;
import org.hobwright.api.job.Units;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Reads the cycle keys of a job or template by the field table ({@link JobFields#cycle()}), and
 * converts a template's cycle keys into another unit so that they can fill a job's missing keys.
 * Defaults for keys left out and where they come from are the table's; speeds, feeds and depths
 * left out are chosen by the planner.
 */
final class CycleReader {
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
        Optional<String> material = f.text(JobFields.CYCLE_WORK_MATERIAL);
        if (needMaterial && !f.has(JobFields.CYCLE_WORK_MATERIAL)) {
            f.missing("workMaterial", "name the work material, e.g. steel-free-machining or brass, in the"
                    + " job's cycle or in its template");
        }
        OptionalDouble speed = f.number(JobFields.CYCLE_CUTTING_SPEED);
        OptionalDouble rough = f.number(JobFields.CYCLE_ROUGH_FEED);
        OptionalDouble finish = f.number(JobFields.CYCLE_FINISH_FEED);
        OptionalDouble depth = f.number(JobFields.CYCLE_ROUGH_DEPTH);
        double stock = f.value(JobFields.CYCLE_FINISH_STOCK);
        HobbingMethod method = f.word(JobFields.CYCLE_METHOD).filter("conventional"::equals).isPresent()
                ? HobbingMethod.CONVENTIONAL : HobbingMethod.CLIMB;
        double axial = f.value(JobFields.CYCLE_AXIAL_CLEARANCE);
        double radial = f.value(JobFields.CYCLE_RADIAL_CLEARANCE);
        boolean coolant = f.bool(JobFields.CYCLE_COOLANT);
        FieldReader t = f.child("targets");
        OptionalDouble mark = t.number(JobFields.TARGET_FEED_MARK_DEPTH);
        OptionalDouble env = t.number(JobFields.TARGET_ENVELOPING_DEPTH);
        OptionalDouble chip = t.number(JobFields.TARGET_MAX_CHIP_THICKNESS);
        FieldReader s = f.child("hobShift");
        double perPart = s.value(JobFields.HOB_SHIFT_PER_PART);
        int every = s.integer(JobFields.HOB_SHIFT_EVERY_PARTS).orElse(1);
        boolean fastest = f.bool(JobFields.CYCLE_FASTEST);
        int batch = f.integer(JobFields.CYCLE_BATCH_SIZE).orElse(1);
        OptionalInt program = f.integer(JobFields.CYCLE_PROGRAM_NUMBER);
        OptionalInt station = f.integer(JobFields.CYCLE_TOOL_STATION);
        boolean turnedRound = f.bool(JobFields.CYCLE_HOB_TURNED_ROUND);
        OptionalDouble life = f.child("hobLife").number(JobFields.HOB_LIFE_PER_TOOTH);
        return new Values(material, speed, rough, finish, depth, stock, method, axial, radial, coolant,
                new QualityTargets(mark, env, chip), perPart, every, fastest,
                new RunSettings(batch, program, station, turnedRound, life));
    }

    /**
     * A copy of a cycle tree with its numbers converted from one unit to another (lengths, feeds,
     * and cutting speed between m/min and ft/min, as the table's unit kinds say). Other values are
     * copied as they are.
     */
    static ObjectNode convert(ObjectNode cycle, Units from, Units to) {
        ObjectNode copy = cycle.deepCopy();
        if (from == to) {
            return copy;
        }
        for (FieldDef f : JobFields.cycle()) {
            String[] parts = f.key().split("\\.");
            JsonNode parent = copy;
            for (int i = 1; i < parts.length - 1 && parent != null; i++) {
                parent = parent.get(parts[i]);
            }
            String leaf = f.leaf();
            if (f.unit().followsUnits() && parent instanceof ObjectNode p && p.has(leaf) && p.get(leaf).isNumber()) {
                double canonical = f.unit().toCanonical(p.get(leaf).doubleValue(), from);
                p.put(leaf, JsonNumbers.tidy(f.unit().fromCanonical(canonical, to)));
            }
        }
        return copy;
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
