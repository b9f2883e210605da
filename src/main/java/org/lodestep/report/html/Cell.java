package org.lodestep.report.html;

import java.util.Objects;

/**
 * One table cell: text (escaped when rendered), how to align it, and an optional status shown as symbol, word and
 * colour.
 *
 * @param text    what the cell says; numbers arrive formatted by the caller, with their unit in the column heading
 * @param numeric right-aligned with tabular figures
 * @param status  a status mark before the text, or null
 */
public record Cell(String text, boolean numeric, Status status) {
    public Cell {
        Objects.requireNonNull(text, "text");
    }

    /** A plain text cell. */
    public static Cell text(String text) {
        return new Cell(text, false, null);
    }

    /** A right-aligned number, already formatted. */
    public static Cell number(String formatted) {
        return new Cell(formatted, true, null);
    }

    /** A status mark followed by the status word. */
    public static Cell status(Status status) {
        return new Cell(status.word(), false, Objects.requireNonNull(status, "status"));
    }

    /** A status mark followed by text of the caller's. */
    public static Cell status(Status status, String text) {
        return new Cell(text, false, Objects.requireNonNull(status, "status"));
    }

    void render(StringBuilder sb, String tag) {
        render(sb, tag, null);
    }

    /** Renders the cell; {@code label} (its column heading, or null) is shown before the value when rows stack. */
    void render(StringBuilder sb, String tag, String label) {
        sb.append('<').append(tag);
        if (label != null) {
            sb.append(" data-label=\"").append(Html.escape(label)).append('"');
        }
        StringBuilder cls = new StringBuilder();
        if (numeric) {
            cls.append("num");
        }
        if (status != null) {
            cls.append(cls.length() > 0 ? " " : "").append("st ").append(status.cssClass());
        }
        if (cls.length() > 0) {
            sb.append(" class=\"").append(cls).append('"');
        }
        sb.append('>');
        if (status != null) {
            sb.append("<span class=\"mark\" aria-hidden=\"true\">").append(status.symbol()).append("</span> ");
        }
        sb.append(Html.escape(text)).append("</").append(tag).append('>');
    }
}
