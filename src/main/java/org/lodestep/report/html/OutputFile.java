package org.lodestep.report.html;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * Writes an output file (report, avoid-list, export, certificate) whole or not at all: a temporary file in the same
 * folder, then an atomic move over the target, so a reader never sees half a file and a failed write leaves the old
 * one in place.
 */
public final class OutputFile {
    private OutputFile() {
    }

    /** Writes text as UTF-8. */
    public static void write(Path target, String text) throws IOException {
        write(target, text.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * An output that could not be written, named as the user gave it with the reason ("is a folder", "permission
     * denied"), never by the temporary file's name; nothing was left at the target.
     */
    public static final class NotWritten extends IOException {
        private static final long serialVersionUID = 1L;

        NotWritten(Path target, String reason, Throwable cause) {
            super(target + ": cannot be written: " + reason, cause);
        }
    }

    /** Writes bytes; any failure is a {@link NotWritten} naming {@code target}. */
    public static void write(Path target, byte[] content) throws IOException {
        if (Files.isDirectory(target)) {
            throw new NotWritten(target, "is a folder, expected a file name", null);
        }
        try {
            writeWhole(target, content);
        } catch (IOException e) {
            throw new NotWritten(target, reason(e), e);
        }
    }

    private static String reason(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return String.valueOf(e.getMessage());
    }

    private static void writeWhole(Path target, byte[] content) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        if (dir != null) {
            Files.createDirectories(dir);
        }
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
        try {
            Files.write(tmp, content);
            readableByAll(tmp);
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** A temporary file starts private (rw-------); an output is meant to be shared like any other file. */
    private static void readableByAll(Path tmp) throws IOException {
        if (tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            Files.setPosixFilePermissions(tmp, PosixFilePermissions.fromString("rw-r--r--"));
        }
    }
}
