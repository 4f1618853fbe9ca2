package org.hobwright.post.nc;

import org.hobwright.post.PostCode;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.PostFindings;

/**
 * Writes the NC program ({@code JOB.nc}) with the dialect given in the context under
 * {@link WriteContext#DIALECT}. Refuses, with findings naming the dialect line, when the dialect
 * does not load or lacks a template the cycle needs, and refuses when a safety invariant is broken
 * on the words as they would be written ({@link PostedWords} rounds them, {@link SafetyCheck}
 * judges them, {@link NcRenderer} writes exactly those numbers).
 */
public final class NcWriter implements CycleWriter {
    private static final int KEPT = 16;
    /**
     * Most operations a program may have: far beyond a hobbing cycle (about six a pass, and the
     * planner makes at most 200 passes), it keeps the text bounded for a cycle from any planner.
     */
    static final int MAX_OPERATIONS = 20_000;
    private final Map<String, DialectLoader.Loaded> dialects = new ConcurrentHashMap<>();



    @Override
    public String id() {
        return "nc";
    }

    @Override
    public int spiVersion() {
        return Spi.VERSION;
    }

    @Override
    public String apiVersion() {
        return Spi.API_VERSION;
    }

    @Override
    public String buildVersion() {
        return PostFindings.BUILD_VERSION;
    }

    @Override
    public String description() {
        return "NC program for the machine's control, from its dialect file";
    }

    @Override
    public WriteResult write(HobCycle cycle, WriteContext context) {
        Optional<WriteResult> refusal = PostFindings.refusal(cycle, context, id());
        if (refusal.isPresent()) {
            return refusal.get();
        }
        String dialectName = dialectName(context);
        Optional<String> json = context.resource(WriteContext.DIALECT);
        if (json.isEmpty()) {
            return WriteResult.refused(List.of(PostCode.NC_DIALECT_MISSING.at("machine.dialect",
                    "No dialect text was given for \"" + dialectName + "\"; the NC program needs one",
                    "save the dialect file " + dialectName + ".json in the library's dialects folder")));
        }
        DialectLoader.Loaded loaded = dialect(dialectName, json.get());
        if (loaded.dialect().isEmpty()) {
            return WriteResult.refused(loaded.findings());
        }
        Dialect dialect = loaded.dialect().get();
        List<Finding> missing = missingTemplates(cycle, dialect);
        missing.addAll(numbers(context.job(), dialect));
        if (!missing.isEmpty()) {
            return WriteResult.refused(missing);
        }
        NcProgram program = NcProgramBuilder.build(cycle, NcHeader.lines(cycle, context, dialect),
                context.job().units(), context.job().machine().radialMaxMm());
        if (program.ops().size() > MAX_OPERATIONS) {
            return WriteResult.refused(List.of(PostCode.NC_PROGRAM_TOO_LONG.at("cycle.steps", "the cycle has "
                    + cycle.steps().size() + " steps; a program may have at most " + MAX_OPERATIONS + " operations",
                    "plan fewer passes (cycle.roughDepth)")));
        }
        WordUnits units = new WordUnits(dialect, context.job().units());
        PostLimits limits = PostLimits.of(context.job(), cycle.setup().orElseThrow());
        List<PostedOp> posted = PostedWords.of(program, dialect, units, limits);
        List<Finding> unsafe = SafetyCheck.check(posted, dialect, units, limits);
        if (!unsafe.isEmpty()) {
            return WriteResult.refused(unsafe);
        }
        NcRenderer.Rendered r = new NcRenderer(dialect, context.job()).render(posted);
        if (!r.findings().isEmpty()) {
            return WriteResult.refused(r.findings());
        }
        String text = String.join(dialect.lineEnding(), r.lines()) + dialect.lineEnding();
        return new WriteResult(List.of(new OutputFile(context.job().name() + ".nc", text)), loaded.findings());
    }

    /** Loads and checks the job's dialect ahead of {@link #write}, which then finds it kept. */
    @Override
    public void prepare(WriteContext context) {
        Optional<String> json = context.resource(WriteContext.DIALECT);
        if (json.isPresent()) {
            dialect(dialectName(context), json.get());
        }
    }

    private static String dialectName(WriteContext context) {
        return context.resource(WriteContext.DIALECT_NAME).orElse(context.job().machine().dialect());
    }

    /**
     * The loaded dialect, kept by name and text: a run that writes many jobs for a few machines
     * reads and checks each dialect once (a dialect is immutable; at most {@value #KEPT} are kept).
     */
    private DialectLoader.Loaded dialect(String name, String json) {
        String key = name + '\n' + json;
        DialectLoader.Loaded loaded = dialects.get(key);
        if (loaded == null) {
            loaded = DialectLoader.load(name, json);
            if (dialects.size() < KEPT) {
                dialects.putIfAbsent(key, loaded);
            }
        }
        return loaded;
    }

    /** Templates the cycle needs beyond the required ones. */
    private static List<Finding> missingTemplates(HobCycle cycle, Dialect dialect) {
        Set<TemplateKey> needed = EnumSet.noneOf(TemplateKey.class);
        for (CycleStep s : cycle.steps()) {
            if (s instanceof CycleStep.SyncOn on && on.differentialDegPerMm() != 0) {
                needed.add(TemplateKey.SYNC_ON_HELIX);
            } else if (s instanceof CycleStep.Swivel sw && sw.programmable()) {
                needed.add(TemplateKey.SWIVEL_TO);
            } else if (s instanceof CycleStep.HobShift) {
                needed.add(TemplateKey.HOB_SHIFT);
            }
        }
        List<Finding> out = new ArrayList<>();
        for (TemplateKey k : needed) {
            if (dialect.template(k).isEmpty()) {
                out.add(PostCode.NC_DIALECT_MISSING_TEMPLATE.at("dialect.templates", dialect.name() + " line "
                        + dialect.lines().templates() + ": the cycle needs template \"" + k.key()
                        + "\", which the dialect does not have",
                        "add \"" + k.key() + "\" to \"templates\" with the words from the control builder's manual"));
            }
        }
        return out;
    }

    /** The program number and the tool station must be ones the dialect's control takes. */
    private static List<Finding> numbers(HobJob job, Dialect d) {
        List<Finding> out = new ArrayList<>(2);
        JobNumbers numbers = JobNumbers.of(job, d);
        long program = numbers.programNumber();
        if (!d.programNumbers().takes(program)) {
            out.add(PostCode.NC_PROGRAM_NUMBER.at("cycle.programNumber", "program number " + program + " is not one "
                    + d.name() + " takes (" + d.programNumbers().min() + " to " + d.programNumbers().max() + ")",
                    "give cycle.programNumber from " + d.programNumbers().min() + " to " + d.programNumbers().max()));
        }
        long tool = numbers.toolStation();
        if (!d.toolStations().takes(tool)) {
            out.add(PostCode.NC_TOOL_STATION.at("cycle.toolStation", "tool station " + tool + " is not one "
                    + d.name() + " has (" + d.toolStations().min() + " to " + d.toolStations().max() + ")",
                    "give cycle.toolStation from " + d.toolStations().min() + " to " + d.toolStations().max()));
        }
        return out;
    }
}
