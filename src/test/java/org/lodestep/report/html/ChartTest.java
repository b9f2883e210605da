package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.lodestep.report.PixelStats;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

class ChartTest {

    @Test
    void pngDecodesAtScaledDesignSizeAndIsNotBlank() throws Exception {
        Chart c = SampleReports.responseCurve();
        // javax.imageio is the outside reader here: the bytes must be a PNG it can decode.
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(c.toPng(2)));
        assertEquals(2 * c.widthPx(), img.getWidth());
        assertEquals(2 * c.heightPx(), img.getHeight());
        assertTrue(PixelStats.of(img, 0, 0, img.getWidth(), img.getHeight()).inkFraction() > 0.02);
    }

    @Test
    void writesStandaloneSvgAndPngFiles(@TempDir Path dir) throws Exception {
        Chart c = SampleReports.histogram();
        c.writeSvg(dir.resolve("h.svg"));
        c.writePng(dir.resolve("h.png"), 1);
        Document d = XmlCheck.parse(Files.readString(dir.resolve("h.svg")));
        assertEquals(XmlCheck.SVG, d.getDocumentElement().getNamespaceURI());
        assertEquals(c.widthPx(), ImageIO.read(dir.resolve("h.png").toFile()).getWidth());
    }

    @Test
    void rejectsAbsurdPngScale() {
        Chart c = SampleReports.responseCurve();
        assertThrows(IllegalArgumentException.class, () -> c.toPng(0));
        assertThrows(IllegalArgumentException.class, () -> c.toPng(Double.NaN));
    }

    @Test
    void svgCoordinatesAreRoundedToHundredths() {
        assertEquals("1.5", Chart.twoDecimals(1.5));
        assertEquals("-0.07", Chart.twoDecimals(-0.0712));
        assertEquals("12", Chart.twoDecimals(12.001));
        assertEquals("3.14", Chart.twoDecimals(Math.PI));
        assertEquals("0.05", Chart.twoDecimals(0.049999));
    }

    @Test
    void eachSvgGetsItsOwnIdPrefix() {
        Chart c = SampleReports.responseCurve();
        String a = c.toSvg().markup();
        String b = c.toSvg().markup();
        String idA = a.substring(a.indexOf("id='") + 4, a.indexOf('\'', a.indexOf("id='") + 4));
        String idB = b.substring(b.indexOf("id='") + 4, b.indexOf('\'', b.indexOf("id='") + 4));
        assertTrue(!idA.equals(idB), idA + " vs " + idB);
    }
}
