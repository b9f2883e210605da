package org.lodestep.qa;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.InputLimits;
import org.lodestep.sample.Utf8Text;

/**
 * A bench log of hand-held meter readings, one row per motor: what an inspector types while testing a lot with
 * instruments that write no file (insulation tester, LCR meter).
 *
 * <p>CSV with a header; {@code serial} is required, every other column optional, empty cells mean not measured:
 * {@code phase_a_ohm, phase_b_ohm, inductance_a_mh, inductance_b_mh, insulation_<label>_mohm} (any label, e.g.
 * {@code insulation_a_frame_mohm}), {@code insulation_test_v}, {@code ke_v_s_per_rad}, {@code step_angle_deg},
 * {@code winding_c}. An insulation reading above the tester's range is written {@code over} or {@code OL}. Each row
 * is recorded with the SHA-256 of the header and that row, so a log that grows during the day still matches the
 * records made from its earlier rows.
 */
public final class MeterLog {

    private static final Pattern INSULATION = Pattern.compile("insulation_(.+)_mohm");
    /** How an insulation cell says the reading was above the tester's range. */
    private static final List<String> OVER_RANGE = List.of("over", "ol", ">range");
    private static final List<String> KNOWN = List.of("serial", "phase_a_ohm", "phase_b_ohm", "inductance_a_mh",
            "inductance_b_mh", "insulation_test_v", "ke_v_s_per_rad", "step_angle_deg", "winding_c");

    /** One motor's row: values by column (NaN for empty), the source line and its hash. */
    public record Row(String serial, Map<String, Double> values, int line, String sha256) {
        public Row {
            values = Map.copyOf(values);
        }

        /** A value, or NaN when the cell was empty or the column absent. */
        public double get(String column) {
            return values.getOrDefault(column, Double.NaN);
        }

        /** Insulation readings of this row: label (as in the header, {@code a_frame}) to megohms. */
        public Map<String, Double> insulationMohm() {
            Map<String, Double> out = new LinkedHashMap<>();
            values.entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> {
                Matcher m = INSULATION.matcher(e.getKey());
                if (m.matches() && !Double.isNaN(e.getValue())) {
                    out.put(m.group(1), e.getValue());
                }
            });
            return out;
        }
    }

    private final String source;
    private final Map<String, Row> rows;

    private MeterLog(String source, Map<String, Row> rows) {
        this.source = source;
        this.rows = rows;
    }

    public static MeterLog read(Path file) throws IOException, InputFormatException {
        return parse(file.toString(), Utf8Text.read(file, "a CSV meter log"));
    }

    public static MeterLog parse(String source, String text) throws InputFormatException {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        String[] lines = text.split("\r?\n", -1);
        int headerLine = headerLine(lines);
        CSVFormat format = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
                .setCommentMarker('#').setIgnoreEmptyLines(true).setTrim(true).get();
        CSVParser p;
        try {
            p = CSVParser.builder().setReader(new StringReader(text)).setFormat(format).get();
        } catch (IOException | RuntimeException e) {
            // Commons CSV refuses an empty, repeated or unterminated header name before any row
            throw new InputFormatException(source, headerLine, null, null, "is not a readable meter-log header:"
                    + " expected each column named once, e.g. serial,phase_a_ohm,insulation_a_frame_mohm");
        }
        Map<String, Row> rows = new LinkedHashMap<>();
        int lastLine = headerLine;
        try (p) {
            List<String> header = header(source, headerLine, p.getHeaderNames());
            for (CSVRecord rec : p) {
                int line = (int) rec.getParser().getCurrentLineNumber();
                lastLine = line;
                Row row = row(source, header, rec, line, lines[headerLine - 1] + "\n"
                        + (line - 1 < lines.length ? lines[line - 1] : ""));
                Row before = rows.putIfAbsent(row.serial(), row);
                if (before != null) {
                    throw new InputFormatException(source, line, "serial", row.serial(), "is listed twice (also line "
                            + before.line() + "): one row per motor expected");
                }
            }
        } catch (IOException | RuntimeException e) {
            if (e.getCause() instanceof InputFormatException ife) {
                throw ife;
            }
            // An unterminated quote or a broken field: Commons CSV's own text names no file, so say it here
            throw new InputFormatException(source, lastLine + 1, null, null, "is not a readable CSV row: expected"
                    + " cells separated by commas, a quoted cell closed by a quote");
        }
        if (rows.isEmpty()) {
            throw new InputFormatException(source, headerLine, null, null, "has no rows: expected one row of readings"
                    + " per motor under the header");
        }
        return new MeterLog(source, rows);
    }

    private static List<String> header(String source, int headerLine, List<String> names)
            throws InputFormatException {
        List<String> header = new ArrayList<>();
        for (String h : names) {
            String k = h.toLowerCase(Locale.ROOT).trim();
            if (!KNOWN.contains(k) && !INSULATION.matcher(k).matches()) {
                throw new InputFormatException(source, headerLine, h, h, "is not a meter-log column; expected "
                        + String.join(", ", KNOWN) + " or insulation_<label>_mohm");
            }
            if (header.contains(k)) {
                throw new InputFormatException(source, headerLine, h, h, "is a repeated column: expected each"
                        + " column once");
            }
            header.add(k);
        }
        if (!header.contains("serial")) {
            throw new InputFormatException(source, headerLine, null, null,
                    "has no serial column: expected a header such as serial,phase_a_ohm,insulation_a_frame_mohm");
        }
        return header;
    }

    private static Row row(String source, List<String> header, CSVRecord rec, int line, String raw)
            throws InputFormatException {
        if (rec.size() != header.size()) {
            throw new InputFormatException(source, line, null, null, "has " + rec.size() + " cells: expected "
                    + header.size() + ", one per column of the header (an empty cell for a value not measured)");
        }
        int serialAt = header.indexOf("serial");
        String serial = rec.get(serialAt);
        if (serial.isEmpty()) {
            throw new InputFormatException(source, line, "serial", "", "expected a serial number");
        }
        if (serial.length() > InputLimits.MAX_SERIAL_CHARS) {
            throw new InputFormatException(source, line, "serial", serial, "is " + serial.length()
                    + " characters long: expected a serial number of at most " + InputLimits.MAX_SERIAL_CHARS);
        }
        Map<String, Double> values = new HashMap<>();
        for (int i = 0; i < header.size(); i++) {
            String column = header.get(i);
            String cell = rec.get(i);
            if (column.equals("serial") || cell.isEmpty()) {
                continue;
            }
            double v;
            if (INSULATION.matcher(column).matches() && OVER_RANGE.contains(cell.toLowerCase(Locale.ROOT))) {
                v = Double.POSITIVE_INFINITY;
            } else {
                try {
                    v = Double.parseDouble(cell);
                } catch (NumberFormatException e) {
                    v = Double.NaN;
                }
                if (!Double.isFinite(v)) {
                    throw new InputFormatException(source, line, column, cell,
                            "is not a number (" + unit(column) + " expected)");
                }
            }
            String refusal = PlausibleReadings.refusal(column, v);
            if (refusal != null) {
                throw new InputFormatException(source, line, column, cell, "is not a plausible reading: " + refusal);
            }
            values.put(column, v);
        }
        return new Row(serial, values, line, Hashes.sha256(raw));
    }

    /** The row of one serial number, if the log has one. */
    public Optional<Row> row(String serial) {
        return Optional.ofNullable(rows.get(serial));
    }

    public String source() {
        return source;
    }

    private static int headerLine(String[] lines) {
        for (int i = 0; i < lines.length; i++) {
            String l = lines[i].trim();
            if (!l.isEmpty() && !l.startsWith("#")) {
                return i + 1;
            }
        }
        return 1;
    }

    private static String unit(String column) {
        if (column.endsWith("_ohm")) {
            return "ohms";
        } else if (column.endsWith("_mohm")) {
            return "megohms";
        } else if (column.endsWith("_mh")) {
            return "millihenries";
        } else if (column.endsWith("_v")) {
            return "volts";
        } else if (column.endsWith("_deg")) {
            return "degrees";
        } else if (column.endsWith("_c")) {
            return "°C";
        }
        return "V·s/rad";
    }
}
