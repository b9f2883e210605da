package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;

import org.lodestep.sample.Channel;
import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * The column layout of a time-series CSV: the delimiter, the time column (if any) and one channel per other column.
 *
 * <p>Headers follow {@code <channel>_<unit>}: the text after the last underscore is the unit when it starts with a
 * letter ({@code accel_x_g} is channel {@code accel_x} in g; {@code emf_1_2} has no unit). The units {@code g},
 * {@code a}, {@code v}, {@code mps2} and {@code pa} are recognised in any letter case and stored in lower case; any
 * other unit is kept as written. The time column is {@code time_s}, {@code time_ms} or {@code time_us}; its values
 * are converted to seconds.
 */
final class CsvColumns {
    private static final Set<String> KNOWN_UNITS = Set.of("g", "a", "v", "mps2", "pa");

    final char delimiter;
    /** Index of the time column, or -1. */
    final int timeIndex;
    /** Factor from the time column's unit to seconds. */
    final double timeToSeconds;
    /** Channel of each column; null for the time column. */
    final Channel[] columnChannel;
    final List<Channel> channels;
    final String[] headers;

    private CsvColumns(char delimiter, int timeIndex, double timeToSeconds, Channel[] columnChannel,
                       List<Channel> channels, String[] headers) {
        this.delimiter = delimiter;
        this.timeIndex = timeIndex;
        this.timeToSeconds = timeToSeconds;
        this.columnChannel = columnChannel;
        this.channels = channels;
        this.headers = headers;
    }

    int width() {
        return headers.length;
    }

    /** Picks the delimiter from the header line: semicolon, then tab, then comma (a lone column uses comma). */
    static char detectDelimiter(String header) {
        int commas = 0;
        int semis = 0;
        int tabs = 0;
        boolean quoted = false;
        for (int i = 0; i < header.length(); i++) {
            char ch = header.charAt(i);
            if (ch == '"') {
                quoted = !quoted;
            } else if (!quoted) {
                if (ch == ',') {
                    commas++;
                } else if (ch == ';') {
                    semis++;
                } else if (ch == '\t') {
                    tabs++;
                }
            }
        }
        if (semis > 0) {
            return ';';
        }
        if (tabs > 0) {
            return '\t';
        }
        return ',';
    }

    /** Splits one line with Commons CSV; used for the header and for the rare data line that holds quotes. */
    static List<String> split(String line, char delimiter, String source, int lineNumber) throws InputFormatException {
        CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(delimiter).setTrim(true).get();
        try (CSVParser p = CSVParser.parse(new StringReader(line), format)) {
            List<CSVRecord> records = p.getRecords();
            if (records.size() != 1) {
                throw new InputFormatException(source, lineNumber, null, line, "expected one row of fields");
            }
            List<String> fields = new ArrayList<>();
            records.get(0).forEach(fields::add);
            return fields;
        } catch (IOException | RuntimeException e) {
            // Commons CSV's own text names neither file nor line and speaks of its tokenizer: say what is wrong here
            throw new InputFormatException(source, lineNumber, null, line, "is not a well-formed CSV row: expected"
                    + " fields separated by '" + (delimiter == '\t' ? "<tab>" : String.valueOf(delimiter))
                    + "', a quoted field closed by a quote on the same line");
        }
    }

    static CsvColumns fromHeader(String headerLine, String source, int lineNumber) throws InputFormatException {
        char delimiter = detectDelimiter(headerLine);
        List<String> names = split(headerLine, delimiter, source, lineNumber);
        // A trailing delimiter (some spreadsheets write one) leaves an empty last name: not a column.
        while (names.size() > 1 && names.get(names.size() - 1).isEmpty()) {
            names.remove(names.size() - 1);
        }
        int n = names.size();
        Channel[] columnChannel = new Channel[n];
        List<Channel> channels = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        int timeIndex = -1;
        double timeToSeconds = 1.0;
        for (int i = 0; i < n; i++) {
            String name = names.get(i);
            String column = String.valueOf(i + 1);
            if (name.isEmpty()) {
                throw new InputFormatException(source, lineNumber, column, headerLine,
                        "has an empty column name: expected time_s or <channel>_<unit> in every column");
            }
            char first = name.charAt(0);
            if (Character.isDigit(first) || first == '-' || first == '+' || first == '.') {
                throw new InputFormatException(source, lineNumber, column, name,
                        "looks like a number: expected a header line of column names first, e.g. time_s,accel_g");
            }
            if (!seen.add(name.toLowerCase(Locale.ROOT))) {
                throw new InputFormatException(source, lineNumber, name, headerLine,
                        "names this column twice: expected each column once");
            }
            double toSeconds = timeFactor(name);
            if (toSeconds > 0) {
                if (timeIndex >= 0) {
                    throw new InputFormatException(source, lineNumber, name, headerLine,
                            "has a second time column: expected one of time_s, time_ms, time_us");
                }
                timeIndex = i;
                timeToSeconds = toSeconds;
                continue;
            }
            if (name.toLowerCase(Locale.ROOT).equals("time") || name.toLowerCase(Locale.ROOT).equals("t")) {
                throw new InputFormatException(source, lineNumber, name, headerLine,
                        "has no unit: expected time_s, time_ms or time_us");
            }
            Channel ch = channelOf(name);
            columnChannel[i] = ch;
            channels.add(ch);
        }
        if (channels.isEmpty()) {
            throw new InputFormatException(source, lineNumber, null, headerLine,
                    "has no data column: expected time_s followed by <channel>_<unit> columns, e.g. time_s,accel_g");
        }
        return new CsvColumns(delimiter, timeIndex, timeToSeconds, columnChannel, List.copyOf(channels),
                names.toArray(new String[0]));
    }

    private static double timeFactor(String name) {
        switch (name.toLowerCase(Locale.ROOT)) {
            case "time_s":
                return 1.0;
            case "time_ms":
                return 1e-3;
            case "time_us":
                return 1e-6;
            default:
                return -1;
        }
    }

    static Channel channelOf(String header) {
        int u = header.lastIndexOf('_');
        if (u > 0 && u < header.length() - 1 && Character.isLetter(header.charAt(u + 1))) {
            String unit = header.substring(u + 1);
            String lower = unit.toLowerCase(Locale.ROOT);
            return new Channel(header.substring(0, u), KNOWN_UNITS.contains(lower) ? lower : unit);
        }
        return new Channel(header, "");
    }
}
