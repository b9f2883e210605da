package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.chrome.ChromeDriver;

/**
 * The demo's leads, motor, resonance and drive reports in Chromium (through chromedriver, whose device emulation
 * lays a page out at phone width, narrower than a headless window can be): no sideways scrolling at 1280 and 400
 * CSS pixels, the verdict banner's headline within the first screen, and in print layout the first wiring diagram
 * on page 1 with the verdict.
 */
class ReportLayoutBrowserTest {
    /** A phone's first screen, CSS pixels (a common 400 × 800 class of phone, portrait). */
    private static final int SCREEN_HEIGHT = 800;
    /** A4 less 12 mm margins each side (HtmlStyle's @page), at 96 CSS px per inch: 186 mm × 269 mm. */
    private static final int PRINT_WIDTH = (int) Math.round(186 / 25.4 * 96);
    private static final int PRINT_HEIGHT = (int) Math.round(269 / 25.4 * 96);

    @TempDir
    static Path dir;
    static ChromeDriver driver;
    static List<Path> reports;

    @BeforeAll
    static void start() throws Exception {
        driver = Chromium.webDriver(dir.resolve("profile"), 1280, 900);
        Path out = dir.resolve("demo");
        ReportCli.Run demo = ReportCli.run("demo", "--out", out.toString());
        assertEquals(0, demo.code(), demo.err());
        try (Stream<Path> s = Files.walk(out)) {
            reports = s.filter(p -> p.toString().endsWith(".html") && !p.toString().contains("/qa/")).sorted()
                    .toList();
        }
        assertTrue(reports.size() >= 10, reports.toString());
    }

    @AfterAll
    static void stop() {
        if (driver != null) {
            driver.quit();
        }
    }

    private static void viewport(int width, int height, boolean mobile, String media) {
        driver.executeCdpCommand("Emulation.setDeviceMetricsOverride", Map.of("width", width, "height", height,
                "deviceScaleFactor", 1, "mobile", mobile));
        driver.executeCdpCommand("Emulation.setEmulatedMedia", Map.of("media", media));
    }

    private static List<Number> numbers(String script) {
        Object r = ((JavascriptExecutor) driver).executeScript(script);
        List<Number> out = new ArrayList<>();
        for (Object o : (List<?>) r) {
            out.add((Number) o);
        }
        return out;
    }

    @Test
    void noSidewaysScrollingAndTheVerdictOnTheFirstScreenAtDesktopAndPhoneWidth() {
        List<String> problems = new ArrayList<>();
        for (int width : new int[] {1280, 400}) {
            viewport(width, SCREEN_HEIGHT, width < 600, "screen");
            for (Path r : reports) {
                driver.get(r.toUri().toString());
                List<Number> m = numbers("var e=document.documentElement;"
                        + "var v=document.querySelector('.verdict strong').getBoundingClientRect();"
                        + "return [e.scrollWidth, e.clientWidth, v.bottom, window.innerWidth];");
                String name = r.getFileName() + " at " + width + " px";
                assertEquals(width, m.get(3).intValue(), name + ": the emulated width");
                if (m.get(0).intValue() > m.get(1).intValue()) {
                    problems.add(name + " scrolls sideways: " + m.get(0) + " > " + m.get(1));
                }
                if (m.get(2).doubleValue() > SCREEN_HEIGHT) {
                    problems.add(name + ": the verdict headline ends at " + m.get(2) + " px, below the first screen");
                }
            }
        }
        assertEquals(List.of(), problems);
    }

    @Test
    void wideTablesScrollInTheirOwnBoxAtPhoneWidth() {
        viewport(400, SCREEN_HEIGHT, true, "screen");
        for (Path r : reports) {
            driver.get(r.toUri().toString());
            // every table sits in a wrapper no wider than the page; a wider table scrolls inside it
            List<Number> m = numbers("var w=0,t=0;document.querySelectorAll('table').forEach(function(x){"
                    + "var p=x.parentElement;t++;if(p.className.indexOf('table-wrap')>=0&&"
                    + "p.getBoundingClientRect().right<=document.documentElement.clientWidth+0.5)w++;});return [t,w];");
            assertEquals(m.get(0), m.get(1), r.getFileName() + ": tables in a scrolling box within the page");
        }
    }

    @Test
    void inPrintTheFirstWiringDiagramSharesPageOneWithTheVerdict() {
        // the leads reports and the motor card: what a person wires by is on the first sheet
        viewport(PRINT_WIDTH, PRINT_HEIGHT, false, "print");
        int checked = 0;
        for (Path r : reports) {
            String n = r.getFileName().toString();
            if (!n.startsWith("leads-") && !n.startsWith("motor-card")) {
                continue;
            }
            driver.get(r.toUri().toString());
            List<Number> m = numbers("var f=document.querySelector('figure');if(!f)return [-1,-1];"
                    + "var b=f.getBoundingClientRect();return [b.bottom+window.scrollY,"
                    + "document.querySelector('.verdict').getBoundingClientRect().bottom];");
            if (m.get(0).intValue() < 0) {
                continue;
            }
            checked++;
            assertTrue(m.get(0).doubleValue() <= PRINT_HEIGHT, r.getFileName() + ": the first diagram ends at "
                    + m.get(0) + " px of a " + PRINT_HEIGHT + " px page");
        }
        assertTrue(checked >= 6, "leads reports and the motor card with a diagram: " + checked);
    }
}
