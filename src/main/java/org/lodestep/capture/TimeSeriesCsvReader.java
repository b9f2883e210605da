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
    /** Files at least this large have their rows parsed on every core ({@link ParallelCsvRows}). */
    static final long PARALLEL_MIN_BYTES = 16L << 20;
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

    /** The file read, when a file: a large one has its later rows parsed on every core. */
    private final Path file;
    /** The parallel read of the rows after the first ones, once started; null before, and for streams. */
    private ParallelCsvRows parallel;
    private boolean parallelTried;
    private long parallelMinBytes = Long.MAX_VALUE;
    private int chunkBytes = ParallelCsvRows.CHUNK_BYTES;
    private int threads = 1;
    /** Lines of the file before the next parallel chunk (the consumer's count). */
    private int linesBeforeChunk;
    /** The serial read that took over from the parallel one at a chunk it could not take; null until then. */
    private TimeSeriesCsvReader serialTail;
    /** For a chunk parser: where each row's time stamp (s) and line go, unchecked; null in a reader. */
    private double[] recordTimesS;
    private int[] recordLines;

    private TimeSeriesCsvReader(InputStream in, String source, Path file) throws IOException, InputFormatException {
        this.in = in;
        this.source = source;
        this.file = file;
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
            header = lines.strictText("a header such as time_s,accel_g").strip();
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
        int n = readFirstRows(times, rowLines);
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

    /**
     * Parses the rows that set the sample clock into {@link #pending}, each row's time stamp (s) and line recorded, not
     * yet checked. The rows take the same two paths as every later row, so the first rows already warm the fast one.
     */
    private int readFirstRows(double[] timesS, int[] rowLines) throws IOException, InputFormatException {
        recordTimesS = timesS;
        recordLines = rowLines;
        try {
            int want = timesS.length;
            int n = 0;
            while (n < want) {
                n += parseWholeLinesInPlace(pending, n, want - n);
                if (n >= want || !lines.next()) {
                    break;
                }
                if (parseRow(pending, n)) {
                    timesS[n] = rowTimeS;
                    rowLines[n] = lines.lineNumber();
                    n++;
                }
            }
            return n;
        } finally {
            // later rows are checked against the clock these rows set, not recorded
            recordTimesS = null;
            recordLines = null;
        }
    }

    /**
     * A reader of the rest of {@code parent}'s rows from {@code lines} on, sharing its columns and dialect. With
     * {@code axis} null (a chunk parser) time stamps are recorded, not checked; else they are checked by {@code axis},
     * the parent's, whose clock state carries on.
     */
    private TimeSeriesCsvReader(TimeSeriesCsvReader parent, InputStream in, ByteLines lines, TimeAxis axis,
                                long firstFrame) {
        this.in = in;
        this.source = parent.source;
        this.file = null;
        this.lines = lines;
        this.columns = parent.columns;
        this.decimalComma = parent.decimalComma;
        this.channelOfColumn = parent.channelOfColumn;
        this.metadata = parent.metadata;
        this.sampleRateHz = parent.sampleRateHz;
        this.startTimeS = parent.startTimeS;
        this.axis = axis;
        this.pending = new double[parent.pending.length][0];
        this.frameIndex = firstFrame;
    }

    /** Parses one chunk of whole lines of this reader's file, for {@link ParallelCsvRows}. */
    static final class ChunkParser {
        private final TimeSeriesCsvReader rows;

        private ChunkParser(TimeSeriesCsvReader rows) {
            this.rows = rows;
        }

        /** As {@link TimeSeriesCsvReader#read}, each row's time stamp (s) and line in the chunk recorded alongside. */
        int readRows(double[][] dest, int at, int max) throws IOException, InputFormatException {
            return rows.readRows(dest, at, max);
        }

        /** Arrays grown by the caller, same indexing as the rows. */
        void recordInto(double[] timesS, int[] lines) {
            rows.recordTimesS = timesS;
            rows.recordLines = lines;
        }

        /** Lines of the chunk read so far. */
        int lineNumber() {
            return rows.lines.lineNumber();
        }
    }

    ChunkParser chunkParser(byte[] chunk, int length, double[] timesS, int[] lines) {
        ChunkParser p = new ChunkParser(new TimeSeriesCsvReader(this, InputStream.nullInputStream(),
                ByteLines.ofChunk(chunk, length, source, 0), null, 0));
        p.recordInto(timesS, lines);
        return p;
    }

    /** Opens a CSV file for streaming; a large file's rows are parsed on every core. */
    public static TimeSeriesCsvReader open(Path path) throws IOException, InputFormatException {
        return open(path, PARALLEL_MIN_BYTES, ParallelCsvRows.CHUNK_BYTES,
                Runtime.getRuntime().availableProcessors());
    }

    /**
     * Opens a CSV file, parsing its rows on {@code threads} threads in chunks of {@code chunkBytes} when it is at
     * least {@code parallelMinBytes} long and {@code threads > 1}: tests cross many chunk bounds with small files.
     */
    static TimeSeriesCsvReader open(Path path, long parallelMinBytes, int chunkBytes, int threads)
            throws IOException, InputFormatException {
        InputFiles.requireFile(path, "a time-series CSV");
        InputStream in = Files.newInputStream(path);
        try {
            TimeSeriesCsvReader r = new TimeSeriesCsvReader(in, path.toString(), path);
            r.parallelMinBytes = parallelMinBytes;
            r.chunkBytes = chunkBytes;
            r.threads = threads;
            r.startParallel(); // the other cores parse ahead while the caller sets up its analysis
            return r;
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
            return new TimeSeriesCsvReader(in, source, null);
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
        if (serialTail != null) {
            return serialTail.read(dest, offset, maxFrames);
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
        if (k < maxFrames && startParallel()) {
            k += parallel.read(dest, offset + k, maxFrames - k, parallelCheck);
            if (k == 0) {
                long from = parallel.serialFrom();
                if (from >= 0) {
                    continueSerially(from);
                    return serialTail.read(dest, offset, maxFrames);
                }
            }
            return k == 0 && maxFrames > 0 ? -1 : k;
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
            if (recordTimesS != null) {
                recordTimesS[offset + k] = rowTimeS;
                recordLines[offset + k] = lines.lineNumber();
            } else if (axis != null) {
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
            if (recordTimesS != null) {
                recordTimesS[at + rows] = timeS * columns.timeToSeconds;
                recordLines[at + rows] = lines.lineNumber() + 1;
            } else if (timeCol >= 0) {
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

    /**
     * Starts the parallel read of the rows after the first ones, for a large file on a machine with a second core;
     * true while it runs. It starts when the file is opened: the first rows, which set the clock, are parsed by
     * then, and the rest are handed on only after them.
     */
    private boolean startParallel() throws IOException {
        if (parallel != null) {
            return true;
        }
        if (parallelTried || file == null) {
            return false;
        }
        parallelTried = true;
        if (threads < 2 || Files.size(file) < parallelMinBytes) {
            return false;
        }
        linesBeforeChunk = lines.lineNumber();
        parallel = new ParallelCsvRows(this, file, lines.offset(), threads, chunkBytes);
        return true;
    }

    /** The consumer's side of the parallel read: each row's time stamp checked in file order, lines counted. */
    private final ParallelCsvRows.RowCheck parallelCheck = new ParallelCsvRows.RowCheck() {
        @Override
        public void row(double timeS, int lineInChunk) throws InputFormatException {
            if (axis != null) {
                axis.check(frameIndex, timeS, linesBeforeChunk + lineInChunk);
            }
            frameIndex++;
        }

        @Override
        public void linesPassed(int chunkLines) {
            linesBeforeChunk += chunkLines;
        }
    };

    /** Hands the rest of the file, from byte {@code from} (a line start), to a serial read. */
    private void continueSerially(long from) throws IOException {
        java.nio.channels.FileChannel ch = java.nio.channels.FileChannel.open(file);
        ch.position(from);
        InputStream tail = java.nio.channels.Channels.newInputStream(ch);
        serialTail = new TimeSeriesCsvReader(this, tail, new ByteLines(tail, source, BUFFER_BYTES, linesBeforeChunk),
                axis, frameIndex);
        parallel.close();
    }

    @Override
    public void close() throws IOException {
        closed = true;
        try {
            if (parallel != null) {
                parallel.close();
            }
            if (serialTail != null) {
                serialTail.close();
            }
        } finally {
            in.close();
        }
    }
}
