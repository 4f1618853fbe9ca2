package org.hobwright.api.spi;

import java.nio.file.Path;
import org.hobwright.api.ApiStatus;

/**
 * Opens host sessions: the provider behind the façade {@link org.hobwright.api.Hobwright}. Found
 * with {@link java.util.ServiceLoader}; the wizard module provides one. A host calls
 * {@link org.hobwright.api.Hobwright#open(ClassLoader, Path)} rather than this interface.
 */
@ApiStatus(since = "1.1")
public interface HostProvider extends Provider {

    /**
     * Opens a session on a library folder.
     *
     * @param home the machine, template, dialect and cutting-data library folder (need not exist)
     * @return the session; the caller closes it
     */
    HostSession open(Path home);
}
