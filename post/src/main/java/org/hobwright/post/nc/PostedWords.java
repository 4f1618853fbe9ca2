package org.hobwright.post.nc;

import org.hobwright.text.Scaled;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.hobwright.text.Decimal;
import org.hobwright.text.Decimal.Rounding;

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
 *   <li>the safe radial position of the safe start and end toward the work: it is the machine's
 *       travel limit, far above the part, and must not pass the limit;</li>
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

    private Map<Placeholder, Scaled> numbers(NcOp op) {
        Map<Placeholder, Scaled> n = new EnumMap<>(Placeholder.class);
        if (op instanceof NcOp.Synchronise s) {
            double ratio = (double) s.sync().hobTurns() / s.sync().workTurns();
            Scaled hob = bounded(s.sync().hobRpm(), Placeholder.HOB_RPM, limits.hobRange(ratio));
            Scaled work = bounded(s.sync().workRpm(), Placeholder.WORK_RPM, limits.workRange(ratio));
            n.put(Placeholder.HOB_RPM, hob);
            n.put(Placeholder.WORK_RPM, work);
            n.put(Placeholder.DIFFERENTIAL, nearest(s.sync().differentialDegPerMm() * w.units().toMm(1),
                    Placeholder.DIFFERENTIAL));
            workBound = Math.max(work.value(), hob.value() / ratio);
            plannedWorkRpm = s.sync().workRpm();
        } else if (op instanceof NcOp.Wait wait) {
            n.put(Placeholder.SECONDS, directed(wait.seconds(), Placeholder.SECONDS, Rounding.CEILING));
            n.put(Placeholder.MILLISECONDS, new Scaled(directed(wait.seconds(), 3, Rounding.CEILING).units(), 0));
        } else if (op instanceof NcOp.SwivelTo s) {
            n.put(Placeholder.SWIVEL, signed(nearest(s.machineAngleDeg(), Placeholder.SWIVEL), d.swivel()
                    .orElseThrow().sign()));
        } else if (op instanceof NcOp.ShiftTo s) {
            n.put(Placeholder.SHIFT, signed(nearest(w.axial(s.positionMm()), Placeholder.SHIFT),
                    d.shift().orElseThrow().sign()));
        } else if (op instanceof NcOp.Safe safe) {
            // at the machine's travel limit: rounded toward the work, never past the limit
            n.put(Placeholder.SAFE_RADIAL, signed(directed(w.radial(safe.diameterMm()), Placeholder.RADIAL,
                    Rounding.DOWN), d.radial().sign()));
        } else if (op instanceof NcOp.Move m) {
            n.put(Placeholder.RADIAL, signed(directed(w.radial(m.diameterMm()), Placeholder.RADIAL, Rounding.CEILING),
                    d.radial().sign()));
            Rounding away = 2 * m.axialMm() < limits.faceWidthMm() ? Rounding.FLOOR : Rounding.CEILING;
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
    private Scaled feed(double mmPerRev) {
        double v = w.feed(mmPerRev);
        Scaled near = nearest(v, Placeholder.FEED);
        if (Double.isNaN(workBound)) {
            return near;
        }
        double cap = w.feed(limits.maxFeedMmPerMin() / workBound);
        boolean plannedWithin = mmPerRev * plannedWorkRpm <= limits.maxFeedMmPerMin() * (1 + PostLimits.REL);
        if (near.value() > cap && plannedWithin) {
            return directed(Math.min(v, cap), Placeholder.FEED, Rounding.FLOOR);
        }
        return near;
    }

    /**
     * Nearest, unless that crosses a limit the value itself keeps: then toward the inside. A speed
     * whose nearest is zero is below what the dialect can write; it stays zero, and is refused.
     */
    private Scaled bounded(double v, Placeholder p, PostLimits.Range r) {
        Scaled near = nearest(v, p);
        if (near.signum() == 0) {
            return near;
        }
        if (near.value() > r.max() && v <= r.max() * (1 + PostLimits.REL)) {
            return directed(Math.min(v, r.max()), p, Rounding.FLOOR);
        }
        if (near.value() < r.min() && v >= r.min() * (1 - PostLimits.REL)) {
            return directed(Math.max(v, r.min()), p, Rounding.CEILING);
        }
        return near;
    }

    private Scaled nearest(double v, Placeholder p) {
        return Decimal.scaled(v, w.decimals(p), Rounding.HALF_UP);
    }

    private Scaled directed(double v, Placeholder p, Rounding mode) {
        return directed(v, w.decimals(p), mode);
    }

    private static Scaled directed(double v, int decimals, Rounding mode) {
        return Decimal.scaled(v, decimals, mode);
    }

    private static Scaled signed(Scaled v, int sign) {
        return sign < 0 ? v.negate() : v;
    }
}
