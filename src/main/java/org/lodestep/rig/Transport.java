package org.lodestep.rig;

import java.io.Closeable;
import java.io.IOException;

/**
 * A full-duplex byte pipe to a rig (or, on the rig side, to the host): a serial port, a TCP socket or an in-process
 * pipe. The protocol of {@code firmware-protocol.md} runs above it, so every transport exercises the same codec.
 */
public interface Transport extends Closeable {

    /** The address this transport was opened from, for messages ({@code serial:/dev/ttyUSB0}, {@code tcp:...}). */
    String address();

    /** Writes all bytes, blocking until they are handed to the line. */
    void write(byte[] bytes, int offset, int length) throws IOException;

    /**
     * Reads at least one byte, waiting at most {@code timeoutMs}.
     *
     * @return the number of bytes read, 0 when the timeout passed with nothing to read, -1 when the far end closed
     */
    int read(byte[] dest, int offset, int length, int timeoutMs) throws IOException;

    default void write(byte[] bytes) throws IOException {
        write(bytes, 0, bytes.length);
    }
}
