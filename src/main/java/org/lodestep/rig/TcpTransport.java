package org.lodestep.rig;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.SocketTimeoutException;
import java.net.UnknownHostException;

/** A rig behind a serial-to-network bridge, or {@code lodestep rig serve --tcp}: {@code tcp:host:port}. */
final class TcpTransport implements Transport {
    private final String address;
    private final Socket socket;
    private final InputStream in;
    private final OutputStream out;

    TcpTransport(String address, Socket socket) throws IOException {
        this.address = address;
        this.socket = socket;
        socket.setTcpNoDelay(true);
        this.in = socket.getInputStream();
        this.out = socket.getOutputStream();
    }

    static TcpTransport connect(String address, String host, int port, int connectTimeoutMs) throws RigException {
        Socket s = new Socket();
        try {
            s.connect(new InetSocketAddress(host, port), connectTimeoutMs);
            return new TcpTransport(address, s);
        } catch (IOException e) {
            try {
                s.close();
            } catch (IOException ignored) {
                // already failing
            }
            // an unknown host's message is the bare host name
            String why = e instanceof UnknownHostException ? "unknown host " + host
                    : e instanceof SocketTimeoutException ? "no answer within " + connectTimeoutMs + " ms"
                    : e.getMessage();
            throw new RigException(address + ": cannot connect (" + why + ")", e);
        }
    }

    @Override
    public String address() {
        return address;
    }

    @Override
    public void write(byte[] bytes, int offset, int length) throws IOException {
        out.write(bytes, offset, length);
        out.flush();
    }

    @Override
    public int read(byte[] dest, int offset, int length, int timeoutMs) throws IOException {
        int avail = in.available();
        if (avail > 0) {
            return in.read(dest, offset, Math.min(length, avail));
        }
        if (timeoutMs <= 0) {
            return 0;
        }
        socket.setSoTimeout(timeoutMs);
        try {
            return in.read(dest, offset, length);
        } catch (SocketTimeoutException e) {
            return 0;
        }
    }

    @Override
    public void close() throws IOException {
        socket.close();
    }
}
