package org.lodestep.station;

import java.util.List;

import org.lodestep.report.html.Html;
import org.lodestep.report.html.Status;

/**
 * The frame every page shares: the navigation, the station's stylesheet and script, the form key. Every user string
 * goes through {@link #esc} (the reports' own escaping).
 */
final class Layout {
    private Layout() {
    }

    /** A navigation entry. */
    private record Nav(String path, String label) {
    }

    private static final List<Nav> NAV = List.of(new Nav("/leads", "Leads"), new Nav("/motor", "Motor"), new Nav("/qa", "QA station"), new Nav("/records", "Records"),
            new Nav("/sweep", "Sweep"));

    static String esc(String s) {
        return Html.escape(s);
    }

    /** A status symbol, shown beside its word so the status reads without colour. */
    static String symbol(Status s) {
        return "<span class=\"sym\" aria-hidden=\"true\">" + s.symbol() + "</span>";
    }

    /** The verdict box's style for a status: pass, fail, or incomplete for everything between. */
    static String verdictClass(Status s) {
        return s == Status.PASS ? "pass" : s == Status.FAIL ? "fail" : "incomplete";
    }

    /** A layout's name under its verdict, with the word "provisional" where the wiring is a guess. */
    static String layoutLabel(Status s, String layout) {
        return esc((s == Status.PROVISIONAL ? s.word() + ": " : "") + layout);
    }

    /**
     * A whole page.
     *
     * @param title   the page's title
     * @param active  path of the navigation entry to mark current
     * @param main    the page's content (already escaped markup)
     * @param formKey the form key to embed, or null on pages without forms
     */
    static String page(String title, String active, String main, String formKey) {
        StringBuilder sb = new StringBuilder(main.length() + 2048);
        sb.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        if (formKey != null) {
            sb.append("<meta name=\"lodestep-form\" content=\"").append(esc(formKey)).append("\">\n");
        }
        sb.append("<title>").append(esc(title)).append(" \u2013 Lodestep bench station</title>\n")
                .append("<link rel=\"stylesheet\" href=\"/assets/station.css\">\n")
                .append("<script src=\"/assets/station.js\" defer></script>\n</head>\n<body>\n")
                .append("<a class=\"skip\" href=\"#main\">Skip to content</a>\n")
                .append("<header class=\"bar\"><span class=\"brand\">Lodestep bench station</span>")
                .append("<nav aria-label=\"Pages\"><ul>");
        for (Nav n : NAV) {
            boolean current = n.path().equals(active);
            sb.append("<li><a href=\"").append(n.path()).append('"').append(current ? " aria-current=\"page\"" : "")
                    .append('>').append(esc(n.label())).append("</a></li>");
        }
        sb.append("</ul></nav></header>\n<main id=\"main\" tabindex=\"-1\">\n").append(main)
                .append("\n</main>\n</body>\n</html>\n");
        return sb.toString();
    }

    /** The hidden form-key field for a form that posts. */
    static String formKeyField(String formKey) {
        return "<input type=\"hidden\" name=\"" + Access.FORM_KEY_FIELD + "\" value=\"" + esc(formKey) + "\">";
    }

    /** A caution box: heading and sentences. */
    static String caution(String heading, List<String> sentences) {
        StringBuilder sb = new StringBuilder("<aside class=\"caution\" role=\"note\"><h2><span aria-hidden=\"true\">")
                .append(Status.WARN.symbol()).append("</span> ").append(esc(heading)).append("</h2>");
        for (String s : sentences) {
            sb.append("<p>").append(esc(s)).append("</p>");
        }
        return sb.append("</aside>").toString();
    }

    /** The live-progress area a task's events fill in. */
    static String progressArea(String id) {
        return "<div id=\"" + id + "\" class=\"progress\" role=\"status\" aria-live=\"polite\" hidden>"
                + "<progress max=\"1\"></progress> <span class=\"progress-text\"></span></div>";
    }
}
