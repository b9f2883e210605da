package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.Utf8Text;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * Splits a byte stream into lines without decoding characters, so numeric CSV can be parsed straight from the bytes.
 *
 * <p>Accepts {@code \n} and {@code \r\n} line ends. A line is exposed as {@link #buffer()} from {@link #start()} to
 * {@link #end()} (exclusive, line end removed) and is valid until the next call to {@link #next()}. Memory stays
 * bounded: the buffer grows only for a line longer than itself, up to {@link #MAX_LINE_BYTES}.
 */
final class ByteLines {
    static final int MAX_LINE_BYTES = 16 << 20;

    private final InputStream in;
    private final String source;
    private byte[] buf;
    private int pos;
    private int limit;
    private boolean eof;
    private int start;
    private int end;
    private int lineNumber;
    /** Index just after the last newline in the buffer; every line starting before it is whole in the buffer. */
    private int safeEnd;
    /** Offset in the stream of {@code buf[0]}. */
    private long bufferOffset;

    ByteLines(InputStream in, String source, int bufferBytes) {
        this(in, source, bufferBytes, 0);
    }

    /**
     * Lines of a stream that starts after line {@code linesBefore} of its file (a chunk of a larger file), so line
     * numbers are the file's.
     */
    ByteLines(InputStream in, String source, int bufferBytes, int linesBefore) {
        this.in = in;
        this.source = source;
        this.buf = new byte[bufferBytes];
        this.lineNumber = linesBefore;
    }

    /**
     * Lines of a chunk of whole lines already in memory ({@code b[0 ... length-1]}), numbered from after line
     * {@code linesBefore} of its file; the array is used as the buffer, not copied.
     */
    static ByteLines ofChunk(byte[] b, int length, String source, int linesBefore) {
        ByteLines l = new ByteLines(InputStream.nullInputStream(), source, 0, linesBefore);
        l.buf = b;
        l.limit = length;
        l.eof = true;
        for (int i = length - 1; i >= 0; i--) {
            if (b[i] == '\n') {
                l.safeEnd = i + 1;
                break;
            }
        }
        return l;
    }

    /** Advances to the next line; false at the end of the input. */
    boolean next() throws IOException, InputFormatException {
        int scanFrom = pos;
        while (true) {
            int nl = indexOfNewline(buf, scanFrom, limit);
            if (nl >= 0) {
                start = pos;
                end = nl > pos && buf[nl - 1] == '\r' ? nl - 1 : nl;
                pos = nl + 1;
                lineNumber++;
                return true;
            }
            if (eof) {
                if (pos < limit) {
                    start = pos;
                    end = buf[limit - 1] == '\r' ? limit - 1 : limit;
                    pos = limit;
                    lineNumber++;
                    return true;
                }
                return false;
            }
            scanFrom = limit - pos;
            fill();
            // fill() moved the unread bytes to the front; continue scanning where the last scan stopped.
        }
    }

    private static int indexOfNewline(byte[] b, int from, int to) {
        for (int i = from; i < to; i++) {
            if (b[i] == '\n') {
                return i;
            }
        }
        return -1;
    }

    private void fill() throws IOException, InputFormatException {
        int unread = limit - pos;
        bufferOffset += pos;
        if (pos > 0) {
            System.arraycopy(buf, pos, buf, 0, unread);
        } else if (unread == buf.length) {
            if (buf.length >= MAX_LINE_BYTES) {
                throw new InputFormatException(source, lineNumber + 1, null, null,
                        "is longer than " + (MAX_LINE_BYTES >> 20) + " MiB: expected one row of numbers per line");
            }
            buf = Arrays.copyOf(buf, Math.min(buf.length * 2, MAX_LINE_BYTES));
        }
        pos = 0;
        limit = unread;
        int n = in.read(buf, limit, buf.length - limit);
        if (n < 0) {
            eof = true;
        } else {
            limit += n;
        }
        safeEnd = 0;
        for (int i = limit - 1; i >= pos; i--) {
            if (buf[i] == '\n') {
                safeEnd = i + 1;
                break;
            }
        }
    }

    /** Position of the first unread byte. */
    int pos() {
        return pos;
    }

    /** Offset in the stream of the first unread byte. */
    long offset() {
        return bufferOffset + pos;
    }

    /**
     * Index just after the last newline read so far: a line starting at {@link #pos()} below this is whole in the
     * buffer, so a parser may scan it without checking for the buffer's end.
     */
    int safeEnd() {
        return safeEnd;
    }

    /** Marks the line starting at {@link #pos()} as consumed by a caller that parsed it in place. */
    void consumeLine(int nextPos) {
        pos = nextPos;
        lineNumber++;
    }

    byte[] buffer() { return buf; }

    int start() { return start; }

    int end() { return end; }

    /** 1-based number of the current line. */
    int lineNumber() { return lineNumber; }

    /** The current line as text, for headers, comments and error messages. */
    String text() {
        return new String(buf, start, end - start, StandardCharsets.UTF_8);
    }

    /**
     * The current line as text, refused unless it is UTF-8 without NUL ({@link Utf8Text}): read leniently, a binary
     * file's first bytes would become U+FFFD and be named as a column.
     *
     * @param what what the line should be, for the message ("a header such as time_s,accel_g")
     */
    String strictText(String what) throws InputFormatException {
        return Utf8Text.decodeLine(buf, start, end, source, lineNumber, bufferOffset + start, what);
    }

    /** Skips a UTF-8 byte-order mark at the very start of the input, if present. */
    void skipByteOrderMark() throws IOException, InputFormatException {
        while (limit - pos < 3 && !eof) {
            fill();
        }
        if (limit - pos >= 3 && (buf[pos] & 0xFF) == 0xEF && (buf[pos + 1] & 0xFF) == 0xBB
                && (buf[pos + 2] & 0xFF) == 0xBF) {
            pos += 3;
        } else if (limit - pos >= 2 && ((buf[pos] & 0xFF) == 0xFF && (buf[pos + 1] & 0xFF) == 0xFE
                || (buf[pos] & 0xFF) == 0xFE && (buf[pos + 1] & 0xFF) == 0xFF)) {
            throw new InputFormatException(source, 1, null, null,
                    "is UTF-16 text: expected UTF-8 or ASCII (save the file as UTF-8 CSV)");
        }
    }
}
