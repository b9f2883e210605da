package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;

/** Reading fixtures under {@code src/test/resources/org/lodestep/capture/resistance} (see the README there). */
class ResistanceCsvReaderTest {

    static Path fixture(String name) {
        try {
            return Path.of(ResistanceCsvReaderTest.class.getResource("resistance/" + name).toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    private static double ohm(ResistanceReadings r, String a, String b) {
        LeadPairReading probe = new LeadPairReading(a, b, 0, 0);
        return r.readings().stream().filter(p -> p.samePair(probe)).findFirst().orElseThrow().resistanceOhm();
    }

    private static boolean has(ResistanceReadings r, String a, String b) {
        LeadPairReading probe = new LeadPairReading(a, b, 0, 0);
        return r.readings().stream().anyMatch(p -> p.samePair(probe));
    }

    @Test
    void readsMinimalPairList() throws Exception {
        ResistanceReadings r = ResistanceCsvReader.read(fixture("good/pairs-comma.csv"));
        assertEquals(List.of("red", "blue", "green"), r.leads());
        assertEquals(2.4, ohm(r, "red", "blue"));
        assertTrue(Double.isInfinite(ohm(r, "green", "red")));
        assertEquals(2, r.readings().get(0).line());
    }

    @Test
    void readsBomMetadataSemicolonDecimalCommaKiloohmAndEveryOpenSpelling() throws Exception {
        ResistanceReadings r = ResistanceCsvReader.read(fixture("good/pairs-semicolon-kohm-bom.csv"));
        assertEquals("KL-90", r.motor());
        assertEquals(24.5, r.temperatureC().getAsDouble());
        assertEquals(List.of("Kestrel Lane bench note"), r.notes());
        // 0,0024 kΩ = 2.4 Ω
        assertEquals(2.4, ohm(r, "red", "blue"), 1e-12);
        for (String[] p : new String[][] {{"red", "green"}, {"red", "black"}, {"green", "black"}, {"blue", "green"}}) {
            assertTrue(Double.isInfinite(ohm(r, p[0], p[1])), p[0] + "-" + p[1]);
        }
        assertFalse(has(r, "blue", "black"), "'-' means not measured");
        assertTrue(r.leads().contains("black"));
    }

    @Test
    void readsTabsAndMilliohmsInBrackets() throws Exception {
        ResistanceReadings r = ResistanceCsvReader.read(fixture("good/pairs-tab-milliohm.tsv"));
        assertEquals(2.4, ohm(r, "1", "2"), 1e-12);
        assertEquals(2.45, ohm(r, "3", "4"), 1e-12);
    }

    @Test
    void readsFullMatrixWithUnitInCorner() throws Exception {
        ResistanceReadings r = ResistanceCsvReader.read(fixture("good/matrix-kohm-full.csv"));
        assertEquals(List.of("a", "b", "c"), r.leads());
        assertEquals(3, r.readings().size());
        assertEquals(2.4, ohm(r, "a", "c"), 1e-12);
    }

    @Test
    void readsUpperTriangleWithEmptyLowerAsNotGiven() throws Exception {
        ResistanceReadings r = ResistanceCsvReader.read(fixture("good/matrix-upper.csv"));
        assertEquals(1.2, ohm(r, "b", "a"));
        assertEquals(1.2, ohm(r, "c", "b"));
        assertEquals(2.4, ohm(r, "a", "c"));
    }

    @Test
    void averagesMirrorCellsWithinTolerance() throws Exception {
        ResistanceReadings r = ResistanceCsvReader.read(fixture("good/matrix-near-symmetric.csv"));
        assertEquals(1.225, ohm(r, "a", "b"), 1e-12);
        assertTrue(Double.isInfinite(ohm(r, "b", "c")));
    }

    @Test
    void titleWordInMatrixCornerMeansOhms() throws Exception {
        ResistanceReadings r = ResistanceCsvReader.read(fixture("good/matrix-title-corner.csv"));
        assertEquals(1.2, ohm(r, "a", "b"));
    }

    private static InputFormatException bad(String name) {
        return assertThrows(InputFormatException.class, () -> ResistanceCsvReader.read(fixture("bad/" + name)));
    }

    @Test
    void wrongHeaderNamesLineOneAndTheExpectedHeader() {
        InputFormatException e = bad("wrong-header.csv");
        assertEquals(1, e.line());
        assertTrue(e.expected().contains("lead_a,lead_b,resistance_ohm"), e.getMessage());
        assertTrue(e.getMessage().startsWith(fixture("bad/wrong-header.csv").toString()), e.getMessage());
    }

    @Test
    void textInNumberColumnNamesLineColumnAndText() {
        InputFormatException e = bad("text-in-number.csv");
        assertEquals(3, e.line());
        assertEquals("resistance_ohm", e.column());
        assertEquals("two", e.text());
    }

    @Test
    void pairListedTwiceWithDifferentValuesNamesBothLines() {
        InputFormatException e = bad("pair-twice.csv");
        assertEquals(4, e.line());
        assertTrue(e.expected().contains("line 2"), e.getMessage());
    }

    @Test
    void leadPairedWithItselfIsRejected() {
        InputFormatException e = bad("self-pair.csv");
        assertEquals(3, e.line());
        assertTrue(e.expected().contains("itself"));
    }

    @Test
    void emptyAndCommentOnlyFilesAreRejected() {
        assertTrue(bad("empty.csv").expected().contains("no data"));
        assertTrue(bad("only-comments.csv").expected().contains("no data"));
    }

    @Test
    void asymmetricMatrixNamesTheMirrorCell() {
        InputFormatException e = bad("matrix-asymmetric.csv");
        assertEquals(3, e.line());
        assertTrue(e.expected().contains("symmetric"), e.getMessage());
    }

    @Test
    void otherMalformedInputsNameTheirLine() {
        assertEquals(3, bad("matrix-short.csv").line());
        assertTrue(bad("negative.csv").expected().contains("negative"));
        assertEquals(2, bad("extra-field.csv").line());
        assertTrue(bad("no-unit.csv").expected().contains("unit"));
        assertEquals(1, bad("bad-temperature.csv").line());
        assertTrue(bad("utf16.csv").expected().contains("UTF-8"));
        assertEquals(1, bad("matrix-bad-unit.csv").line());
    }

    @Test
    void everyMessageIsOneLine() {
        for (String f : List.of("wrong-header.csv", "text-in-number.csv", "pair-twice.csv", "self-pair.csv",
                "empty.csv", "matrix-asymmetric.csv", "matrix-short.csv", "negative.csv", "extra-field.csv",
                "no-unit.csv", "bad-temperature.csv", "utf16.csv", "only-comments.csv")) {
            String m = bad(f).getMessage();
            assertFalse(m.contains("\n"), f + ": " + m);
            assertTrue(m.contains(f), f + ": " + m);
        }
    }
}
