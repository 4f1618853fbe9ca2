package org.hobwright.samples.host;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Imports the cycle CSV into this host's operation list. The CSV is Hobwright's contract with
 * host adapters: one row per step in cycle order, canonical millimetres and seconds, the unit in
 * every header name, and a format-version column. A host checks the version it was written for
 * and reads columns by name, never by position, so added columns do not break it.
 */
public final class CycleImport {

    /** Column holding the CSV format version. */
    public static final String VERSION_COLUMN = "format_version";
    /** Column holding the step kind. */
    public static final String KIND_COLUMN = "kind";
    /** Column holding the step's time in seconds. */
    public static final String SECONDS_COLUMN = "time_s";
    /** The CSV format version this host understands. */
    public static final String SUPPORTED_VERSION = "2";

    private CycleImport() {
    }

    /**
     * Reads the operations.
     *
     * @param csv the cycle CSV text
     * @return the operations in cycle order
     * @throws IllegalArgumentException naming the column or line when the CSV is not one this host reads
     */
    public static List<Operation> operations(String csv) {
        CsvTable table = CsvTable.parse(csv);
        int version = required(table, VERSION_COLUMN);
        int kind = required(table, KIND_COLUMN);
        int seconds = required(table, SECONDS_COLUMN);
        List<Operation> ops = new ArrayList<>();
        for (List<String> row : table.rows()) {
            int line = ops.size() + 2;
            if (!SUPPORTED_VERSION.equals(row.get(version))) {
                throw new IllegalArgumentException("CSV line " + line + " is format version \"" + row.get(version)
                        + "\"; this host reads version " + SUPPORTED_VERSION);
            }
            Map<String, String> values = new HashMap<>();
            for (int c = 0; c < row.size(); c++) {
                values.put(table.header().get(c), row.get(c));
            }
            ops.add(new Operation(ops.size() + 1, row.get(kind), Double.parseDouble(row.get(seconds)), values));
        }
        return ops;
    }

    private static int required(CsvTable table, String name) {
        int i = table.column(name);
        if (i < 0) {
            throw new IllegalArgumentException("the cycle CSV has no \"" + name + "\" column; columns are "
                    + table.header());
        }
        return i;
    }
}
