package org.hobwright.wizard.steps;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.Units;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.api.spi.ProviderMissingException;
import org.hobwright.wizard.analysis.JobAnalyser;
import org.hobwright.wizard.run.LibraryPlanner;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.store.LibraryEntry;
import org.hobwright.wizard.store.Loaded;
import tools.jackson.databind.node.ObjectNode;

/**
 * The step model's services on a real library: the store's job reader, the engineering checks
 * ({@link JobAnalyser}) and the library's planner ({@link LibraryPlanner}: the shop's cutting data
 * when the folder has a table), looked up once, when first needed.
 */
public final class LibraryServices implements StepServices {
    /** Name of the answers in the reader's messages. */
    static final String SOURCE = "wizard answers";

    private final Library library;
    private final JobReader reader;
    private final ClassLoader loader;
    private CyclePlanner planner;

    /**
     * @param library the machine and template library
     * @param loader  the class loader the planner is found with
     */
    public LibraryServices(Library library, ClassLoader loader) {
        this.library = library;
        this.reader = new JobReader(library);
        this.loader = loader;
    }

    @Override
    public JobRead read(ObjectNode tree) {
        Loaded<HobJob> loaded = reader.read(tree, SOURCE);
        return new JobRead(loaded.value(), loaded.findings());
    }

    @Override
    public List<Finding> check(HobJob job) {
        return JobAnalyser.analyse(job).findings();
    }

    @Override
    public HobCycle plan(HobJob job) {
        try {
            if (planner == null) {
                Loaded<CyclePlanner> found = LibraryPlanner.of(library, loader);
                if (!found.ok()) {
                    return unplanned(job, found.findings());
                }
                planner = found.get();
            }
            return planner.plan(job);
        } catch (ProviderMissingException e) {
            return unplanned(job, List.of(WizardCode.WIZARD_NO_PLANNER.at("job", e.getMessage(),
                    "put hobwright-wizard on the class path")));
        }
    }

    private static HobCycle unplanned(HobJob job, List<Finding> why) {
        return new HobCycle(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(), List.of(),
                Optional.empty(), Optional.empty(), why, Optional.of(job));
    }

    @Override
    public List<String> machines() {
        return library.machines().stream().map(LibraryEntry::name).toList();
    }

    @Override
    public List<String> templates(String machine) {
        return library.templates(machine).stream().map(LibraryEntry::name).toList();
    }

    @Override
    public Optional<ObjectNode> templateCycle(String machine, String name, Units units) {
        return library.template(machine, name).value().map(t -> t.cycleIn(units));
    }
}
