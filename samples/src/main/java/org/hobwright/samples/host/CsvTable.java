package org.hobwright.samples.host;

import java.util.ArrayList;
import java.util.List;

/**
 * A CSV text split into a header and rows, by RFC 4180: comma-separated, fields with commas,
 * quotes or line breaks in double quotes, a doubled quote for a quote, CRLF or LF line ends.
 * This host's own small reader: an adapter needs no library to import the cycle CSV.
 *
 * @param header the column names of the first line
 * @param rows   the other lines, each as long as the header
 */
public record CsvTable(List<String> header, List<List<String>> rows) {

    public CsvTable {
        header = List.copyOf(header);
        rows = rows.stream().map(List::copyOf).toList();
    }

    /**
     * Parses a CSV text.
     *
     * @throws IllegalArgumentException naming the line when a row has the wrong number of fields
     *                                  or a quote is not closed
     */
    public static CsvTable parse(String text) {
        List<List<String>> lines = records(text);
        if (lines.isEmpty()) {
            throw new IllegalArgumentException("the CSV text is empty: no header line");
        }
        List<String> header = lines.get(0);
        for (int i = 1; i < lines.size(); i++) {
            if (lines.get(i).size() != header.size()) {
                throw new IllegalArgumentException("CSV line " + (i + 1) + " has " + lines.get(i).size()
                        + " fields, the header has " + header.size());
            }
        }
        return new CsvTable(header, lines.subList(1, lines.size()));
    }

    /** Index of a column, or -1 when there is none of that name. */
    public int column(String name) {
        return header.indexOf(name);
    }

    private static List<List<String>> records(String text) {
        List<List<String>> out = new ArrayList<>();
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        boolean quoted = false;
        boolean any = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    field.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    field.append(c);
                }
            } else if (c == '"') {
                quoted = true;
                any = true;
            } else if (c == ',') {
                fields.add(field.toString());
                field.setLength(0);
                any = true;
            } else if (c == '\n' || c == '\r') {
                if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                    i++;
                }
                if (any || field.length() > 0) {
                    fields.add(field.toString());
                    out.add(fields);
                }
                fields = new ArrayList<>();
                field.setLength(0);
                any = false;
            } else {
                field.append(c);
                any = true;
            }
        }
        if (quoted) {
            throw new IllegalArgumentException("CSV line " + (out.size() + 1) + ": a quoted field is not closed");
        }
        if (any || field.length() > 0) {
            fields.add(field.toString());
            out.add(fields);
        }
        return out;
    }
}
