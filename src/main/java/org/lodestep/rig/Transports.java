package org.lodestep.rig;

/**
 * Opens a {@link Transport} from an address: {@code serial:/dev/ttyUSB0?baud=921600}, {@code tcp:host:port}, or
 * {@code sim:<scenario>[?seed=N&realtime=1]} (the virtual rig, started in-process on a pipe).
 */
public final class Transports {
    private static final int CONNECT_TIMEOUT_MS = 3000;

    private Transports() {
    }

    /** A virtual rig running in-process, and the host's end of the pipe to it. */
    public record SimLink(Transport host, VirtualRig rig, Thread thread) {
    }

    /**
     * Opens a transport.
     *
     * @throws IllegalArgumentException when the address is not of a known form (a usage error)
     * @throws RigException             when it is, but the rig cannot be reached
     */
    public static Transport open(String address) throws RigException {
        if (address.startsWith("sim:")) {
            return openSim(address).host();
        }
        if (address.startsWith("tcp:")) {
            String rest = address.substring(4);
            int colon = rest.lastIndexOf(':');
            if (colon <= 0) {
                throw new IllegalArgumentException("address '" + address + "' is not tcp:HOST:PORT");
            }
            int port = parseInt(rest.substring(colon + 1), address, "a port number 1..65535");
            if (port < 1 || port > 65535) {
                throw new IllegalArgumentException("address '" + address + "': port must be 1..65535");
            }
            String host = rest.substring(0, colon);
            if (host.startsWith("[") && host.endsWith("]")) {
                host = host.substring(1, host.length() - 1);
            }
            return TcpTransport.connect(address, host, port, CONNECT_TIMEOUT_MS);
        }
        if (address.startsWith("serial:")) {
            String rest = address.substring(7);
            int q = rest.indexOf('?');
            String device = q < 0 ? rest : rest.substring(0, q);
            int baud = SerialTransport.DEFAULT_BAUD;
            if (q >= 0) {
                for (String kv : rest.substring(q + 1).split("&")) {
                    if (kv.startsWith("baud=")) {
                        baud = parseInt(kv.substring(5), address, "baud=BITS_PER_SECOND");
                    } else {
                        throw new IllegalArgumentException("address '" + address + "': unknown option '" + kv
                                + "' (only baud=)");
                    }
                }
            }
            if (device.isEmpty()) {
                throw new IllegalArgumentException("address '" + address + "' names no device");
            }
            return SerialTransport.open(address, device, baud);
        }
        throw new IllegalArgumentException("address '" + address
                + "' is not serial:DEVICE[?baud=N], tcp:HOST:PORT or sim:SCENARIO");
    }

    /** Starts a virtual rig in-process for {@code sim:NAME[?seed=N&realtime=1]}. */
    public static SimLink openSim(String address) throws RigException {
        String rest = address.substring(4);
        int q = rest.indexOf('?');
        String name = q < 0 ? rest : rest.substring(0, q);
        if (name.isEmpty()) {
            throw new IllegalArgumentException("address 'sim:' names no scenario; known: "
                    + String.join(", ", Scenarios.all().keySet()));
        }
        Scenario s = Scenarios.all().get(name);
        if (s == null) {
            throw new IllegalArgumentException("no virtual-rig scenario '" + name + "'; known: "
                    + String.join(", ", Scenarios.all().keySet()));
        }
        boolean realTime = false;
        if (q >= 0) {
            for (String kv : rest.substring(q + 1).split("&")) {
                if (kv.startsWith("seed=")) {
                    s = s.withSeed(parseInt(kv.substring(5), address, "seed=INTEGER"));
                } else if (kv.equals("realtime=1")) {
                    realTime = true;
                } else {
                    throw new IllegalArgumentException("address '" + address + "': unknown option '" + kv
                            + "' (seed=N, realtime=1)");
                }
            }
        }
        PipeTransport[] ends = PipeTransport.pair(address, 1 << 16);
        VirtualRig rig = new VirtualRig(name, s, ends[1], realTime);
        Thread t = new Thread(rig, "virtual-rig " + name);
        t.setDaemon(true);
        t.start();
        return new SimLink(ends[0], rig, t);
    }

    private static int parseInt(String s, String address, String expected) {
        try {
            return Integer.parseInt(s);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("address '" + address + "': '" + s + "' is not " + expected);
        }
    }

    /** Serial ports present on this machine: {address, description} pairs. */
    public static java.util.List<String[]> serialPorts() {
        return SerialTransport.list();
    }

    /** Opens a serial device for the rig side of {@code rig serve --serial}. */
    public static Transport openSerialDevice(String device, int baud) throws RigException {
        return SerialTransport.open("serial:" + device, device, baud);
    }


    /** Wraps a socket accepted by {@code rig serve --tcp} as the rig side's transport. */
    public static Transport acceptedTcp(String address, java.net.Socket socket) throws java.io.IOException {
        return new TcpTransport(address, socket);
    }
}
