package org.lodestep.capture;

import org.lodestep.sample.Channel;

import org.lodestep.sample.InputFiles;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.InputLimits;
import org.lodestep.sample.SampleStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import ch.randelshofer.fastdoubleparser.JavaDoubleParser;

/**
 * Streams a time-series CSV: a {@code time_s} column and {@code <channel>_<unit>} columns, or channel columns only
 * with a {@code # sample_rate_hz=} comment.
 *
 * <p><b>Dialects.</b> Comma, semicolon or tab delimited (taken from the header line); with a semicolon or tab
 * delimiter a comma inside a number is its decimal separator ({@code 0,25}). A UTF-8 byte-order mark is skipped.
 * {@code # key=value} lines before the header become {@link #metadata()} (keys in lower case); later comment lines and
 * blank lines are skipped. Fields may be quoted.
 *
 * <p><b>Speed.</b> Rows of the plain shape are parsed in place in the read buffer: plain decimals exactly by
 * {@link PlainDecimal}, other numbers by FastDoubleParser. Any other row (quotes, comments, errors) takes a
 * general path that splits the line first; a row holding a quote character goes through Commons CSV. Memory is
 * bounded by one read buffer and the caller's block, whatever the file's length.
 *
 * <p><b>Errors.</b> A cell that is empty, not a number, NaN or infinite, a row with the wrong number of fields, and a
 * time stamp that breaks the sample clock (see {@link TimeAxis}: gaps, repeats, backwards steps, drift) end the read
 * with an {@link InputFormatException} naming the line and column. Nothing is repaired silently.
 */
public final class TimeSeriesCsvReader implements SampleStream {
    private static final int BUFFER_BYTES = 1 << 20;
    private static final String BEYOND_LIMIT = "is beyond the plausible magnitude "
            + InputLimits.MAX_SAMPLE_MAGNITUDE;

    private final String source;
    private final ByteLines lines;
    private final CsvColumns columns;
    private final boolean decimalComma;
    private final Map<String, String> metadata;
    private final double sampleRateHz;
    private final double startTimeS;
    private final TimeAxis axis;
    private final InputStream in;
    private final int[] channelOfColumn;

    private final double[][] pending;
    private int pendingCount;
    private int pendingPos;
    private int pendingStart;
    private InputFormatException pendingError;
    private long frameIndex;
    private double rowTimeS;
    private final byte[] scratch = new byte[64];
    private final int[] numberEnd = new int[1];
    private boolean closed;

    private TimeSeriesCsvReader(InputStream in, String source) throws IOException, InputFormatException {
        this.in = in;
        this.source = source;
        this.lines = new ByteLines(in, source, BUFFER_BYTES);
        lines.skipByteOrderMark();
        Map<String, String> meta = new LinkedHashMap<>();
        Map<String, Integer> metaLine = new LinkedHashMap<>();
        String header = null;
        while (lines.next()) {
            String text = lines.text().strip();
            if (text.isEmpty()) {
                continue;
            }
            if (text.startsWith("#")) {
                int eq = text.indexOf('=');
                if (eq > 0) {
                    String key = text.substring(1, eq).strip().toLowerCase(Locale.ROOT);
                    if (!key.isEmpty()) {
                        meta.put(key, text.substring(eq + 1).strip());
                        metaLine.put(key, lines.lineNumber());
                    }
                }
                continue;
            }
            header = text;
            break;
        }
        if (header == null) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                    "has no header line: expected a first row such as time_s,accel_g");
        }
        int headerLine = lines.lineNumber();
        this.columns = CsvColumns.fromHeader(header, source, headerLine);
        this.decimalComma = columns.delimiter != ',';
        this.channelOfColumn = new int[columns.width()];
        for (int i = 0, c = 0; i < columns.width(); i++) {
            channelOfColumn[i] = i == columns.timeIndex ? -1 : c++;
        }
        this.metadata = Collections.unmodifiableMap(meta);

        double declaredRateHz = Double.NaN;
        if (meta.containsKey("sample_rate_hz")) {
            declaredRateHz = positiveNumber(meta.get("sample_rate_hz"), metaLine.get("sample_rate_hz"),
                    "sample_rate_hz", "a positive sample rate in Hz");
            if (!InputLimits.plausibleSampleRate(declaredRateHz)) {
                throw new InputFormatException(source, metaLine.get("sample_rate_hz"), "sample_rate_hz",
                        meta.get("sample_rate_hz"), InputLimits.sampleRateExpected());
            }
        }
        if (columns.channels.size() > InputLimits.MAX_CHANNELS) {
            throw new InputFormatException(source, headerLine, null, null, "has " + columns.channels.size()
                    + " channel columns: expected at most " + InputLimits.MAX_CHANNELS);
        }
        if (columns.timeIndex < 0 && Double.isNaN(declaredRateHz)) {
            throw new InputFormatException(source, headerLine, null, header,
                    "has no time_s column: expected a time_s column or a '# sample_rate_hz=' comment above the header");
        }

        int nc = columns.channels.size();
        int want = TimeAxis.ESTIMATE_ROWS;
        this.pending = new double[nc][want];
        double[] times = new double[want];
        int[] rowLines = new int[want];
        int n = 0;
        while (n < want && lines.next()) {
            if (parseRow(pending, n)) {
                times[n] = rowTimeS;
                rowLines[n] = lines.lineNumber();
                n++;
            }
        }
        if (n == 0) {
            throw new InputFormatException(source, headerLine + 1, null, null,
                    "has no data rows: expected rows of numbers under the header");
        }
        this.pendingCount = n;
        if (columns.timeIndex >= 0) {
            this.axis = TimeAxis.fromFirstRows(times, rowLines, n, declaredRateHz, source,
                    columns.headers[columns.timeIndex]);
            if (!InputLimits.plausibleSampleRate(axis.sampleRateHz)) {
                throw new InputFormatException(source, rowLines[0], columns.headers[columns.timeIndex], null,
                        "gives a sample rate of " + axis.sampleRateHz + " Hz: " + InputLimits.sampleRateExpected());
            }
            this.sampleRateHz = axis.sampleRateHz;
            this.startTimeS = axis.startTimeS;
        } else {
            this.axis = null;
            this.sampleRateHz = declaredRateHz;
            this.startTimeS = meta.containsKey("start_time_s")
                    ? finiteNumber(meta.get("start_time_s"), metaLine.get("start_time_s"), "start_time_s",
                    "a start time in seconds")
                    : 0.0;
        }
        this.frameIndex = n;
    }

    /** Opens a CSV file for streaming. */
    public static TimeSeriesCsvReader open(Path path) throws IOException, InputFormatException {
        InputFiles.requireFile(path, "a time-series CSV");
        InputStream in = Files.newInputStream(path);
        try {
            return new TimeSeriesCsvReader(in, path.toString());
        } catch (IOException | InputFormatException | RuntimeException e) {
            in.close();
            throw e;
        }
    }

    /**
     * Reads CSV from a stream; {@code source} names it in error messages. The stream is closed by {@link #close()}.
     */
    public static TimeSeriesCsvReader open(InputStream in, String source) throws IOException, InputFormatException {
        try {
            return new TimeSeriesCsvReader(in, source);
        } catch (IOException | InputFormatException | RuntimeException e) {
            in.close();
            throw e;
        }
    }

    private double positiveNumber(String text, int line, String key, String expected) throws InputFormatException {
        double v = finiteNumber(text, line, key, expected);
        if (!(v > 0)) {
            throw new InputFormatException(source, line, key, text, "expected " + expected);
        }
        return v;
    }

    private double finiteNumber(String text, int line, String key, String expected) throws InputFormatException {
        try {
            double v = Double.parseDouble(text.replace(',', '.'));
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InputFormatException(source, line, key, text, "expected " + expected);
    }

    /**
     * A {@code # key=value} line below the header would be silently ignored, and the analysis would run without the
     * value the user meant to give (a turn count, a lead pair): refuse it. Plain comment lines stay notes.
     */
    private void refuseLateMetadata(String text) throws InputFormatException {
        String t = text.strip();
        int eq = t.indexOf('=');
        if (eq > 1 && t.substring(1, eq).strip().matches("[A-Za-z][A-Za-z0-9_]*")) {
            throw new InputFormatException(source, lines.lineNumber(), null, t, "is metadata below the header line:"
                    + " expected every '# key=value' line above the header (move it up)");
        }
    }

    /** Parses the current line into {@code dest[*][at]} and {@link #rowTimeS}; false for a blank or comment line. */
    private boolean parseRow(double[][] dest, int at) throws InputFormatException {
        byte[] b = lines.buffer();
        int p = lines.start();
        int end = lines.end();
        while (p < end && b[p] == ' ') {
            p++;
        }
        if (p == end) {
            return false;
        }
        if (b[p] == '#') {
            refuseLateMetadata(lines.text());
            return false;
        }
        p = lines.start();
        byte delim = (byte) columns.delimiter;
        int width = columns.width();
        int col = 0;
        while (true) {
            int q = p;
            boolean comma = false;
            while (q < end) {
                byte ch = b[q];
                if (ch == delim) {
                    break;
                }
                if (ch == ',') {
                    comma = true;
                } else if (ch == '"') {
                    return parseQuotedRow(dest, at);
                }
                q++;
            }
            if (col >= width) {
                if (col == width && q == p && q == end) {
                    break; // one trailing delimiter
                }
                throw wrongFieldCount(countFields(b, lines.start(), end, delim));
            }
            double v = parseNumber(b, p, q, comma, col);
            store(dest, at, col, v);
            col++;
            if (q >= end) {
                break;
            }
            p = q + 1;
        }
        if (col < width) {
            throw wrongFieldCount(col);
        }
        return true;
    }

    private void store(double[][] dest, int at, int col, double v) {
        int c = channelOfColumn[col];
        if (c < 0) {
            rowTimeS = v * columns.timeToSeconds;
        } else {
            dest[c][at] = v;
        }
    }

    private static int countFields(byte[] b, int from, int to, byte delim) {
        int n = 1;
        for (int i = from; i < to; i++) {
            if (b[i] == delim) {
                n++;
            }
        }
        return n;
    }

    private InputFormatException wrongFieldCount(int found) {
        return new InputFormatException(source, lines.lineNumber(), null, lines.text(),
                "has " + found + " field" + (found == 1 ? "" : "s") + ": expected " + columns.width() + " ("
                        + String.join(String.valueOf(columns.delimiter == '\t' ? "<tab>"
                        : String.valueOf(columns.delimiter)), columns.headers) + ")");
    }

    private double parseNumber(byte[] b, int from, int to, boolean comma, int col) throws InputFormatException {
        while (from < to && b[from] == ' ') {
            from++;
        }
        while (to > from && b[to - 1] == ' ') {
            to--;
        }
        int len = to - from;
        if (len == 0) {
            throw badCell(col, "", "is an empty cell");
        }
        byte last = b[to - 1];
        if ((last < '0' || last > '9') && last != '.') {
            throw badCell(col, new String(b, from, len, java.nio.charset.StandardCharsets.UTF_8), "is not a number");
        }
        double v;
        try {
            if (comma && decimalComma && len <= scratch.length) {
                for (int i = 0; i < len; i++) {
                    byte ch = b[from + i];
                    scratch[i] = ch == ',' ? (byte) '.' : ch;
                }
                v = JavaDoubleParser.parseDouble(scratch, 0, len);
            } else {
                v = JavaDoubleParser.parseDouble(b, from, len);
            }
        } catch (NumberFormatException e) {
            throw badCell(col, new String(b, from, len, java.nio.charset.StandardCharsets.UTF_8), "is not a number");
        }
        if (!Double.isFinite(v)) {
            throw badCell(col, new String(b, from, len, java.nio.charset.StandardCharsets.UTF_8),
                    "is not a finite number");
        }
        if (!InputLimits.plausibleMagnitude(v)) {
            throw badCell(col, new String(b, from, len, java.nio.charset.StandardCharsets.UTF_8), BEYOND_LIMIT);
        }
        return v;
    }

    private boolean parseQuotedRow(double[][] dest, int at) throws InputFormatException {
        List<String> fields = CsvColumns.split(lines.text(), columns.delimiter, source, lines.lineNumber());
        int width = columns.width();
        if (fields.size() == width + 1 && fields.get(width).isEmpty()) {
            fields = fields.subList(0, width);
        }
        if (fields.size() != width) {
            throw wrongFieldCount(fields.size());
        }
        for (int col = 0; col < width; col++) {
            String f = fields.get(col);
            if (f.isEmpty()) {
                throw badCell(col, "", "is an empty cell");
            }
            String t = decimalComma ? f.replace(',', '.') : f;
            char last = t.charAt(t.length() - 1);
            double v;
            try {
                if ((last < '0' || last > '9') && last != '.') {
                    throw new NumberFormatException();
                }
                v = JavaDoubleParser.parseDouble(t);
            } catch (NumberFormatException e) {
                throw badCell(col, f, "is not a number");
            }
            if (!Double.isFinite(v)) {
                throw badCell(col, f, "is not a finite number");
            }
            if (!InputLimits.plausibleMagnitude(v)) {
                throw badCell(col, f, BEYOND_LIMIT);
            }
            store(dest, at, col, v);
        }
        return true;
    }

    private InputFormatException badCell(int col, String text, String what) {
        String header = columns.headers[col];
        String unit;
        if (col == columns.timeIndex) {
            unit = "a time in " + header.substring(header.indexOf('_') + 1);
        } else {
            Channel ch = columns.columnChannel[col];
            unit = ch.unit().isEmpty() ? "a number" : "a number in " + ch.unit();
        }
        return new InputFormatException(source, lines.lineNumber(), header, text, what + ": expected " + unit);
    }

    @Override
    public String source() {
        return source;
    }

    @Override
    public List<Channel> channels() {
        return columns.channels;
    }

    @Override
    public double sampleRateHz() {
        return sampleRateHz;
    }

    @Override
    public double startTimeS() {
        return startTimeS;
    }

    @Override
    public Map<String, String> metadata() {
        return metadata;
    }

    /**
     * {@inheritDoc}
     *
     * <p>Rows before a malformed one are always delivered: a read that meets an error returns the frames before it,
     * and the next read throws.
     */
    @Override
    public int read(double[][] dest, int offset, int maxFrames) throws IOException, InputFormatException {
        if (closed) {
            throw new IOException(source + ": read after close");
        }
        if (pendingError != null) {
            InputFormatException e = pendingError;
            pendingError = null;
            throw e;
        }
        long firstFrame = frameIndex;
        try {
            return readRows(dest, offset, maxFrames);
        } catch (InputFormatException e) {
            int delivered = (pendingPos - pendingStart) + (int) (frameIndex - firstFrame);
            if (delivered > 0) {
                pendingError = e;
                return delivered;
            }
            throw e;
        }
    }

    private int readRows(double[][] dest, int offset, int maxFrames) throws IOException, InputFormatException {
        pendingStart = pendingPos;
        int k = 0;
        if (pendingPos < pendingCount) {
            int take = Math.min(maxFrames, pendingCount - pendingPos);
            for (int c = 0; c < pending.length; c++) {
                System.arraycopy(pending[c], pendingPos, dest[c], offset, take);
            }
            pendingPos += take;
            k = take;
        }
        while (k < maxFrames) {
            k += parseWholeLinesInPlace(dest, offset + k, maxFrames - k);
            if (k >= maxFrames) {
                break;
            }
            // The next line is not whole in the buffer, or is not of the plain shape: the general path handles it.
            if (!lines.next()) {
                break;
            }
            if (!parseRow(dest, offset + k)) {
                continue;
            }
            if (axis != null) {
                axis.check(frameIndex, rowTimeS, lines.lineNumber());
            }
            frameIndex++;
            k++;
        }
        return k == 0 && maxFrames > 0 ? -1 : k;
    }

    /**
     * The fast path: parses rows of the plain shape (unquoted numbers separated by the delimiter, spaces allowed
     * around them, ending in a newline) straight from the read buffer. Stops before the first row that is not whole in the buffer or
     * not plain, leaving it to {@link #parseRow}, which reads every shape and words every error.
     *
     * @return the number of rows parsed
     */
    private int parseWholeLinesInPlace(double[][] dest, int at, int max) throws InputFormatException {
        byte[] b = lines.buffer();
        int p = lines.pos();
        int safe = lines.safeEnd();
        int width = columns.width();
        int timeCol = columns.timeIndex;
        int[] channelOf = channelOfColumn;
        byte delim = (byte) columns.delimiter;
        int[] end = numberEnd;
        int rows = 0;
        rowLoop:
        while (rows < max && p < safe) {
            int q = p;
            double timeS = 0;
            for (int col = 0; col < width; col++) {
                while (b[q] == ' ') {
                    q++;   // "0.001, 0.5": spaces around fields are common in hand-made and logger files
                }
                double v = PlainDecimal.parse(b, q, decimalComma, end);
                if (Double.isNaN(v)) {
                    v = generalNumber(b, q, delim);
                    if (Double.isNaN(v)) {
                        break rowLoop;
                    }
                }
                q = end[0];
                while (b[q] == ' ') {
                    q++;
                }
                byte c = b[q];
                if (col < width - 1) {
                    if (c != delim) {
                        break rowLoop;
                    }
                } else if (c == '\r' && b[q + 1] == '\n') {
                    q++;
                } else if (c != '\n') {
                    break rowLoop;
                }
                q++;
                int ch = channelOf[col];
                if (ch >= 0) {
                    dest[ch][at + rows] = v;
                } else {
                    timeS = v;
                }
            }
            if (timeCol >= 0) {
                axis.check(frameIndex, timeS * columns.timeToSeconds, lines.lineNumber() + 1);
            }
            lines.consumeLine(q);
            p = q;
            frameIndex++;
            rows++;
        }
        return rows;
    }

    /**
     * A number the plain parser declined (exponent, many digits): parsed by FastDoubleParser up to the next
     * delimiter or line end; NaN when it is not a finite number, so the general path words the error.
     */
    private double generalNumber(byte[] b, int from, byte delim) {
        int q = from;
        while (b[q] != delim && b[q] != '\n' && b[q] != '\r' && b[q] != '"' && b[q] != ' ') {
            q++;
        }
        numberEnd[0] = q;
        if (q == from || decimalComma && hasComma(b, from, q)) {
            return Double.NaN;
        }
        byte last = b[q - 1];
        if ((last < '0' || last > '9') && last != '.') {
            return Double.NaN;
        }
        try {
            double v = JavaDoubleParser.parseDouble(b, from, q - from);
            // beyond the limit: NaN sends the row to the general path, which words the refusal
            return InputLimits.plausibleMagnitude(v) ? v : Double.NaN;
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private static boolean hasComma(byte[] b, int from, int to) {
        for (int i = from; i < to; i++) {
            if (b[i] == ',') {
                return true;
            }
        }
        return false;
    }

    @Override
    public void close() throws IOException {
        closed = true;
        in.close();
    }
}
