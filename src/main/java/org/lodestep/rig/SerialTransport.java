package org.lodestep.rig;

import java.io.IOException;

import com.fazecast.jSerialComm.SerialPort;

/**
 * A serial port through jSerialComm: {@code serial:/dev/ttyUSB0?baud=921600}, 8 data bits, no parity, one stop bit,
 * no flow control. Also opens one end of a pseudo-terminal pair (what {@code rig serve --serial} and the tests use).
 */
final class SerialTransport implements Transport {
    /** Default line speed, bits per second. */
    static final int DEFAULT_BAUD = 921_600;

    private final String address;
    private final SerialPort port;

    private SerialTransport(String address, SerialPort port) {
        this.address = address;
        this.port = port;
    }

    static SerialTransport open(String address, String device, int baud) throws RigException {
        SerialPort p;
        try {
            p = SerialPort.getCommPort(device);
        } catch (RuntimeException e) {
            throw new RigException(address + ": no such serial port (" + e.getMessage() + ")", e);
        }
        p.setComPortParameters(baud, 8, SerialPort.ONE_STOP_BIT, SerialPort.NO_PARITY);
        p.setFlowControl(SerialPort.FLOW_CONTROL_DISABLED);
        if (!p.openPort()) {
            throw new RigException(address + ": cannot open serial port " + device + " (error "
                    + p.getLastErrorCode() + "; is it present and not in use, and may this user open it?)");
        }
        return new SerialTransport(address, p);
    }

    /** The serial ports the system knows, as {@code serial:} addresses with a description. */
    static java.util.List<String[]> list() {
        java.util.List<String[]> out = new java.util.ArrayList<>();
        for (SerialPort p : SerialPort.getCommPorts()) {
            out.add(new String[] {"serial:" + p.getSystemPortPath(), p.getPortDescription()});
        }
        return out;
    }

    @Override
    public String address() {
        return address;
    }

    @Override
    public void write(byte[] bytes, int offset, int length) throws IOException {
        int done = 0;
        while (done < length) {
            int n = port.writeBytes(bytes, length - done, offset + done);
            if (n < 0) {
                throw new IOException(address + ": write failed (error " + port.getLastErrorCode() + ")");
            }
            done += n;
        }
    }

    @Override
    public int read(byte[] dest, int offset, int length, int timeoutMs) throws IOException {
        long deadline = System.nanoTime() + timeoutMs * 1_000_000L;
        while (true) {
            int avail = port.bytesAvailable();
            if (avail < 0) {
                return -1;
            }
            if (avail > 0) {
                int n = port.readBytes(dest, Math.min(length, avail), offset);
                if (n < 0) {
                    throw new IOException(address + ": read failed (error " + port.getLastErrorCode() + ")");
                }
                return n;
            }
            if (System.nanoTime() >= deadline) {
                return 0;
            }
            try {
                Thread.sleep(1);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException(address + ": interrupted", e);
            }
        }
    }

    @Override
    public void close() {
        port.closePort();
    }
}
