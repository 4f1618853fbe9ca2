package org.hobwright.wizard.plan;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.store.CuttingData;
import org.hobwright.wizard.store.ValueRange;

/**
 * Picks the feeds of the user's plan. A feed the job gives is kept (a finding says when it lies
 * outside the cutting-data range). An open feed starts at the middle of the table's range and is
 * lowered, when needed, to meet the chip-thickness limit (Hoffmeister, FORMULAS.md §8.1) and, for the
 * finishing pass, the feed-mark target (FORMULAS.md §6.1). Both are then held within the machine's
 * maximum feed rate. A single pass runs at the finishing feed; its roughing feed is reported equal to it.
 *
 * @param roughMmPerRev  roughing feed, mm per work revolution
 * @param finishMmPerRev finishing feed, mm per work revolution
 */
public record FeedChoice(double roughMmPerRev, double finishMmPerRev) {

    /** The inputs of the choice. */
    public record Inputs(OptionalDouble rough, OptionalDouble finish, Optional<CuttingData> row, QualityLimits targets,
                         CutModel model, PassDepths depths, double workRpm, double maxFeedRateMmPerMin) {
    }

    /** The feeds, or empty when a feed is open and there is no cutting-data row. */
    public static Optional<FeedChoice> of(Inputs in, List<Finding> findings) {
        if ((in.rough().isEmpty() || in.finish().isEmpty()) && in.row().isEmpty()) {
            return Optional.empty();
        }
        int last = in.depths().count() - 1;
        double heaviestRough = 0;
        for (int i = 0; i < last; i++) {
            heaviestRough = Math.max(heaviestRough, in.depths().increment(i));
        }
        double rough;
        if (in.rough().isPresent()) {
            rough = last == 0 ? in.rough().getAsDouble()
                    : given(in.rough().getAsDouble(), in.row().map(CuttingData::roughFeed), "cycle.roughFeed", findings);
        } else {
            ValueRange r = in.row().get().roughFeed();
            double limit = in.targets().hasChipLimit() && heaviestRough > 0
                    ? in.model().feedForChip(in.targets().chipMm(), heaviestRough) : Double.POSITIVE_INFINITY;
            rough = lowered(r, limit, "cycle.roughFeed", "chip thickness limit", findings);
        }
        double finish;
        if (in.finish().isPresent()) {
            finish = given(in.finish().getAsDouble(), in.row().map(CuttingData::finishFeed), "cycle.finishFeed",
                    findings);
        } else {
            ValueRange r = in.row().get().finishFeed();
            double chip = in.targets().hasChipLimit()
                    ? in.model().feedForChip(in.targets().chipMm(), in.depths().increment(last)) : Double.POSITIVE_INFINITY;
            double mark = in.model().feedForFeedMark(in.targets().feedMarkUm());
            finish = lowered(r, Math.min(chip, mark), "cycle.finishFeed",
                    mark <= chip ? "feed-mark target" : "chip thickness limit", findings);
        }
        double rateCap = in.maxFeedRateMmPerMin() / in.workRpm();
        finish = capped(finish, rateCap, "cycle.finishFeed", in.maxFeedRateMmPerMin(), findings);
        rough = last == 0 ? finish : capped(rough, rateCap, "cycle.roughFeed", in.maxFeedRateMmPerMin(), findings);
        return Optional.of(new FeedChoice(rough, finish));
    }

    private static double given(double feed, Optional<ValueRange> range, String field, List<Finding> findings) {
        if (range.isPresent() && !range.get().contains(feed)) {
            findings.add(PlanCode.PLAN_FEED_OUTSIDE_TABLE.at(field, "feed " + Decimal.fixed(feed, 3)
                    + " mm per work revolution is outside the typical " + Decimal.fixed(range.get().min(), 3) + " to "
                    + Decimal.fixed(range.get().max(), 3) + " mm", "confirm the feed with the hob supplier"));
        }
        return feed;
    }

    private static double lowered(ValueRange range, double limit, String field, String why, List<Finding> findings) {
        double feed = Math.min(range.mid(), limit);
        if (feed < range.min()) {
            findings.add(PlanCode.PLAN_FEED_LOWERED_FOR_TARGET.at(field, "feed set to " + Decimal.fixed(feed, 4)
                    + " mm per work revolution, below the typical " + Decimal.fixed(range.min(), 3)
                    + " mm, to meet the " + why, null));
        }
        return feed;
    }

    private static double capped(double feed, double cap, String field, double rate, List<Finding> findings) {
        if (feed <= cap) {
            return feed;
        }
        findings.add(PlanCode.PLAN_FEED_RATE_CAPPED.at(field, "feed " + Decimal.fixed(feed, 4)
                + " mm per work revolution would exceed the machine's " + Decimal.fixed(rate, 1)
                + " mm/min; lowered to " + Decimal.fixed(cap, 4)
                + " mm", "accept the lower feed, or lower the cutting speed"));
        return cap;
    }
}
