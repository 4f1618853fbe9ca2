package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.MachineTimes;
import org.hobwright.api.job.SwivelHolder;
import org.hobwright.api.job.Units;
import org.hobwright.wizard.store.FieldReader.Kind;

/** Builds a {@link MachineFile} from the keys of a machine profile (a file or a job's inline machine). */
final class MachineReader {
    static final String SCALE_DM = "degrees-minutes";
    static final String SCALE_DEC = "decimal-degrees";
    /** Clockwise-turning hob teeth move toward the chuck at the work. */
    static final String TOWARD_CHUCK = "toward-chuck";
    /** Clockwise-turning hob teeth move away from the chuck at the work (the default). */
    static final String AWAY_FROM_CHUCK = "away-from-chuck";
    static final List<String> TEETH_MOVES = List.of(AWAY_FROM_CHUCK, TOWARD_CHUCK);

    private MachineReader() {
    }

    /** Reads a whole machine file. */
    static Loaded<MachineFile> read(JsonDocument doc) {
        return FileFormat.MACHINE.open(doc).then(d -> {
            List<Finding> out = new ArrayList<>();
            Optional<Units> units = FieldReader.root(d, out, Units.MM).units("units");
            if (units.isEmpty()) {
                return Loaded.unreadable(out);
            }
            Optional<MachineFile> m = body(FieldReader.root(d, out, units.get()), out);
            return m.isPresent() ? Loaded.of(m.get(), out) : Loaded.failed(out);
        });
    }

    /** Reads the machine keys of {@code f}; its units are used unless it states its own. */
    static Optional<MachineFile> body(FieldReader f, List<Finding> out) {
        int errorsBefore = (int) out.stream().filter(Finding::isError).count();
        String name = f.requiredText("name", "give the machine a name").orElse("");
        if (!name.isEmpty()) {
            f.checkName("name", name);
        }
        String description = f.text("description").orElse("");
        String dialect = f.requiredText("dialect", "name the NC dialect file of this machine's control").orElse("");
        FieldReader work = f.child("workSpindle");
        FieldReader hobSp = f.child("hobSpindle");
        double workMin = work.required("minRpm", Kind.PLAIN, Limit.NON_NEGATIVE, null);
        double workMax = work.required("maxRpm", Kind.PLAIN, Limit.POSITIVE, null);
        double hobMin = hobSp.required("minRpm", Kind.PLAIN, Limit.NON_NEGATIVE, null);
        double hobMax = hobSp.required("maxRpm", Kind.PLAIN, Limit.POSITIVE, null);
        order(work, "minRpm", workMin, "maxRpm", workMax, false);
        order(hobSp, "minRpm", hobMin, "maxRpm", hobMax, false);
        double sync = f.required("maxSyncRatio", Kind.PLAIN, Limit.POSITIVE, null);
        boolean followsHelix = f.bool("followsHelix", false);
        FieldReader sw = f.child("swivel");
        if (!f.has("swivel")) {
            f.missing("swivel", "describe the swivel holder: scale, resolution, maxAngle, positiveSense");
        }
        String scale = sw.choice("scale", List.of(SCALE_DM, SCALE_DEC)).orElse(SCALE_DEC);
        if (f.has("swivel") && !sw.has("scale")) {
            sw.missing("scale", "degrees-minutes or decimal-degrees");
        }
        double resolution = sw.angle("resolution", Limit.range(1e-6, 1),
                SCALE_DM.equals(scale) ? 1.0 / 60 : 0.001);
        boolean programmable = sw.bool("programmable", false);
        double maxAngle = f.has("swivel") ? sw.requiredAngle("maxAngle", Limit.range(0, 90), null) : 0;
        String sense = f.has("swivel") ? sw.requiredText("positiveSense",
                "say in words which way a positive setting turns the hob").orElse("") : "";
        boolean positiveIsRight = sw.bool("positiveIsRight", true);
        FieldReader tr = f.child("travel");
        double radialMin = tr.number("radialMin", Kind.LENGTH, Limit.NON_NEGATIVE, 0);
        double radialMax = tr.required("radialMax", Kind.LENGTH, Limit.POSITIVE, null);
        double axialMin = tr.required("axialMin", Kind.LENGTH, Limit.ANY, null);
        double axialMax = tr.required("axialMax", Kind.LENGTH, Limit.ANY, null);
        order(tr, "radialMin", radialMin, "radialMax", radialMax, true);
        order(tr, "axialMin", axialMin, "axialMax", axialMax, true);
        OptionalDouble shift = tr.number("hobShift", Kind.LENGTH, Limit.NON_NEGATIVE);
        double rapid = f.required("rapid", Kind.LENGTH_PER_MIN, Limit.POSITIVE, null);
        double maxFeed = f.required("maxFeed", Kind.LENGTH_PER_MIN, Limit.POSITIVE, null);
        double settle = f.number("syncSettle", Kind.PLAIN, Limit.NON_NEGATIVE, 0);
        double maxHob = f.required("maxHobDiameter", Kind.LENGTH, Limit.POSITIVE, null);
        boolean towardChuck = hobSp.choice("clockwiseTeethMove", TEETH_MOVES).map(TOWARD_CHUCK::equals).orElse(false);
        boolean phased = work.bool("phasedSync", false);
        FieldReader t = f.child("times");
        MachineTimes times = new MachineTimes(t.number("load", Kind.PLAIN, Limit.NON_NEGATIVE),
                t.number("unload", Kind.PLAIN, Limit.NON_NEGATIVE), t.number("swivel", Kind.PLAIN, Limit.NON_NEGATIVE),
                t.number("hobShift", Kind.PLAIN, Limit.NON_NEGATIVE),
                t.number("hobChange", Kind.PLAIN, Limit.NON_NEGATIVE));
        if (out.stream().filter(Finding::isError).count() > errorsBefore) {
            return Optional.empty();
        }
        MachineProfile p = new MachineProfile(name, dialect, workMin, workMax, hobMin, hobMax, sync, followsHelix,
                new SwivelHolder(SCALE_DM.equals(scale) ? SwivelHolder.SwivelScale.DEGREES_MINUTES
                        : SwivelHolder.SwivelScale.DECIMAL_DEGREES, resolution, programmable, maxAngle, sense,
                        positiveIsRight),
                radialMin, radialMax, axialMin, axialMax,
                shift.isPresent() && shift.getAsDouble() > 0 ? shift : OptionalDouble.empty(),
                rapid, maxFeed, settle, maxHob, towardChuck, times, phased);
        return Optional.of(new MachineFile(p, f.units(), description));
    }

    private static void order(FieldReader f, String lowKey, double low, String highKey, double high, boolean strict) {
        if (Double.isFinite(low) && Double.isFinite(high) && (strict ? low >= high : low > high)) {
            f.problem(InputCode.INPUT_CONFLICT, lowKey, f.path(lowKey) + " (" + FieldReader.format(low) + ") must be "
                    + (strict ? "less than " : "at most ") + f.path(highKey) + " (" + FieldReader.format(high) + ")",
                    "swap or correct the two values");
        }
    }
}
