package org.hobwright.post.sheet;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.GearPairData;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.cycle.InspectionLimits;
import org.hobwright.api.cycle.SplineData;
import org.hobwright.api.cycle.PassSummary;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.SplineSpec;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.post.Batch;
import org.hobwright.post.Senses;
import org.hobwright.post.nc.Dialect;
import org.hobwright.post.nc.JobNumbers;
import org.hobwright.text.Decimal;

/** The tables of the setup sheet, each a {@code section} element. */
final class SheetTables {
    private final Markup m;
    private final SheetFormat f;
    private final HobJob job;
    /** Tables of up to this many rows are not split across pages. */
    static final int KEEP_ROWS = 14;
    private final List<String[]> pending = new java.util.ArrayList<>();

    SheetTables(Markup m, SheetFormat f, HobJob job) {
        this.m = m;
        this.f = f;
        this.job = job;
    }

    void setup(SetupValues s, CycleSummary sum, boolean coolant, Senses senses) {
        section("Setup");
        row("Turn the blank to ⌀", f.lenU(s.blankDiameterMm()));
        row("Touch-off ⌀ (hob tip meets the blank)", f.lenU(s.touchOffDiameterMm()));
        row("Final infeed ⌀ (root)", f.lenU(s.finalInfeedDiameterMm()));
        row("Hob lead angle γ", f.deg(s.leadAngleDeg()));
        row("Swivel angle η = β − γ", f.deg(s.swivelAngleDeg()) + " = " + s.swivelAngleDms());
        row("Holder setting", s.swivelSettingText() + " — " + s.swivelDirection());
        row("Cutting speed", f.cuttingSpeed(s.cuttingSpeedMPerMin()));
        row("Hob speed", f.hobRpm(s.hobRpm()));
        row("Work speed", f.workRpm(s.workRpm()));
        row("Sync ratio hob : work", s.syncHobTurns() + " : " + s.syncWorkTurns());
        row("Hob spindle", senses.hob());
        row("Work spindle", senses.work());
        row("Feed", senses.feed());
        if (s.differentialDegPerMm() != 0) {
            row("Helical addition", Decimal.fixed(s.differentialDegPerMm() * job.units().toMm(1), 6) + " °/"
                    + f.u().lengthSymbol() + " of axial travel");
        }
        row("Finishing feed", f.feed(sum.finishFeedMmPerRev()));
        row("Passes", String.valueOf(sum.passes().size()));
        row("Approach / overrun (last pass)", f.lenU(sum.approachLengthMm()) + " / " + f.lenU(sum.overrunLengthMm()));
        if (job.machine().hobShiftTravelMm().isPresent()) {
            row("Hob shift position", f.lenU(s.hobShiftMm()));
        }
        row("Coolant", coolant ? "on" : "off");
        rows();
        passes(sum.passes());
        m.close("section");
    }

    /**
     * Where the setter looks first, one line each under the heading: the program to call, the station
     * the hob goes in, where the program's zeros lie and which way its axial axis counts; the batch.
     */
    void run(Optional<JobNumbers> numbers, Optional<Dialect> dialect, Batch b) {
        List<String> program = new java.util.ArrayList<>(4);
        if (numbers.isPresent()) {
            program.add("Program " + numbers.get().programNumber());
            program.add("hob station " + numbers.get().toolStation());
        }
        if (dialect.isPresent()) {
            Dialect.Axis axial = dialect.get().axial();
            Dialect.Axis radial = dialect.get().radial();
            program.add(axial.letter() + "0 gear front face, " + axial.letter() + "+ "
                    + (axial.sign() > 0 ? "toward" : "away from") + " the chuck");
            program.add(radial.letter() + "0 work axis, " + radial.letter() + " as "
                    + (radial.diameter() ? "diameter" : "radius"));
        }
        if (!program.isEmpty()) {
            m.leaf("p", String.join(" · ", program), "class", "run").nl();
        }
        String unknown = b.unknownTimes().isEmpty() ? "" : "; not in the machine profile, counted as 0 s: "
                + String.join(", ", b.unknownTimes());
        m.leaf("p", "Cycle time " + f.seconds(b.cycleS()) + " (" + Decimal.fixed(b.cycleS() / 60, 2) + " min) · batch of "
                + b.parts() + (b.parts() == 1 ? " part" : " parts") + ": " + f.seconds(b.timePerPartS()) + " per part (with"
                + " load " + f.seconds(b.loadS().orElse(0)) + " and unload " + f.seconds(b.unloadS().orElse(0)) + unknown
                + ") · batch " + f.seconds(b.batchTimeS()) + " (" + Decimal.fixed(b.batchTimeS() / 3600, 2) + " h)",
                "class", "run").nl();
    }

    /** The hob as the setter finds it in the tool store; the work material and where the cutting data came from. */
    void hob(HobSpec h, CycleSettings c) {
        m.leaf("p", "Hob " + h.identifier().orElse("(no identifier)") + " · ⌀ " + f.len(h.outsideDiameterMm())
                + " × " + f.lenU(h.lengthMm()) + " · " + (h.pitch() instanceof Pitch.Diametral d
                ? "DP " + Decimal.fixed(d.perInch(), 4) + " /in" : "module " + Decimal.fixed(h.moduleMm(), 4) + " mm")
                + ", " + f.deg(h.pressureAngleDeg()) + " · " + h.starts() + (h.starts() == 1 ? " start, " : " starts, ")
                + h.hand().word() + " hand · " + h.gashes() + " gashes · " + h.material(), "class", "run").nl();
        String table = "cutting-data table (typical, confirm with the hob supplier)";
        String speed = c.cuttingSpeedMPerMin().isPresent() ? "the job" : table;
        String feeds = c.roughFeedMmPerRev().isPresent() && c.finishFeedMmPerRev().isPresent() ? "the job"
                : c.roughFeedMmPerRev().isPresent() || c.finishFeedMmPerRev().isPresent() ? "the job and the " + table
                : table;
        m.leaf("p", "Work material " + c.workMaterial() + " · " + (speed.equals(feeds) ? "speed and feeds: "
                + speed : "speed: " + speed + ", feeds: " + feeds), "class", "run").nl();
    }

    private void passes(List<PassSummary> passes) {
        m.open("table", "class", "passes").open("thead").open("tr");
        for (String h : List.of("Pass", "Infeed ⌀", "Depth", "Feed", "Approach", "Overrun", "Travel", "Time")) {
            m.leaf("th", h);
        }
        m.close("tr").close("thead").open("tbody");
        for (PassSummary p : passes) {
            m.open("tr").leaf("td", String.valueOf(p.pass())).leaf("td", f.lenU(p.infeedDiameterMm()))
                    .leaf("td", f.lenU(p.radialDepthMm())).leaf("td", f.feed(p.feedMmPerRev()))
                    .leaf("td", f.lenU(p.approachMm())).leaf("td", f.lenU(p.overrunMm()))
                    .leaf("td", f.lenU(p.axialTravelMm())).leaf("td", f.seconds(p.seconds())).close("tr");
        }
        m.close("tbody").close("table");
    }

    void gear(GearData g) {
        GearSpec s = job.gear();
        section("Gear");
        row("Part", s.partName());
        row("Teeth z", String.valueOf(s.teeth()));
        row(s.pitch() instanceof Pitch.Diametral ? "Diametral pitch" : "Module",
                s.pitch() instanceof Pitch.Diametral d ? Decimal.fixed(d.perInch(), 4) + " /in"
                        : Decimal.fixed(s.moduleMm(), 4) + " mm");
        row("Pressure angle", f.deg(s.pressureAngleDeg()));
        row("Helix", s.isSpur() ? "spur" : f.deg(s.helixAngleDeg()) + " " + s.hand().word() + " hand");
        row("Profile shift x", Decimal.fixed(s.profileShift(), 4));
        row("Face width", f.lenU(s.faceWidthMm()));
        row("Reference ⌀", f.lenU(g.referenceDiameterMm()));
        row("Base ⌀", f.lenU(g.baseDiameterMm()));
        row("Tip ⌀", f.lenU(g.tipDiameterMm()));
        row("Root ⌀", f.lenU(g.rootDiameterMm()));
        row("Whole depth", f.lenU(g.wholeDepthMm()));
        row("Tooth thickness (normal, reference circle)", f.lenU(g.toothThicknessMm()));
        end();
    }

    /** The spline's limits, its inspection over pins and the form check, for a spline job. */
    void spline(SplineData d) {
        GearSpec s = job.gear();
        SplineSpec sp = job.spline().orElseThrow();
        section("Spline");
        row("Part", s.partName());
        row("Standard", d.standard() + ", " + sp.root() + " root, class " + sp.toleranceClass() + sp.fitClass());
        row("Teeth z", String.valueOf(s.teeth()));
        row(s.pitch() instanceof Pitch.Diametral ? "Diametral pitch" : "Module",
                s.pitch() instanceof Pitch.Diametral p ? Decimal.fixed(p.perInch(), 4) + "/" + Decimal.fixed(2 * p.perInch(), 4)
                        : Decimal.fixed(s.moduleMm(), 4) + " mm");
        row("Pressure angle", f.deg(s.pressureAngleDeg()));
        row("Spline length", f.lenU(s.faceWidthMm()));
        row("Pitch ⌀ D / base ⌀ D_b", f.lenU(d.pitchDiameterMm()) + " / " + f.lenU(d.baseDiameterMm()));
        row("Major ⌀ D_ee (turn to)", f.len(d.majorDiameterMinMm()) + " … " + f.lenU(d.majorDiameterMaxMm()));
        row("Minor ⌀ D_ie", f.len(d.minorDiameterMinMm()) + " … " + f.lenU(d.minorDiameterMaxMm()));
        row("Form ⌀ D_Fe (involute at least down to)", f.lenU(d.formDiameterMm()));
        d.form().ifPresent(fc -> {
            row("Involute begins at (simulated, thickest tooth)", f.lenU(fc.involuteStartDiameterMm())
                    + (fc.formReached() ? " — form diameter reached" : " — FORM DIAMETER NOT REACHED"));
            row("Root ⌀ the hob cuts", f.len(fc.rootDiameterMinMm()) + " … " + f.lenU(fc.rootDiameterMaxMm()));
        });
        row("Tooth thickness S_v max (effective)", f.lenU(d.effectiveThicknessMaxMm()));
        row("Tooth thickness S_max … S_min (actual)", f.len(d.toothThicknessMaxMm()) + " … "
                + f.lenU(d.toothThicknessMinMm()));
        row("Pin ⌀", f.lenU(d.pinDiameterMm()) + " (" + d.pinOrigin() + ")");
        row("Over two pins, max … min", f.len(d.overPinsMaxMm()) + " … " + f.lenU(d.overPinsMinMm()));
        end();
    }

    void inspection(InspectionData i) {
        section("Inspection");
        Optional<InspectionLimits> l = i.limits();
        row("Span over k teeth", "k = " + i.spanTeeth() + ", W = " + l.map(x -> range(x.spanWidthLowerMm(),
                x.spanWidthUpperMm())).orElse(f.lenU(i.spanWidthMm())));
        row("Anvil contact ⌀", f.lenU(i.spanContactDiameterMm()));
        row(i.balls() ? "Ball ⌀" : "Pin ⌀", f.lenU(i.pinDiameterMm()));
        row(i.balls() ? "Over two balls" : "Over two pins", l.map(x -> range(x.overPinsLowerMm(),
                x.overPinsUpperMm())).orElse(f.lenU(i.overPinsMm())));
        row("Chordal thickness / height", l.map(x -> range(x.chordalThicknessLowerMm(), x.chordalThicknessUpperMm()))
                .orElse(f.lenU(i.chordalThicknessMm())) + " / " + f.lenU(i.chordalHeightMm()));
        l.ifPresent(x -> row("Tooth-thickness allowances (normal)", "upper " + f.lenU(x.upperAllowanceMm())
                + ", lower " + f.lenU(x.lowerAllowanceMm()) + " (" + x.basis() + ")"));
        end();
    }

    /** "lower … upper unit": a range of limits. */
    private String range(double lowerMm, double upperMm) {
        return f.len(lowerMm) + " … " + f.lenU(upperMm);
    }

    void pair(GearPairData p) {
        section("Mating gear");
        row("Mate", p.mateTeeth() + " teeth, profile shift " + Decimal.fixed(p.mateProfileShift(), 4)
                + (p.mateProfileShiftGiven() ? "" : " (from the centre distance)"));
        row("Centre distance", f.lenU(p.centreDistanceMm()) + (p.centreDistanceGiven() ? " (drawing)"
                : " (without backlash)") + "; reference " + f.lenU(p.referenceCentreDistanceMm()));
        row("Working pressure angle (transverse)", f.deg(p.workingPressureAngleDeg()));
        row("x₁ + x₂ the centre distance implies", Decimal.fixed(p.profileShiftSum(), 4));
        row("Normal backlash", range(p.backlashMinMm(), p.backlashMaxMm()));
        row("Mate tip ⌀ / root ⌀", f.lenU(p.mateTipDiameterMm()) + " / " + f.lenU(p.mateRootDiameterMm()));
        row("Tip clearance: this gear / the mate", f.lenU(p.tipClearanceMm()) + " / " + f.lenU(p.mateTipClearanceMm()));
        end();
    }

    /**
     * The first-article record: what the inspector measures on the first part, with the limits and blank
     * fields for the measured values, the verdict, the date and the signatures.
     */
    void firstArticle(GearData g, SetupValues s, Optional<InspectionData> inspection) {
        m.open("section", "class", "record keep").leaf("h2", "First-article record").nl();
        m.open("table", "class", "record").open("thead").open("tr");
        for (String h : List.of("Characteristic", "Nominal", "Lower limit", "Upper limit", "Measured", "OK?")) {
            m.leaf("th", h);
        }
        m.close("tr").close("thead").open("tbody");
        inspection.ifPresent(i -> {
            Optional<InspectionLimits> l = i.limits();
            measure("Span over " + i.spanTeeth() + " teeth", i.spanWidthMm(), l.map(InspectionLimits::spanWidthLowerMm),
                    l.map(InspectionLimits::spanWidthUpperMm));
            measure((i.balls() ? "Over two balls ⌀ " : "Over two pins ⌀ ") + f.lenU(i.pinDiameterMm()), i.overPinsMm(),
                    l.map(InspectionLimits::overPinsLowerMm), l.map(InspectionLimits::overPinsUpperMm));
        });
        measure("Tip ⌀ (turned blank)", s.blankDiameterMm(), Optional.empty(), Optional.empty());
        Optional<InspectionLimits> l = inspection.flatMap(InspectionData::limits);
        measure("Root ⌀", g.rootDiameterMm(), l.map(InspectionLimits::rootDiameterLowerMm),
                l.map(InspectionLimits::rootDiameterUpperMm));
        m.close("tbody").close("table");
        m.leaf("p", "Limits from the tooth-thickness allowances; \u201cdrawing\u201d: the drawing's tolerance applies.");
        m.open("table", "class", "signoff").open("tbody");
        for (String[] r : List.of(new String[] {"Part / serial no.", "Measured by", "Date", "Signature"},
                new String[] {"Machine / program", "Released by", "Date", "Signature"})) {
            m.open("tr");
            for (String c : r) {
                m.leaf("th", c, "scope", "row").leaf("td", "", "class", "blank");
            }
            m.close("tr");
        }
        m.close("tbody").close("table");
        m.close("section");
    }

    private void measure(String name, double nominalMm, Optional<Double> lowerMm, Optional<Double> upperMm) {
        m.open("tr").leaf("td", name).leaf("td", f.lenU(nominalMm))
                .leaf("td", lowerMm.map(f::lenU).orElse("drawing"))
                .leaf("td", upperMm.map(f::lenU).orElse("drawing"))
                .leaf("td", "", "class", "blank").leaf("td", "", "class", "blank").close("tr");
    }

    void quality(CycleSummary sum, QualityTargets t, Optional<ToleranceData> tol,
                 Optional<SimulationData> sim) {
        m.open("section").leaf("h2", "Predicted quality against targets").nl();
        m.open("table").open("thead").open("tr").leaf("th", "Value").leaf("th", "Predicted").leaf("th", "Target")
                .leaf("th", "Verdict").close("tr").close("thead").open("tbody");
        verdict("Feed-mark depth on the flank", sum.feedMarkFlankUm(), t.feedMarkDepthUm(), f.um(sum.feedMarkFlankUm()),
                t.feedMarkDepthUm().isPresent() ? f.um(t.feedMarkDepthUm().getAsDouble()) : "");
        verdict("Enveloping-cut depth", sum.envelopingDepthUm(), t.envelopingDepthUm(), f.um(sum.envelopingDepthUm()),
                t.envelopingDepthUm().isPresent() ? f.um(t.envelopingDepthUm().getAsDouble()) : "");
        verdict("Largest chip thickness", sum.maxChipThicknessMm(), t.maxChipThicknessMm(),
                f.lenU(sum.maxChipThicknessMm()),
                t.maxChipThicknessMm().isPresent() ? f.lenU(t.maxChipThicknessMm().getAsDouble()) : "");
        m.open("tr").leaf("td", "Feed-mark depth in the root").leaf("td", f.um(sum.feedMarkRootUm())).leaf("td", "—")
                .leaf("td", "").close("tr");
        sim.ifPresent(s -> {
            OptionalDouble profileLimit = tol.isPresent()
                    ? OptionalDouble.of(tol.get().profileFormUm()) : OptionalDouble.empty();
            verdict("Simulated profile deviation", s.profileDeviationMaxMm() * 1000, profileLimit,
                    f.um(s.profileDeviationMaxMm() * 1000),
                    profileLimit.isPresent() ? f.um(profileLimit.getAsDouble()) + " (f_fαT)" : "");
            m.open("tr").leaf("td", "Undercut in the simulation").leaf("td", s.undercut() ? "yes" : "no")
                    .leaf("td", "no").leaf("td", s.undercut() ? "check" : "within").close("tr");
        });
        m.close("tbody").close("table");
        tol.ifPresent(this::tolerances);
        m.close("section");
    }

    private void verdict(String name, double value, OptionalDouble target, String shown, String targetText) {
        String v = target.isEmpty() ? "no target" : value <= target.getAsDouble() ? "within" : "over the target";
        m.open("tr").leaf("td", name).leaf("td", shown).leaf("td", targetText.isEmpty() ? "—" : targetText)
                .leaf("td", v, "class", v.startsWith("over") ? "bad" : "ok").close("tr");
    }

    private void tolerances(ToleranceData t) {
        m.leaf("p", "ISO 1328-1:2013 flank tolerance class " + t.flankToleranceClass()
                + " (what the inspector measures against):");
        m.open("table").open("tbody");
        m.open("tr").leaf("td", "f_pT " + f.um(t.singlePitchUm())).leaf("td", "F_pT " + f.um(t.totalPitchUm()))
                .leaf("td", "F_αT " + f.um(t.profileTotalUm())).leaf("td", "F_βT " + f.um(t.helixTotalUm())).close("tr");
        m.open("tr").leaf("td", "f_Hα " + f.um(t.profileSlopeUm())).leaf("td", "f_fα " + f.um(t.profileFormUm()))
                .leaf("td", "f_Hβ " + f.um(t.helixSlopeUm())).leaf("td", "f_fβ " + f.um(t.helixFormUm())).close("tr");
        m.close("tbody").close("table");
    }

    void findings(List<Finding> findings) {
        m.open("section").leaf("h2", "Open warnings and notes").nl();
        List<Finding> open = findings.stream().filter(x -> !x.isError()).toList();
        if (open.isEmpty()) {
            m.leaf("p", "None.");
        } else {
            m.open("ul", "class", "findings");
            for (Finding x : open) {
                m.open("li").leaf("strong", x.severity().word() + " " + x.code()).text(" (" + x.field() + "): "
                        + x.message() + x.fix().map(fx -> " — fix: " + fx).orElse("")).close("li");
            }
            m.close("ul");
        }
        m.close("section");
    }

    /**
     * Opens a section with its heading; its rows follow ({@link #row}) and {@link #end} closes it. The
     * heading never ends a page; a table of up to {@value #KEEP_ROWS} rows is kept on one page, a longer
     * one may break between rows, so no section leaves a large part of a page empty.
     */
    private void section(String title) {
        m.open("section").leaf("h2", title).nl();
        pending.clear();
    }

    private void row(String name, String value) {
        pending.add(new String[] {name, value});
    }

    /** Writes the rows given since the heading as one table. */
    private void rows() {
        m.open("table", "class", pending.size() <= KEEP_ROWS ? "rows keep" : "rows").open("tbody");
        for (String[] r : pending) {
            m.open("tr").leaf("th", r[0], "scope", "row").leaf("td", r[1]).close("tr");
        }
        m.close("tbody").close("table");
        pending.clear();
    }

    private void end() {
        rows();
        m.close("section");
    }
}
