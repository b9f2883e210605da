package org.lodestep.rig;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.Socket;
import java.net.SocketException;
import java.util.function.Consumer;

/**
 * Serves the virtual rig on a TCP port, one session at a time (firmware-protocol.md, section 3): while a host holds
 * the rig, another that connects is answered {@code E} tag 0 {@code 3 BUSY} at once and disconnected, and a host
 * that stays silent or sends only half a frame loses the session after the rig's timeouts
 * ({@link VirtualRig#closingIdleSessions()}).
 */
public final class RigServer {
    private RigServer() {
    }

    /**
     * Accepts connections on {@code server} until it is closed, or, with {@code once}, until the first session ends.
     *
     * @param log receives one line per session that ends or connection that is turned away
     */
    public static void serve(ServerSocket server, String scenarioName, Scenario scenario, boolean realTime,
                             boolean once, Consumer<String> log) throws IOException {
        Thread active = null;
        while (true) {
            Socket socket;
            try {
                socket = server.accept();
            } catch (SocketException e) {
                if (server.isClosed()) {
                    return; // closed by the session that ended a --once server, or by the caller
                }
                throw e;
            }
            if (active != null && active.isAlive()) {
                // a session that has just hung up may still be finishing: give it a moment before saying busy
                try {
                    active.join(250);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
            if (active != null && active.isAlive()) {
                refuse(socket);
                log.accept("turned away " + socket.getRemoteSocketAddress() + ": busy with another session");
                continue;
            }
            String from = String.valueOf(socket.getRemoteSocketAddress());
            Transport t = Transports.acceptedTcp("tcp:" + from, socket);
            VirtualRig rig = new VirtualRig(scenarioName, scenario, t, realTime).closingIdleSessions();
            active = new Thread(() -> {
                rig.run();
                log.accept("session from " + from + " ended");
                if (once) {
                    try {
                        server.close();
                    } catch (IOException ignored) {
                        // the accept loop ends either way
                    }
                }
            }, "virtual-rig session " + from);
            active.start();
            if (once) {
                try {
                    active.join();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
                return;
            }
        }
    }

    /** Tells a second host the rig is taken, then hangs up: it learns why at once instead of timing out. */
    private static void refuse(Socket socket) {
        try (socket) {
            socket.getOutputStream().write(FrameCodec.encode(VirtualRig.errorFrame(0, RigError.BUSY,
                    "another host holds this rig; try again when its session ends")));
            socket.getOutputStream().flush();
            socket.shutdownOutput();
        } catch (IOException ignored) {
            // it hung up first
        }
    }
}
