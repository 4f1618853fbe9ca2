package org.hobwright.api.wizard;

import java.util.Map;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.Provider;

/**
 * Starts wizard sessions. Found with {@link java.util.ServiceLoader} (or
 * {@link org.hobwright.api.spi.Providers#wizards(ClassLoader)}); the wizard module provides one.
 */
@ApiStatus(since = "1.0")
public interface WizardFactory extends Provider {

    /** Option naming the folder of the machine, template and dialect library. */
    String HOME = "home";

    /**
     * Option choosing the answers a session starts with: {@value #START_BLANK} (the default: every
     * field empty until the user answers) or {@value #START_SAMPLE} (the built-in sample job's
     * values, for demonstrations).
     */
    String START = "start";

    /** Value of {@link #START}: no answers. */
    String START_BLANK = "blank";

    /** Value of {@link #START}: the built-in sample job's answers. */
    String START_SAMPLE = "sample";

    /**
     * The SPI generation of the first api: return {@link org.hobwright.api.spi.Spi#VERSION}. Which api the provider was
     * built against is {@link #apiVersion()}, which the lookup reads.
     *
     * @return {@link org.hobwright.api.spi.Spi#VERSION}
     */
    int spiVersion();

    /**
     * Starts a session, blank unless {@link #START} asks for the sample.
     *
     * @param options optional settings: {@link #HOME} = folder of the machine and template
     *                library, {@link #START} = blank or sample
     * @return the session
     */
    Wizard start(Map<String, String> options);

    /**
     * Starts a session whose defaults are taken from an existing job.
     *
     * @param job     the job to start from
     * @param options as for {@link #start(Map)} ({@link #START} is not read)
     * @return the session
     */
    Wizard start(HobJob job, Map<String, String> options);
}
