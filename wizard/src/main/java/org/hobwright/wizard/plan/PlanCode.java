package org.hobwright.wizard.plan;

import static org.hobwright.api.check.Severity.ERROR;
import static org.hobwright.api.check.Severity.INFO;
import static org.hobwright.api.check.Severity.WARNING;

import java.util.Collections;
import java.util.EnumSet;
import java.util.Set;
import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/**
 * Stable finding codes of the planner, each with the severities it takes (the first is the usual
 * one), the field it names, its meaning and its source; listed in {@code wizard/FINDINGS.md}.
 * Codes are never reused for another meaning. Retired: {@code PLAN_HELIX_NOT_FOLLOWED} and
 * {@code PLAN_HOB_TOO_LARGE} (the engineering checks {@code MACHINE_NO_HELIX} and
 * {@code MACHINE_HOB_TOO_LARGE} report these before planning starts).
 */
public enum PlanCode implements FindingCode {
    PLAN_SYNC_RATIO_TOO_HIGH("gear.teeth", "z₂/z₀ above the machine's largest sync ratio",
            PlanSources.MACHINE, ERROR),
    PLAN_NO_DEPTH("gear.blankDiameter", "blank not above the root diameter, or root not above 0",
            "ISO 21771 (root diameter)", ERROR),
    PLAN_HOB_TOO_SMALL("hob.outsideDiameter", "hob radius not larger than the depth to cut",
            "cut geometry, FORMULAS.md §7.1", ERROR),
    PLAN_SWIVEL_BEYOND_HOLDER("machine.swivel.maxAngle", "swivel setting beyond the holder's range",
            PlanSources.MACHINE, ERROR),
    PLAN_CUTTING_DATA_MISSING("cycle.workMaterial or hob.material", "no table row for the work and hob material"
            + " (the field names the unknown one), and a speed or feed left open",
            PlanSources.TABLE, ERROR),
    PLAN_SPEED_WINDOW_EMPTY("machine", "no hob speed meets both the minimum and maximum limits",
            PlanSources.MACHINE, ERROR),
    PLAN_TRAVEL_RADIAL("machine.travel.radialMax or radialMin", "a step outside the radial travel",
            PlanSources.MACHINE, ERROR),
    PLAN_TRAVEL_AXIAL("machine.travel.axialMin or axialMax", "a step outside the axial travel",
            PlanSources.MACHINE, ERROR),
    PLAN_TOO_MANY_PASSES("cycle.roughDepth", "the roughing depth splits the depth into more passes than a cycle may"
            + " have", "Hobwright limit of " + PassDepths.MAX_PASSES + " passes (bounds the program size)", ERROR),
    PLAN_INVARIANT_BROKEN("job", "a safety invariant failed inside the planner, or the analysis gave no geometry"
            + " without an error (a defect: report it)", "Hobwright safety invariants", ERROR),
    PLAN_HOB_RPM_CAPPED("cycle.cuttingSpeed", "hob speed lowered to a machine or hob limit",
            PlanSources.MACHINE, WARNING),
    PLAN_HOB_RPM_RAISED("cycle.cuttingSpeed", "hob speed raised to a machine minimum",
            PlanSources.MACHINE, WARNING),
    PLAN_CUTTING_SPEED_OUTSIDE_TABLE("cycle.cuttingSpeed",
            "cutting speed outside the table range (info when a machine or hob limit caused it)",
            PlanSources.TABLE, WARNING, INFO),
    PLAN_FEED_OUTSIDE_TABLE("cycle.roughFeed, cycle.finishFeed", "a given feed outside the table range",
            PlanSources.TABLE, WARNING),
    PLAN_FEED_RATE_CAPPED("cycle.roughFeed, cycle.finishFeed", "feed lowered to the machine's maximum feed rate",
            PlanSources.MACHINE, WARNING),
    PLAN_FEED_MARK_OVER_TARGET("cycle.finishFeed", "predicted flank feed marks above the target",
            "feed-mark depth, FORMULAS.md §6.1 (derived for helical gears)", WARNING),
    PLAN_ENVELOPING_OVER_TARGET("hob.gashes", "predicted enveloping flats above the target",
            "enveloping depth, FORMULAS.md §6.2 (derived)", WARNING),
    PLAN_CHIP_OVER_LIMIT("cycle.roughFeed", "Hoffmeister chip thickness above the limit",
            "Hoffmeister 1970 (exponents from memory)", WARNING),
    PLAN_CLEARANCE_SMALL("cycle.radialClearance, cycle.axialClearance", "a clearance below 0.5 mm",
            PlanSources.NO_SOURCE, WARNING),
    PLAN_HOB_SHIFT_NO_ROOM("hob.length", "hob too short to shift beyond its working width",
            PlanSources.NO_SOURCE, WARNING),
    PLAN_HOB_SHIFT_STEP_TOO_LARGE("cycle.hobShift.perPart", "shift step larger than the usable range (not shifted)",
            PlanSources.NO_SOURCE, WARNING),
    PLAN_FASTEST_NONE("cycle.workMaterial, machine", "no fastest cycle: no table row, or no feasible speed",
            PlanSources.TABLE + "; " + PlanSources.MACHINE, WARNING),
    PLAN_FEED_LOWERED_FOR_TARGET("cycle.roughFeed, cycle.finishFeed",
            "a default feed set below the table range to meet a target", PlanSources.TABLE, INFO),
    PLAN_CHIP_LIMIT_UNKNOWN("cycle.targets.maxChipThickness", "no chip-thickness limit known, not checked",
            PlanSources.TABLE, INFO),
    PLAN_SWIVEL_ROUNDED("machine.swivel.resolution", "the holder's resolution rounds the swivel",
            PlanSources.MACHINE, INFO),
    PLAN_HOB_SENSE_ASSUMED("hob.cuttingSense",
            "the hob's cutting sense is not given; clockwise seen from its drive end is taken", PlanSources.NO_SOURCE,
            INFO),
    PLAN_HOB_TURNED_ROUND("cycle.hobTurnedRound",
            "the hob is turned round on its arbor: the spindle runs against the sense marked on the hob",
            "hob cutting sense, FORMULAS.md §7.4", WARNING),
    PLAN_HOB_SHIFT_NO_AXIS("cycle.hobShift.perPart", "shift asked for on a machine without a shift axis",
            PlanSources.MACHINE, INFO),
    PLAN_MACHINE_TIME_UNKNOWN("machine.times", "a time the cycle or the batch counts is not in the machine profile:"
            + " counted as 0 s", PlanSources.MACHINE, INFO),
    PLAN_FASTEST("cycle.fastest", "the fastest cycle, its proved lower bound and binding limits",
            "fastest-cycle search (derived)", INFO);

    private final String field;
    private final String meaning;
    private final String source;
    private final Severity severity;
    private final Set<Severity> severities;

    PlanCode(String field, String meaning, String source, Severity severity, Severity... others) {
        this.field = field;
        this.meaning = meaning;
        this.source = source;
        this.severity = severity;
        this.severities = Collections.unmodifiableSet(EnumSet.of(severity, others));
    }

    @Override
    public String code() {
        return name();
    }

    @Override
    public Severity severity() {
        return severity;
    }

    @Override
    public Set<Severity> severities() {
        return severities;
    }

    /** The input field findings of this code name (job-file path). */
    public String field() {
        return field;
    }

    @Override
    public String meaning() {
        return meaning;
    }

    @Override
    public String source() {
        return source;
    }
}
