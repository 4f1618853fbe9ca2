package org.hobwright.wizard.run;

import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.api.spi.Providers;
import org.hobwright.wizard.plan.CuttingDataTable;
import org.hobwright.wizard.plan.DefaultCyclePlanner;
import org.hobwright.wizard.store.Library;

/**
 * The planner for a library folder, the same for the terminal tool, the wizard and a host: the one
 * found through the SPI, or, when the library holds the shop's own cutting-data table
 * ({@code cutting-data.json}), Hobwright's planner with that table over the built-in one.
 */
public final class LibraryPlanner {
    private LibraryPlanner() {
    }

    /**
     * The planner for a library.
     *
     * @param library the library
     * @param loader  the class loader the planner is found with when the library has no table
     * @return the planner
     * @throws IllegalArgumentException naming the file and the problem when the shop's table cannot be used
     */
    public static CyclePlanner of(Library library, ClassLoader loader) {
        Path table = library.home().resolve(CuttingDataTable.FILE_NAME);
        if (!Files.isRegularFile(table)) {
            return Providers.planner(loader);
        }
        return new DefaultCyclePlanner(table(library));
    }

    /**
     * The cutting-data table the planner of a library uses.
     *
     * @param library the library
     * @return the built-in table, overridden by the shop's own when the folder has one
     * @throws IllegalArgumentException naming the file and the problem when the shop's table cannot be used
     */
    public static CuttingDataTable table(Library library) {
        Path table = library.home().resolve(CuttingDataTable.FILE_NAME);
        try {
            return CuttingDataTable.forLibrary(library.home());
        } catch (UncheckedIOException e) {
            throw new IllegalArgumentException("the shop's cutting-data table " + table + " cannot be read: "
                    + e.getCause().getMessage(), e);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("the shop's cutting-data table " + table + " cannot be used: "
                    + e.getMessage(), e);
        }
    }
}
