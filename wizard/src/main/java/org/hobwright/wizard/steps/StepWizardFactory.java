package org.hobwright.wizard.steps;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.wizard.Wizard;
import org.hobwright.api.wizard.WizardFactory;
import org.hobwright.wizard.run.Build;
import org.hobwright.wizard.run.LibraryPlanner;
import org.hobwright.wizard.store.JobWriter;
import org.hobwright.wizard.store.Library;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The wizard module's {@link WizardFactory}, found with {@link java.util.ServiceLoader}. Sessions
 * start blank (only the defaults of a standard or the trade's convention filled in, see
 * {@link Answers#blank()}), from the built-in sample job (an invented metering-pump gear) when
 * asked, or from a given job. The planner at REVIEW is the library's ({@link LibraryPlanner}),
 * with the shop's cutting data.
 */
public final class StepWizardFactory implements WizardFactory {
    /** Resource of the built-in sample job whose values are the defaults. */
    public static final String SAMPLE = "org/hobwright/builtin/jobs/metering-pump-gear.json";

    @Override
    public String id() {
        return "hobwright";
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
        return Build.VERSION;
    }

    @Override
    public Wizard start(Map<String, String> options) {
        java.util.Objects.requireNonNull(options, "options is required, was null");
        return new StepSession(services(options), START_SAMPLE.equals(options.get(START)) ? sampleAnswers()
                : Answers.blank());
    }

    /** {@inheritDoc} A machine the library does not hold is kept inline. */
    @Override
    public Wizard start(HobJob job, Map<String, String> options) {
        java.util.Objects.requireNonNull(job, "job is required, was null");
        java.util.Objects.requireNonNull(options, "options is required, was null");
        StepServices services = services(options);
        boolean known = services.machines().contains(job.machine().name());
        return new StepSession(services, Answers.fromTree(JobWriter.jobTree(job, job.units(), known)));
    }

    /** The answers of the built-in sample job (an invented metering-pump gear). */
    public static Answers sampleAnswers() {
        try (InputStream in = StepWizardFactory.class.getClassLoader().getResourceAsStream(SAMPLE)) {
            if (in == null) {
                throw new IllegalStateException("the built-in sample job " + SAMPLE + " is missing");
            }
            JsonNode tree = JsonMapper.shared().readTree(in);
            return Answers.fromTree(tree);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static StepServices services(Map<String, String> options) {
        Library library = Library.open(Optional.ofNullable(options.get(HOME)).map(Path::of));
        return new LibraryServices(library, StepWizardFactory.class.getClassLoader());
    }
}
