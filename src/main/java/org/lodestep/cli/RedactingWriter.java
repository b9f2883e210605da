package org.lodestep.cli;

import java.io.IOException;
import java.io.Writer;

import org.lodestep.qa.DatabaseUrls;

/**
 * Standard error with database passwords masked, line by line: whatever prints an error (picocli's option messages
 * included) cannot show a secret that came in a URL.
 */
final class RedactingWriter extends Writer {
    private final Writer out;
    private final StringBuilder line = new StringBuilder();

    RedactingWriter(Writer out) {
        this.out = out;
    }

    @Override
    public void write(char[] cbuf, int off, int len) throws IOException {
        for (int i = off; i < off + len; i++) {
            line.append(cbuf[i]);
            if (cbuf[i] == '\n') {
                emit();
            }
        }
    }

    private void emit() throws IOException {
        out.write(DatabaseUrls.redact(line.toString()));
        line.setLength(0);
    }

    @Override
    public void flush() throws IOException {
        // a prompt without a newline must still show; a URL is never split across a flush in our own output
        if (line.length() > 0) {
            emit();
        }
        out.flush();
    }

    @Override
    public void close() throws IOException {
        flush();
    }
}
