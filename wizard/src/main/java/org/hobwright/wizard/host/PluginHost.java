package org.hobwright.wizard.host;

import java.nio.file.Path;
import org.hobwright.api.spi.HostProvider;
import org.hobwright.api.spi.HostSession;
import org.hobwright.api.spi.Spi;
import org.hobwright.wizard.run.Build;

/**
 * Hobwright's {@link HostProvider}, found with {@link java.util.ServiceLoader} behind the façade
 * {@link org.hobwright.api.Hobwright}. Its sessions plan and post exactly as the terminal tool does.
 */
public final class PluginHost implements HostProvider {

    @Override
    public String id() {
        return "hobwright";
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
    public HostSession open(Path home) {
        return new PluginSession(home, PluginHost.class.getClassLoader());
    }
}
