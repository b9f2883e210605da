package org.lodestep.report.html;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;


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
    private final String html;

    private HtmlReport(String html) {
        this.html = html;
    }

    /** Starts a report; {@code kind} names the analysis (small heading), {@code title} the subject. */
    public static Builder builder(String kind, String title) {
        return new Builder(kind, title);
    }

    /** The whole document. */
    public String html() {
        return html;
    }

    /** Writes the report as UTF-8, whole or not at all (temporary file in the same folder, then an atomic move). */
    public void write(Path file) throws IOException {
        OutputFile.write(file, html.getBytes(StandardCharsets.UTF_8));
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
            Objects.requireNonNull(status, "status");
            body.append("<section class=\"verdict ").append(status.cssClass()).append("\" role=\"status\">")
                    .append("<span class=\"mark\" aria-hidden=\"true\">").append(status.symbol()).append("</span>")
                    .append("<div class=\"text\"><span class=\"word ").append(status.cssClass()).append("\">")
                    .append(Html.escape(status.word())).append("</span><strong>").append(Html.escape(headline))
                    .append("</strong>");
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
        public Builder safety(SafetyNote... notes) {
            for (SafetyNote n : notes) {
                body.append("<aside class=\"safety\"><h3>").append(Html.escape(n.title())).append("</h3><p>")
                        .append(Html.escape(n.text())).append("</p></aside>\n");
            }
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
            StringBuilder sb = new StringBuilder(body.length() + HtmlStyle.CSS.length() + 2048);
            sb.append("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n")
                    .append("<meta charset=\"utf-8\"/>\n")
                    .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n")
                    .append("<meta name=\"generator\" content=\"Lodestep\"/>\n")
                    .append("<title>").append(Html.escape(kind + ": " + title)).append("</title>\n")
                    .append("<style>\n").append(HtmlStyle.CSS).append("</style>\n</head>\n<body>\n")
                    .append("<main class=\"report\">\n<header class=\"head\"><p class=\"kind\">")
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
            sb.append("</header>\n").append(body)
                    .append("<footer>").append(Html.escape(footer)).append("</footer>\n</main>\n</body>\n</html>\n");
            return new HtmlReport(sb.toString());
        }
    }
}
