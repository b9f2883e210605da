package org.lodestep.report.html;

import java.util.Objects;

/**
 * One well-formed {@code <svg>} element made by this package (a chart or a wiring diagram), ready to inline in a
 * report. Only this package can create one, so no caller can slip unescaped markup into a document.
 */
public final class SvgFragment {
    private final String markup;
    private final String description;

    SvgFragment(String markup, String description) {
        this.markup = Objects.requireNonNull(markup, "markup");
        if (!markup.startsWith("<svg")) {
            throw new IllegalArgumentException("an SVG fragment must start with <svg");
        }
        this.description = Html.clean(description);
    }

    /** The {@code <svg>} element text. */
    public String markup() {
        return markup;
    }

    /** A one-sentence text alternative, for readers who cannot see the drawing. */
    public String description() {
        return description;
    }

    /** A standalone SVG file's text (XML declaration plus the element), for writing {@code .svg} files. */
    public String asDocument() {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + markup + "\n";
    }
}
