package org.lodestep.capture;

/**
 * Parses the plain decimals that instruments write ({@code -0.017617}, {@code 12}, {@code 0,25}) straight from bytes,
 * exactly, or says it cannot so the caller falls back to a general parser.
 *
 * <p>Exactness: with at most 15 significant digits the digits form an integer {@code m < 2^53} and the value is
 * {@code m / 10^k} with {@code k <= 15}; both operands are exact doubles, so the one IEEE division is correctly
 * rounded and the result equals what any correct parser returns (W. D. Clinger, "How to read floating point numbers
 * accurately", PLDI 1990, the fast path of section 5). Longer mantissas and exponents go to FastDoubleParser.
 */
final class PlainDecimal {
    private static final double[] POW10 = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13,
        1e14, 1e15};
    private static final int MAX_DIGITS = 15;

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
        while (c >= '0' && c <= '9') {
            m = m * 10 + (c - '0');
            digits++;
            c = b[++i];
        }
        int fraction = 0;
        if (c == '.' || decimalComma && c == ',') {
            c = b[++i];
            while (c >= '0' && c <= '9') {
                m = m * 10 + (c - '0');
                fraction++;
                c = b[++i];
            }
        }
        if (digits + fraction == 0 || digits + fraction > MAX_DIGITS || c == 'e' || c == 'E') {
            return Double.NaN;
        }
        endOut[0] = i;
        double v = fraction == 0 ? (double) m : m / POW10[fraction];
        return negative ? -v : v;
    }
}
