package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.InputLimits;
import org.lodestep.sample.Utf8Text;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads lead-pair resistances from CSV: a pair list ({@code lead_a,lead_b,resistance_ohm}) or a square matrix (lead
 * labels in the first row and column).
 *
 * <p>Accepted: comma, semicolon or tab delimiters (decimal comma with semicolon or tab); UTF-8 with or without BOM;
 * the unit in the resistance header ({@code _ohm _mohm _kohm _Mohm}, {@code [Ω] [mΩ] [kΩ] [MΩ]}) or, for a matrix,
 * in the top-left cell (empty means ohms); open circuit written {@code OL}, {@code open}, {@code inf}, {@code ∞} or
 * left empty; {@code -} or {@code ?} for a pair not measured; comment lines {@code # key=value} as metadata
 * ({@code temperature_c}, {@code motor}) and other comment lines as notes. A matrix may give one triangle only;
 * when both are given they must agree within {@link #SYMMETRY_TOLERANCE} (or {@link #SYMMETRY_ALLOWANCE_OHM}).
 */
public final class ResistanceCsvReader {
    /** Two readings of one pair in a matrix may differ by this fraction of the larger (meter and contact scatter). */
    public static final double SYMMETRY_TOLERANCE = 0.05;
    /** ... or by this many ohms, whichever is larger (probe contact, common practice). */
    public static final double SYMMETRY_ALLOWANCE_OHM = 0.3;

    private static final String PAIR_HEADER = "lead_a,lead_b,resistance_ohm (or _mohm, _kohm, _Mohm)";
    private static final String EXPECTED_HEADER = "expected the header " + PAIR_HEADER
            + ", or a square matrix with lead labels in the first row and column";

    private ResistanceCsvReader() {
    }

    /** Reads a file; the message of any error names {@code path}'s file name. */
    public static ResistanceReadings read(Path path) throws IOException, InputFormatException {
        String text = Utf8Text.read(path, "a CSV file of lead-pair resistances");
        return parse(text, path.toString());
    }

    /** Parses CSV text; {@code source} names it in messages. */
    public static ResistanceReadings parse(String text, String source) throws InputFormatException {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        String[] lines = text.split("\r\n|\n|\r", -1);
        Map<String, String> metadata = new LinkedHashMap<>();
        List<String> notes = new ArrayList<>();
        List<Row> rows = new ArrayList<>();
        Character delimiter = null;
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            String stripped = line.strip();
            if (stripped.isEmpty()) {
                continue;
            }
            if (stripped.startsWith("#")) {
                comment(stripped.substring(1).strip(), i + 1, source, metadata, notes);
                continue;
            }
            if (delimiter == null) {
                delimiter = line.indexOf('\t') >= 0 ? '\t' : line.indexOf(';') >= 0 ? ';' : ',';
            }
            rows.add(new Row(i + 1, cells(line, delimiter, source, i + 1)));
        }
        if (rows.isEmpty()) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                    "has no data: " + EXPECTED_HEADER);
        }
        boolean decimalComma = delimiter != ',';
        List<String> header = rows.get(0).cells;
        Reading r = new Reading(source, decimalComma);
        if (isPairHeader(header)) {
            readPairs(rows, r);
        } else if (header.size() >= 3 && !header.get(1).isBlank()) {
            readMatrix(rows, r);
        } else {
            throw new InputFormatException(source, rows.get(0).line, null, String.join(String.valueOf(delimiter),
                    header), EXPECTED_HEADER);
        }
        return new ResistanceReadings(source, new ArrayList<>(r.leads), r.readings, metadata, notes);
    }

    private record Row(int line, List<String> cells) {
    }

    /** Accumulates readings, rejecting self pairs and conflicting duplicates. */
    private static final class Reading {
        final String source;
        final boolean decimalComma;
        final LinkedHashSet<String> leads = new LinkedHashSet<>();
        final List<LeadPairReading> readings = new ArrayList<>();

        Reading(String source, boolean decimalComma) {
            this.source = source;
            this.decimalComma = decimalComma;
        }

        void add(LeadPairReading p, String column, String text) throws InputFormatException {
            for (LeadPairReading q : readings) {
                if (q.samePair(p)) {
                    if (q.resistanceOhm() != p.resistanceOhm()) {
                        throw new InputFormatException(source, p.line(), column, text, "gives " + p.leadA() + "-"
                                + p.leadB() + " a different value than line " + q.line()
                                + ": expected each pair once (delete one of the two rows)");
                    }
                    return;
                }
            }
            leads.add(p.leadA());
            leads.add(p.leadB());
            readings.add(p);
        }

        /** The cell in ohms, +Infinity for open. */
        double ohms(String cell, double factor, int line, String column) throws InputFormatException {
            if (ResistanceValues.isOpen(cell)) {
                return Double.POSITIVE_INFINITY;
            }
            if (cell.strip().startsWith("-") && ResistanceValues.number(cell.strip().substring(1), decimalComma)
                    .isPresent()) {
                throw new InputFormatException(source, line, column, cell, "is negative: expected a resistance >= 0"
                        + " (a negative value is a typing error)");
            }
            OptionalDouble v = ResistanceValues.number(cell, decimalComma);
            if (v.isEmpty()) {
                throw new InputFormatException(source, line, column, cell, "is not a resistance: expected a number"
                        + (decimalComma ? " (decimal point or comma)" : " (decimal point)")
                        + " or OL/open/inf/∞/empty for open circuit");
            }
            double ohms = v.getAsDouble() * factor;
            if (!Double.isFinite(ohms)) {
                throw new InputFormatException(source, line, column, cell, "is out of range: expected a finite"
                        + " resistance");
            }
            String impossible = ResistanceValues.impossible(ohms);
            if (impossible != null) {
                throw new InputFormatException(source, line, column, cell, impossible);
            }
            return ohms;
        }
    }

    private static void readPairs(List<Row> rows, Reading r) throws InputFormatException {
        List<String> header = rows.get(0).cells;
        double factor = ResistanceValues.unitFactor(header.get(2));
        if (Double.isNaN(factor)) {
            throw new InputFormatException(r.source, rows.get(0).line, "3", header.get(2).strip(),
                    "has no unit: expected resistance_ohm, _mohm, _kohm, _Mohm, or a unit in brackets ([Ω], [kΩ] ...)");
        }
        for (Row row : rows.subList(1, rows.size())) {
            List<String> c = row.cells;
            if (c.size() != 3 && !(c.size() > 3 && c.subList(3, c.size()).stream().allMatch(String::isBlank))) {
                throw new InputFormatException(r.source, row.line, null, String.join(",", c),
                        "has " + c.size() + " fields: expected 3 (lead_a, lead_b, resistance)");
            }
            String a = c.get(0).strip();
            String b = c.size() > 1 ? c.get(1).strip() : "";
            if (a.isEmpty() || b.isEmpty()) {
                throw new InputFormatException(r.source, row.line, a.isEmpty() ? "lead_a" : "lead_b", "",
                        "is empty: expected a lead label");
            }
            refuseLongLabel(r.source, row.line, "lead_a", a);
            refuseLongLabel(r.source, row.line, "lead_b", b);
            if (a.equals(b)) {
                throw new InputFormatException(r.source, row.line, "lead_b", b,
                        "pairs a lead with itself: expected two different leads");
            }
            String cell = c.size() > 2 ? c.get(2) : "";
            if (cell.strip().equals("-") || cell.strip().equals("?")) {
                r.leads.add(a);
                r.leads.add(b);
                continue;
            }
            r.add(new LeadPairReading(a, b, r.ohms(cell, factor, row.line, header.get(2).strip()), row.line),
                    header.get(2).strip(), cell);
        }
        if (r.readings.isEmpty() && r.leads.isEmpty()) {
            throw new InputFormatException(r.source, rows.get(0).line, null, null,
                    "has a header but no readings: expected one row per measured pair");
        }
    }

    /** A label longer than {@link InputLimits#MAX_LABEL_CHARS} is damage or a pasted paragraph, never a lead. */
    static void refuseLongLabel(String source, int line, String column, String label) throws InputFormatException {
        if (label.length() > InputLimits.MAX_LABEL_CHARS) {
            throw new InputFormatException(source, line, column, label, "is " + label.length()
                    + " characters long: expected a lead label of at most " + InputLimits.MAX_LABEL_CHARS);
        }
    }

    private static void readMatrix(List<Row> rows, Reading r) throws InputFormatException {
        List<String> header = rows.get(0).cells;
        String corner = header.get(0).strip();
        double factor = corner.isEmpty() ? 1.0 : ResistanceValues.unitFactor(corner);
        // A word such as "leads" in the corner is a title, not a unit: ohms, as for an empty corner.
        if (Double.isNaN(factor) && !corner.toLowerCase(Locale.ROOT).contains("ohm") && !corner.contains("Ω")) {
            factor = 1.0;
        }
        if (Double.isNaN(factor)) {
            throw new InputFormatException(r.source, rows.get(0).line, "1", corner, "is not a unit: " + EXPECTED_HEADER
                    + " (top-left cell empty for ohms, or ohm, mohm, kohm, Mohm, [Ω], [kΩ] ...)");
        }
        List<String> labels = new ArrayList<>();
        for (int j = 1; j < header.size(); j++) {
            String l = header.get(j).strip();
            refuseLongLabel(r.source, rows.get(0).line, null, l);
            if (l.isEmpty() || labels.contains(l)) {
                throw new InputFormatException(r.source, rows.get(0).line, String.valueOf(j + 1), l,
                        l.isEmpty() ? "is empty: expected a lead label" : "repeats a lead label: expected each lead once");
            }
            labels.add(l);
        }
        int n = labels.size();
        // Not a pair-list header, and the next row does not start with the first label: not a matrix either.
        if (rows.size() < 2 || !rows.get(1).cells.get(0).strip().equals(labels.get(0))) {
            throw new InputFormatException(r.source, rows.get(0).line, null, String.join(",", header),
                    EXPECTED_HEADER);
        }
        if (rows.size() - 1 != n) {
            throw new InputFormatException(r.source, rows.get(rows.size() - 1).line, null, null,
                    "ends after " + (rows.size() - 1) + " rows: expected a square matrix, one row per lead (" + n + ")");
        }
        String[][] cell = new String[n][n];
        int[] lineOf = new int[n];
        for (int i = 0; i < n; i++) {
            Row row = rows.get(i + 1);
            List<String> c = row.cells;
            if (c.size() != n + 1) {
                throw new InputFormatException(r.source, row.line, null, null,
                        "has " + c.size() + " fields: expected " + (n + 1) + " (a label and one cell per lead)");
            }
            if (!c.get(0).strip().equals(labels.get(i))) {
                throw new InputFormatException(r.source, row.line, "1", c.get(0).strip(),
                        "is not the row label expected here: expected '" + labels.get(i)
                        + "' (rows in the same order as the header)");
            }
            for (int j = 0; j < n; j++) {
                cell[i][j] = c.get(j + 1).strip();
            }
            lineOf[i] = row.line;
        }
        for (String l : labels) {
            r.leads.add(l);
        }
        boolean lowerEmpty = true;
        boolean upperEmpty = true;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (i > j && !cell[i][j].isEmpty()) {
                    lowerEmpty = false;
                }
                if (i < j && !cell[i][j].isEmpty()) {
                    upperEmpty = false;
                }
            }
        }
        for (int i = 0; i < n; i++) {
            String d = cell[i][i];
            if (!(d.isEmpty() || d.equals("-") || d.equals("x") || d.equals("X")
                    || ResistanceValues.number(d, r.decimalComma).orElse(-1) == 0.0)) {
                throw new InputFormatException(r.source, lineOf[i], String.valueOf(i + 2), d,
                        "is on the diagonal (a lead with itself): expected it empty, '-' or 0");
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                // One triangle only: the empty triangle means "given in the other", not open.
                String up = upperEmpty && !lowerEmpty ? null : cell[i][j];
                String low = lowerEmpty && !upperEmpty ? null : cell[j][i];
                Double vu = value(r, up, factor, lineOf[i], labels.get(j));
                Double vl = value(r, low, factor, lineOf[j], labels.get(i));
                Double v;
                if (vu != null && vl != null) {
                    v = symmetric(r, vu, vl, lineOf[j], labels.get(i), labels.get(j), low);
                } else {
                    v = vu != null ? vu : vl;
                }
                if (v != null) {
                    int line = vu != null ? lineOf[i] : lineOf[j];
                    r.add(new LeadPairReading(labels.get(i), labels.get(j), v, line), labels.get(j), null);
                }
            }
        }
    }

    /** The value of a matrix cell in ohms (+Infinity open), or null when not measured or not given. */
    private static Double value(Reading r, String cell, double factor, int line, String column)
            throws InputFormatException {
        if (cell == null || cell.equals("-") || cell.equals("?")) {
            return null;
        }
        return r.ohms(cell, factor, line, column);
    }

    private static double symmetric(Reading r, double up, double low, int line, String column, String other,
                                    String text) throws InputFormatException {
        if (Double.isInfinite(up) && Double.isInfinite(low)) {
            return up;
        }
        double tolerance = Math.max(SYMMETRY_ALLOWANCE_OHM, SYMMETRY_TOLERANCE * Math.max(up, low));
        if (Double.isInfinite(up) || Double.isInfinite(low) || Math.abs(up - low) > tolerance) {
            throw new InputFormatException(r.source, line, column, text, String.format(Locale.ROOT,
                    "disagrees with the mirror cell %s-%s (%s against %s ohm): expected a symmetric matrix, within"
                    + " %.0f %% or %.1f ohm", other, column, fmt(low), fmt(up), 100 * SYMMETRY_TOLERANCE,
                    SYMMETRY_ALLOWANCE_OHM));
        }
        return (up + low) / 2;
    }

    private static String fmt(double v) {
        return Double.isInfinite(v) ? "open" : String.format(Locale.ROOT, "%.4g", v);
    }

    private static boolean isPairHeader(List<String> header) {
        if (header.size() < 3) {
            return false;
        }
        String a = header.get(0).strip().toLowerCase(Locale.ROOT);
        String b = header.get(1).strip().toLowerCase(Locale.ROOT);
        return a.equals("lead_a") && b.equals("lead_b");
    }

    private static void comment(String body, int line, String source, Map<String, String> metadata, List<String> notes)
            throws InputFormatException {
        int eq = body.indexOf('=');
        if (eq > 0 && body.substring(0, eq).strip().matches("[A-Za-z][A-Za-z0-9_]*")) {
            String key = body.substring(0, eq).strip().toLowerCase(Locale.ROOT);
            String value = body.substring(eq + 1).strip();
            if (key.equals("temperature_c")) {
                OptionalDouble t = ResistanceValues.number(value.startsWith("-") ? value.substring(1) : value, true);
                if (t.isEmpty() || t.getAsDouble() > 250) {
                    throw new InputFormatException(source, line, "temperature_c", value,
                            "is not a temperature: expected degrees Celsius, e.g. 23.5");
                }
                value = Double.toString(value.startsWith("-") ? -t.getAsDouble() : t.getAsDouble());
            }
            metadata.put(key, value);
        } else if (!body.isEmpty()) {
            notes.add(body);
        }
    }

    private static List<String> cells(String line, char delimiter, String source, int lineNo)
            throws InputFormatException {
        CSVFormat format = CSVFormat.DEFAULT.builder().setDelimiter(delimiter).setIgnoreSurroundingSpaces(true).get();
        try (CSVParser p = CSVParser.parse(line, format)) {
            List<CSVRecord> records = p.getRecords();
            if (records.size() != 1) {
                throw new InputFormatException(source, lineNo, null, line, "is not one CSV row");
            }
            return records.get(0).toList();
        } catch (IOException | UncheckedIOException e) {
            throw new InputFormatException(source, lineNo, null, line,
                    "is not valid CSV (unbalanced quotes?): expected delimited fields");
        }
    }
}
