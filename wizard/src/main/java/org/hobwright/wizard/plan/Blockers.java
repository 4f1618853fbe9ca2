package org.hobwright.wizard.plan;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.store.CuttingData;
import org.hobwright.wizard.store.CuttingDataTable;

/**
 * The problems that stop a cycle from being planned at all; each becomes an error finding naming
 * the field and a fix. Problems of the job itself (a helix the machine cannot follow, a hob the
 * holder cannot take, ...) are the engineering checks' and stop planning before it starts; these
 * are the ones that need the plan's own numbers (ratio, rounded swivel setting, depth, speed window,
 * cutting data).
 */
final class Blockers {
    private final HobJob job;
    private final CuttingDataTable table;
    private final List<Finding> findings;

    Blockers(HobJob job, CuttingDataTable table, List<Finding> findings) {
        this.job = job;
        this.table = table;
        this.findings = findings;
    }

    void check(SyncRatio ratio, SwivelSetting swivel, double touchOff, double root, double roughDepth,
               SpeedWindow window, Optional<CuttingData> row) {
        HobSpec hob = job.hob();
        MachineProfile machine = job.machine();
        if (ratio.hobTurnsPerWorkTurn() > machine.maxSyncRatio()) {
            error(PlanCode.PLAN_SYNC_RATIO_TOO_HIGH, "gear.teeth", "the sync ratio " + ratio.hobTurns() + ":"
                    + ratio.workTurns() + " is more than the machine's largest ratio "
                    + Decimal.fixed(machine.maxSyncRatio(), 1), "use a hob with more starts");
        }
        double depth = (touchOff - root) / 2;
        if (!(root > 0) || !(depth > 0)) {
            error(PlanCode.PLAN_NO_DEPTH, "gear.blankDiameter", "the blank diameter " + Decimal.fixed(touchOff, 4)
                    + " mm must be larger than the root diameter " + Decimal.fixed(root, 4)
                    + " mm, which must be above 0",
                    "check the blank diameter, the tooth count and the tooth system");
        } else if (depth >= hob.outsideDiameterMm() / 2) {
            error(PlanCode.PLAN_HOB_TOO_SMALL, "hob.outsideDiameter", "the hob radius "
                    + Decimal.fixed(hob.outsideDiameterMm() / 2, 3) + " mm is not larger than the "
                    + Decimal.fixed(depth, 3) + " mm depth to cut",
                    "use a larger hob");
        } else {
            passes(depth, roughDepth);
        }
        if (Math.abs(swivel.machineAngleDeg()) > machine.swivel().maxAngleDeg()) {
            error(PlanCode.PLAN_SWIVEL_BEYOND_HOLDER, "machine.swivel.maxAngle", "the swivel setting " + swivel.text()
                    + " is beyond the holder's " + machine.swivel().maxAngleDeg() + " degrees",
                    "use a hob of the same hand as the gear (smaller swivel) or another holder");
        }
        if (!window.isOpen()) {
            error(PlanCode.PLAN_SPEED_WINDOW_EMPTY, "machine", "no hob speed satisfies both the " + window.minLimit()
                    + " (" + Decimal.fixed(window.minRpm(), 1) + " rpm) and the " + window.maxLimit() + " ("
                    + Decimal.fixed(window.maxRpm(), 1)
                    + " rpm)", "check the spindle limits of the machine profile and the hob");
        }
        boolean open = job.cycle().cuttingSpeedMPerMin().isEmpty() || job.cycle().roughFeedMmPerRev().isEmpty()
                || job.cycle().finishFeedMmPerRev().isEmpty();
        if (row.isEmpty() && open) {
            cuttingDataMissing(hob);
        }
    }

    /**
     * No row for the pair of materials: names the hob material when the work material has rows for
     * other hobs, else the work material.
     */
    private void cuttingDataMissing(HobSpec hob) {
        String work = job.cycle().workMaterial();
        List<String> hobs = table.hobMaterialsFor(work);
        String open = ", and the cycle leaves the cutting speed or a feed open";
        String give = "give cycle.cuttingSpeed, roughFeed and finishFeed, or add a row to your cutting-data table";
        if (hobs.isEmpty()) {
            error(PlanCode.PLAN_CUTTING_DATA_MISSING, "cycle.workMaterial", "the cutting-data table has no row for "
                    + work + " with any hob" + open, give);
        } else {
            error(PlanCode.PLAN_CUTTING_DATA_MISSING, "hob.material", "the cutting-data table has no row for "
                    + work + " with a " + hob.material() + " hob, only with " + String.join(" or ", hobs) + " hobs"
                    + open, "use a " + String.join(" or ", hobs) + " hob, or " + give);
        }
    }

    private void passes(double depth, double roughDepth) {
        double stock = job.cycle().finishStockMm();
        double passes = PassDepths.count(depth, roughDepth, stock);
        if (passes > PassDepths.MAX_PASSES) {
            int roughPasses = PassDepths.MAX_PASSES - (stock > 0 ? 1 : 0);
            double least = (depth - stock) / roughPasses;
            error(PlanCode.PLAN_TOO_MANY_PASSES, "cycle.roughDepth", "a roughing depth of " + Decimal.exact(roughDepth)
                    + " mm splits the " + Decimal.fixed(depth, 4) + " mm depth into " + Decimal.plain(passes, 0)
                    + " passes; a cycle may have at most " + PassDepths.MAX_PASSES, "give a roughing depth of at least "
                    + Decimal.fixed(least, 4, true, Decimal.Rounding.CEILING) + " mm per pass (check the unit)");
        }
    }

    private void error(PlanCode code, String field, String message, String fix) {
        findings.add(code.at(field, message, fix));
    }
}
