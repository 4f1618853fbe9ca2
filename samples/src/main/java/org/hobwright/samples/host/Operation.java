package org.hobwright.samples.host;

import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.TreeMap;

/**
 * One operation in this host's own list, imported from a row of the cycle CSV. A real host would
 * map it onto its own operation objects; this one keeps the row's values by column name.
 *
 * @param sequence position in the cycle, 1 = first
 * @param kind     the step kind ({@code sync-on}, {@code rapid}, {@code feed} ...)
 * @param seconds  time of the step, s
 * @param values   every column of the row by its header name, as written
 */
public record Operation(int sequence, String kind, double seconds, Map<String, String> values) {

    public Operation {
        values = Map.copyOf(values);
    }

    /** A numeric column, empty when the column is missing or blank in this row. */
    public OptionalDouble number(String column) {
        String v = values.get(column);
        return v == null || v.isBlank() ? OptionalDouble.empty() : OptionalDouble.of(Double.parseDouble(v));
    }

    /** Columns {@link #describe()} leaves out because the line shows them already. */
    private static final java.util.Set<String> SHOWN = java.util.Set.of(CycleImport.VERSION_COLUMN,
            CycleImport.KIND_COLUMN, CycleImport.SECONDS_COLUMN, "step_no");

    /** One line for a listing: sequence, kind, time and the other non-empty values. */
    public String describe() {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "%3d %-14s %8.2f s", sequence, kind, seconds));
        new TreeMap<>(values).forEach((k, v) -> {
            if (!v.isBlank() && !SHOWN.contains(k)) {
                sb.append("  ").append(k).append('=').append(v);
            }
        });
        return sb.toString();
    }
}
