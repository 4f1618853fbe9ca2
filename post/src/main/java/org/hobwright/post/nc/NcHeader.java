package org.hobwright.post.nc;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.post.Cautions;
import org.hobwright.post.Senses;
import org.hobwright.text.Decimal;
import org.hobwright.post.JobUnits;

/**
 * The comment header of a program: part, job, date, gear data, hob, swivel angle (decimal and
 * degrees-minutes-seconds) and the holder's setting, diameters, speeds, cycle time, cautions. Lengths
 * in the job's units with the dialect's decimals.
 */
final class NcHeader {
    private NcHeader() {
    }

    /** The header lines, not yet cleaned for the control. */
    static List<String> lines(HobCycle cycle, WriteContext context, Dialect dialect) {
        HobJob job = context.job();
        JobUnits u = new JobUnits(job.units());
        int ld = dialect.decimals().length(job.units());
        int ad = dialect.decimals().deg();
        String lu = " " + u.lengthSymbol();
        GearSpec g = job.gear();
        HobSpec h = job.hob();
        GearData gd = cycle.gear().orElseThrow();
        SetupValues s = cycle.setup().orElseThrow();
        CycleSummary sum = cycle.summary().orElseThrow();
        List<String> out = new ArrayList<>();
        out.add("Hobwright hobbing program - a starting point to be proved out");
        out.add("Part " + g.partName());
        out.add("Job " + job.name() + "  date " + context.generatedOn() + "  Hobwright " + context.toolVersion());
        out.add("Machine " + job.machine().name() + "  dialect " + dialect.name() + "  units " + u.lengthSymbol());
        if (job.spline().isPresent()) {
            out.add("Spline " + job.spline().get().standard() + " z " + g.teeth() + "  " + pitch(g.pitch())
                    + "  pressure angle " + Decimal.fixed(g.pressureAngleDeg(), ad) + " deg  " + job.spline().get().root()
                    + " root  class " + job.spline().get().toleranceClass() + job.spline().get().fitClass() + "  length "
                    + len(u, g.faceWidthMm(), ld) + lu);
        } else {
            out.add("Gear z " + g.teeth() + "  " + pitch(g.pitch()) + "  pressure angle "
                    + Decimal.fixed(g.pressureAngleDeg(), ad) + " deg  "
                    + (g.isSpur() ? "spur" : "helix " + Decimal.fixed(g.helixAngleDeg(), ad) + " deg " + g.hand().word()
                    + " hand") + "  x " + Decimal.fixed(g.profileShift(), 4) + "  face " + len(u, g.faceWidthMm(), ld)
                    + lu);
        }
        out.add("Tip dia " + len(u, gd.tipDiameterMm(), ld) + "  ref dia " + len(u, gd.referenceDiameterMm(), ld)
                + "  root dia " + len(u, gd.rootDiameterMm(), ld) + lu);
        out.add("Hob " + pitch(h.pitch()) + "  " + h.starts() + " start " + h.hand().word() + " hand  OD "
                + len(u, h.outsideDiameterMm(), ld) + lu + "  " + h.gashes() + " gashes  " + h.material()
                + "  lead angle " + Decimal.fixed(s.leadAngleDeg(), ad) + " deg");
        out.add("Swivel angle " + Decimal.fixed(s.swivelAngleDeg(), ad) + " deg = " + s.swivelAngleDms());
        out.add("Swivel setting " + s.swivelSettingText() + ": " + s.swivelDirection());
        out.add("Blank dia " + len(u, s.blankDiameterMm(), ld) + "  touch-off dia " + len(u, s.touchOffDiameterMm(), ld)
                + "  final dia " + len(u, s.finalInfeedDiameterMm(), ld) + lu);
        out.add("Cutting speed " + Decimal.fixed(u.cuttingSpeed(s.cuttingSpeedMPerMin()), 1) + " " + u.speedSymbol()
                + "  hob " + Decimal.fixed(s.hobRpm(), 1) + " rpm  work " + Decimal.fixed(s.workRpm(), 3) + " rpm");
        out.add("Ratio hob:work " + s.syncHobTurns() + ":" + s.syncWorkTurns()
                + (s.differentialDegPerMm() == 0 ? "" : "  helical addition "
                + Decimal.fixed(s.differentialDegPerMm() * u.units().toMm(1), 6) + " deg/" + u.lengthSymbol()));
        Senses senses = Senses.of(cycle, job);
        senses.turnedRound().ifPresent(out::add);
        out.add("Hob spindle " + senses.hob());
        out.add("Work spindle " + senses.work());
        out.add("Feed " + senses.feed());
        out.add("Passes " + sum.passes().size() + "  finish feed " + Decimal.fixed(u.length(sum.finishFeedMmPerRev()),
                dialect.decimals().feed(job.units())) + lu + "/rev  cycle time " + Decimal.fixed(sum.cycleTimeS(), 1)
                + " s");
        out.addAll(Cautions.LINES);
        return out;
    }

    private static String len(JobUnits u, double mm, int decimals) {
        return Decimal.fixed(u.length(mm), decimals);
    }

    private static String pitch(Pitch p) {
        if (p instanceof Pitch.Diametral d) {
            return "DP " + Decimal.exact(d.perInch()) + "/in";
        }
        return "module " + Decimal.exact(p.moduleMm()) + " mm";
    }
}
