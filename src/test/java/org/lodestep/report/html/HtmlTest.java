package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;

class HtmlTest {

    @Test
    void escapesTheFiveMarkupCharacters() {
        // XML 1.0 (Fifth Edition), section 2.4: & and < must be escaped in content; quotes in attribute values.
        assertEquals("&lt;b&gt; &amp; &quot;x&quot; &#39;y&#39;", Html.escape("<b> & \"x\" 'y'"));
    }

    @Test
    void replacesCharactersXmlForbidsWithReplacementCharacter() {
        // XML 1.0, section 2.2 (Char production): U+0000-U+0008, U+000B, U+000C, U+000E-U+001F, U+FFFE, U+FFFF
        // and lone surrogates are not characters of a document.
        assertEquals("a\uFFFDb\uFFFDc\uFFFD\tok\n", Html.escape("a\u0000b\u001Fc\uFFFE\tok\n"));
        assertEquals("\uFFFDx", Html.escape("\uD800x"));
    }

    @Test
    void keepsPairedSurrogatesAndNonAsciiText() {
        String s = "\u03A9 \u00B0C \uD83D\uDD27 \u2212";
        assertEquals(s, Html.escape(s));
    }

    @Test
    void escapedHostileTextRoundTripsThroughAnXmlParser() throws Exception {
        String hostile = "</p><script>x()</script>&amp;\"'";
        Document d = XmlCheck.parse("<p a=\"" + Html.escape(hostile) + "\">" + Html.escape(hostile) + "</p>");
        assertEquals(hostile, d.getDocumentElement().getTextContent());
        assertEquals(hostile, d.getDocumentElement().getAttribute("a"));
    }

    @Test
    void cleanKeepsMarkupCharactersForApisThatEscapeThemselves() {
        assertEquals("<a&b>\uFFFD", Html.clean("<a&b>\u0007"));
        assertEquals("", Html.clean(null));
    }
}
