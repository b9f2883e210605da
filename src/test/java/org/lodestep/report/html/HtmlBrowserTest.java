package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.report.Chromium;
import org.lodestep.report.PixelStats;

/** Renders the sample reports in a real browser: no console messages, nothing blank, nothing wider than a phone. */
class HtmlBrowserTest {

    @Test
    void everyFigureRendersWithInkAndTheConsoleStaysQuiet(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("everything.html");
        SampleReports.everything(SampleReports.HOSTILE).write(file);
        Path wiring = dir.resolve("wiring.html");
        HtmlReport.builder("Wiring", "Every connection")
                .figure(SampleReports.eightLeadSeries().toSvg(), "8-lead series")
                .figure(SampleReports.eightLeadParallel().toSvg(), "8-lead parallel")
                .figure(SampleReports.fiveLeadUnipolar().toSvg(), "5-lead unipolar")
                .build().write(wiring);
        java.util.List<Chromium.Page> pages = Chromium.renderAll(java.util.List.of(file, wiring), 1000);
        Chromium.Page page = pages.get(0);
        assertEquals(java.util.List.of(), pages.get(1).console(), "console messages");
        assertEquals(3, pages.get(1).figures().size());
        for (Chromium.Box b : pages.get(1).figures()) {
            assertTrue(PixelStats.of(pages.get(1).screenshot(), b.x(), b.y(), b.width(), b.height()).inkFraction()
                    > 0.02, "wiring diagram at " + b + " is nearly blank");
        }
        assertEquals(java.util.List.of(), page.console(), "console messages");
        assertEquals(8, page.figures().size(), "figures laid out");
        for (Chromium.Box b : page.figures()) {
            assertTrue(b.width() > 300 && b.height() > 150, "figure too small: " + b);
            PixelStats s = PixelStats.of(page.screenshot(), b.x(), b.y(), b.width(), b.height());
            assertTrue(s.inkFraction() > 0.02, "figure at " + b + " is nearly blank: " + s);
            assertTrue(s.stdLuma() > 10, "figure at " + b + " has almost no contrast: " + s);
        }
    }

    @Test
    void narrowWindowNeedsNoSidewaysScrolling(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("everything.html");
        SampleReports.everything("QX-4471").write(file);
        // 500 CSS px is the narrowest window headless Chromium lays out; the phone layout starts below 640 px.
        Chromium.Page page = Chromium.render(file, Chromium.NARROWEST_WIDTH);
        assertTrue(page.scrollWidth() <= page.viewportWidth(), "page " + page.scrollWidth() + " px wide in a "
                + page.viewportWidth() + " px window");
        for (Chromium.Box b : page.figures()) {
            assertTrue(b.x() >= 0 && b.x() + b.width() <= page.viewportWidth(), "figure overflows: " + b);
            PixelStats s = PixelStats.of(page.screenshot(), b.x(), b.y(), b.width(), b.height());
            assertTrue(s.inkFraction() > 0.02, "figure at " + b + " is nearly blank: " + s + " in a screenshot of "
                    + page.screenshot().getWidth() + " x " + page.screenshot().getHeight() + " px");
        }
    }
}
