package org.lodestep.report.html;

/**
 * Escapes text for HTML/XML content and attribute values: the one place user strings become markup.
 *
 * <p>Besides the five markup characters, characters that XML 1.0 forbids (C0 controls other than tab, line feed and
 * carriage return; unpaired surrogates; U+FFFE, U+FFFF) become U+FFFD, so a hostile serial number cannot make a
 * report unreadable to an XML parser.
 * Public so the bench station's pages escape exactly as the reports do.
 */
public final class Html {
    private Html() {
    }

    /** Escaped text, safe in element content and in single- or double-quoted attributes. */
    public static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> {
                    if (Character.isHighSurrogate(c) && i + 1 < text.length()
                            && Character.isLowSurrogate(text.charAt(i + 1))) {
                        sb.append(c).append(text.charAt(++i));
                    } else if (!allowed(c)) {
                        sb.append('\uFFFD');
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.toString();
    }

    /** The text with XML-forbidden characters replaced but markup characters kept, for APIs that escape by themselves. */
    static String clean(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isHighSurrogate(c) && i + 1 < text.length() && Character.isLowSurrogate(text.charAt(i + 1))) {
                sb.append(c).append(text.charAt(++i));
            } else {
                sb.append(allowed(c) ? c : '\uFFFD');
            }
        }
        return sb.toString();
    }

    private static boolean allowed(char c) {
        if (c == '\t' || c == '\n' || c == '\r') {
            return true;
        }
        if (c < 0x20 || c == 0xFFFE || c == 0xFFFF) {
            return false;
        }
        return !Character.isSurrogate(c);
    }
}
