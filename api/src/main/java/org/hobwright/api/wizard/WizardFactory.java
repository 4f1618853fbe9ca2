package org.hobwright.api.wizard;

import java.util.Map;
import org.hobwright.api.job.HobJob;

/**
 * Starts wizard sessions. Found with {@link java.util.ServiceLoader}; the wizard module provides one.
 */
public interface WizardFactory {

    /** The SPI version this factory was built for. */
    int spiVersion();

    /**
     * Starts a session with the built-in sample's answers as defaults.
     *
     * @param options optional settings: {@code home} = folder of the machine and template library
     */
    Wizard start(Map<String, String> options);

    /**
     * Starts a session whose defaults are taken from an existing job.
     *
     * @param job     the job to start from
     * @param options as for {@link #start(Map)}
     */
    Wizard start(HobJob job, Map<String, String> options);
}
