package org.hobwright.wizard.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.Units;
import org.hobwright.api.wizard.Wizard;
import org.hobwright.wizard.run.Outputs;
import org.hobwright.wizard.steps.StepFields;
import org.hobwright.wizard.steps.StepSession;
import org.hobwright.wizard.store.CycleTemplate;
import org.hobwright.wizard.store.Loaded;
import org.hobwright.wizard.store.Names;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/** The end of a terminal wizard: write the outputs, then offer to save the cycle answers as a template. */
final class WizardFinish implements TerminalWizard.Finish {
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
        String line = asker.read("Write the program, CSV, setup sheet and report to " + folder
                + "? (yes, no, back) [yes] > ");
        if (line.equalsIgnoreCase("back")) {
            return false;
        }
        if (TerminalWizard.yes(line, true)) {
            HobJob job = wizard.job().orElseThrow();
            JobInput in = new JobInput("wizard answers", Optional.of(job), List.of(), wizard.cycle());
            RunPrinter printer = new RunPrinter(prompter.writer());
            if (PlanRun.write(outputs, List.of(in), store, folder, printer) != ExitCodes.OK) {
                return true;
            }
        }
        saveTemplate(asker, prompter);
        return true;
    }

    private void saveTemplate(TerminalWizard asker, Prompter prompter) {
        String machine = session.value(StepFields.MACHINE);
        while (true) {
            String name = asker.read("Save the cycle answers as a template of " + machine
                    + "? Name, or Enter for none [] > ");
            if (name.isEmpty()) {
                return;
            }
            Optional<Finding> bad = Names.check("template", name);
            if (bad.isPresent()) {
                prompter.say("  ! " + bad.get().message());
                continue;
            }
            CycleTemplate template = new CycleTemplate(name, machine, "saved by the wizard", units(), cycleTree());
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

    /** The cycle answers as a template's {@code cycle} object (without the template choice itself). */
    private ObjectNode cycleTree() {
        JsonNode cycle = session.answers().toTree().get("cycle");
        ObjectNode c = cycle instanceof ObjectNode o ? o.deepCopy() : JsonNodeFactory.instance.objectNode();
        c.remove("template");
        return c;
    }

    private Units units() {
        return "in".equals(session.value(StepFields.UNITS)) ? Units.IN : Units.MM;
    }
}
