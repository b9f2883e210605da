package org.lodestep.capture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class PlainDecimalTest {

    private static double parse(String s, boolean decimalComma) {
        byte[] b = (s + "\n").getBytes(StandardCharsets.US_ASCII);
        int[] end = new int[1];
        double v = PlainDecimal.parse(b, 0, decimalComma, end);
        if (!Double.isNaN(v)) {
            assertEquals(s.length(), end[0], "end of " + s);
        }
        return v;
    }

    /**
     * The reference is the JDK's own {@code Double.parseDouble}, which the Java SE specification requires to round
     * correctly (Double.valueOf(String) javadoc, Java SE 17); every plain decimal of up to 15 digits must match it
     * bit for bit.
     */
    @Test
    void matchesJdkParserBitForBitOnRandomPlainDecimals() {
        SplittableRandom rnd = new SplittableRandom(42);
        for (int n = 0; n < 200_000; n++) {
            int intDigits = rnd.nextInt(0, 8);
            int fracDigits = rnd.nextInt(intDigits == 0 ? 1 : 0, 16 - intDigits);
            StringBuilder sb = new StringBuilder(rnd.nextBoolean() ? "-" : "");
            for (int i = 0; i < intDigits; i++) {
                sb.append((char) ('0' + rnd.nextInt(10)));
            }
            if (fracDigits > 0 || rnd.nextBoolean()) {
                sb.append('.');
            }
            for (int i = 0; i < fracDigits; i++) {
                sb.append((char) ('0' + rnd.nextInt(10)));
            }
            String s = sb.toString();
            double v = parse(s, false);
            assertEquals(Double.doubleToRawLongBits(Double.parseDouble(s)), Double.doubleToRawLongBits(v), s);
        }
    }

    /**
     * The same check where the number sits inside a longer buffer, as it does in a file's read buffer: any byte value
     * may follow the number's end, and lengths fall on and beside eight bytes (a parser taking digits by the word
     * would be held to the same answers).
     */
    @Test
    void matchesJdkParserInsideLongerBuffersWhateverBytesFollow() {
        SplittableRandom rnd = new SplittableRandom(7);
        for (int n = 0; n < 200_000; n++) {
            int intDigits = rnd.nextInt(0, 16);
            int fracDigits = rnd.nextInt(intDigits == 0 ? 1 : 0, Math.max(2, 16 - intDigits));
            StringBuilder sb = new StringBuilder(rnd.nextInt(4) == 0 ? "-" : "");
            for (int i = 0; i < intDigits; i++) {
                sb.append((char) ('0' + rnd.nextInt(10)));
            }
            if (fracDigits > 0) {
                sb.append('.');
            }
            for (int i = 0; i < fracDigits; i++) {
                sb.append((char) ('0' + rnd.nextInt(10)));
            }
            String s = sb.toString();
            byte[] text = s.getBytes(StandardCharsets.US_ASCII);
            int lead = rnd.nextInt(0, 9);
            byte[] b = new byte[lead + text.length + 1 + rnd.nextInt(0, 12)];
            for (int i = 0; i < b.length; i++) {
                b[i] = (byte) rnd.nextInt(256);
            }
            System.arraycopy(text, 0, b, lead, text.length);
            byte end;
            do {
                end = (byte) rnd.nextInt(256);
            } while (end >= '0' && end <= '9' || end == '.' || end == 'e' || end == 'E');
            b[lead + text.length] = end;
            int[] endOut = new int[1];
            double v = PlainDecimal.parse(b, lead, false, endOut);
            if (intDigits + fracDigits > 15) {
                assertTrue(Double.isNaN(v), s);
                continue;
            }
            assertEquals(Double.doubleToRawLongBits(Double.parseDouble(s)), Double.doubleToRawLongBits(v), s);
            assertEquals(lead + text.length, endOut[0], "end of " + s);
        }
    }

    @Test
    void readsDecimalCommaOnlyWhenAsked() {
        assertEquals(0.25, parse("0,25", true));
        assertEquals(0.0, parse("0", true));
        byte[] b = "0,25\n".getBytes(StandardCharsets.US_ASCII);
        int[] end = new int[1];
        assertEquals(0.0, PlainDecimal.parse(b, 0, false, end));
        assertEquals(1, end[0]);   // stops at the comma: it is the delimiter there
    }

    @Test
    void declinesWhatItCannotReadExactly() {
        // 16 digits may exceed 2^53; exponents and words go to the general parser.
        assertTrue(Double.isNaN(parse("1234567890.123456", false)));
        assertTrue(Double.isNaN(parse("1.0E-5", false)));
        assertTrue(Double.isNaN(parse("NaN", false)));
        assertTrue(Double.isNaN(parse("-", false)));
        assertTrue(Double.isNaN(parse(".", false)));
        assertEquals(-0.5, parse("-.5", false));
        assertEquals(12.0, parse("+12.", false));
    }
}
