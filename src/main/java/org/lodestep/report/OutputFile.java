package org.lodestep.report;

import java.io.IOException;
import java.nio.file.Path;

/**
 * The whole-or-nothing writer for callers outside the report packages; the implementation is
 * {@link org.lodestep.report.html.OutputFile}, in the leaf package, so that {@code report.html} depends on nothing of
 * ours and {@code report} depends on it, not both ways.
 */
public final class OutputFile {
    private OutputFile() {
    }

    /** Writes text as UTF-8, whole or not at all. */
    public static void write(Path target, String text) throws IOException {
        org.lodestep.report.html.OutputFile.write(target, text);
    }

    /** Writes bytes, whole or not at all. */
    public static void write(Path target, byte[] content) throws IOException {
        org.lodestep.report.html.OutputFile.write(target, content);
    }
}
