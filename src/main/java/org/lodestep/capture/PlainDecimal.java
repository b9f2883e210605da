package org.lodestep.capture;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;

/**
 * Parses the plain decimals that instruments write ({@code -0.017617}, {@code 12}, {@code 0,25}) straight from bytes,
 * exactly, or says it cannot so the caller falls back to a general parser.
 *
 * <p>Exactness: with at most 15 significant digits the digits form an integer {@code m < 2^53} and the value is
 * {@code m / 10^k} with {@code k <= 15}; both operands are exact doubles, so the one IEEE division is correctly
 * rounded and the result equals what any correct parser returns (W. D. Clinger, "How to read floating point numbers
 * accurately", PLDI 1990, the fast path of section 5). Longer mantissas and exponents go to FastDoubleParser.
 *
 * <p>Speed: the first eight digits of the integer part and of the fraction are each taken as one 64-bit word, found
 * and converted with a few multiplications (the eight-digit conversion of D. Lemire, "Number parsing at a gigabyte
 * per second", Software: Practice and Experience 51(8), 2021, section 5); any further digits one byte at a time.
 * Only the accumulation of the digits into {@code m} changes: the value is the same one division.
 */
final class PlainDecimal {
    private static final double[] POW10 = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13,
        1e14, 1e15};
    private static final long[] POW10_LONG = {1L, 10L, 100L, 1_000L, 10_000L, 100_000L, 1_000_000L, 10_000_000L,
        100_000_000L};
    private static final int MAX_DIGITS = 15;
    private static final VarHandle WORD = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.LITTLE_ENDIAN);
    private static final long ZEROS = 0x3030303030303030L;

    private PlainDecimal() {
    }

    /**
     * Parses a number starting at {@code p}, stopping at the first byte that cannot continue it.
     *
     * @param decimalComma whether {@code ','} is a decimal separator (besides {@code '.'})
     * @param endOut       receives, in {@code endOut[0]}, the index just after the number
     * @return the value, or NaN when the text is not a plain decimal of at most 15 digits (the caller falls back)
     */
    static double parse(byte[] b, int p, boolean decimalComma, int[] endOut) {
        int i = p;
        boolean negative = false;
        byte c = b[i];
        if (c == '-') {
            negative = true;
            c = b[++i];
        } else if (c == '+') {
            c = b[++i];
        }
        long m = 0;
        int digits = 0;
        if (i + Long.BYTES <= b.length) {
            long word = (long) WORD.get(b, i);
            digits = leadingDigits(word);
            m = eightDigits(word, digits);
            i += digits;
            c = b[i];
        }
        if (digits == Long.BYTES || i + Long.BYTES > b.length) {
            while (c >= '0' && c <= '9') {
                m = m * 10 + (c - '0');
                digits++;
                c = b[++i];
            }
        }
        int fraction = 0;
        if (c == '.' || decimalComma && c == ',') {
            c = b[++i];
            if (i + Long.BYTES <= b.length) {
                long word = (long) WORD.get(b, i);
                fraction = leadingDigits(word);
                m = m * POW10_LONG[fraction] + eightDigits(word, fraction);
                i += fraction;
                c = b[i];
            }
            if (fraction == Long.BYTES || i + Long.BYTES > b.length) {
                while (c >= '0' && c <= '9') {
                    m = m * 10 + (c - '0');
                    fraction++;
                    c = b[++i];
                }
            }
        }
        if (digits + fraction == 0 || digits + fraction > MAX_DIGITS || c == 'e' || c == 'E') {
            return Double.NaN;
        }
        endOut[0] = i;
        double v = fraction == 0 ? (double) m : m / POW10[fraction];
        return negative ? -v : v;
    }

    /** How many of the word's bytes, first byte (lowest) on, are ASCII digits: 0 ... 8. */
    private static int leadingDigits(long word) {
        long x = word ^ ZEROS; // a digit becomes 0 ... 9 in its byte
        // Per byte, the top bit set when the byte is over 9; the addition cannot carry out of a byte.
        long over = (((x & 0x7F7F7F7F7F7F7F7FL) + 0x7676767676767676L) | x) & 0x8080808080808080L;
        return Long.numberOfTrailingZeros(over) >>> 3;
    }

    /** The integer of the word's first {@code n} digit bytes (0 ... 8), the first the most significant. */
    private static long eightDigits(long word, int n) {
        if (n == 0) {
            return 0;
        }
        // Keep the n digits and shift them up, so the bytes below hold zeros: leading zeros of an 8-digit number.
        long x = (word ^ ZEROS) << (Long.SIZE - 8 * n);
        x = x * 10 + (x >>> 8); // pairs of digits
        x = ((x & 0x000000FF000000FFL) * (100 + (1_000_000L << 32))
                + ((x >>> 16) & 0x000000FF000000FFL) * (1 + (10_000L << 32))) >>> 32;
        return x & 0xFFFF_FFFFL;
    }
}
