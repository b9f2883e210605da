package org.lodestep.signal;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;

/**
 * Work that runs beside a segmenter on the threads that transform its segments, queued ahead of the transform
 * helpers the segmenter asks for after it. On two cores the second core then runs this work first and helps with
 * the transforms once it is done, instead of the two taking turns on that core while the feeding thread waits on
 * whichever is behind (a helper still queued is simply not waited for: the feeding thread takes its segments).
 */
public final class BesideWork {
    private final FutureTask<Void> task;

    private BesideWork(Runnable work) {
        this.task = new FutureTask<>(work, null);
    }

    /** Queues {@code work} on the transform threads. */
    public static BesideWork start(Runnable work) {
        BesideWork w = new BesideWork(work);
        TransformThreads.pool().execute(w.task);
        return w;
    }

    /**
     * Waits for the work to finish, running it on this thread if no transform thread has started it, and rethrows
     * what it threw. Like a fork-join task's join, the wait is not cut short by an interrupt: the interrupt is kept
     * for the caller, and the work, which the caller's next steps depend on, is always complete on return.
     */
    public void join() {
        task.run(); // does nothing if a transform thread started it, or it is done
        boolean interrupted = false;
        try {
            while (true) {
                try {
                    task.get();
                    return;
                } catch (InterruptedException e) {
                    interrupted = true;
                } catch (ExecutionException e) {
                    Throwable cause = e.getCause();
                    if (cause instanceof RuntimeException re) {
                        throw re;
                    }
                    if (cause instanceof Error err) {
                        throw err;
                    }
                    throw new IllegalStateException(cause);
                }
            }
        } finally {
            if (interrupted) {
                Thread.currentThread().interrupt();
            }
        }
    }
}
