package org.hobwright.post.nc;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.hobwright.text.Decimal;

/**
 * Rounds every number of the program to the dialect's decimals, in the direction that keeps the
 * machine safe where the word's meaning gives one (post/README.md, "Posted words"):
 * <ul>
 *   <li>radial positions away from the work axis (a cut never goes deeper than planned, a rapid
 *       never comes closer to the blank);</li>
 *   <li>axial positions away from the blank: down before the middle of the face, up beyond it;</li>
 *   <li>speeds to the nearest value, but down at an upper limit and up at a lower one (the limits
 *       of both spindles, carried through the ratio);</li>
 *   <li>feeds to the nearest value, but down when that would pass the machine's feed rate at the
 *       highest work speed the posted speed words allow;</li>
 *   <li>dwells up (the spindles settle at least as long as planned);</li>
 *   <li>swivel, hob shift and helical addition to the nearest value.</li>
 * </ul>
 * A directed rounding never pushes a value across its limit, and no word moves by more than one
 * unit of its last decimal; a speed or feed below what the dialect can write comes out zero.
 * Whether what comes out keeps every invariant is {@link SafetyCheck}'s to judge, on these numbers.
 */
final class PostedWords {
    private final WordUnits w;
    private final Dialect d;
    private final PostLimits limits;
    /** Highest work speed the posted speed words allow, rpm (NaN before the synchronisation). */
    private double workBound = Double.NaN;
    private double plannedWorkRpm = Double.NaN;

    private PostedWords(WordUnits w, Dialect d, PostLimits limits) {
        this.w = w;
        this.d = d;
        this.limits = limits;
    }

    /**
     * The posted numbers of every operation.
     *
     * @param program the program model
     * @param d       the dialect
     * @param w       the words' units
     * @param limits  the limits the rounding must not cross
     */
    static List<PostedOp> of(NcProgram program, Dialect d, WordUnits w, PostLimits limits) {
        PostedWords p = new PostedWords(w, d, limits);
        List<PostedOp> out = new ArrayList<>(program.ops().size());
        for (NcOp op : program.ops()) {
            out.add(new PostedOp(op, p.numbers(op)));
        }
        return out;
    }

    private Map<Placeholder, BigDecimal> numbers(NcOp op) {
        Map<Placeholder, BigDecimal> n = new EnumMap<>(Placeholder.class);
        if (op instanceof NcOp.Synchronise s) {
            double ratio = (double) s.sync().hobTurns() / s.sync().workTurns();
            BigDecimal hob = bounded(s.sync().hobRpm(), Placeholder.HOB_RPM, limits.hobRange(ratio));
            BigDecimal work = bounded(s.sync().workRpm(), Placeholder.WORK_RPM, limits.workRange(ratio));
            n.put(Placeholder.HOB_RPM, hob);
            n.put(Placeholder.WORK_RPM, work);
            n.put(Placeholder.DIFFERENTIAL, nearest(s.sync().differentialDegPerMm() * w.units().toMm(1),
                    Placeholder.DIFFERENTIAL));
            workBound = Math.max(work.doubleValue(), hob.doubleValue() / ratio);
            plannedWorkRpm = s.sync().workRpm();
        } else if (op instanceof NcOp.Wait wait) {
            n.put(Placeholder.SECONDS, directed(wait.seconds(), Placeholder.SECONDS, RoundingMode.CEILING));
            n.put(Placeholder.MILLISECONDS, directed(wait.seconds(), 3, RoundingMode.CEILING).movePointRight(3));
        } else if (op instanceof NcOp.SwivelTo s) {
            n.put(Placeholder.SWIVEL, signed(nearest(s.machineAngleDeg(), Placeholder.SWIVEL), d.swivel()
                    .orElseThrow().sign()));
        } else if (op instanceof NcOp.ShiftTo s) {
            n.put(Placeholder.SHIFT, signed(nearest(w.axial(s.positionMm()), Placeholder.SHIFT),
                    d.shift().orElseThrow().sign()));
        } else if (op instanceof NcOp.Move m) {
            n.put(Placeholder.RADIAL, signed(directed(w.radial(m.diameterMm()), Placeholder.RADIAL, RoundingMode.UP),
                    d.radial().sign()));
            RoundingMode away = 2 * m.axialMm() < limits.faceWidthMm() ? RoundingMode.FLOOR : RoundingMode.CEILING;
            n.put(Placeholder.AXIAL, signed(directed(w.axial(m.axialMm()), Placeholder.AXIAL, away),
                    d.axial().sign()));
            if (!m.rapid()) {
                n.put(Placeholder.FEED, feed(m.feedMmPerRev()));
            }
        }
        return n;
    }

    /**
     * Nearest, unless that passes the feed-rate limit a planned feed kept: then down, to the limit
     * (a feed that comes out zero is refused by the safety check).
     */
    private BigDecimal feed(double mmPerRev) {
        double v = w.feed(mmPerRev);
        BigDecimal near = nearest(v, Placeholder.FEED);
        if (Double.isNaN(workBound)) {
            return near;
        }
        double cap = w.feed(limits.maxFeedMmPerMin() / workBound);
        boolean plannedWithin = mmPerRev * plannedWorkRpm <= limits.maxFeedMmPerMin() * (1 + PostLimits.REL);
        if (near.doubleValue() > cap && plannedWithin) {
            return directed(Math.min(v, cap), Placeholder.FEED, RoundingMode.FLOOR);
        }
        return near;
    }

    /**
     * Nearest, unless that crosses a limit the value itself keeps: then toward the inside. A speed
     * whose nearest is zero is below what the dialect can write; it stays zero, and is refused.
     */
    private BigDecimal bounded(double v, Placeholder p, PostLimits.Range r) {
        BigDecimal near = nearest(v, p);
        if (near.signum() == 0) {
            return near;
        }
        if (near.doubleValue() > r.max() && v <= r.max() * (1 + PostLimits.REL)) {
            return directed(Math.min(v, r.max()), p, RoundingMode.FLOOR);
        }
        if (near.doubleValue() < r.min() && v >= r.min() * (1 - PostLimits.REL)) {
            return directed(Math.max(v, r.min()), p, RoundingMode.CEILING);
        }
        return near;
    }

    private BigDecimal nearest(double v, Placeholder p) {
        return Decimal.rounded(v, w.decimals(p), RoundingMode.HALF_UP);
    }

    private BigDecimal directed(double v, Placeholder p, RoundingMode mode) {
        return directed(v, w.decimals(p), mode);
    }

    private static BigDecimal directed(double v, int decimals, RoundingMode mode) {
        return Decimal.rounded(v, decimals, mode);
    }

    private static BigDecimal signed(BigDecimal v, int sign) {
        return sign < 0 ? v.negate() : v;
    }
}
