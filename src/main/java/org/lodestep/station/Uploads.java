package org.lodestep.station;

import java.io.IOException;
import java.io.InputStream;

import org.lodestep.workflow.SettingsException;

import io.javalin.http.UploadedFile;

/** Uploaded files: size-limited, read whole, named safely in messages. */
final class Uploads {
    private Uploads() {
    }

    /** The file's base name with control and path characters replaced: it only ever appears in messages. */
    static String safeName(String name) {
        if (name == null || name.isBlank()) {
            return "upload";
        }
        String base = name.replace('\\', '/');
        base = base.substring(base.lastIndexOf('/') + 1);
        base = base.replaceAll("[\\p{Cntrl}]", "?");
        return base.isEmpty() ? "upload" : base.length() > 120 ? base.substring(0, 120) : base;
    }

    /** The upload's bytes; refuses one above {@link Station#MAX_UPLOAD_BYTES} without reading it all. */
    static byte[] bytes(UploadedFile f) throws IOException {
        if (f.size() > Station.MAX_UPLOAD_BYTES) {
            throw new SettingsException(safeName(f.filename()) + ": " + f.size() + " bytes is more than the "
                    + Station.MAX_UPLOAD_BYTES + " bytes an upload may have");
        }
        try (InputStream in = f.content()) {
            byte[] b = in.readNBytes((int) Station.MAX_UPLOAD_BYTES + 1);
            if (b.length > Station.MAX_UPLOAD_BYTES) {
                throw new SettingsException(safeName(f.filename()) + ": more than the " + Station.MAX_UPLOAD_BYTES
                        + " bytes an upload may have");
            }
            return b;
        }
    }
}
