package org.lodestep.station;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.SynchronousQueue;

import org.lodestep.workflow.LeadsProbe;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.SettingsException;
import org.lodestep.wiring.Identification;

/**
 * One guided probe session at the Leads page: {@link LeadsProbe} runs on a thread of its own (it waits for a person
 * with a meter, minutes at a time, so it never holds the station's worker) and asks this meter for each reading; the
 * page hands each answer over and gets the next question back.
 */
final class LeadsProbeRun implements LeadsProbe.Meter {
    /** A reading as recorded, for the page's list. */
    record Entry(int number, String first, String second, OptionalDouble ohms) {
    }

    final String id;
    final LeadsProbe.Settings settings;
    private final SynchronousQueue<LeadsProbe.Answer> answers = new SynchronousQueue<>();
    private final List<Entry> entries = new ArrayList<>();
    private LeadsProbe.Question question;
    private LeadsProbe.Result result;
    private String failure;
    private String notice = "";
    private Identification soFar;
    private long version;
    private final Thread thread;

    LeadsProbeRun(String id, LeadsProbe.Settings settings) {
        this.id = id;
        this.settings = settings;
        this.thread = new Thread(this::run, "leads-probe-" + id.substring(0, 6));
        thread.setDaemon(true);
    }

    void start() {
        thread.start();
    }

    private void run() {
        try {
            LeadsProbe.Result r = LeadsProbe.run(settings, this, Progress.NONE);
            synchronized (this) {
                result = r;
                question = null;
                version++;
                notifyAll();
            }
        } catch (Exception e) {
            synchronized (this) {
                failure = Problems.of(e).message();
                question = null;
                version++;
                notifyAll();
            }
        }
    }

    @Override
    public LeadsProbe.Answer ask(LeadsProbe.Question q) {
        synchronized (this) {
            question = q;
            version++;
            notifyAll();
        }
        try {
            LeadsProbe.Answer a = answers.take();
            synchronized (this) {
                if (a instanceof LeadsProbe.Answer.Reading r) {
                    entries.add(new Entry(q.number(), q.first(), q.second(), r.ohms()));
                    notice = "";
                }
            }
            return a;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return new LeadsProbe.Answer.Stop(LeadsProbe.StopReason.QUIT);
        }
    }

    @Override
    public synchronized void undone(boolean withdrew) {
        if (withdrew && !entries.isEmpty()) {
            Entry e = entries.remove(entries.size() - 1);
            notice = "withdrew " + e.first() + "\u2013" + e.second();
        } else {
            notice = "nothing to undo";
        }
    }

    @Override
    public synchronized void refused(String reason) {
        notice = reason;
    }

    @Override
    public boolean followsIdentification() {
        return true;
    }

    @Override
    public synchronized void soFar(Identification identification) {
        soFar = identification;
    }

    /** The identification from the readings so far, or null before the first. */
    synchronized Identification soFar() {
        return soFar;
    }

    /** Hands the answer to the session and waits (briefly) until it has asked the next question or finished. */
    void answer(LeadsProbe.Answer a) throws InterruptedException {
        long before;
        synchronized (this) {
            if (question == null) {
                throw new SettingsException(result != null || failure != null ? "this probe session has ended"
                        : "the session is not ready yet; try again");
            }
            before = version;
        }
        if (!answers.offer(a, 5, java.util.concurrent.TimeUnit.SECONDS)) {
            throw new SettingsException("the probe session did not take the reading; reload the page");
        }
        synchronized (this) {
            long until = System.currentTimeMillis() + 5000;
            while (version == before && System.currentTimeMillis() < until) {
                wait(500);
            }
        }
    }

    synchronized LeadsProbe.Question question() {
        return question;
    }

    synchronized LeadsProbe.Result result() {
        return result;
    }

    synchronized String failure() {
        return failure;
    }

    synchronized String notice() {
        return notice;
    }

    synchronized List<Entry> entries() {
        return List.copyOf(entries);
    }

    /** Waits until the session has asked its first question or ended. */
    synchronized void awaitReady() throws InterruptedException {
        long until = System.currentTimeMillis() + 5000;
        while (question == null && result == null && failure == null && System.currentTimeMillis() < until) {
            wait(200);
        }
    }

    void stop() {
        thread.interrupt();
    }
}
