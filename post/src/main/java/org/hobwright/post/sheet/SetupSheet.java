package org.hobwright.post.sheet;

import java.util.Optional;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.post.Batch;
import org.hobwright.post.Cautions;
import org.hobwright.text.Decimal;
import org.hobwright.post.JobUnits;
import org.hobwright.post.Senses;
import org.hobwright.post.TargetsGiven;
import org.hobwright.post.nc.Dialect;
import org.hobwright.post.nc.DialectLoader;
import org.hobwright.post.nc.JobNumbers;

/**
 * The setup sheet: one self-contained XHTML page with inline SVG and CSS, laid out to print on A4
 * or Letter. Composes the header, cautions, the two drawings and the tables.
 */
final class SetupSheet {

    private static final String CSS = """
            @page { margin: 12mm; }
            body { font-family: "DejaVu Sans", Arial, Helvetica, sans-serif; font-size: 10pt; color: #111;
                   max-width: 186mm; margin: 0 auto; }
            h1 { font-size: 16pt; margin: 0 0 2mm 0; }
            h2 { font-size: 11.5pt; margin: 4mm 0 1.5mm 0; border-bottom: 0.4mm solid #444;
                 break-after: avoid; page-break-after: avoid; }
            p.meta { margin: 0 0 2mm 0; color: #333; }
            p.run { margin: 0 0 0.5mm 0; }
            .cautions { border: 0.6mm solid #b00000; background: #fff3f0; padding: 1.5mm 3mm; margin: 2mm 0; }
            .cautions ul { margin: 1mm 0; padding-left: 5mm; }
            .figures { display: flex; gap: 4mm; break-inside: avoid; page-break-inside: avoid; }
            figure { flex: 1 1 0; margin: 0; break-inside: avoid; page-break-inside: avoid; }
            figcaption { font-size: 8.5pt; color: #222; margin-top: 1mm; }
            table { border-collapse: collapse; width: 100%; margin: 1mm 0; }
            thead { display: table-header-group; }
            tr, li, p, .cautions, .keep { break-inside: avoid; page-break-inside: avoid; }
            th, td { border: 0.2mm solid #999; padding: 0.8mm 1.5mm; text-align: left; vertical-align: top; }
            th[scope=row] { width: 45%; font-weight: normal; background: #f2f2f2; }
            thead th { background: #e4e4e4; }
            table.record td.blank { width: 22%; } table.record td:last-child { width: 8%; }
            table.signoff th[scope=row] { width: 13%; } table.signoff td.blank { width: 12%; height: 6mm; }
            td.ok { color: #0a5d00; } td.bad { color: #b00000; font-weight: bold; }
            svg text { font-family: inherit; } svg { overflow: visible; display: block; }
            .frame { fill: #fff; stroke: #bbb; }
            .tip, .ref, .base, .root, .simulated, .nominal { fill: none; stroke-width: 1.6; }
            .tip { stroke: #1f4e9c; } .ref { stroke: #2a8a2a; stroke-dasharray: 7 4; }
            .base { stroke: #c27c00; stroke-dasharray: 2 3; } .root { stroke: #8c1c1c; }
            .simulated { stroke: #000; stroke-width: 1.2; } .nominal { stroke: #9b30b0; stroke-dasharray: 4 3; }
            .label { font-size: 16px; fill: #111; } .note { font-size: 14px; fill: #555; font-style: italic; }
            .workaxis, .hobaxis { stroke: #333; stroke-dasharray: 12 3 2 3; stroke-width: 1; }
            .square { stroke: #777; stroke-dasharray: 5 4; } .gear { fill: #e9eef5; stroke: #456; }
            .tooth { stroke: #6b7f99; stroke-width: 1.4; } .hob { fill: #f7e3c0; fill-opacity: 0.9; stroke: #7a4b00; }
            .thread { stroke: #7a4b00; stroke-width: 1.3; } .sweep { fill: none; stroke: #b00000; stroke-width: 2; }
            .arrowhead { fill: #b00000; }
            .columns > section:first-child h2 { margin-top: 4mm; }
            @media print { body { font-size: 9pt; max-width: none; } .figures { gap: 3mm; }
                           .figures svg { max-height: 62mm; } th, td { padding: 0.5mm 1.2mm; }
                           .columns { column-count: 2; column-gap: 5mm; }
                           .columns section { break-inside: avoid; page-break-inside: avoid; }
                           .columns h2 { margin-top: 0; } }
            """;

    private SetupSheet() {
    }

    /** The page for a cycle without errors. */
    static String html(HobCycle cycle, WriteContext context) {
        HobJob job = context.job();
        SheetFormat f = new SheetFormat(new JobUnits(job.units()));
        SetupValues s = cycle.setup().orElseThrow();
        GearData g = cycle.gear().orElseThrow();
        CycleSummary sum = cycle.summary().orElseThrow();
        Markup m = new Markup();
        m.raw("<!DOCTYPE html>\n");
        m.open("html", "xmlns", "http://www.w3.org/1999/xhtml", "lang", "en").nl();
        m.open("head").empty("meta", "charset", "UTF-8")
                .leaf("title", (job.spline().isPresent() ? "Spline hobbing" : "Hobbing") + " setup sheet – " + job.gear().partName()).open("style").raw(CSS).close("style").close("head");
        m.open("body").nl();
        m.leaf("h1", (job.spline().isPresent() ? "Spline hobbing" : "Hobbing") + " setup sheet – " + job.gear().partName()).nl();
        m.leaf("p", "Job " + job.name() + " · machine " + job.machine().name() + " · units " + f.u().lengthSymbol()
                + " · " + context.generatedOn() + " · Hobwright " + context.toolVersion(), "class", "meta").nl();
        SheetTables t = new SheetTables(m, f, job);
        Optional<Dialect> dialect = DialectLoader.of(context);
        t.run(dialect.map(d -> JobNumbers.of(job, d)), dialect, Batch.of(cycle, job));
        t.hob(job.hob(), job.cycle());
        m.open("div", "class", "cautions").leaf("strong", "Cautions").open("ul");
        Cautions.LINES.forEach(c -> m.leaf("li", c));
        m.close("ul").close("div");
        Senses senses = Senses.of(cycle, job);
        senses.turnedRound().ifPresent(w -> m.open("div", "class", "cautions").leaf("strong", w).close("div"));
        m.open("div", "class", "figures").nl();
        m.open("figure").raw(ToothSpaceFigure.svg(g, job.gear().teeth(), cycle.simulation(), f))
                .leaf("figcaption", "Tooth space in the transverse section, drawn to scale"
                        + cycle.simulation().map(sim -> ", with the generating simulation: its flanks depart from the"
                        + " true involute by at most " + f.um(sim.profileDeviationMaxMm() * 1000)
                        + " (hobwright simulate draws the departure enlarged)").orElse("") + ".")
                .close("figure");
        m.open("figure").raw(SwivelSvg.svg(s.swivelAngleDeg(), job.gear().signedHelixAngleDeg(), job.hob().hand(),
                        "η " + f.deg(s.swivelAngleDeg())))
                .leaf("figcaption", swivelCaption(s, job, f)).close("figure");
        m.close("div");
        t.setup(s, sum, job.cycle().coolant(), senses);
        m.open("div", "class", "columns");
        if (cycle.spline().isPresent()) {
            t.spline(cycle.spline().get());
        } else {
            t.gear(g);
        }
        cycle.inspection().ifPresent(t::inspection);
        cycle.pair().ifPresent(t::pair);
        m.close("div");
        t.quality(sum, TargetsGiven.none(sum.targets()) ? job.cycle().targets() : sum.targets(),
                cycle.tolerances(), cycle.simulation());
        t.findings(cycle.findings());
        t.firstArticle(g, s, cycle.inspection());
        m.close("body").close("html");
        return m.toString();
    }

    private static String swivelCaption(SetupValues s, HobJob job, SheetFormat f) {
        String turn = s.swivelAngleDeg() > 0 ? "clockwise" : s.swivelAngleDeg() < 0 ? "counter-clockwise" : "not";
        boolean exaggerated = s.swivelAngleDeg() != 0 && Math.abs(s.swivelAngleDeg()) < SwivelSvg.MIN_DRAWN;
        return "Seen from the hob toward the work axis. " + capitalised(job.hob().hand().word()) + "-hand hob, "
                + job.hob().starts() + " start(s); gear " + (job.gear().isSpur() ? "spur"
                : job.gear().hand().word() + "-hand helix " + f.deg(job.gear().helixAngleDeg())) + ". "
                + "The hob axis is turned " + turn + " from square by η = " + f.deg(s.swivelAngleDeg()) + " ("
                + s.swivelAngleDms() + ")" + (exaggerated ? ", drawn at " + Decimal.fixed(SwivelSvg.MIN_DRAWN, 0)
                + "° so the direction shows" : "") + ". On this machine set " + s.swivelSettingText() + "; a positive "
                + "setting means: " + job.machine().swivel().positiveSense() + ". " + capitalised(s.swivelDirection()) + ".";
    }

    private static String capitalised(String text) {
        return text.isEmpty() ? text : text.substring(0, 1).toUpperCase(java.util.Locale.ROOT) + text.substring(1);
    }
}
