package org.hobwright.post.csv;

import org.hobwright.post.PostCode;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.post.nc.Dialect;
import org.hobwright.text.Decimal;
import tools.jackson.core.FormatSchema;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonGenerator;
import tools.jackson.core.ObjectWriteContext;
import tools.jackson.databind.MappingIterator;
import tools.jackson.dataformat.csv.CsvFactory;
import tools.jackson.dataformat.csv.CsvMapper;
import tools.jackson.dataformat.csv.CsvReadFeature;
import tools.jackson.dataformat.csv.CsvSchema;
import tools.jackson.dataformat.csv.CsvWriteFeature;

/**
 * The cycle CSV: one row per step, canonical millimetres, seconds, rpm and degrees, RFC 4180
 * (comma, CRLF, double quotes only where needed), a point as the decimal separator whatever the
 * locale. Numbers are written as the shortest decimal that reads back to the same double, so
 * {@link #read(String)} rebuilds the steps exactly.
 */
public final class CycleCsv {

    /** The column-set version written in every row. */
    public static final int VERSION = 2;


    /** Writing takes the generator alone: an object mapper is only built to read. */
    private static final CsvFactory GENERATORS = CsvFactory.builder()
            .enable(CsvWriteFeature.STRICT_CHECK_FOR_QUOTING)
            .build();

    private static final CsvSchema SCHEMA = schema();

    private CycleCsv() {
    }

    private static CsvSchema schema() {
        CsvSchema.Builder b = CsvSchema.builder();
        for (CsvColumn c : CsvColumn.values()) {
            b.addColumn(c.header());
        }
        return b.setUseHeader(true).setLineSeparator("\r\n").build();
    }

    /**
     * Writes the steps without a dialect: the machine-axis columns stay empty.
     *
     * @param steps the cycle's steps
     * @return the CSV text, header first, CRLF line ends
     */
    public static String write(List<CycleStep> steps) {
        return write(steps, Optional.empty());
    }

    /**
     * Writes the steps, with the hob centre on the dialect's axes when a dialect is given.
     *
     * @param steps   the cycle's steps
     * @param dialect the machine's dialect, whose axes name the machine-axis columns
     * @return the CSV text, header first, CRLF line ends
     */
    public static String write(List<CycleStep> steps, Optional<Dialect> dialect) {
        List<Map<CsvColumn, String>> rows = new ArrayList<>();
        for (int i = 0; i < steps.size(); i++) {
            Map<CsvColumn, String> row = new EnumMap<>(CsvColumn.class);
            row.put(CsvColumn.FORMAT_VERSION, String.valueOf(VERSION));
            row.put(CsvColumn.STEP_NO, String.valueOf(i + 1));
            row.put(CsvColumn.KIND, steps.get(i).kind());
            row.put(CsvColumn.TIME_S, Decimal.exact(steps.get(i).seconds()));
            fill(steps.get(i), row, dialect);
            rows.add(row);
        }
        if (rows.isEmpty()) {
            return String.join(",", Arrays.stream(CsvColumn.values()).map(CsvColumn::header).toList()) + "\r\n";
        }
        StringWriter out = new StringWriter();
        try (JsonGenerator g = GENERATORS.createGenerator(new WithSchema(), out)) {
            g.writeStartArray();
            for (Map<CsvColumn, String> row : rows) {
                g.writeStartObject();
                for (CsvColumn c : CsvColumn.values()) {
                    g.writeName(c.header());
                    g.writeString(row.getOrDefault(c, ""));
                }
                g.writeEndObject();
            }
            g.writeEndArray();
        }
        return out.toString();
    }

    /** The generator's settings: the factory's, with the column schema. */
    private static final class WithSchema extends ObjectWriteContext.Base {
        @Override
        public FormatSchema getSchema() {
            return SCHEMA;
        }
    }

    private static void fill(CycleStep step, Map<CsvColumn, String> row, Optional<Dialect> dialect) {
        if (step instanceof CycleStep.Comment c) {
            row.put(CsvColumn.TEXT, c.text());
        } else if (step instanceof CycleStep.Coolant c) {
            row.put(CsvColumn.COOLANT, String.valueOf(c.on()));
        } else if (step instanceof CycleStep.Swivel s) {
            row.put(CsvColumn.SWIVEL_DEG, Decimal.exact(s.machineAngleDeg()));
            row.put(CsvColumn.SWIVEL_PROGRAMMABLE, String.valueOf(s.programmable()));
            if (s.programmable()) {
                dialect.flatMap(Dialect::swivel).ifPresent(a -> row.put(CsvColumn.SWIVEL_AXIS, a.letter()));
            }
        } else if (step instanceof CycleStep.SyncOn s) {
            row.put(CsvColumn.HOB_TURNS, String.valueOf(s.hobTurns()));
            row.put(CsvColumn.WORK_TURNS, String.valueOf(s.workTurns()));
            row.put(CsvColumn.HOB_RPM, Decimal.exact(s.hobRpm()));
            row.put(CsvColumn.WORK_RPM, Decimal.exact(s.workRpm()));
            row.put(CsvColumn.HOB_ROTATION, word(s.hobRotation()));
            row.put(CsvColumn.WORK_ROTATION, word(s.workRotation()));
            row.put(CsvColumn.DIFFERENTIAL_DEG_PER_MM, Decimal.exact(s.differentialDegPerMm()));
        } else if (step instanceof CycleStep.HobShift h) {
            row.put(CsvColumn.HOB_SHIFT_MM, Decimal.exact(h.positionMm()));
        } else if (step instanceof CycleStep.Rapid r) {
            move(row, r.pass(), r.diameterMm(), r.axialMm(), r.hobTipDiameterMm(), dialect);
        } else if (step instanceof CycleStep.Feed f) {
            move(row, f.pass(), f.diameterMm(), f.axialMm(), f.hobTipDiameterMm(), dialect);
            row.put(CsvColumn.FEED_MM_PER_REV, Decimal.exact(f.feedMmPerRev()));
            row.put(CsvColumn.CUTTING, String.valueOf(f.cutting()));
        }
        // sync-off, spindles-stop and dwell carry only their time
    }

    private static void move(Map<CsvColumn, String> row, int pass, double diameterMm, double axialMm,
                             double hobTipDiameterMm, Optional<Dialect> dialect) {
        row.put(CsvColumn.PASS_NO, String.valueOf(pass));
        row.put(CsvColumn.DIAMETER_MM, Decimal.exact(diameterMm));
        row.put(CsvColumn.AXIAL_MM, Decimal.exact(axialMm));
        row.put(CsvColumn.HOB_TIP_DIAMETER_MM, Decimal.exact(hobTipDiameterMm));
        if (hobTipDiameterMm == 0) {
            return;     // a step that does not carry the hob's size: no centre position
        }
        double centre = (diameterMm + hobTipDiameterMm) / 2;
        row.put(CsvColumn.HOB_CENTRE_RADIUS_MM, Decimal.exact(centre));
        dialect.ifPresent(d -> {
            row.put(CsvColumn.RADIAL_AXIS, d.radial().letter());
            row.put(CsvColumn.RADIAL_VALUE_MM, Decimal.exact(d.radial().sign() * (d.radial().diameter() ? 2 * centre
                    : centre)));
            row.put(CsvColumn.AXIAL_AXIS, d.axial().letter());
            row.put(CsvColumn.AXIAL_VALUE_MM, Decimal.exact(d.axial().sign() * axialMm));
        });
    }

    /** {@code clockwise} or {@code counter-clockwise}. */
    static String word(Rotation r) {
        return r.word();
    }

    /**
     * What {@link #read(String)} found.
     *
     * @param steps    the steps, empty when any finding is an error
     * @param findings problems, each naming the line and column
     */
    public record Read(List<CycleStep> steps, List<Finding> findings) {
        public Read {
            steps = List.copyOf(steps);
            findings = List.copyOf(findings);
        }
    }

    /**
     * Reads a cycle CSV of version {@value #VERSION}. Columns are found by header name, so their
     * order does not matter. Never throws for bad input.
     *
     * @param text the CSV text
     * @return the steps, or findings naming the line and column of each problem
     */
    public static Read read(String text) {
        List<String[]> rows = new ArrayList<>();
        try (MappingIterator<String[]> it = Reading.MAPPER.readerFor(String[].class)
                .with(CsvReadFeature.WRAP_AS_ARRAY).with(CsvReadFeature.SKIP_EMPTY_LINES).readValues(text)) {
            while (it.hasNextValue()) {
                rows.add(it.nextValue());
            }
        } catch (JacksonException e) {
            int line = e.getLocation() == null ? 1 : e.getLocation().getLineNr();
            return new Read(List.of(), List.of(problem("csv", "line " + line + ": " + e.getOriginalMessage())));
        }
        if (rows.isEmpty()) {
            return new Read(List.of(), List.of(problem("csv", "the text has no header line")));
        }
        Map<String, Integer> index = new HashMap<>();
        String[] header = rows.get(0);
        for (int i = 0; i < header.length; i++) {
            index.put(header[i].strip(), i);
        }
        List<Finding> findings = new ArrayList<>();
        for (CsvColumn c : CsvColumn.values()) {
            if (!index.containsKey(c.header())) {
                findings.add(problem("csv." + c.header(), "line 1: column \"" + c.header() + "\" is missing"));
            }
        }
        if (!findings.isEmpty()) {
            return new Read(List.of(), findings);
        }
        List<CycleStep> steps = new ArrayList<>();
        for (int r = 1; r < rows.size(); r++) {
            RowReader row = new RowReader(rows.get(r), index);
            try {
                steps.add(row.step());
            } catch (IllegalArgumentException e) {
                findings.add(problem("csv", "line " + (r + 1) + ": " + e.getMessage()));
            }
        }
        return findings.isEmpty() ? new Read(steps, List.of()) : new Read(List.of(), findings);
    }

    /** The mapper that reads, built on first use. */
    private static final class Reading {
        static final CsvMapper MAPPER = CsvMapper.builder().build();

        private Reading() {
        }
    }

    private static Finding problem(String field, String message) {
        return PostCode.CSV_UNREADABLE.at(field, "Cycle CSV " + message,
                "write the file with Hobwright's cycle CSV writer, version " + VERSION);
    }
}
