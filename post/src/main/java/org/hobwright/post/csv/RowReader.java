package org.hobwright.post.csv;

import java.util.Map;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.Rotation;

/** Reads one data row of the cycle CSV into a step; every problem names the line and column. */
final class RowReader {
    private final String[] cells;
    private final Map<String, Integer> index;

    RowReader(String[] cells, Map<String, Integer> index) {
        this.cells = cells;
        this.index = index;
    }

    /**
     * The step of this row.
     *
     * @throws IllegalArgumentException naming the column and value when the row is not a step
     */
    CycleStep step() {
        int version = integer(CsvColumn.FORMAT_VERSION);
        if (version != CycleCsv.VERSION) {
            throw new IllegalArgumentException("format_version " + version + " is not supported, this reader reads "
                    + CycleCsv.VERSION);
        }
        String kind = text(CsvColumn.KIND);
        double s = number(CsvColumn.TIME_S);
        return switch (kind) {
            case "comment" -> new CycleStep.Comment(text(CsvColumn.TEXT));
            case "coolant" -> new CycleStep.Coolant(flag(CsvColumn.COOLANT));
            case "swivel" -> new CycleStep.Swivel(number(CsvColumn.SWIVEL_DEG), s, flag(CsvColumn.SWIVEL_PROGRAMMABLE));
            case "sync-on" -> new CycleStep.SyncOn(integer(CsvColumn.HOB_TURNS), integer(CsvColumn.WORK_TURNS),
                    number(CsvColumn.HOB_RPM), number(CsvColumn.WORK_RPM), rotation(CsvColumn.HOB_ROTATION),
                    rotation(CsvColumn.WORK_ROTATION), number(CsvColumn.DIFFERENTIAL_DEG_PER_MM), s);
            case "sync-off" -> new CycleStep.SyncOff(s);
            case "spindles-stop" -> new CycleStep.SpindlesStop(s);
            case "dwell" -> new CycleStep.Dwell(s);
            case "hob-shift" -> new CycleStep.HobShift(number(CsvColumn.HOB_SHIFT_MM), s);
            case "rapid" -> new CycleStep.Rapid(integer(CsvColumn.PASS_NO), number(CsvColumn.DIAMETER_MM),
                    number(CsvColumn.AXIAL_MM), s, number(CsvColumn.HOB_TIP_DIAMETER_MM));
            case "feed" -> new CycleStep.Feed(integer(CsvColumn.PASS_NO), number(CsvColumn.DIAMETER_MM),
                    number(CsvColumn.AXIAL_MM), number(CsvColumn.FEED_MM_PER_REV), flag(CsvColumn.CUTTING), s,
                    number(CsvColumn.HOB_TIP_DIAMETER_MM));
            default -> throw new IllegalArgumentException("column kind: unknown step kind \"" + kind + "\"");
        };
    }

    private String text(CsvColumn c) {
        int i = index.get(c.header());
        return i < cells.length ? cells[i] : "";
    }

    private double number(CsvColumn c) {
        String t = text(c).strip();
        try {
            double v = Double.parseDouble(t);
            if (Double.isFinite(v) && t.matches("[-+]?[0-9]*\\.?[0-9]+([eE][-+]?[0-9]+)?")) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw bad(c, t, "a number with a point as the decimal separator");
    }

    private int integer(CsvColumn c) {
        String t = text(c).strip();
        try {
            return Integer.parseInt(t);
        } catch (NumberFormatException e) {
            throw bad(c, t, "a whole number");
        }
    }

    private boolean flag(CsvColumn c) {
        String t = text(c).strip();
        if (t.equals("true") || t.equals("false")) {
            return Boolean.parseBoolean(t);
        }
        throw bad(c, t, "true or false");
    }

    private Rotation rotation(CsvColumn c) {
        String t = text(c).strip();
        for (Rotation r : Rotation.values()) {
            if (CycleCsv.word(r).equals(t)) {
                return r;
            }
        }
        throw bad(c, t, "clockwise or counter-clockwise");
    }

    private IllegalArgumentException bad(CsvColumn c, String value, String expected) {
        return new IllegalArgumentException("column " + c.header() + ": expected " + expected + ", found \""
                + value + "\"");
    }

}
