package org.hobwright.post.csv;

import java.util.ArrayList;
import java.util.List;

/**
 * An independent RFC 4180 parser for the tests (fields separated by commas, records by CRLF, a field
 * in double quotes may hold commas, CRLF and doubled quotes). Fails on anything else.
 */
final class Rfc4180 {
    private Rfc4180() {
    }

    static List<List<String>> parse(String text) {
        List<List<String>> rows = new ArrayList<>();
        List<String> row = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        int i = 0;
        boolean quoted = false;
        while (i < text.length()) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    field.append('"');
                    i += 2;
                    continue;
                }
                if (c == '"') {
                    quoted = false;
                } else {
                    field.append(c);
                }
            } else if (c == '"') {
                if (field.length() != 0) {
                    throw new AssertionError("quote inside an unquoted field at " + i);
                }
                quoted = true;
            } else if (c == ',') {
                row.add(field.toString());
                field.setLength(0);
            } else if (c == '\r') {
                if (i + 1 >= text.length() || text.charAt(i + 1) != '\n') {
                    throw new AssertionError("CR without LF at " + i);
                }
                row.add(field.toString());
                field.setLength(0);
                rows.add(row);
                row = new ArrayList<>();
                i++;
            } else if (c == '\n') {
                throw new AssertionError("LF without CR at " + i);
            } else {
                field.append(c);
            }
            i++;
        }
        if (quoted || field.length() != 0 || !row.isEmpty()) {
            throw new AssertionError("the text must end with CRLF after the last record");
        }
        return rows;
    }
}
