package org.lodestep.sample;

import java.nio.file.Files;
import java.nio.file.Path;

/** The check every reader makes before it opens a path: a folder given where a file belongs is named, not read. */
public final class InputFiles {
    private InputFiles() {
    }

    /**
     * Refuses a folder with a one-line message naming the path as given (reading one fails with "Is a directory" and
     * no name). A missing file is left to the open, whose {@code NoSuchFileException} names it.
     *
     * @param what what the file should be, for the message ("a capture CSV or WAV")
     */
    public static void requireFile(Path path, String what) throws InputFormatException {
        if (Files.isDirectory(path)) {
            throw new InputFormatException(path.toString(), InputFormatException.NO_LINE, null, null,
                    "is a folder: expected " + what);
        }
    }
}
