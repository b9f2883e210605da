package org.lodestep.report.html;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import org.lodestep.safety.Hazard;


/**
 * One self-contained HTML report: inline CSS and SVG, no scripts, no network. The markup is XHTML-compatible (it
 * parses as XML), so tests and other tools can read it with any XML parser.
 *
 * <p>Build with {@link #builder}; every string given to the builder is escaped when rendered.
 *
 * <pre>{@code
 * HtmlReport r = HtmlReport.builder("Lead identification", "Motor SN 4471")
 *         .meta("Source", "leads.csv")
 *         .verdict(Status.PASS, "Bipolar 6-lead motor", "Two windings with centre taps.")
 *         .section("Wiring").figure(diagram, "Series connection")
 *         .build();
 * r.write(Path.of("report.html"));
 * }</pre>
 */
public final class HtmlReport {
    private final String head;
    private final String header;
    private final String body;
    private final String footer;
    private final String pageCss;

    private HtmlReport(String head, String header, String body, String footer, String pageCss) {
        this.head = head;
        this.header = header;
        this.body = body;
        this.footer = footer;
        this.pageCss = pageCss;
    }

    /** Starts a report; {@code kind} names the analysis (small heading), {@code title} the subject. */
    public static Builder builder(String kind, String title) {
        return new Builder(kind, title);
    }

    /** The whole document. */
    public String html() {
        StringBuilder sb = new StringBuilder(head.length() + header.length() + body.length() + HtmlStyle.CSS.length()
                + 512);
        sb.append(head).append("<style>\n").append(HtmlStyle.CSS).append(pageCss).append("</style>\n</head>\n<body>\n")
                .append("<main class=\"report\">\n").append(header).append(body)
                .append("<footer>").append(footer).append("</footer>\n</main>\n</body>\n</html>\n");
        return sb.toString();
    }

    /**
     * This report stamped with what produced it: a line under the title (report ID, run time, tool), a closing
     * "Provenance" section (labelled facts, then the input files with their SHA-256), the report ID in the footer,
     * and in print the report ID and "page N of M" in the bottom margin of every page (CSS Paged Media page-margin
     * boxes and the page counters, references §24).
     *
     * @param reportId    the run's report ID
     * @param summaryLine the line under the title
     * @param facts       labelled facts (tool, command, time, rig), in order
     * @param files       one row per input file: role, path, size, SHA-256 (hex)
     */
    public HtmlReport stamped(String reportId, String summaryLine, Map<String, String> facts, List<String[]> files) {
        StringBuilder h = new StringBuilder(header);
        int end = h.lastIndexOf("</header>");
        h.insert(end, "<p class=\"provenance-line\">" + Html.escape(summaryLine)
                + " <a href=\"#provenance\">Provenance</a></p>");
        StringBuilder b = new StringBuilder(body);
        b.append("<section class=\"provenance\" id=\"provenance\"><h2>Provenance</h2><dl class=\"facts prov\">");
        for (Map.Entry<String, String> e : facts.entrySet()) {
            b.append("<div><dt>").append(Html.escape(e.getKey())).append("</dt><dd class=\"token\">")
                    .append(Html.escape(e.getValue())).append("</dd></div>");
        }
        b.append("</dl>\n");
        if (!files.isEmpty()) {
            b.append("<div class=\"table-wrap\"><table class=\"files\"><caption>Input files</caption><thead><tr>")
                    .append("<th scope=\"col\">Role</th><th scope=\"col\">File</th><th scope=\"col\" class=\"num\">")
                    .append("Bytes</th><th scope=\"col\">SHA-256</th></tr></thead><tbody>");
            for (String[] f : files) {
                b.append("<tr><td>").append(Html.escape(f[0])).append("</td><td class=\"token\">")
                        .append(Html.escape(f[1])).append("</td><td class=\"num\">").append(Html.escape(f[2]))
                        .append("</td><td class=\"token\">").append(Html.escape(f[3])).append("</td></tr>");
            }
            b.append("</tbody></table></div>\n");
        }
        b.append("</section>\n");
        String css = "@page{@bottom-left{content:\"Lodestep report " + cssString(reportId)
                + "\";font-size:8pt;color:#5b6673}@bottom-right{content:\"page \" counter(page) \" of \" counter(pages);"
                + "font-size:8pt;color:#5b6673}}\n";
        return new HtmlReport(head, h.toString(), b.toString(), Html.escape("Report " + reportId + ". " + summaryLine),
                css);
    }

    /** A CSS string body: only hex digits and letters survive, so nothing can close the string. */
    private static String cssString(String s) {
        return s.replaceAll("[^A-Za-z0-9 ._:-]", "");
    }

    /** Writes the report as UTF-8, whole or not at all (temporary file in the same folder, then an atomic move). */
    public void write(Path file) throws IOException {
        OutputFile.write(file, html().getBytes(StandardCharsets.UTF_8));
    }

    /** One line of a findings list: a status and a sentence. */
    public record Finding(Status status, String text) {
        public Finding {
            Objects.requireNonNull(status, "status");
            Objects.requireNonNull(text, "text");
        }
    }

    /** Collects the parts of a report in reading order. */
    public static final class Builder {
        private final String kind;
        private final String title;
        private String subtitle;
        private final List<String[]> meta = new ArrayList<>();
        private final StringBuilder body = new StringBuilder();
        private boolean sectionOpen;
        private String footer = "Made with Lodestep.";
        private int figures;

        private Builder(String kind, String title) {
            this.kind = Objects.requireNonNull(kind, "kind");
            this.title = Objects.requireNonNull(title, "title");
        }

        /** A line under the title. */
        public Builder subtitle(String text) {
            this.subtitle = text;
            return this;
        }

        /** A labelled fact in the header: serial number, operator, source file, date. */
        public Builder meta(String label, String value) {
            meta.add(new String[] {Objects.requireNonNull(label, "label"), value == null ? "\u2014" : value});
            return this;
        }

        /** The one-glance result: a banner with symbol, status word, headline and an optional detail sentence. */
        public Builder verdict(Status status, String headline, String detail) {
            return verdict(status, headline, null, detail);
        }

        /**
         * The one-glance result with the answer a person acts on (the wiring in one line, the rates to avoid) in
         * its own line under the headline; {@code answer} and {@code detail} may be null.
         */
        public Builder verdict(Status status, String headline, String answer, String detail) {
            Objects.requireNonNull(status, "status");
            body.append("<section class=\"verdict ").append(status.cssClass()).append("\" role=\"status\">")
                    .append("<span class=\"mark\" aria-hidden=\"true\">").append(status.symbol()).append("</span>")
                    .append("<div class=\"text\"><span class=\"word ").append(status.cssClass()).append("\">")
                    .append(Html.escape(status.word())).append("</span><strong>").append(Html.escape(headline))
                    .append("</strong>");
            if (answer != null && !answer.isBlank()) {
                body.append("<p class=\"answer\">").append(Html.escape(answer)).append("</p>");
            }
            if (detail != null && !detail.isBlank()) {
                body.append("<p>").append(Html.escape(detail)).append("</p>");
            }
            body.append("</div></section>\n");
            return this;
        }

        /** Starts a new section with a heading; the blocks that follow belong to it. */
        public Builder section(String heading) {
            closeSection();
            body.append("<section><h2>").append(Html.escape(heading)).append("</h2>\n");
            sectionOpen = true;
            return this;
        }

        /** A paragraph of plain text. */
        public Builder paragraph(String text) {
            body.append("<p>").append(Html.escape(text)).append("</p>\n");
            return this;
        }

        /** A list of findings, each with its status symbol and word. */
        public Builder findings(List<Finding> findings) {
            body.append("<ul class=\"findings\">");
            for (Finding f : findings) {
                body.append("<li class=\"").append(f.status().cssClass()).append("\">")
                        .append("<span class=\"mark\" aria-hidden=\"true\">").append(f.status().symbol())
                        .append("</span><span class=\"word\">").append(Html.escape(f.status().word()))
                        .append("</span><span class=\"text\">").append(Html.escape(f.text())).append("</span></li>");
            }
            body.append("</ul>\n");
            return this;
        }

        /** Labelled values in a compact grid (the motor card); the map's iteration order is kept. */
        public Builder facts(Map<String, String> labelledValues) {
            body.append("<dl class=\"facts\">");
            for (Map.Entry<String, String> e : labelledValues.entrySet()) {
                body.append("<div><dt>").append(Html.escape(e.getKey())).append("</dt><dd>")
                        .append(Html.escape(e.getValue())).append("</dd></div>");
            }
            body.append("</dl>\n");
            return this;
        }

        /** A table. */
        public Builder table(HtmlTable table) {
            table.render(body);
            return this;
        }

        /** A drawing with a caption; its description becomes the drawing's text alternative. */
        public Builder figure(SvgFragment svg, String caption) {
            figures++;
            String id = "fig" + figures;
            body.append("<figure id=\"").append(id).append("\" role=\"img\" aria-label=\"")
                    .append(Html.escape(svg.description())).append("\">")
                    .append(svg.markup())
                    .append("<figcaption><strong>Figure ").append(figures).append(".</strong> ")
                    .append(Html.escape(caption)).append("</figcaption></figure>\n");
            return this;
        }

        /** Safety notes, each in a bordered box with a warning sign. */
        public Builder safety(Hazard... notes) {
            // one group, so that print can set the notes side by side and leave page 1 to the answer
            body.append("<div class=\"safety-notes\">");
            for (Hazard n : notes) {
                body.append("<aside class=\"safety\"><h3>").append(Html.escape(n.title())).append("</h3><p>")
                        .append(Html.escape(n.text())).append("</p></aside>\n");
            }
            body.append("</div>\n");
            return this;
        }

        /**
         * Opens a collapsed block (HTML {@code details}) whose one-line {@code summary} is always shown; the blocks
         * that follow, up to {@link #endCollapsed}, open on a click (and in print stay as the browser prints them).
         */
        public Builder collapsed(String summary) {
            return collapsed(summary, false);
        }

        /** A block like {@link #collapsed(String)} that starts open when {@code open}. */
        public Builder collapsed(String summary, boolean open) {
            body.append(open ? "<details open=\"open\"><summary>" : "<details><summary>").append(Html.escape(summary))
                    .append("</summary>\n");
            return this;
        }

        /** Closes the block {@link #collapsed} opened. */
        public Builder endCollapsed() {
            body.append("</details>\n");
            return this;
        }

        /** The footer line (tool version, generation time); replaces the default. */
        public Builder footer(String text) {
            this.footer = Objects.requireNonNull(text, "text");
            return this;
        }

        private void closeSection() {
            if (sectionOpen) {
                body.append("</section>\n");
                sectionOpen = false;
            }
        }

        public HtmlReport build() {
            closeSection();
            String head = "<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n"
                    + "<meta charset=\"utf-8\"/>\n"
                    + "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n"
                    + "<meta name=\"generator\" content=\"Lodestep\"/>\n"
                    + "<title>" + Html.escape(kind + ": " + title) + "</title>\n";
            StringBuilder sb = new StringBuilder(1024);
            sb.append("<header class=\"head\"><p class=\"kind\">")
                    .append(Html.escape(kind)).append("</p><h1>").append(Html.escape(title)).append("</h1>");
            if (subtitle != null) {
                sb.append("<p class=\"subtitle\">").append(Html.escape(subtitle)).append("</p>");
            }
            if (!meta.isEmpty()) {
                sb.append("<dl class=\"meta\">");
                for (String[] m : meta) {
                    sb.append("<div><dt>").append(Html.escape(m[0])).append("</dt><dd>").append(Html.escape(m[1]))
                            .append("</dd></div>");
                }
                sb.append("</dl>");
            }
            sb.append("</header>\n");
            return new HtmlReport(head, sb.toString(), body.toString(), Html.escape(footer), "");
        }
    }
}
