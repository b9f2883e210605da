package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.util.Base64;
import java.util.List;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

class HeatMapChartTest {

    /** Relative luminance, WCAG 2.1 definition (sRGB linearised, 0.2126/0.7152/0.0722). */
    private static double luminance(Color c) {
        double[] ch = {c.getRed() / 255.0, c.getGreen() / 255.0, c.getBlue() / 255.0};
        for (int i = 0; i < 3; i++) {
            ch[i] = ch[i] <= 0.04045 ? ch[i] / 12.92 : Math.pow((ch[i] + 0.055) / 1.055, 2.4);
        }
        return 0.2126 * ch[0] + 0.7152 * ch[1] + 0.0722 * ch[2];
    }

    @Test
    void paletteLightnessFallsSteadilySoGreyPrintsKeepTheOrder() {
        double prev = Double.POSITIVE_INFINITY;
        for (int k = 0; k <= 100; k++) {
            double l = luminance(HeatMapChart.colorAt(k / 100.0));
            assertTrue(l < prev, "luminance must fall at t = " + k / 100.0);
            prev = l;
        }
        // WCAG 2.1 contrast ratio (L1 + 0.05) / (L2 + 0.05) between the ends: at least 7:1 (level AAA for text).
        double ratio = (luminance(HeatMapChart.colorAt(0)) + 0.05) / (luminance(HeatMapChart.colorAt(1)) + 0.05);
        assertTrue(ratio > 7, "contrast " + ratio);
    }

    @Test
    void gridBecomesOneEmbeddedImageWithOnePixelPerCell() throws Exception {
        Document d = XmlCheck.parse(SampleReports.spectrogram().toSvg().markup());
        List<Element> images = XmlCheck.elements(d, XmlCheck.SVG, "image");
        assertEquals(1, images.size());
        String href = images.get(0).getAttributeNS("http://www.w3.org/1999/xlink", "href");
        if (href.isEmpty()) {
            href = images.get(0).getAttribute("href");
        }
        assertTrue(href.startsWith("data:image/png;base64,"), "embedded, nothing loaded from outside");
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(
                Base64.getDecoder().decode(href.substring("data:image/png;base64,".length()))));
        // The sample grid: 96 step rates by 129 frequencies, both evenly spaced.
        assertEquals(96, img.getWidth());
        assertEquals(129, img.getHeight());
    }

    @Test
    void highLevelsAreDarkerAndHighFrequenciesAtTheTop() throws Exception {
        double[] x = {1, 2, 3};
        double[] y = {10, 20};
        // level rises with frequency only: the top row of the image must be the darker one.
        double[][] level = {{0, 1}, {0, 1}, {0, 1}};
        Chart c = HeatMapChart.builder("", "x", x, "y", y, "level", level).build();
        Document d = XmlCheck.parse(c.toSvg().markup());
        Element image = XmlCheck.elements(d, XmlCheck.SVG, "image").get(0);
        String href = image.getAttributeNS("http://www.w3.org/1999/xlink", "href");
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(
                Base64.getDecoder().decode(href.substring(href.indexOf(',') + 1))));
        assertTrue(luminance(new Color(img.getRGB(1, 0))) < luminance(new Color(img.getRGB(1, 1))));
    }

    @Test
    void unevenGridIsResampledToNearestCell() throws Exception {
        double[] x = {0, 1, 10};
        double[] y = {0, 1};
        double[][] level = {{0, 0}, {1, 1}, {2, 2}};
        Chart c = HeatMapChart.builder("", "x", x, "y", y, "level", level).build();
        assertEquals("svg", XmlCheck.parse(c.toSvg().markup()).getDocumentElement().getLocalName());
    }

    @Test
    void rejectsGridThatDoesNotMatchItsAxes() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> HeatMapChart.builder(
                "", "x", new double[] {1, 2}, "y", new double[] {1, 2}, "l", new double[][] {{1, 2}, {1}}));
        assertTrue(e.getMessage().contains("column 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> HeatMapChart.builder(
                "", "x", new double[] {2, 1}, "y", new double[] {1, 2}, "l", new double[][] {{1, 2}, {1, 2}}));
    }
}
