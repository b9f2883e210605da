package org.lodestep.report.html;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;

/** Writes a file whole or not at all: a temporary file in the same folder, then an atomic move over the target. */
final class AtomicWrite {
    private AtomicWrite() {
    }

    static void write(Path target, byte[] content) throws IOException {
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

    /** A temporary file starts private (rw-------); a report is meant to be shared like any other file. */
    private static void readableByAll(Path tmp) throws IOException {
        if (tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            Files.setPosixFilePermissions(tmp, PosixFilePermissions.fromString("rw-r--r--"));
        }
    }
}
