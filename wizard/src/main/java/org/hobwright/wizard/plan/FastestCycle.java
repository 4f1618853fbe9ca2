package org.hobwright.wizard.plan;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.FastestProposal;
import org.hobwright.api.cycle.PassSummary;
import org.hobwright.wizard.store.CuttingData;

/**
 * The shortest cycle the machine, the hob, the cutting data and the quality targets allow.
 *
 * <p><b>Problem.</b> Choose the hob speed n₀, the number of roughing passes (the finishing stock is
 * the user's), the roughing feed f_r and the finishing feed f_f to minimise the cycle time
 * <pre>
 * t = t_fixed(passes) + Σ_k 60 (c_r + L_k) / (f_k · n₂),   n₂ = n₀ z₀ / z₂
 * </pre>
 * where t_fixed (settle dwell and rapids) and the pass travels L_k = E_k + b + U_k + 2 c_ax depend on
 * the pass depths only, subject to
 * <pre>
 * n₀ ≤ min(hob spindle max, hob maker's max, work spindle max · z₂/z₀, 1000 v_c,max / (π d_a0))
 * n₀ ≥ max(hob spindle min, work spindle min · z₂/z₀)
 * f_k ≤ table feed max (roughing or finishing),  h_max(f_k, depth of pass k) ≤ chip limit (Hoffmeister),
 * f_f ≤ feed-mark limit,  f_k · n₂ ≤ machine maximum feed rate,  passes ≤ {@value #MAX_PASSES}
 * </pre>
 * <p><b>Lower bound.</b> For fixed pass depths every constraint is an upper bound on n₀, on one f_k,
 * or on the product f_k n₂, and t falls strictly in each of n₀ and f_k. So for those depths no
 * feasible setting is faster than t at n₀ = n₀,max and f_k n₂ = min(f_k,max n₂,max, v_f,max): that
 * time is a lower bound, and it is reached by exactly those settings whenever the speed window is
 * open. The bound over all plans is the least of these over the pass counts 1 … {@value #MAX_PASSES};
 * pass counts are searched in order and the search stops once n (b + 2 c_ax) / v_f,ceiling alone
 * exceeds the best time found, which no larger count can beat. The enveloping depth does not depend
 * on speeds or feeds and is not part of the search. Derived here; no published source.
 */
public final class FastestCycle {
    /** Largest number of passes the optimiser considers. */
    public static final int MAX_PASSES = 8;

    private FastestCycle() {
    }

    /**
     * The optimiser's answer.
     *
     * @param proposal  the proposal shown beside the user's plan
     * @param settings  the proposed speeds, feeds and passes
     */
    public record Result(FastestProposal proposal, PlanSettings settings) {
    }

    /** The limits of the search. */
    public record Limits(SpeedWindow window, CuttingData row, QualityLimits targets, double maxFeedRateMmPerMin,
                         double finishStockMm) {
    }

    /**
     * Searches for the fastest cycle.
     *
     * @return the proposal, or empty with no feasible speed
     */
    public static Optional<Result> find(CycleGeometry g, Drive drive, CutModel model, Limits limits) {
        SpeedWindow w = limits.window();
        double rpm = w.maxRpm();
        String speedLimit = w.maxLimit();
        double tableRpm = Kinematics.hobRpm(limits.row().cuttingSpeed().max(), g.hobOutsideDiameterMm());
        if (tableRpm < rpm) {
            rpm = tableRpm;
            speedLimit = "cutting speed range of the " + PlanSources.TABLE;
        }
        if (!(rpm >= w.minRpm()) || !(rpm > 0)) {
            return Optional.empty();
        }
        double workRpm = drive.workRpm(rpm);
        double rateMax = limits.maxFeedRateMmPerMin();
        double ceiling = Math.min(rateMax,
                workRpm * Math.max(limits.row().roughFeed().max(), limits.row().finishFeed().max()));
        double total = g.totalDepthMm();
        double stock = limits.finishStockMm() >= total ? 0 : limits.finishStockMm();
        Words words = new Words(limits.targets());
        Candidate best = null;
        for (int rough = 1; rough <= MAX_PASSES; rough++) {
            PassDepths depths = PassDepths.of(total, (total - stock) / rough, stock);
            if (depths.count() > MAX_PASSES) {
                break;
            }
            if (best != null && g.syncSettleS() + 60.0 * depths.count() * (g.faceWidthMm() + 2 * g.axialClearanceMm())
                    / ceiling >= best.bound) {
                break;
            }
            Candidate c = candidate(g, drive, model, limits, depths, rpm, workRpm, words);
            if (c != null && (best == null || c.bound < best.bound)) {
                best = c;
            }
        }
        if (best == null) {
            return Optional.empty();
        }
        String binding = "speed: " + speedLimit + "; finishing feed: " + best.finishLimit
                + (best.settings.passes().count() > 1 ? "; roughing feed: " + best.roughLimit : "");
        FastestProposal p = new FastestProposal(best.time, best.bound, binding,
                Kinematics.cuttingSpeed(rpm, g.hobOutsideDiameterMm()), rpm, best.settings.roughFeedMmPerRev(),
                best.settings.finishFeedMmPerRev(), best.settings.passes().count());
        return Optional.of(new Result(p, best.settings));
    }

    private record Candidate(PlanSettings settings, double time, double bound, String roughLimit,
                             String finishLimit) {
    }

    private static Candidate candidate(CycleGeometry g, Drive drive, CutModel model, Limits limits,
                                       PassDepths depths, double rpm, double workRpm, Words words) {
        int last = depths.count() - 1;
        FeedLimit finish = new FeedLimit(limits.row().finishFeed().max(), Words.FINISH_TABLE)
                .orBelow(limits.maxFeedRateMmPerMin() / workRpm, Words.FEED_RATE)
                .orBelow(model.feedForFeedMark(limits.targets().feedMarkUm()), words.feedMark);
        FeedLimit rough = new FeedLimit(limits.row().roughFeed().max(), Words.ROUGH_TABLE)
                .orBelow(limits.maxFeedRateMmPerMin() / workRpm, Words.FEED_RATE);
        if (limits.targets().hasChipLimit()) {
            finish = finish.orBelow(model.feedForChip(limits.targets().chipMm(), depths.increment(last)), words.chip);
            for (int i = 0; i < last; i++) {
                rough = rough.orBelow(model.feedForChip(limits.targets().chipMm(), depths.increment(i)), words.chip);
            }
        }
        if (!(finish.feed > 0) || !(rough.feed > 0) || !Double.isFinite(finish.feed) || !Double.isFinite(rough.feed)) {
            return null;
        }
        double roughFeed = last == 0 ? finish.feed : rough.feed;
        PlanSettings s = new PlanSettings(Kinematics.cuttingSpeed(rpm, g.hobOutsideDiameterMm()), rpm, roughFeed,
                finish.feed, depths);
        Toolpath path = ToolpathBuilder.build(g, drive, s, List.of(), false);
        return new Candidate(s, path.cycleTimeS(), lowerBound(g, path, s, workRpm), rough.limit, finish.limit);
    }

    /**
     * The bound for fixed pass depths: the time of every step that is not a feed, plus each pass's
     * feed length (radial clearance in air and axial travel) at its largest feed rate.
     */
    private static double lowerBound(CycleGeometry g, Toolpath path, PlanSettings s, double workRpm) {
        double fixed = 0;
        for (CycleStep step : path.steps()) {
            if (!(step instanceof CycleStep.Feed)) {
                fixed += step.seconds();
            }
        }
        double feeding = 0;
        for (PassSummary p : path.passes()) {
            feeding += 60.0 * (g.radialClearanceMm() + p.axialTravelMm()) / (s.feed(p.pass() - 1) * workRpm);
        }
        return fixed + feeding;
    }

    /** The names of the limits, built once per search. */
    private static final class Words {
        static final String FINISH_TABLE = "finishing feed range of the cutting-data table";
        static final String ROUGH_TABLE = "roughing feed range of the cutting-data table";
        static final String FEED_RATE = "machine maximum feed rate";
        final String feedMark;
        final String chip;

        Words(QualityLimits t) {
            feedMark = "feed-mark depth target (" + t.feedMarkSource() + ")";
            chip = "chip thickness limit (" + t.chipSource() + ")";
        }
    }

    /** A feed limit and the words that name it. */
    private record FeedLimit(double feed, String limit) {
        FeedLimit orBelow(double other, String words) {
            return other < feed ? new FeedLimit(other, words) : this;
        }
    }
}
