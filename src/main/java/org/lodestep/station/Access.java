package org.lodestep.station;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.SecureRandom;
import java.util.HexFormat;
import java.util.Locale;
import java.util.Set;

import io.javalin.http.Context;
import io.javalin.http.Cookie;
import io.javalin.http.HttpStatus;
import io.javalin.http.SameSite;

/**
 * Who may talk to the station, checked before every request.
 *
 * <ul>
 *   <li><b>Token</b> (when listening beyond loopback): every request carries the access token, in the cookie the
 *       station sets when the printed address ({@code ?token=}) is first opened, or as {@code Authorization: Bearer}.
 *   <li><b>Host</b> (loopback): the Host header must name loopback, so a page on another site cannot reach the
 *       station through a rebound DNS name.
 *   <li><b>Cross-site</b>: a state-changing request (anything but GET and HEAD) must come from the station's own
 *       pages: same origin by {@code Origin} and {@code Sec-Fetch-Site} when the browser sends them, and always the
 *       form key that only the station's pages carry.
 * </ul>
 */
final class Access {
    static final String COOKIE = "lodestep_station";
    static final String FORM_KEY_HEADER = "X-Lodestep-Form";
    static final String FORM_KEY_FIELD = "form_key";
    private static final Set<String> LOOPBACK_NAMES = Set.of("localhost", "127.0.0.1", "[::1]");

    private final String token;
    private final String formKey;

    Access(String token) {
        this.token = token;
        this.formKey = random();
    }

    /** A fresh random key, 128 bits in hex. */
    static String random() {
        byte[] b = new byte[16];
        new SecureRandom().nextBytes(b);
        return HexFormat.of().formatHex(b);
    }

    /** The key every page embeds in its forms and scripts. */
    String formKey() {
        return formKey;
    }

    void check(Context ctx) {
        secureHeaders(ctx);
        if (token == null) {
            String host = hostName(ctx.header("Host"));
            if (!LOOPBACK_NAMES.contains(host)) {
                throw new Refused(HttpStatus.FORBIDDEN, "this station answers only to localhost addresses");
            }
        } else {
            String offered = ctx.queryParam("token");
            if (offered != null && same(offered, token)) {
                ctx.cookie(new Cookie(COOKIE, token, "/", -1, false, true, null, SameSite.STRICT));
                if (ctx.method().name().equals("GET")) {
                    ctx.redirect(ctx.path(), HttpStatus.SEE_OTHER); // the token leaves the address bar and history
                    ctx.skipRemainingHandlers();
                    return;
                }
            } else if (!same(ctx.cookie(COOKIE), token) && !same(bearer(ctx.header("Authorization")), token)) {
                throw new Refused(HttpStatus.UNAUTHORIZED, "access token required: open the address that "
                        + "`lodestep station` printed (it ends in ?token=...)");
            }
        }
        String method = ctx.method().name();
        if (!method.equals("GET") && !method.equals("HEAD")) {
            sameSite(ctx);
        }
    }

    private void sameSite(Context ctx) {
        String site = ctx.header("Sec-Fetch-Site");
        if (site != null && !site.equals("same-origin") && !site.equals("none")) {
            throw new Refused(HttpStatus.FORBIDDEN, "refused a request sent from another site (" + site + ")");
        }
        String origin = ctx.header("Origin");
        if (origin != null && !origin.equalsIgnoreCase("http://" + ctx.header("Host"))) {
            throw new Refused(HttpStatus.FORBIDDEN, "refused a request from another origin");
        }
        String key = ctx.header(FORM_KEY_HEADER);
        if (key == null) {
            key = ctx.formParam(FORM_KEY_FIELD);
        }
        if (!same(key, formKey)) {
            throw new Refused(HttpStatus.FORBIDDEN, "refused a request without the station's form key; reload the page");
        }
    }

    private static void secureHeaders(Context ctx) {
        ctx.header("Content-Security-Policy", "default-src 'self'; img-src 'self' data:; style-src 'self' "
                + "'unsafe-inline'; script-src 'self'; object-src 'none'; frame-ancestors 'self'; form-action 'self'; "
                + "base-uri 'none'");
        ctx.header("X-Content-Type-Options", "nosniff");
        ctx.header("Referrer-Policy", "same-origin"); // "no-referrer" would make the browser send Origin: null
        ctx.header("X-Frame-Options", "SAMEORIGIN");
        ctx.header("Cache-Control", "no-store");
    }

    private static String hostName(String hostHeader) {
        if (hostHeader == null) {
            return "";
        }
        String h = hostHeader.toLowerCase(Locale.ROOT);
        if (h.startsWith("[")) {
            int end = h.indexOf(']');
            return end < 0 ? h : h.substring(0, end + 1);
        }
        int colon = h.indexOf(':');
        return colon < 0 ? h : h.substring(0, colon);
    }

    private static String bearer(String header) {
        return header != null && header.startsWith("Bearer ") ? header.substring(7).trim() : null;
    }

    /** Constant-time comparison, so response time does not tell how much of a guess was right. */
    static boolean same(String a, String b) {
        return a != null && b != null
                && MessageDigest.isEqual(a.getBytes(StandardCharsets.UTF_8), b.getBytes(StandardCharsets.UTF_8));
    }

    /** A request the station refuses, with the status and a one-line reason. */
    static final class Refused extends RuntimeException {
        final HttpStatus status;

        Refused(HttpStatus status, String message) {
            super(message);
            this.status = status;
        }
    }
}
