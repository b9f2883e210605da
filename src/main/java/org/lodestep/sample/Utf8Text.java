package org.lodestep.sample;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads a text input strictly: UTF-8 only (a byte-order mark is dropped), no NUL character, no more than a stated
 * size; anything else is an {@link InputFormatException} naming the line of the first bad byte.
 *
 * <p>RFC 3629 (references §28) requires a decoder to refuse ill-formed sequences. Lenient decoding would put
 * U+FFFD into a serial number or a label and store it as if typed; a NUL is the sign
 * of a binary file or a damaged copy. The size bound keeps a wrong file (a disk image) from being read whole.
 */
public final class Utf8Text {
    /** Largest text file read whole (specs, meter logs, serial lists, resistance tables), bytes. */
    public static final long MAX_TEXT_BYTES = 64L << 20;

    private Utf8Text() {
    }

    /** Reads and checks a file; {@code what} says what the file should be ("a part spec in TOML"). */
    public static String read(Path file, String what) throws IOException, InputFormatException {
        InputFiles.requireFile(file, what);
        long size = Files.size(file);
        if (size > MAX_TEXT_BYTES) {
            throw new InputFormatException(file.toString(), InputFormatException.NO_LINE, null, null, "is " + size
                    + " bytes: expected " + what + " of at most " + MAX_TEXT_BYTES + " bytes");
        }
        return decode(Files.readAllBytes(file), file.toString(), what);
    }

    /** Decodes and checks bytes; {@code source} names them in the message. */
    public static String decode(byte[] bytes, String source, String what) throws InputFormatException {
        ByteBuffer in = ByteBuffer.wrap(bytes);
        String text = strictly(in, bytes.length);
        if (text == null) {
            throw notUtf8(source, lineAt(bytes, in.position()), in.position(), what);
        }
        if (text.indexOf('\0') >= 0) {
            throw nul(source, lineAt(bytes, byteIndexOf(bytes, (byte) 0)), what);
        }
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }

    /**
     * Decodes and checks one line, {@code b[from]} to {@code b[to - 1]}, of a larger input read piece by piece (a
     * capture's header): {@code line} and {@code offset}, where {@code b[from]} sits in the input, place a fault in
     * the input's own terms.
     */
    public static String decodeLine(byte[] b, int from, int to, String source, int line, long offset, String what)
            throws InputFormatException {
        ByteBuffer in = ByteBuffer.wrap(b, from, to - from);
        String text = strictly(in, to - from);
        if (text == null) {
            throw notUtf8(source, line, offset + in.position() - from, what);
        }
        if (text.indexOf('\0') >= 0) {
            throw nul(source, line, what);
        }
        return text;
    }

    /** The text of {@code in}'s remaining bytes, or null with {@code in} at the first ill-formed byte. */
    private static String strictly(ByteBuffer in, int bytes) {
        CharsetDecoder d = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        CharBuffer out = CharBuffer.allocate(bytes);
        if (d.decode(in, out, true).isError()) {
            return null;
        }
        d.flush(out);
        return out.flip().toString();
    }

    private static InputFormatException notUtf8(String source, int line, long offset, String what) {
        return new InputFormatException(source, line, null, null, "has a byte that is not UTF-8 at offset " + offset
                + ": expected " + what + " in UTF-8 text");
    }

    private static InputFormatException nul(String source, int line, String what) {
        return new InputFormatException(source, line, null, null, "has a NUL character: expected " + what
                + " in text, not a binary file");
    }

    private static int lineAt(byte[] bytes, int offset) {
        int line = 1;
        for (int i = 0; i < offset && i < bytes.length; i++) {
            if (bytes[i] == '\n') {
                line++;
            }
        }
        return line;
    }

    private static int byteIndexOf(byte[] bytes, byte b) {
        for (int i = 0; i < bytes.length; i++) {
            if (bytes[i] == b) {
                return i;
            }
        }
        return bytes.length;
    }
}
