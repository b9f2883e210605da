package org.lodestep.sample;

import java.util.Arrays;
import java.util.Random;

/** Damaged copies of a valid input for the readers' fuzz tests: a few random byte edits, as a bad copy leaves. */
public final class ByteDamage {
    private ByteDamage() {
    }

    /**
     * A copy of {@code base} with 1 to 4 edits, each replacing, inserting or deleting one byte, or cutting the rest
     * off; an inserted or replacing byte is drawn from {@code alphabet} (the format's own characters) two times in
     * three, else any byte value.
     */
    public static byte[] edit(byte[] base, Random rnd, byte[] alphabet) {
        byte[] bytes = base.clone();
        int edits = 1 + rnd.nextInt(4);
        for (int e = 0; e < edits && bytes.length > 0; e++) {
            int at = rnd.nextInt(bytes.length);
            byte x = rnd.nextInt(3) == 0 ? (byte) rnd.nextInt() : alphabet[rnd.nextInt(alphabet.length)];
            switch (rnd.nextInt(4)) {
                case 0 -> bytes[at] = x;
                case 1 -> {
                    byte[] n = new byte[bytes.length + 1];
                    System.arraycopy(bytes, 0, n, 0, at);
                    n[at] = x;
                    System.arraycopy(bytes, at, n, at + 1, bytes.length - at);
                    bytes = n;
                }
                case 2 -> {
                    byte[] n = new byte[bytes.length - 1];
                    System.arraycopy(bytes, 0, n, 0, at);
                    System.arraycopy(bytes, at + 1, n, at, bytes.length - at - 1);
                    bytes = n;
                }
                default -> bytes = Arrays.copyOf(bytes, at);
            }
        }
        return bytes;
    }
}
