package org.lodestep.workflow;

import java.util.Map;

import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.rig.RigInfo;
import org.lodestep.rig.Scenario;
import org.lodestep.rig.Scenarios;

/** What a rig is and can do (its handshake), or which scenarios the virtual rig offers. */
public final class RigDescribe {
    private RigDescribe() {
    }

    /**
     * Connects, handshakes and disconnects.
     *
     * @throws IllegalArgumentException a malformed address
     */
    public static RigInfo info(String address, Progress progress) throws RigException {
        progress.step("connecting to " + address);
        try (RigClient c = RigClient.open(address)) {
            return c.info();
        }
    }

    /** The virtual rig's scenarios, by name. */
    public static Map<String, Scenario> scenarios() {
        return Scenarios.all();
    }
}
