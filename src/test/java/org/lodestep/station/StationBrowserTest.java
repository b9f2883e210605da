package org.lodestep.station;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.report.Chromium;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.Keys;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The bench station in a real browser (Debian's Chromium through its chromium-driver), one shared session: a probe
 * session typed through to the wiring, a QA lot of five scanned serial numbers with one failure, the records of that
 * lot, a live sweep of the virtual rig to its bands, the motor card from uploaded captures.
 * Screenshots of each page at desktop and phone width go to {@code target/station-screenshots}; each is checked for
 * no horizontal scrolling and, on the QA station, for the verdict in view without scrolling. Without the browser or
 * driver the tests skip with a message; with {@code CI=true} they fail.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class StationBrowserTest {
    static final Path SHOTS = Path.of("target", "station-screenshots");
    static final Path QA = Path.of("sample-captures", "qa").toAbsolutePath();
    static final int DESKTOP = 1280;
    /** The phone width asked for; headless Chromium lays out no narrower than about 485 CSS px (machine notes). */
    static final int PHONE = 400;

    @TempDir
    static Path dir;
    static Station station;
    static ChromeDriver driver;
    static String base;

    @BeforeAll
    static void start() throws Exception {
        driver = Chromium.webDriver(dir.resolve("profile"), DESKTOP, 900);
        Files.createDirectories(SHOTS);
        station = Station.start(new Station.Settings("127.0.0.1", 0, null, dir.resolve("qa.sqlite").toString(),
                "sim:bench-4", QA, QA, dir.resolve("out"), "test"));
        base = "http://127.0.0.1:" + station.port();
    }

    @AfterAll
    static void stop() {
        if (driver != null) {
            driver.quit();
        }
        if (station != null) {
            station.close();
        }
    }

    static WebDriverWait waiting() {
        return new WebDriverWait(driver, Duration.ofSeconds(20));
    }

    static Object js(String script) {
        return ((JavascriptExecutor) driver).executeScript(script);
    }

    /** Screenshots the page at desktop and phone width; checks neither scrolls sideways. */
    static void shots(String name, String mustBeInView) throws Exception {
        shots(name, mustBeInView, null);
    }

    /** As {@link #shots(String, String)}, the picture taken with {@code showSelector} scrolled to the top. */
    static void shots(String name, String mustBeInView, String showSelector) throws Exception {
        for (int width : new int[] {DESKTOP, PHONE}) {
            driver.manage().window().setSize(new Dimension(width, 900));
            js(showSelector == null ? "window.scrollTo(0,0)"
                    : "document.querySelector('" + showSelector + "').scrollIntoView({block:'start'})");
            long scroll = ((Number) js("return document.documentElement.scrollWidth")).longValue();
            long inner = ((Number) js("return window.innerWidth")).longValue();
            File png = driver.getScreenshotAs(OutputType.FILE);
            Path target = SHOTS.resolve(name + "-" + (width == DESKTOP ? "desktop" : "phone") + ".png");
            Files.copy(png.toPath(), target, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            assertTrue(scroll <= inner, name + " at " + width + " px scrolls sideways: " + scroll + " > " + inner);
            if (mustBeInView != null) {
                Number bottom = (Number) js("var e=document.querySelector('" + mustBeInView + " .big');"
                        + "return e.getBoundingClientRect().bottom;");
                Number height = (Number) js("return window.innerHeight");
                assertTrue(bottom.doubleValue() <= height.doubleValue(),
                        name + " at " + width + " px: the verdict is below the fold (" + bottom + " > " + height + ")");
            }
        }
        driver.manage().window().setSize(new Dimension(DESKTOP, 900));
    }

    /** A six-lead motor as the technician's meter sees it: two centre-tapped windings, 1.2 Ω per half (invented). */
    static String meter(String a, String b) {
        List<String> windingA = List.of("1", "2", "3");
        List<String> windingB = List.of("4", "5", "6");
        for (List<String> w : List.of(windingA, windingB)) {
            if (w.contains(a) && w.contains(b)) {
                // ends 1-3 read both halves in series; an end to its centre tap reads one half
                return Math.abs(w.indexOf(a) - w.indexOf(b)) == 2 ? "2.4" : "1.2";
            }
        }
        return "OL";
    }

    @Test
    @Order(0)
    void aProbeSessionTypedThroughToTheWiring() throws Exception {
        driver.get(base + "/leads");
        WebElement labels = driver.findElement(By.id("labels"));
        labels.clear();
        labels.sendKeys("6", Keys.ENTER);
        waiting().until(d -> d.findElements(By.cssSelector("[data-page=leads-probe]")).size() == 1);
        WebElement root = driver.findElement(By.cssSelector("[data-page=leads-probe]"));
        boolean undone = false;
        boolean schematic = false;
        for (int i = 0; i < 40 && root.getAttribute("data-done") == null; i++) {
            String pair = driver.findElement(By.cssSelector("#next .pair")).getText();
            String[] ab = pair.split("\\s*\u2013\\s*");
            WebElement ohms = driver.findElement(By.id("ohms"));
            assertEquals(ohms, driver.switchTo().activeElement(), "the answer field has the focus");
            int answers = root.getAttribute("data-answers") == null ? 0 : Integer.parseInt(root.getAttribute("data-answers"));
            if (!undone && i == 1) {
                // a slip of the probe: a wrong reading, withdrawn with u
                ohms.sendKeys("99", Keys.ENTER);
                waitAnswers(root, answers + 1);
                driver.findElement(By.id("ohms")).sendKeys("u", Keys.ENTER);
                waitAnswers(root, answers + 2);
                undone = true;
                continue;
            }
            ohms.sendKeys(meter(ab[0], ab[1]), Keys.ENTER);
            waitAnswers(root, answers + 1);
            if (root.getAttribute("data-done") == null) {
                // still probing: the readings so far, the windings found and their schematic are on the page
                assertTrue(driver.findElement(By.id("probe-panel")).getText().contains("So far"));
                if (!schematic && !driver.findElements(By.cssSelector("#probe-panel .so-far svg")).isEmpty()) {
                    schematic = true;
                    shots("leads-live", "#next");
                }
            }
        }
        assertTrue(schematic, "the schematic fills in while the readings are typed");
        assertEquals("true", root.getAttribute("data-done"));
        String result = driver.findElement(By.id("next")).getText();
        assertTrue(result.contains("6-lead"), result);
        shots("leads", "#next");
        driver.switchTo().frame(driver.findElement(By.cssSelector("iframe.report")));
        assertTrue(driver.findElements(By.cssSelector("figure svg")).size() > 0, "the schematic and wiring diagrams");
        driver.switchTo().defaultContent();
    }

    static void waitAnswers(WebElement root, int n) {
        waiting().until(d -> String.valueOf(n).equals(root.getAttribute("data-answers")));
    }

    @Test
    @Order(4)
    void uploadedCapturesGiveTheMotorCard() throws Exception {
        driver.get(base + "/motor");
        Path m = Path.of("sample-captures", "motor").toAbsolutePath();
        driver.findElement(By.id("step_response")).sendKeys(String.join("\n", m.resolve("step-1-7.csv").toString(),
                m.resolve("step-2-5.csv").toString(), m.resolve("step-3-8.csv").toString(),
                m.resolve("step-4-6.csv").toString()));
        driver.findElement(By.id("back_emf")).sendKeys(m.resolve("back-emf.csv").toString());
        driver.findElement(By.name("supply_v")).sendKeys("24");
        driver.findElement(By.name("phase_current_a")).sendKeys("1.2", Keys.ENTER);
        waiting().until(d -> d.findElement(By.id("motor-result")).getAttribute("data-done") != null);
        assertTrue(driver.findElement(By.id("motor-result")).getText().contains("Motor card"));
        shots("motor", null);
    }

    @Test
    @Order(1)
    void aQaLotOfFiveScannedSerialsWithOneFailure() throws Exception {
        driver.get(base + "/qa");
        shots("qa-start", null);
        new Select(driver.findElement(By.id("spec"))).selectByVisibleText("kv-4218-m.toml");
        driver.findElement(By.id("lot")).sendKeys("L-2607");
        driver.findElement(By.id("operator")).sendKeys("R. Okafor");
        new Select(driver.findElement(By.id("meter_log"))).selectByVisibleText("lot-L2607-meter-log.csv");
        driver.findElement(By.id("operator")).sendKeys(Keys.ENTER); // the keyboard submits the form
        try {
            waiting().until(d -> d.findElements(By.id("serial")).size() == 1);
        } catch (org.openqa.selenium.TimeoutException e) {
            fail("the run did not start: " + driver.getCurrentUrl() + " " + driver.getPageSource());
        }
        List<String> serials = List.of("KV24-00120", "KV24-00122", "KV24-00123", "KV24-00125", "KV24-00124");
        for (int i = 0; i < serials.size(); i++) {
            WebElement input = driver.findElement(By.id("serial"));
            assertEquals(input, driver.switchTo().activeElement(), "the scan field keeps the focus");
            input.sendKeys(serials.get(i), Keys.ENTER); // as a barcode scanner types
            int scans = i + 1;
            waiting().until(d -> String.valueOf(scans).equals(
                    d.findElement(By.cssSelector("[data-page=qa-run]")).getAttribute("data-scans")));
        }
        String verdict = driver.findElement(By.id("verdict")).getText();
        assertTrue(verdict.contains("FAIL") && verdict.contains("KV24-00124"), verdict);
        // the persistent live region speaks the verdict to a screen reader
        assertTrue(driver.findElement(By.id("announce")).getAttribute("textContent").contains("FAIL KV24-00124"));
        String tally = driver.findElement(By.id("tally")).getText();
        assertTrue(tally.contains("5 tested, 4 PASS, 1 FAIL"), tally);
        shots("qa-run", "#verdict");
    }

    @Test
    @Order(5)
    void aMotorTypedAtTheMeterThatFailsShowsTheValueAgainstTheLimit() throws Exception {
        driver.get(base + "/qa");
        new Select(driver.findElement(By.id("spec"))).selectByVisibleText("kv-4218-m.toml");
        driver.findElement(By.id("lot")).sendKeys("L-2608");
        driver.findElement(By.cssSelector("input[name=source][value=typed]")).click();
        driver.findElement(By.id("lot")).sendKeys(Keys.ENTER);
        waiting().until(d -> d.findElements(By.id("phase_a_ohm")).size() == 1);
        // the scanner types the serial and Enter; then the inspector types each reading and Enter, keyboard only
        driver.findElement(By.id("serial")).sendKeys("KV24-00131", Keys.ENTER);
        // the sample spec kv-4218-m.toml: 1.90 ohm +- 10 %: phase A at 2.31 ohm is above the upper limit 2.09 ohm
        for (String v : List.of("2.31", "1.92", "2.8", "2.81", "OL", "950", "1.8")) {
            WebElement field = driver.switchTo().activeElement();
            assertEquals("input", field.getTagName());
            field.sendKeys(v, Keys.ENTER);
        }
        waiting().until(d -> "1".equals(d.findElement(By.cssSelector("[data-page=qa-run]")).getAttribute("data-scans")));
        String verdict = driver.findElement(By.id("verdict")).getText();
        assertTrue(verdict.contains("FAIL") && verdict.contains("KV24-00131"), verdict);
        assertTrue(verdict.contains("phase resistance A: 2.31 \u03A9, above the upper limit 2.09 \u03A9 by 0.22 \u03A9"), verdict);
        assertEquals(driver.findElement(By.id("serial")), driver.switchTo().activeElement(), "ready for the next motor");
        assertEquals("", driver.findElement(By.id("phase_a_ohm")).getAttribute("value"), "the fields are cleared");
        shots("qa-typed", "#verdict");
    }

    @Test
    @Order(6)
    void theRigMeasuresLeadsAndTheMotorOnlyOnceArmedOnThePage() throws Exception {
        for (String page : List.of("leads", "motor")) {
            driver.get(base + "/" + page);
            WebElement section = driver.findElement(By.cssSelector("[data-rig-action=" + page + "]"));
            WebElement fire = section.findElement(By.cssSelector("button.fire"));
            assertTrue(!fire.isEnabled(), "nothing can be energised before the arming");
            section.findElement(By.cssSelector("button.arm-button")).sendKeys(Keys.ENTER);
            waiting().until(d -> fire.isEnabled());
            assertTrue(section.findElement(By.cssSelector(".arm-state")).getText().contains("ARMED"));
            assertEquals(fire, driver.switchTo().activeElement(), "the armed action has the focus");
            fire.sendKeys(Keys.ENTER);
            new WebDriverWait(driver, Duration.ofSeconds(60)).until(d -> section.getAttribute("data-done") != null);
            assertEquals("true", section.getAttribute("data-done"),
                    section.findElement(By.cssSelector(".progress")).getText());
            // a healthy 4-lead motor on the rig takes two readings (its two windings; the cross pairs are inferred)
            assertTrue(Integer.parseInt(section.getAttribute("data-readings")) >= 2, "each reading or stage listed");
            assertTrue(!fire.isEnabled(), "the arming was used once");
            shots(page + "-rig", null, "[data-rig-action=" + page + "]");
        }
    }

    @Test
    @Order(2)
    void theLotsRecordsShowYieldAndTheReportCharts() throws Exception {
        driver.get(base + "/records?lot=L-2607");
        String text = driver.findElement(By.tagName("main")).getText();
        assertTrue(text.contains("First-pass yield") && text.contains("80.0 %"), text);
        driver.switchTo().frame(driver.findElement(By.cssSelector("iframe.report")));
        assertTrue(driver.findElements(By.cssSelector("figure svg")).size() > 0, "the lot report's charts");
        driver.switchTo().defaultContent();
        shots("records", null);
    }

    @Test
    @Order(3)
    void aLiveSweepRunsToItsBandsOnceTheCautionIsAcknowledged() throws Exception {
        driver.get(base + "/sweep");
        WebElement startButton = driver.findElement(By.id("sweep-start"));
        assertTrue(!startButton.isEnabled(), "the sweep cannot start before the caution is acknowledged");
        driver.findElement(By.id("ack")).sendKeys(Keys.SPACE);
        assertTrue(startButton.isEnabled());
        // the virtual rig in real time: samples leave no faster than they were sampled, as from a real rig
        WebElement rig = driver.findElement(By.id("rig"));
        rig.clear();
        rig.sendKeys("sim:gantry-axis?realtime=1");
        startButton.sendKeys(Keys.ENTER);
        // the response curve is drawn while the sweep still runs: points before the end, no bands yet
        WebElement figure = driver.findElement(By.id("live-curve"));
        waiting().until(d -> figure.getAttribute("data-updates") != null
                && Integer.parseInt(figure.getAttribute("data-updates")) >= 3);
        assertEquals(null, driver.findElement(By.id("sweep-result")).getAttribute("data-bands"),
                "the curve must be live, not drawn at the end");
        assertTrue(Integer.parseInt(figure.getAttribute("data-points")) > 0);
        assertTrue(figure.findElements(By.cssSelector("svg polyline")).size() == 1);
        assertTrue(driver.findElement(By.id("curve-state")).getText().contains("live"));
        shots("sweep-live", null, "#sweep-progress");
        new WebDriverWait(driver, Duration.ofSeconds(60))
                .until(d -> d.findElement(By.id("sweep-result")).getAttribute("data-bands") != null);
        int bands = Integer.parseInt(driver.findElement(By.id("sweep-result")).getAttribute("data-bands"));
        assertTrue(bands > 0, "the gantry axis has resonance bands");
        // then the bands over the final curve, and the avoid-list beside it
        assertEquals(bands, figure.findElements(By.cssSelector("svg rect.band")).size());
        assertTrue(driver.findElement(By.id("avoid-table")).getText().contains("full steps/s"));
        assertTrue(driver.findElement(By.cssSelector("#sweep-progress .progress-text")).getText().contains("done"));
        shots("sweep", null, "#sweep-progress");
        shots("sweep-bands", null, "#sweep-result");
        // a profile across those bands: the gantry-axis scenario's motor (scenarios.toml), typed as from its card
        String[][] typed = {{"phase_resistance_ohm", "1.2"}, {"phase_inductance_h", "0.00276"}, {"kt_nm_per_a", "0.3"},
            {"rotor_inertia_kgm2", "8.2e-6"}, {"supply_v", "48"}, {"current_a", "2.5"},
            {"load_inertia_kgm2", "5.5e-5"}, {"target_full_steps_per_s", "300"}};
        for (String[] f : typed) {
            WebElement in = driver.findElement(By.id(f[0]));
            in.clear();
            in.sendKeys(f[1]);
        }
        driver.findElement(By.id("target_full_steps_per_s")).sendKeys(Keys.ENTER);
        waiting().until(d -> d.findElement(By.id("plan-result")).getAttribute("data-rows") != null);
        assertTrue(driver.findElement(By.id("plan-result")).getText().contains("crossed at"));
        shots("sweep-profile", null, "#plan-result");
        driver.get(base + "/");
        shots("home", null);
    }
}
