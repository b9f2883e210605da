package org.lodestep.sample;

import java.util.Objects;

/**
 * Input that cannot be read as what it claims to be: names the source, the line, what was found and what was expected.
 *
 * <p>The parts are kept as fields so tests assert them instead of parsing the message. The message itself is one line,
 * in the form {@code FILE line N, column C: 'TEXT' EXPECTED}, ready to show a user.
 */
public class InputFormatException extends Exception {
    private static final long serialVersionUID = 1L;

    /** Line number when the whole input is at fault (empty file, missing header). */
    public static final int NO_LINE = 0;

    private final String source;
    private final int line;
    private final String column;
    private final String text;
    private final String expected;

    /**
     * @param source   file name or other label of the input (never null)
     * @param line     1-based line number, or {@link #NO_LINE}
     * @param column   column name or number, or null
     * @param text     the offending text, or null
     * @param expected what was expected there, in words a user understands (with the unit where one applies)
     */
    public InputFormatException(String source, int line, String column, String text, String expected) {
        this(source, line, column, text, expected, (line > 0 ? " line " + line : "")
                + (column != null ? ", column " + column : ""));
    }

    private InputFormatException(String source, int line, String column, String text, String expected,
                                 String location) {
        super(format(source, location, text, expected));
        this.source = Objects.requireNonNull(source, "source");
        this.line = line;
        this.column = column;
        this.text = text;
        this.expected = Objects.requireNonNull(expected, "expected");
    }

    /**
     * A fault at a byte offset of a binary input (a WAV header), in the form {@code FILE, byte N: 'TEXT' EXPECTED};
     * {@link #column()} reads {@code byte N}.
     */
    public static InputFormatException atByte(String source, long byteOffset, String text, String expected) {
        String at = "byte " + byteOffset;
        return new InputFormatException(source, NO_LINE, at, text, expected, ", " + at);
    }

    private static String format(String source, String location, String text, String expected) {
        StringBuilder b = new StringBuilder(String.valueOf(source)).append(location).append(": ");
        if (text != null) {
            b.append('\'').append(oneLine(text)).append("' ");
        }
        b.append(expected);
        // one line whatever the parts hold: a file name or a chunk id read from the file may carry line breaks
        return b.toString().replaceAll("\\p{Cntrl}", "?");
    }

    private static String oneLine(String s) {
        String t = s.replaceAll("\\p{Cntrl}", "?");
        return t.length() > 60 ? t.substring(0, 57) + "..." : t;
    }

    public String source() { return source; }

    public int line() { return line; }

    public String column() { return column; }

    public String text() { return text; }

    public String expected() { return expected; }
}
