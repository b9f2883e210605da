package org.lodestep.workflow;

import org.lodestep.rig.RigConformance;
import org.lodestep.rig.RigException;

/**
 * Checks a rig's firmware against the protocol specification ({@code firmware-protocol.md}) with the conformance
 * kit, for a firmware author: every row names the section it rests on.
 */
public final class RigConformanceCheck {
    private RigConformanceCheck() {
    }

    /**
     * @param address  the rig ({@code serial:...}, {@code tcp:...}, {@code sim:...})
     * @param thorough also the slow checks (the insulation arm's expiry, the watchdog during a dwell)
     */
    public record Settings(String address, boolean thorough) {
        public Settings {
            if (address == null || address.isBlank()) {
                throw new SettingsException("no rig address");
            }
        }
    }

    /**
     * Runs the kit; each check is announced as a step.
     *
     * @throws RigException when the rig cannot be reached at all (a failing rig gives a report, not an exception)
     */
    public static RigConformance.Report run(Settings settings, Progress progress) throws RigException {
        return RigConformance.run(settings.address(), new RigConformance.Settings(settings.thorough()),
                progress::step);
    }
}
