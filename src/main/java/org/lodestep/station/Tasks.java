package org.lodestep.station;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

import org.lodestep.report.Json;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.SerializationFeature;
import org.lodestep.workflow.Progress;

import io.javalin.http.sse.SseClient;

/**
 * Long tasks (a motor's check, a sweep) run one at a time on the station's worker thread, because there is one rig
 * and one store; each keeps its events (step, progress, note, then done or failed) so a page that subscribes late,
 * or reconnects, still sees them all. The browser follows a task over server-sent events.
 */
final class Tasks implements AutoCloseable {
    private static final int KEEP = 64;

    /** What a task does; returns the fields of its {@code done} event. */
    @FunctionalInterface
    interface Work {
        /** Runs on the worker; {@code task} is its progress and takes events of the work's own kinds. */
        Map<String, Object> run(Task task) throws Exception;
    }

    /** One task and its events so far. */
    static final class Task implements Progress {
        final String id;
        private final List<String> events = new ArrayList<>();
        private boolean finished;
        private long lastAdvancedMs;

        Task(String id) {
            this.id = id;
        }

        @Override
        public void step(String step) {
            add("step", Map.of("text", step));
        }

        @Override
        public void advanced(long done, long total) {
            long now = System.currentTimeMillis();
            if (total >= 0 && done < total && now - lastAdvancedMs < 100) {
                return; // a few updates a second are enough for a progress bar
            }
            lastAdvancedMs = now;
            add("progress", Map.of("done", done, "total", total));
        }

        @Override
        public void note(String message) {
            add("note", Map.of("text", message));
        }

        synchronized void add(String type, Map<String, ?> fields) {
            if (finished) {
                return;
            }
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("type", type);
            e.putAll(fields);
            events.add(compact(e));
            if (type.equals("done") || type.equals("failed")) {
                finished = true;
            }
            notifyAll();
        }

        /** One line of JSON: an SSE data field must not span lines. */
        private static String compact(Map<String, Object> e) {
            try {
                return Json.mapper().writer().without(SerializationFeature.INDENT_OUTPUT).writeValueAsString(e);
            } catch (JsonProcessingException ex) {
                throw new IllegalStateException("event not serialisable: " + ex.getMessage(), ex);
            }
        }

        /** Sends every event from {@code from} on, waiting for new ones, until the task ends or the page leaves. */
        void stream(SseClient client, int from) throws InterruptedException {
            int next = Math.max(0, from);
            while (!client.terminated()) {
                String data;
                boolean last;
                synchronized (this) {
                    while (next >= events.size() && !finished) {
                        wait(15_000);
                        if (next >= events.size() && !finished) {
                            client.sendComment("waiting"); // keeps proxies and the browser from timing out
                        }
                    }
                    if (next >= events.size()) {
                        return;
                    }
                    data = events.get(next);
                    last = finished && next == events.size() - 1;
                }
                client.sendEvent("task", data, Integer.toString(next));
                next++;
                if (last) {
                    return;
                }
            }
        }
    }

    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "station-worker");
        t.setDaemon(true);
        return t;
    });
    private final Map<String, Task> tasks = new ConcurrentHashMap<>();
    private final List<String> order = new ArrayList<>();

    /** Queues {@code work}; its failure becomes a {@code failed} event with the message the user reads. */
    Task submit(Work work) {
        Task t = new Task(Access.random());
        synchronized (order) {
            order.add(t.id);
            while (order.size() > KEEP) {
                tasks.remove(order.remove(0));
            }
        }
        tasks.put(t.id, t);
        t.add("queued", Map.of());
        worker.submit(() -> {
            try {
                t.add("done", work.run(t));
            } catch (Exception | Error e) {
                Problems.Problem p = Problems.of(e);
                t.add("failed", Map.of("kind", p.kind(), "message", p.message()));
            }
        });
        return t;
    }

    Optional<Task> find(String id) {
        return Optional.ofNullable(tasks.get(id));
    }

    @Override
    public void close() {
        worker.shutdownNow();
    }
}
