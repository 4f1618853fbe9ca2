package org.hobwright.post.nc;

import org.hobwright.text.Scaled;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.post.PostCode;
import org.hobwright.text.Decimal;

/**
 * Checks the safety invariants on the numbers exactly as the program writes them (after the
 * dialect's rounding, in its units and its radius or diameter mode), independently of the
 * planner, before anything is written:
 * <ul>
 *   <li>the synchronisation is on before every feed move, and a dwell of at least the machine's
 *       settle time lies between it and the first feed;</li>
 *   <li>it is off before the spindles stop, and off at the end of the program;</li>
 *   <li>no feed or rapid position lies inside the final root diameter;</li>
 *   <li>no rapid brings the hob into the blank (a rapid straight out from the work axis, the
 *       retract after a cut, excepted);</li>
 *   <li>every speed and feed word is above zero; hob and work speeds lie within the machine's
 *       spindle ranges, the hob maker's limit and, through the ratio, each other's; the ratio
 *       is not above the machine's largest; feed × the highest posted work speed is not above
 *       the machine's feed rate.</li>
 * </ul>
 * A word that breaks an invariant only because of the dialect's precision is reported as
 * {@code NC_SAFETY_PRECISION}, naming the word, the value and the decimals. Any broken invariant
 * is an error finding and the program is not written. Values are compared allowing only the
 * relative 1e-9 of binary arithmetic.
 */
final class SafetyCheck {

    private static final double REL = PostLimits.REL;

    private final Dialect d;
    private final WordUnits w;
    private final PostLimits limits;
    private final List<Finding> out = new ArrayList<>();

    private SafetyCheck(Dialect d, WordUnits w, PostLimits limits) {
        this.d = d;
        this.w = w;
        this.limits = limits;
    }

    /**
     * Checks a posted program.
     *
     * @param posted the operations with their posted numbers
     * @param d      the dialect (word addresses and decimals for the messages)
     * @param w      the words' units
     * @param limits what the words must keep to
     * @return error findings, empty when every invariant holds
     */
    static List<Finding> check(List<PostedOp> posted, Dialect d, WordUnits w, PostLimits limits) {
        SafetyCheck c = new SafetyCheck(d, w, limits);
        c.run(posted);
        return c.out;
    }

    private void run(List<PostedOp> posted) {
        boolean synced = false;
        boolean fed = false;
        double settle = 0;
        double workBound = Double.NaN;
        double plannedWorkRpm = Double.NaN;
        double[] at = null;
        int index = 0;
        for (PostedOp p : posted) {
            index++;
            NcOp op = p.op();
            if (op instanceof NcOp.Synchronise s) {
                synced = true;
                settle = 0;
                workBound = speeds(p, s.sync(), index);
                plannedWorkRpm = s.sync().workRpm();
            } else if (op instanceof NcOp.Fixed f && f.key() == TemplateKey.SYNC_OFF) {
                synced = false;
            } else if (op instanceof NcOp.Fixed f && f.key() == TemplateKey.SPINDLES_STOP && synced) {
                error(PostCode.NC_SAFETY_STOP_WHILE_SYNCED, "cycle.steps", "operation " + index
                        + " stops the spindles while they are still synchronised",
                        "switch the synchronisation off before the spindles stop");
            } else if (op instanceof NcOp.Fixed f && f.key() == TemplateKey.PROGRAM_END && synced) {
                error(PostCode.NC_SAFETY_SYNC_LEFT_ON, "cycle.steps", "the program ends with the spindles still synchronised",
                        "switch the synchronisation off and stop the spindles before the end");
            } else if (op instanceof NcOp.Wait && synced && !fed) {
                settle += p.number(Placeholder.SECONDS).value();
            } else if (op instanceof NcOp.Move mv) {
                double dia = w.diameterMm(p.number(Placeholder.RADIAL));
                double ax = w.axialMm(p.number(Placeholder.AXIAL));
                if (!mv.rapid()) {
                    if (!synced) {
                        error(PostCode.NC_SAFETY_CUT_WITHOUT_SYNC, "cycle.steps", "feed move " + index
                                + " comes before the synchronisation is on",
                                "switch the synchronisation on before the first feed move");
                    } else if (!fed && settle < limits.syncSettleS() * (1 - REL)) {
                        error(PostCode.NC_SAFETY_SETTLE, "machine.syncSettle", "the first feed move " + index
                                + " follows the synchronisation after " + Decimal.fixed(settle, 3)
                                + " s of dwell, the machine needs " + Decimal.fixed(limits.syncSettleS(), 3) + " s",
                                "dwell for the machine's settle time after the synchronisation");
                    }
                    fed = true;
                    feed(p, mv, index, workBound, plannedWorkRpm);
                }
                root(p, mv, dia, index);
                if (mv.rapid() && !retract(at, dia, ax)) {
                    blank(p, at, dia, ax, index);
                }
                at = new double[] {dia, ax};
            }
        }
    }

    /**
     * Checks the speed words. The control locks one spindle to the other, whichever it starts from,
     * so each spindle is checked at its own word and at the other's word carried through the ratio.
     *
     * @return the highest work speed the words allow, rpm
     */
    private double speeds(PostedOp p, CycleStep.SyncOn s, int index) {
        double ratio = (double) s.hobTurns() / s.workTurns();
        String at = " at " + s.hobTurns() + ":" + s.workTurns();
        if (ratio > limits.maxSyncRatio() * (1 + REL)) {
            error(PostCode.NC_SAFETY_SYNC_RATIO, "machine.maxSyncRatio", "operation " + index + " asks for a ratio of "
                    + s.hobTurns() + ":" + s.workTurns() + ", above the machine's largest "
                    + Decimal.fixed(limits.maxSyncRatio(), 1) + ":1", "use a multi-start hob or another machine");
        }
        TemplateKey sync = s.differentialDegPerMm() != 0 ? TemplateKey.SYNC_ON_HELIX : TemplateKey.SYNC_ON;
        Scaled hob = p.number(Placeholder.HOB_RPM);
        Scaled work = p.number(Placeholder.WORK_RPM);
        String hobWord = postedWord(sync, Placeholder.HOB_RPM, hob);
        String workWord = postedWord(TemplateKey.WORK_SPINDLE, Placeholder.WORK_RPM, work);
        boolean hobOk = positive(hob, s.hobRpm(), Placeholder.HOB_RPM, hobWord, "hob speed", index);
        boolean workOk = positive(work, s.workRpm(), Placeholder.WORK_RPM, workWord, "work speed", index);
        if (!hobOk || !workOk) {
            return Double.NaN;
        }
        double hobFromWork = work.value() * ratio;
        double workFromHob = hob.value() / ratio;
        String hobText = "the hob at " + plain(hob) + " rpm (" + hobWord + "), or " + plain(hobFromWork)
                + " rpm locked to the work spindle's " + workWord + at;
        String workText = "the work spindle at " + plain(work) + " rpm (" + workWord + "), or " + plain(workFromHob)
                + " rpm locked to the hob's " + hobWord + at;
        double hobLow = Math.min(hob.value(), hobFromWork);
        double hobHigh = Math.max(hob.value(), hobFromWork);
        limit(PostCode.NC_SAFETY_HOB_SPEED, "machine.hobSpindle", index, hobText, hobLow, hobHigh, s.hobRpm(),
                new PostLimits.Range(limits.hobMinRpm(), limits.hobMaxRpm()), "the machine's hob spindle",
                Placeholder.HOB_RPM);
        limit(PostCode.NC_SAFETY_HOB_SPEED, "hob.maxRpm", index, hobText, hobLow, hobHigh, s.hobRpm(),
                new PostLimits.Range(0, limits.hobMakerMaxRpm()), "the hob maker's limit", Placeholder.HOB_RPM);
        limit(PostCode.NC_SAFETY_WORK_SPEED, "machine.workSpindle", index, workText, Math.min(work.value(), workFromHob),
                Math.max(work.value(), workFromHob), s.workRpm(),
                new PostLimits.Range(limits.workMinRpm(), limits.workMaxRpm()), "the machine's work spindle",
                Placeholder.WORK_RPM);
        return Math.max(work.value(), workFromHob);
    }

    private void limit(PostCode code, String field, int index, String text, double low, double high, double planned,
                       PostLimits.Range range, String limit, Placeholder p) {
        String bounds = range.min() > 0 ? "outside " + limit + " of " + plain(range.min()) + " to " + plain(range.max())
                + " rpm" : "above " + limit + " of " + plain(range.max()) + " rpm";
        if (!range.contains(planned)) {
            error(code, field, "operation " + index + " asks for " + plain(planned) + " rpm, " + bounds,
                    "change the cutting speed or choose another machine");
        } else if (!range.contains(low) || !range.contains(high)) {
            precision("operation " + index + " runs " + text + ", " + bounds, p, planned, "rpm",
                    "change the cutting speed or choose another machine");
        }
    }

    private void feed(PostedOp p, NcOp.Move mv, int index, double workBound, double plannedWorkRpm) {
        Scaled f = p.number(Placeholder.FEED);
        String word = postedWord(TemplateKey.FEED_MOVE, Placeholder.FEED, f);
        String unit = w.units().symbol() + " per work revolution";
        double plannedRate = mv.feedMmPerRev() * plannedWorkRpm;
        if (!(mv.feedMmPerRev() > 0) || plannedRate > limits.maxFeedMmPerMin() * (1 + REL)) {
            error(PostCode.NC_SAFETY_FEED_RATE, "machine.maxFeed", "feed move " + index + " asks for "
                    + plain(w.feed(mv.feedMmPerRev())) + " " + unit + " at " + plain(plannedWorkRpm)
                    + " rpm of the work, " + plain(plannedRate)
                    + " mm/min; a feed must be above zero and not above the machine's "
                    + plain(limits.maxFeedMmPerMin()) + " mm/min", "lower the feed or the speed");
        } else if (f.signum() <= 0) {
            precision("feed move " + index + " writes the feed as " + word + "; a feed word must be above zero",
                    Placeholder.FEED, w.feed(mv.feedMmPerRev()), unit, "raise the feed");
        } else if (!Double.isNaN(workBound) && w.feedMmPerRev(f) * workBound > limits.maxFeedMmPerMin() * (1 + REL)) {
            precision("feed move " + index + " (" + word + ") at up to " + plain(workBound) + " rpm of the work feeds "
                    + plain(w.feedMmPerRev(f) * workBound) + " mm/min, above the machine's "
                    + plain(limits.maxFeedMmPerMin()) + " mm/min", Placeholder.FEED,
                    w.feed(mv.feedMmPerRev()), unit, "lower the feed or the speed");
        }
    }

    private void root(PostedOp p, NcOp.Move mv, double dia, int index) {
        String what = mv.rapid() ? "rapid move" : "feed move";
        String fix = "plan the cycle again; no move may go inside the final infeed diameter";
        if (mv.diameterMm() < limits.rootDiameterMm() * (1 - REL)) {
            error(PostCode.NC_SAFETY_BELOW_ROOT, "cycle.steps", what + " " + index + " goes to diameter "
                    + plain(mv.diameterMm()) + " mm, inside the final root diameter " + plain(limits.rootDiameterMm())
                    + " mm", fix);
        } else if (dia < limits.rootDiameterMm() * (1 - REL)) {
            precision(what + " " + index + " goes to " + axisWord(d.radial(), p.number(Placeholder.RADIAL))
                    + ", diameter " + plain(dia) + " mm, inside the final root diameter "
                    + plain(limits.rootDiameterMm())
                    + " mm", Placeholder.RADIAL, w.radial(mv.diameterMm()), w.units().symbol(),
                    fix);
        }
    }

    /** True for a rapid straight out from the work axis: the retract from where the hob just was. */
    private static boolean retract(double[] from, double dia, double ax) {
        return from != null && ax == from[1] && dia >= from[0];
    }

    /**
     * A rapid may pass anywhere in the box its two end points span (a control may move one axis
     * before the other); the hob's section in the axial plane through its centre, an ellipse with
     * half axes r_a0 across and r_a0 / cos η along the work axis, must stay out of the blank
     * (0 ≤ z ≤ b, r ≤ r_blank) at the box's point nearest the blank. The first rapid is checked at
     * its end only.
     */
    private void blank(PostedOp p, double[] from, double dia, double ax, int index) {
        double lowDia = from == null ? dia : Math.min(from[0], dia);
        double zLo = from == null ? ax : Math.min(from[1], ax);
        double zHi = from == null ? ax : Math.max(from[1], ax);
        double ra0 = limits.hobOutsideDiameterMm() / 2;
        double h = (limits.blankDiameterMm() - lowDia) / 2;
        if (h <= REL * limits.blankDiameterMm()) {
            return;
        }
        double gap = zHi < 0 ? -zHi : zLo > limits.faceWidthMm() ? zLo - limits.faceWidthMm() : 0;
        double reach = h >= ra0 ? Double.POSITIVE_INFINITY
                : Math.sqrt(h * (2 * ra0 - h)) / Math.cos(Math.toRadians(limits.swivelDeg()));
        if (gap >= reach * (1 - REL)) {
            return;
        }
        error(PostCode.NC_SAFETY_RAPID_IN_BLANK, "cycle.axialClearance", "rapid move " + index + " to "
                + axisWord(d.radial(), p.number(Placeholder.RADIAL)) + " "
                + axisWord(d.axial(), p.number(Placeholder.AXIAL)) + " brings the hob " + plain(reach - gap)
                + " mm into the blank: the hob tip at diameter " + plain(lowDia) + " mm needs " + plain(reach)
                + " mm of axial clear from the blank's faces (blank diameter " + plain(limits.blankDiameterMm())
                + " mm, face 0 to " + plain(limits.faceWidthMm()) + " mm), it has " + plain(gap) + " mm",
                "raise cycle.axialClearance and cycle.radialClearance, then plan again");
    }

    /** False, with a finding, when a speed word is not above zero. */
    private boolean positive(Scaled posted, double planned, Placeholder p, String word, String what, int index) {
        if (!(planned > 0)) {
            error(p == Placeholder.HOB_RPM ? PostCode.NC_SAFETY_HOB_SPEED : PostCode.NC_SAFETY_WORK_SPEED, "cycle.steps",
                    "operation " + index + " asks for a " + what + " of " + plain(planned) + " rpm; it must be above"
                            + " zero", "plan the cycle again");
            return false;
        }
        if (posted.signum() > 0) {
            return true;
        }
        precision("operation " + index + " writes the " + what + " as " + word + "; a " + what
                + " word must be above zero", p, planned, "rpm", "raise the " + what);
        return false;
    }

    /** A word that breaks an invariant the planned value kept: the dialect's decimals are the cause. */
    private void precision(String text, Placeholder p, double planned, String unit, String fix) {
        error(PostCode.NC_SAFETY_PRECISION, "dialect." + w.decimalsKey(p), text + ": the planned " + plain(planned)
                + " "
                + unit + " cannot be written safely with " + w.decimals(p) + " decimals (" + w.decimalsKey(p) + ")",
                "give the dialect more decimals if the control accepts them, or change the job so the value can be"
                        + " written (" + fix + ")");
    }

    /** The word as written: its address from the template and the posted number. */
    private String postedWord(TemplateKey key, Placeholder p, Scaled v) {
        return word(key, p, v.text(d.trailingZeros()));
    }

    private String word(TemplateKey key, Placeholder p, String number) {
        return d.template(key).flatMap(lines -> lines.stream().map(l -> l.address(p)).flatMap(Optional::stream)
                .findFirst()).orElse("") + number;
    }

    private String axisWord(Dialect.Axis axis, Scaled v) {
        return axis.letter() + v.text(d.trailingZeros());
    }

    private static String plain(double v) {
        return Decimal.plain(v, 6);
    }

    private static String plain(Scaled v) {
        String t = v.text(false);
        return t.endsWith(".") ? t.substring(0, t.length() - 1) : t;
    }

    private void error(PostCode code, String field, String message, String fix) {
        out.add(code.at(field, message + "; the program was not written", fix));
    }
}
