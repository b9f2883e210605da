package org.lodestep.signal;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

/**
 * The helper threads that transform segments beside the feeding thread. Created on first use, so commands that do no
 * spectral work start no thread; daemon threads, so they never keep the process alive.
 */
final class TransformThreads {
    /** Segments are transformed on at most this many threads (the feeding thread included). */
    static final int MAX_LANES = 8;
    /** System property that sets the number of lanes (1 = serial), for measurements; default: one per core. */
    static final String LANES_PROPERTY = "lodestep.transformThreads";

    private TransformThreads() {
    }

    /** Lanes for a new segmenter: the property if set, else the available processors, 1 ... {@link #MAX_LANES}. */
    static int defaultLanes() {
        int cores = Runtime.getRuntime().availableProcessors();
        String p = System.getProperty(LANES_PROPERTY);
        int lanes = cores;
        if (p != null) {
            try {
                lanes = Integer.parseInt(p.trim());
            } catch (NumberFormatException e) {
                lanes = cores; // a measurement switch, not a user option: a bad value falls back to the default
            }
        }
        return Math.max(1, Math.min(MAX_LANES, lanes));
    }

    static ExecutorService pool() {
        return Holder.POOL;
    }

    /** Threads of the pool: one per core beside the feeding thread, at least one, within {@link #MAX_LANES}. */
    static int poolThreads() {
        return Math.max(1, Math.min(MAX_LANES, Runtime.getRuntime().availableProcessors()) - 1);
    }

    /** Lazy holder: the pool exists only once a segmenter transforms in parallel. */
    private static final class Holder {
        static final ExecutorService POOL = Executors.newFixedThreadPool(poolThreads(), r -> {
            Thread t = new Thread(r, "lodestep-transform");
            t.setDaemon(true);
            return t;
        });
    }
}
