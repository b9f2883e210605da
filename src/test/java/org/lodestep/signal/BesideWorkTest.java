package org.lodestep.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;

import org.junit.jupiter.api.Test;

class BesideWorkTest {

    @Test
    void joinReturnsWithTheWorkDoneAndItsWritesVisible() {
        int[] out = new int[1];
        BesideWork w = BesideWork.start(() -> out[0] = 42);
        w.join();
        assertEquals(42, out[0]);
        w.join(); // a second join returns at once
    }

    @Test
    void joinRethrowsWhatTheWorkThrew() {
        IllegalArgumentException thrown = new IllegalArgumentException("sample 7 is not a finite number");
        BesideWork w = BesideWork.start(() -> {
            throw thrown;
        });
        assertSame(thrown, assertThrows(IllegalArgumentException.class, w::join));
    }

    /** With every transform thread busy, the joining thread runs the work itself rather than wait for one. */
    @Test
    void joinRunsTheWorkHereWhenNoTransformThreadIsFree() throws InterruptedException {
        int poolThreads = TransformThreads.poolThreads();
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch started = new CountDownLatch(poolThreads);
        List<BesideWork> blockers = new ArrayList<>();
        for (int i = 0; i < poolThreads; i++) {
            blockers.add(BesideWork.start(() -> {
                started.countDown();
                try {
                    release.await();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }));
        }
        try {
            assertTrue(started.await(10, TimeUnit.SECONDS), "the transform threads did not start");
            AtomicReference<Thread> ranOn = new AtomicReference<>();
            BesideWork w = BesideWork.start(() -> ranOn.set(Thread.currentThread()));
            w.join();
            assertSame(Thread.currentThread(), ranOn.get());
        } finally {
            release.countDown();
            for (BesideWork b : blockers) {
                b.join();
            }
        }
    }

    /** The work runs on a transform thread while the joining thread, interrupted, waits for it. */
    @Test
    void anInterruptDoesNotCutTheWaitShortAndIsKept() throws InterruptedException {
        CountDownLatch running = new CountDownLatch(1);
        boolean[] finished = new boolean[1];
        BesideWork w = BesideWork.start(() -> {
            running.countDown();
            long until = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(50);
            while (System.nanoTime() < until) {
                Thread.onSpinWait();
            }
            finished[0] = true;
        });
        assertTrue(running.await(10, TimeUnit.SECONDS), "no transform thread took the work");
        Thread.currentThread().interrupt();
        try {
            w.join();
            assertTrue(finished[0], "join returned before the work finished");
            assertTrue(Thread.currentThread().isInterrupted(), "the interrupt was lost");
        } finally {
            Thread.interrupted(); // clear it for the next test
        }
    }
}
