package org.lodestep.qa;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Keeps database passwords off command lines and out of messages: a store URL that carries a password anywhere is
 * refused, and every URL in a message is shown with its secrets masked.
 *
 * <p>A password can hide in a URL's user-info ({@code //user:secret@host}), in any query parameter whose name
 * spells a password ({@code password}, {@code PASSWORD}, {@code sslpassword}, {@code passwd}, {@code pwd},
 * percent-encoded or not), and behind any separator a driver accepts ({@code ?}, {@code &}, {@code ;}).
 */
public final class DatabaseUrls {
    /** Parameter names that carry a secret, after percent-decoding and lower-casing. */
    private static final Pattern SECRET_KEY = Pattern.compile("(?:password|passwd|pwd|secret)\\s*=");
    /** A URL in free text: a JDBC URL or a bare PostgreSQL connection URI. */
    private static final Pattern URL = Pattern.compile(
            "(?i)(?:jdbc:[a-z0-9]+:|postgres(?:ql)?://)[^\\s'\"<>]*[^\\s'\"<>:.,;)]");
    /** The password of a user-info part: {@code //user:secret@}. */
    private static final Pattern USER_INFO = Pattern.compile("//([^/?#@:]*):([^/?#@]*)@");
    /** A secret parameter value, up to the next separator. */
    private static final Pattern SECRET_VALUE = Pattern.compile(
            "(?i)([?&;][a-z0-9_]*?(?:password|passwd|pwd|secret)[a-z0-9_]*\\s*=)[^&;#\\s]*");

    private DatabaseUrls() {
    }

    /**
     * Refuses a location that carries a password.
     *
     * @throws IllegalArgumentException naming where the password sits, never repeating it
     */
    public static void refusePassword(String location) {
        if (location == null) {
            return;
        }
        String decoded = percentDecode(location);
        Matcher ui = USER_INFO.matcher(decoded);
        if (ui.find()) {
            throw new IllegalArgumentException("the database URL carries a password in its user part (user:...@); "
                    + advice());
        }
        int q = firstSeparator(decoded);
        if (q >= 0 && SECRET_KEY.matcher(decoded.substring(q).toLowerCase(Locale.ROOT)).find()) {
            throw new IllegalArgumentException("the database URL carries a password parameter; " + advice());
        }
    }

    private static String advice() {
        return "put it in LODESTEP_DB_PASSWORD (or PGPASSWORD, or ~/.pgpass) instead, so it never shows on a "
                + "command line";
    }

    /** The text with every URL's password (user-info or parameter) replaced by {@code ***}. */
    public static String redact(String text) {
        if (text == null || text.isEmpty()) {
            return text;
        }
        Matcher m = URL.matcher(text);
        StringBuilder b = new StringBuilder();
        while (m.find()) {
            m.appendReplacement(b, Matcher.quoteReplacement(redactUrl(m.group())));
        }
        m.appendTail(b);
        return b.toString();
    }

    private static String redactUrl(String url) {
        // decoded first, so no percent-encoded spelling slips past the patterns
        String u = USER_INFO.matcher(percentDecode(url)).replaceAll("//$1:***@");
        return SECRET_VALUE.matcher(u).replaceAll("$1***");
    }

    private static int firstSeparator(String s) {
        int best = -1;
        for (char c : new char[] {'?', ';', '&'}) {
            int i = s.indexOf(c);
            if (i >= 0 && (best < 0 || i < best)) {
                best = i;
            }
        }
        return best;
    }

    /** Decodes %XX escapes leniently (a malformed escape stays as written). */
    static String percentDecode(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '%' && i + 2 < s.length() && hex(s.charAt(i + 1)) >= 0 && hex(s.charAt(i + 2)) >= 0) {
                b.append((char) (hex(s.charAt(i + 1)) * 16 + hex(s.charAt(i + 2))));
                i += 2;
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }

    private static int hex(char c) {
        return Character.digit(c, 16);
    }
}
