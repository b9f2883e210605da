package org.lodestep.station;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.lodestep.workflow.SettingsException;

/**
 * The explicit confirmation before the browser energises the motor through the rig: the page that showed the
 * caution arms one action and gets a key bound to that page (its tab key, made when the page loaded) and to the
 * action; firing takes the key once. A second tab never saw the key, and a key shown to it would not match its tab.
 */
final class RigArming {
    /** How long an arming stays valid, ms: long enough to clip the leads on, short enough to be deliberate. */
    static final long VALID_MS = 120_000;

    /** What may be armed. */
    enum Action {
        LEADS, MOTOR
    }

    private record Armed(Action action, String tab, long expiresMs) {
    }

    private final Map<String, Armed> armed = new ConcurrentHashMap<>();

    /** Arms {@code action} for the page {@code tab}; any earlier arming of that page is void. Returns the key. */
    String arm(Action action, String tab, long nowMs) {
        String t = tab(tab);
        armed.values().removeIf(a -> a.tab().equals(t) || a.expiresMs() < nowMs);
        String key = Access.random();
        armed.put(key, new Armed(action, t, nowMs + VALID_MS));
        return key;
    }

    /**
     * Takes the arming {@code key} for {@code action} from page {@code tab}, once.
     *
     * @throws SettingsException when it is missing, used, expired, for another action or another page: nothing is
     *                           energised
     */
    void take(String key, Action action, String tab, long nowMs) {
        Armed a = key == null ? null : armed.get(key);
        if (a == null) {
            throw new SettingsException("not armed: read the caution and arm this action on this page first; nothing"
                    + " was energised");
        }
        if (!Access.same(a.tab(), tab(tab)) || a.action() != action) {
            throw new SettingsException("this arming belongs to another page or action: arm it here; nothing was "
                    + "energised");
        }
        armed.remove(key);
        if (nowMs > a.expiresMs()) {
            throw new SettingsException("the arming has expired (" + VALID_MS / 1000 + " s): arm again; nothing was "
                    + "energised");
        }
    }

    private static String tab(String tab) {
        if (tab == null || !tab.matches("[0-9a-f]{16,64}")) {
            throw new SettingsException("this page has no tab key: reload it");
        }
        return tab;
    }
}
