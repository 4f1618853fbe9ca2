package org.hobwright.wizard.host;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.host.CuttingRow;
import org.hobwright.api.host.HostLibrary;
import org.hobwright.api.host.Outcome;
import org.hobwright.api.host.Range;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.api.spi.Spi;
import org.hobwright.wizard.run.LibraryPlanner;
import org.hobwright.wizard.run.RunCode;
import org.hobwright.wizard.store.CuttingData;
import org.hobwright.wizard.store.CuttingDataReader;
import org.hobwright.wizard.store.CuttingDataTable;
import org.hobwright.wizard.store.ValueRange;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.store.LibraryEntry;
import org.hobwright.wizard.store.Loaded;

/** The library as a host sees it: read-only look-ups by name, problems as findings. */
final class ShopLibrary implements HostLibrary {
    private final Library library;

    ShopLibrary(Library library) {
        this.library = library;
    }

    @Override
    public Path home() {
        return library.home();
    }

    @Override
    public List<String> machines() {
        return library.machines().stream().map(LibraryEntry::name).toList();
    }

    @Override
    public Outcome<MachineProfile> machine(String name) {
        return PluginSession.of(library.machine(name));
    }

    @Override
    public List<String> templates(String machine) {
        return library.templates(machine).stream().map(LibraryEntry::name).toList();
    }

    @Override
    public Outcome<String> template(String machine, String name) {
        return PluginSession.of(library.templateText(machine, name));
    }

    @Override
    public List<String> dialects() {
        return library.dialects().stream().map(LibraryEntry::name).toList();
    }

    @Override
    public Outcome<String> dialect(String name) {
        return PluginSession.of(library.dialectText(name));
    }

    @Override
    public Outcome<List<CuttingRow>> cuttingData() {
        Outcome<CuttingDataTable> table = table();
        if (!table.ok()) {
            return Outcome.failed(table.findings());
        }
        return Outcome.of(table.orElseThrow().rows().values().stream().map(ShopLibrary::row)
                .sorted(Comparator.comparing(CuttingRow::workMaterial).thenComparing(CuttingRow::hobMaterial))
                .toList(), List.of());
    }

    @Override
    public Outcome<CuttingRow> cuttingData(String workMaterial, String hobMaterial) {
        Outcome<CuttingDataTable> table = table();
        if (!table.ok()) {
            return Outcome.failed(table.findings());
        }
        Optional<CuttingData> row = table.orElseThrow().find(workMaterial, hobMaterial);
        return row.map(r -> Outcome.of(row(r), List.of())).orElseGet(() -> Outcome.failed(List.of(
                RunCode.LIBRARY_NO_CUTTING_DATA.at("cycle.workMaterial", "the cutting-data table has no row for "
                        + workMaterial + " with a " + hobMaterial + " hob", "add a row to the library's "
                        + CuttingDataReader.FILE_NAME + ", or choose a work and hob material it has"))));
    }

    /** The library's planner; a shop table that cannot be used gives a planner that says so in every cycle. */
    CyclePlanner planner(ClassLoader loader) {
        Loaded<CyclePlanner> found = LibraryPlanner.of(library, loader);
        if (found.ok()) {
            return found.get();
        }
        List<Finding> why = found.findings();
        return new CyclePlanner() {
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
            public HobCycle plan(HobJob job) {
                java.util.Objects.requireNonNull(job, "job is required, was null");
                return new HobCycle(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                        List.of(), Optional.empty(), Optional.empty(), why, Optional.of(job));
            }
        };
    }

    private Outcome<CuttingDataTable> table() {
        return PluginSession.of(LibraryPlanner.table(library));
    }

    private static CuttingRow row(CuttingData d) {
        return new CuttingRow(d.workMaterial(), d.hobMaterial(), range(d.cuttingSpeed()), range(d.roughFeed()),
                range(d.finishFeed()), d.maxChipThicknessMm(), d.status());
    }

    private static Range range(ValueRange r) {
        return new Range(r.min(), r.max());
    }
}
