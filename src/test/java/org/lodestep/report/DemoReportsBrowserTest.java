package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Runs {@code lodestep demo} and renders every HTML report it writes in headless Chromium: each loads without a
 * console message, every figure holds a drawing, and the page needs no sideways scrolling.
 */
class DemoReportsBrowserTest {

    @Test
    void everyDemoReportRendersInARealBrowser(@TempDir Path out) throws Exception {
        Chromium.require();
        ReportCli.Run demo = ReportCli.run("demo", "--out", out.toString());
        assertEquals(0, demo.code(), "demo exit code; stderr: " + demo.err());
        List<Path> reports;
        try (Stream<Path> s = Files.walk(out)) {
            reports = s.filter(p -> p.toString().endsWith(".html")).sorted().toList();
        }
        // leads (one per sample motor), motor card, ring-down, sweep, QA check and lot report
        assertTrue(reports.size() >= 6, "demo wrote " + reports);
        for (Path r : reports) {
            assertTrue(demo.out().contains(r.toString()), "demo prints the path of " + r);
        }
        List<Chromium.Page> pages = Chromium.renderAll(reports, 1000);
        int figures = 0;
        for (int i = 0; i < reports.size(); i++) {
            Chromium.Page p = pages.get(i);
            String name = reports.get(i).getFileName().toString();
            assertEquals(List.of(), p.console(), name + ": console messages");
            assertTrue(p.scrollWidth() <= p.viewportWidth(), name + " is wider than the window");
            for (Chromium.Box b : p.figures()) {
                PixelStats st = PixelStats.of(p.screenshot(), b.x(), b.y(), b.width(), b.height());
                assertTrue(st.inkFraction() > 0.02 && st.stdLuma() > 10, name + ": figure at " + b + " is blank: "
                        + st);
                figures++;
            }
        }
        assertTrue(figures >= reports.size(), "only " + figures + " figures in " + reports.size() + " reports");
    }
}
