package org.hobwright.wizard.cli;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.wizard.Wizard;
import org.hobwright.wizard.run.Outputs;
import org.hobwright.wizard.steps.StepFields;
import org.hobwright.wizard.steps.StepSession;
import org.hobwright.wizard.steps.UsedCycle;
import org.hobwright.wizard.store.CycleTemplate;
import org.hobwright.wizard.store.JobWriter;
import org.hobwright.wizard.store.Loaded;
import org.hobwright.wizard.store.Names;

/**
 * The end of a terminal wizard: write the outputs with the job file of the answers
 * ({@code NAME.job.json}, the format {@code plan} reads), then offer to save the cycle actually
 * used as a template of the machine.
 */
final class WizardFinish implements TerminalWizard.Finish {
    /** Ending of the job file written beside the outputs. */
    static final String JOB_FILE = ".job.json";

    private final StepSession session;
    private final Store store;
    private final Outputs outputs;
    private final Path folder;

    WizardFinish(StepSession session, Store store, Outputs outputs, Path folder) {
        this.session = session;
        this.store = store;
        this.outputs = outputs;
        this.folder = folder;
    }

    @Override
    public boolean offer(Wizard wizard, Prompter prompter) {
        TerminalWizard asker = new TerminalWizard(wizard, prompter);
        HobJob job = wizard.job().orElseThrow();
        Outputs.Produced written = outputs.produce(List.of(new Outputs.Named("wizard answers",
                new PlannedJob(job, wizard.cycle().orElseThrow()))));
        Map<String, String> files = new LinkedHashMap<>(written.files());
        files.put(job.name() + JOB_FILE, JobWriter.text(session.answers().toTree()));
        Outputs.Produced produced = new Outputs.Produced(files, written.findings());
        List<String> replaced = OutputFolder.existing(folder, produced.files().keySet());
        String line = asker.read("Write the program, CSV, setup sheet, report and job file to " + folder
                + (replaced.isEmpty() ? "" : " (replacing " + String.join(", ", replaced) + ")")
                + "? (yes, no, back) [yes] > ");
        if (line.equalsIgnoreCase("back")) {
            return false;
        }
        if (TerminalWizard.yes(line, true)) {
            RunPrinter printer = new RunPrinter(prompter.writer());
            if (PlanRun.write(produced, store, folder, printer) != ExitCodes.OK) {
                return true;
            }
        }
        saveTemplate(asker, prompter, job);
        return true;
    }

    private void saveTemplate(TerminalWizard asker, Prompter prompter, HobJob job) {
        String machine = session.value(StepFields.MACHINE);
        while (true) {
            String name = asker.read("Save the cycle used (speed, feeds, stock, passes) as a template of " + machine
                    + "? Name, or Enter for none [] > ");
            if (name.isEmpty()) {
                return;
            }
            Optional<Finding> bad = Names.check("template", name);
            if (bad.isPresent()) {
                prompter.say("  ! " + bad.get().message());
                continue;
            }
            CycleTemplate template = CycleTemplate.of(name, machine, "saved by the wizard from job " + job.name(),
                    UsedCycle.of(job, session.cycle().orElseThrow()), job.units());
            Loaded<Path> saved = store.library().saveTemplate(template, false);
            if (saved.hasErrors() && saved.findings().stream().anyMatch(f -> f.code().equals("LIBRARY_EXISTS"))
                    && TerminalWizard.yes(asker.read("  Template " + name + " exists. Replace it? [no] > "), false)) {
                saved = store.library().saveTemplate(template, true);
            }
            prompter.say(saved.ok() ? "Saved template " + name + " to " + saved.get() : "  ! " + saved.errorLine());
            if (saved.ok()) {
                return;
            }
        }
    }
}
