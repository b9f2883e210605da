package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.lodestep.report.Chromium;
import org.lodestep.report.PixelStats;

/**
 * Renders the sample reports in a real browser: no console messages, ink in every figure, A4 pages when printed,
 * nothing wider than a narrow window. All pages load at once, before the checks.
 */
class HtmlBrowserTest {
    private static List<Chromium.Page> pages;

    @BeforeAll
    static void render() throws Exception {
        Path dir = Files.createTempDirectory("lodestep-html-browser");
        Path everything = dir.resolve("everything.html");
        SampleReports.everything(SampleReports.HOSTILE).write(everything);
        Path wiring = dir.resolve("wiring.html");
        HtmlReport.builder("Wiring", "Every connection")
                .figure(SampleReports.eightLeadSeries().toSvg(), "8-lead series")
                .figure(SampleReports.eightLeadParallel().toSvg(), "8-lead parallel")
                .figure(SampleReports.fiveLeadUnipolar().toSvg(), "5-lead unipolar")
                .build().write(wiring);
        pages = Chromium.renderAll(List.of(new Chromium.Load(everything, 1000), new Chromium.Load(wiring, 1000),
                // 500 CSS px is the narrowest window headless Chromium lays out; the phone layout starts below 640.
                new Chromium.Load(everything, Chromium.NARROWEST_WIDTH)));
    }

    @Test
    void consoleStaysQuiet() {
        for (Chromium.Page p : pages) {
            assertEquals(List.of(), p.console(), "console messages");
        }
    }

    @Test
    void everyFigureHoldsADrawing() {
        assertEquals(8, pages.get(0).figures().size(), "figures laid out in the full report");
        assertEquals(3, pages.get(1).figures().size(), "wiring diagrams laid out");
        for (Chromium.Page p : pages.subList(0, 2)) {
            for (Chromium.Box b : p.figures()) {
                assertTrue(b.width() > 300 && b.height() > 150, "figure too small: " + b);
                PixelStats s = PixelStats.of(p.screenshot(), b.x(), b.y(), b.width(), b.height());
                assertTrue(s.inkFraction() > 0.02, "figure at " + b + " is nearly blank: " + s);
                assertTrue(s.stdLuma() > 10, "figure at " + b + " has almost no contrast: " + s);
            }
        }
    }

    @Test
    void printsOnA4() {
        // ISO 216: A4 is 210 x 297 mm = 595.3 x 841.9 pt; the report's @page rule asks for it.
        List<double[]> sizes = pages.get(0).printedPageSizesPt();
        assertTrue(sizes.size() >= 2, "the full report prints on several pages, got " + sizes.size());
        for (double[] size : sizes) {
            assertEquals(595.3, size[0], 1.0);
            assertEquals(841.9, size[1], 1.0);
        }
    }

    @Test
    void narrowWindowNeedsNoSidewaysScrolling() {
        Chromium.Page page = pages.get(2);
        assertTrue(page.scrollWidth() <= page.viewportWidth(), "page " + page.scrollWidth() + " px wide in a "
                + page.viewportWidth() + " px window");
        assertEquals(8, page.figures().size());
        for (Chromium.Box b : page.figures()) {
            assertTrue(b.x() >= 0 && b.x() + b.width() <= page.viewportWidth(), "figure overflows: " + b);
            PixelStats s = PixelStats.of(page.screenshot(), b.x(), b.y(), b.width(), b.height());
            assertTrue(s.inkFraction() > 0.02, "figure at " + b + " is nearly blank: " + s + " in a screenshot of "
                    + page.screenshot().getWidth() + " x " + page.screenshot().getHeight() + " px");
        }
    }
}
