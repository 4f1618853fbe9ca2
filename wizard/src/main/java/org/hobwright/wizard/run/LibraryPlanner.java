package org.hobwright.wizard.run;

import java.nio.file.Files;
import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.api.spi.Providers;
import org.hobwright.wizard.plan.DefaultCyclePlanner;
import org.hobwright.wizard.store.CuttingDataReader;
import org.hobwright.wizard.store.CuttingDataTable;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.store.Loaded;

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
     * @return the planner, or the findings of a shop table that cannot be used
     * @throws org.hobwright.api.spi.ProviderMissingException when no planner is found
     */
    public static Loaded<CyclePlanner> of(Library library, ClassLoader loader) {
        if (!Files.exists(library.home().resolve(CuttingDataReader.FILE_NAME))) {
            return Loaded.of(Providers.planner(loader));
        }
        return table(library).map(DefaultCyclePlanner::new);
    }

    /**
     * The cutting-data table the planner of a library uses.
     *
     * @param library the library
     * @return the built-in table, overridden by the shop's own when the folder has one, or the
     *         findings of a shop table that cannot be used
     */
    public static Loaded<CuttingDataTable> table(Library library) {
        return CuttingDataReader.forLibrary(library.home());
    }

    /**
     * One text for a shop table that cannot be used: every error, each with its line, key and fix.
     *
     * @param findings the reader's findings
     * @return the text
     */
    public static String failure(List<Finding> findings) {
        StringBuilder problems = new StringBuilder("the shop's cutting-data table cannot be used: ");
        String sep = "";
        for (Finding f : findings) {
            if (f.isError()) {
                problems.append(sep).append(f.message()).append(f.fix().map(x -> " (" + x + ")").orElse(""));
                sep = "\n  ";
            }
        }
        return problems.toString();
    }
}
