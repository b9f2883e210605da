package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ConcurrentHashMap;

import org.lodestep.qa.Hashes;

/**
 * SHA-256 digests of a run's large input files, worked out on a background thread from the start of the run, so the
 * provenance hash of a capture of hundreds of megabytes overlaps its analysis instead of following it (a 219 MB CSV
 * takes about 0.3 s to hash with the processor's SHA instructions, 2 s without).
 *
 * <p>{@link Provenance} takes a digest started here only if the file still has the size and modification time it
 * had when hashing began, and the hashing thread checks them again when it ends; otherwise, or when nothing was
 * started for the file, the file is hashed when it is added. Each digest is used once.
 */
public final class InputDigests {
    /** Files smaller than this are hashed when added: starting a thread would cost more than it saves. */
    static final long BACKGROUND_MIN_BYTES = 1 << 20;

    private static final Map<Path, Pending> STARTED = new ConcurrentHashMap<>();

    /** A digest under way, and what the file looked like when it began. */
    private record Pending(long bytes, FileTime modified, CompletableFuture<String> sha256) {
    }

    private InputDigests() {
    }

    /**
     * Starts hashing, on one daemon thread, every argument that names a regular file of at least
     * {@link #BACKGROUND_MIN_BYTES}; anything else (options, missing files, small files) is passed over.
     */
    public static void start(List<String> arguments) {
        List<Path> files = new ArrayList<>();
        List<Pending> pending = new ArrayList<>();
        for (String a : arguments) {
            if (a.isEmpty() || a.startsWith("-")) {
                continue;
            }
            try {
                Path file = Path.of(a);
                BasicFileAttributes at = Files.readAttributes(file, BasicFileAttributes.class);
                Path key = key(file);
                if (!at.isRegularFile() || at.size() < BACKGROUND_MIN_BYTES || STARTED.containsKey(key)) {
                    continue;
                }
                Pending p = new Pending(at.size(), at.lastModifiedTime(), new CompletableFuture<>());
                STARTED.put(key, p);
                files.add(file);
                pending.add(p);
            } catch (IOException | InvalidPathException | SecurityException e) {
                // not a file we can read: the command reports it in its own words
            }
        }
        if (files.isEmpty()) {
            return;
        }
        Thread t = new Thread(() -> {
            for (int i = 0; i < files.size(); i++) {
                Pending p = pending.get(i);
                try {
                    String sha = Hashes.sha256(files.get(i));
                    p.sha256().complete(unchanged(files.get(i), p) ? sha : null);
                } catch (IOException | RuntimeException e) {
                    p.sha256().complete(null); // hashed again when added, which words the failure
                }
            }
        }, "lodestep-input-digest");
        t.setDaemon(true);
        t.start();
    }

    /** The SHA-256 of {@code file}: the one started for it if still valid, else computed now. */
    static String sha256(Path file) throws IOException {
        Pending p = STARTED.remove(key(file));
        if (p != null && unchanged(file, p)) {
            try {
                String sha = p.sha256().join();
                if (sha != null && unchanged(file, p)) {
                    return sha;
                }
            } catch (CompletionException e) {
                // hashed below
            }
        }
        return Hashes.sha256(file);
    }

    private static boolean unchanged(Path file, Pending p) {
        try {
            BasicFileAttributes at = Files.readAttributes(file, BasicFileAttributes.class);
            return at.size() == p.bytes() && at.lastModifiedTime().equals(p.modified());
        } catch (IOException e) {
            return false;
        }
    }

    private static Path key(Path file) {
        return file.toAbsolutePath().normalize();
    }
}
