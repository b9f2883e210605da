package org.lodestep.station;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.NoSuchFileException;
import java.util.Map;

import org.lodestep.qa.SpecChangedException;
import org.lodestep.qa.StoreException;
import org.lodestep.report.Json;
import org.lodestep.rig.RigException;
import org.lodestep.sample.InputFormatException;

import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

/**
 * What the user reads when something goes wrong: the same classes of error as the command line's exit codes
 * ({@code cli.Main}), each as one line next to the form, never a stack trace.
 */
final class Problems {
    private Problems() {
    }

    /**
     * @param kind    input, setting, rig, store, io, refused or internal
     * @param message one line for the user
     * @param status  the HTTP status
     */
    record Problem(String kind, String message, HttpStatus status) {
    }

    static Problem of(Throwable e) {
        if (e instanceof Access.Refused r) {
            return new Problem("refused", r.getMessage(), r.status);
        }
        if (e instanceof InputFormatException) {
            return new Problem("input", e.getMessage(), HttpStatus.BAD_REQUEST);
        }
        if (e instanceof org.lodestep.drive.PlanningException) { // the command line's "no profile" finding
            return new Problem("finding", "no profile: " + e.getMessage(), HttpStatus.UNPROCESSABLE_CONTENT);
        }
        if (e instanceof IllegalArgumentException) { // SettingsException and the records' own checks
            return new Problem("setting", e.getMessage(), HttpStatus.BAD_REQUEST);
        }
        if (e instanceof RigException) {
            return new Problem("rig", "rig fault: " + e.getMessage() + ". The rig switches every output off when "
                    + "the line drops; nothing was recorded.", HttpStatus.BAD_GATEWAY);
        }
        if (e instanceof SpecChangedException) { // the spec file is at fault, not the store
            return new Problem("input", e.getMessage(), HttpStatus.CONFLICT);
        }
        if (e instanceof StoreException) {
            return new Problem("store", "record store: " + e.getMessage(), HttpStatus.SERVICE_UNAVAILABLE);
        }
        if (e instanceof NoSuchFileException) {
            return new Problem("input", e.getMessage() + ": no such file", HttpStatus.BAD_REQUEST);
        }
        if (e instanceof AccessDeniedException) {
            return new Problem("input", e.getMessage() + ": permission denied", HttpStatus.BAD_REQUEST);
        }
        if (e instanceof IOException) {
            return new Problem("io", "I/O error: " + e.getMessage(), HttpStatus.INTERNAL_SERVER_ERROR);
        }
        if (e instanceof io.javalin.http.HttpResponseException h) {
            return new Problem("refused", h.getMessage(), HttpStatus.forStatus(h.getStatus()));
        }
        return new Problem("internal", "internal error (" + e.getClass().getSimpleName() + "): please report it",
                HttpStatus.INTERNAL_SERVER_ERROR);
    }

    /** JSON for the pages' scripts ({@code /api/...}), an HTML page otherwise. */
    static void respond(Context ctx, Exception e) {
        Problem p = of(e);
        ctx.status(p.status());
        if (ctx.path().startsWith("/api/")) {
            ctx.contentType("application/json");
            ctx.result(Json.write(Map.of("kind", p.kind(), "message", p.message())));
        } else {
            ctx.html(Layout.page("Problem", "", "<section class=\"problem\" role=\"alert\"><h1>"
                    + Layout.symbol(org.lodestep.report.html.Status.FAIL) + " Problem</h1><p>"
                    + Layout.esc(p.message()) + "</p><p><a href=\"/\">Back to the station</a></p></section>", null));
        }
    }
}
