package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.MachineFields;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.MachineTimes;
import org.hobwright.api.job.SwivelHolder;
import org.hobwright.api.job.Units;

/** Builds a {@link MachineFile} from the keys of a machine profile (a file or a job's inline machine). */
final class MachineReader {
    static final String SCALE_DM = MachineFields.SCALES.get(0);
    static final String SCALE_DEC = MachineFields.SCALES.get(1);
    /** Clockwise-turning hob teeth move away from the chuck at the work (the default). */
    static final String AWAY_FROM_CHUCK = MachineFields.TEETH_MOVES.get(0);
    /** Clockwise-turning hob teeth move toward the chuck at the work. */
    static final String TOWARD_CHUCK = MachineFields.TEETH_MOVES.get(1);

    private MachineReader() {
    }

    /** Reads a whole machine file. */
    static Loaded<MachineFile> read(JsonDocument doc) {
        return FileFormat.MACHINE.open(doc).then(d -> {
            List<Finding> out = new ArrayList<>(FileFormat.MACHINE.structure(d));
            Optional<Units> units = FieldReader.root(d, out, Units.MM).units("units");
            if (units.isEmpty()) {
                return Loaded.unreadable(out);
            }
            Optional<MachineFile> m = body(FieldReader.root(d, out, units.get()), out);
            return m.isPresent() && !Finding.anyError(out) ? Loaded.of(m.get(), out) : Loaded.failed(out);
        });
    }

    /** Reads the machine keys of {@code f} by the field table ({@link MachineFields}); its units are used unless it states its own. */
    static Optional<MachineFile> body(FieldReader f, List<Finding> out) {
        int errorsBefore = JobParts.errors(out);
        String name = f.text(MachineFields.NAME).orElse("");
        String description = f.text(MachineFields.DESCRIPTION).orElse("");
        String dialect = f.text(MachineFields.DIALECT).orElse("");
        FieldReader work = f.child("workSpindle");
        FieldReader hobSp = f.child("hobSpindle");
        double workMin = work.value(MachineFields.WORK_MIN_RPM);
        double workMax = work.value(MachineFields.WORK_MAX_RPM);
        double hobMin = hobSp.value(MachineFields.HOB_MIN_RPM);
        double hobMax = hobSp.value(MachineFields.HOB_MAX_RPM);
        order(work, "minRpm", workMin, "maxRpm", workMax, false);
        order(hobSp, "minRpm", hobMin, "maxRpm", hobMax, false);
        double sync = f.value(MachineFields.MAX_SYNC_RATIO);
        boolean followsHelix = f.bool(MachineFields.FOLLOWS_HELIX);
        FieldReader sw = f.child("swivel");
        if (!f.has("swivel")) {
            f.missing("swivel", "describe the swivel holder: scale, resolution, maxAngle, positiveSense");
        }
        boolean swivel = f.has("swivel");
        String scale = swivel ? sw.text(MachineFields.SWIVEL_SCALE).orElse(SCALE_DEC) : SCALE_DEC;
        double resolution = sw.number(MachineFields.SWIVEL_RESOLUTION)
                .orElse(SCALE_DM.equals(scale) ? 1.0 / 60 : 0.001);
        boolean programmable = sw.bool(MachineFields.SWIVEL_PROGRAMMABLE);
        double maxAngle = swivel ? sw.value(MachineFields.SWIVEL_MAX_ANGLE) : 0;
        String sense = swivel ? sw.text(MachineFields.SWIVEL_POSITIVE_SENSE).orElse("") : "";
        boolean positiveIsRight = sw.bool(MachineFields.SWIVEL_POSITIVE_IS_RIGHT);
        FieldReader tr = f.child("travel");
        double radialMin = tr.value(MachineFields.RADIAL_MIN);
        double radialMax = tr.value(MachineFields.RADIAL_MAX);
        double axialMin = tr.value(MachineFields.AXIAL_MIN);
        double axialMax = tr.value(MachineFields.AXIAL_MAX);
        order(tr, "radialMin", radialMin, "radialMax", radialMax, true);
        order(tr, "axialMin", axialMin, "axialMax", axialMax, true);
        OptionalDouble shift = tr.number(MachineFields.SHIFT_TRAVEL);
        double rapid = f.value(MachineFields.RAPID);
        double maxFeed = f.value(MachineFields.MAX_FEED);
        double settle = f.value(MachineFields.SYNC_SETTLE);
        double maxHob = f.value(MachineFields.MAX_HOB_DIAMETER);
        boolean towardChuck = hobSp.word(MachineFields.HOB_CLOCKWISE_TEETH_MOVE).map(TOWARD_CHUCK::equals).orElse(false);
        boolean phased = work.bool(MachineFields.WORK_PHASED_SYNC);
        FieldReader t = f.child("times");
        MachineTimes times = new MachineTimes(t.number(MachineFields.TIME_LOAD), t.number(MachineFields.TIME_UNLOAD),
                t.number(MachineFields.TIME_SWIVEL), t.number(MachineFields.TIME_HOB_SHIFT),
                t.number(MachineFields.TIME_HOB_CHANGE));
        if (JobParts.errors(out) > errorsBefore) {
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
