package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.qa.Histogram;
import org.lodestep.qa.Parameters;
import org.lodestep.qa.Verdict;

class QaFormatTest {

    @Test
    void controlCharactersBecomeVisibleEscapes() {
        assertEquals("a\\x1B[2Jb\\r\\n\\x07\\x202E", QaFormat.visible("a\u001b[2Jb\r\n\u0007\u202e"));
        assertEquals("O'Brien \"x\" ; DROP", QaFormat.visible("O'Brien \"x\" ; DROP"));
    }

    @Test
    void displayUnitsScaleFromSi() {
        assertEquals("2.8", QaFormat.value(Parameters.PHASE_INDUCTANCE, 2.8e-3));
        assertEquals("150", QaFormat.value(Parameters.INSULATION_RESISTANCE, 150e6));
        assertEquals("-", QaFormat.value(Parameters.PHASE_RESISTANCE, Double.NaN));
    }

    @Test
    void bannerFramesEachVerdictDifferently() {
        List<String> pass = QaBanner.lines(Verdict.PASS, "serial X");
        List<String> fail = QaBanner.lines(Verdict.FAIL, "serial X");
        assertTrue(pass.get(0).matches("=+"));
        assertTrue(fail.get(0).matches("X+"));
        assertEquals(8, pass.size());
        assertTrue(pass.stream().allMatch(l -> l.length() == pass.get(0).length()), String.join("\n", pass));
    }

    @Test
    void histogramMarksLimitsAndDrawsOneHashPerValue() {
        String h = QaText.histogram(Parameters.PHASE_RESISTANCE,
                List.of(new Histogram.Bin(1.7, 1.9, 2, 0), new Histogram.Bin(1.9, 2.1, 5, 0)), 1.71, 2.09);
        assertTrue(h.contains("|2    ## <LSL"), h);
        assertTrue(h.contains("|5    ##### <USL"), h);
        assertFalse(h.contains("######"), h);
    }

    // OWASP "CSV Injection" (references §28): prefix a text cell starting with = + - @ tab or CR with a single quote.
    @Test
    void csvNeutralisesEveryCellASpreadsheetWouldEvaluateAndKeepsPlainText() {
        assertEquals("'=1+1", QaCsv.text("=1+1"));
        assertEquals("'@SUM(A1)", QaCsv.text("@SUM(A1)"));
        assertEquals("'-cmd", QaCsv.text("-cmd"));
        assertEquals("'-2+3", QaCsv.text("-2+3"));
        assertEquals("'+2", QaCsv.text("+2"));
        assertEquals("'\tx", QaCsv.text("\tx"));
        assertEquals("'\r=1", QaCsv.text("\r=1"));
        assertEquals("KV24-00117", QaCsv.text("KV24-00117"));
        assertEquals("", QaCsv.text(""));
    }
}
