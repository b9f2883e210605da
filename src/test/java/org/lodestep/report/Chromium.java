package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.fail;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Assumptions;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;

/**
 * Renders an HTML file in headless Chromium (Debian's {@code chromium} package): a screenshot, the console messages,
 * and where each figure's drawing landed on the page.
 *
 * <p>The page is loaded from a copy with one probe script appended, which only writes the layout (page size and
 * the box of every {@code figure svg}) into the document title; the report itself needs no script and the probe
 * changes nothing that is drawn. Without Chromium the calling test is skipped with a message, except when
 * {@code CI=true}, where it fails.
 */
public final class Chromium {
    private static final String PROBE = "<script>(function(){var r=[];"
            + "document.querySelectorAll('figure svg').forEach(function(s){var b=s.getBoundingClientRect();"
            + "r.push([Math.round(b.left),Math.round(b.top+window.scrollY),Math.round(b.width),Math.round(b.height)]"
            + ".join(','));});"
            + "document.title='PROBE|'+document.documentElement.scrollWidth+'|'"
            + "+document.documentElement.scrollHeight+'|'+window.innerWidth+'|'+r.join(';');})();</script>";
    private static final Pattern MEDIA_BOX = Pattern.compile("/MediaBox \\[0 0 ([0-9.]+) ([0-9.]+)\\]");
    private static final Pattern TITLE = Pattern.compile("<title>PROBE\\|(\\d+)\\|(\\d+)\\|(\\d+)\\|([0-9,;-]*)</title>");

    /** The narrowest window headless Chromium lays out at (found by trial: narrower windows stay 500 px wide). */
    public static final int NARROWEST_WIDTH = 500;

    private Chromium() {
    }

    /** A box on the page, in CSS pixels from the page's top left. */
    public record Box(int x, int y, int width, int height) {
    }

    /** What one page load produced. */
    public record Page(BufferedImage screenshot, List<Box> figures, int scrollWidth, int scrollHeight,
                       int viewportWidth, List<String> console, List<double[]> printedPageSizesPt) {
    }

    /** The browser binary, or a skipped test (a failed one with {@code CI=true}) when there is none. */
    public static Path require() {
        String env = System.getenv("LODESTEP_CHROMIUM");
        for (String c : new String[] {env, "/usr/bin/chromium", "/usr/bin/chromium-browser"}) {
            if (c != null && Files.isExecutable(Path.of(c))) {
                return Path.of(c);
            }
        }
        String message = "headless Chromium not found (install Debian's 'chromium' package); browser test skipped";
        if ("true".equals(System.getenv("CI"))) {
            fail(message.replace("skipped", "required when CI=true"));
        }
        Assumptions.assumeTrue(false, message);
        return null;
    }

    /**
     * A WebDriver session in headless Chromium, window {@code width} × {@code height}, its profile in {@code profile};
     * without Chromium or its driver (Debian's {@code chromium-driver}) the calling test is skipped, or fails with
     * {@code CI=true}.
     */
    public static ChromeDriver webDriver(Path profile, int width, int height) {
        Path chromium = require();
        Path chromedriver = Path.of(System.getenv().getOrDefault("LODESTEP_CHROMEDRIVER", "/usr/bin/chromedriver"));
        if (!Files.isExecutable(chromedriver)) {
            String message = "chromedriver not found (install Debian's 'chromium-driver'); browser test skipped";
            if ("true".equals(System.getenv("CI"))) {
                fail(message.replace("skipped", "required when CI=true"));
            }
            Assumptions.assumeTrue(false, message);
        }
        ChromeOptions o = new ChromeOptions();
        o.setBinary(chromium.toFile());
        o.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-dev-shm-usage",
                "--user-data-dir=" + profile, "--window-size=" + width + "," + height);
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(chromedriver.toFile())
                .usingAnyFreePort().build();
        ChromeDriver driver = new ChromeDriver(service, o);
        driver.manage().timeouts().implicitlyWait(Duration.ZERO);
        return driver;
    }

    /** Loads {@code html} in a window {@code width} CSS pixels wide, tall enough for the whole page. */
    public static Page render(Path html, int width) throws IOException, InterruptedException {
        return renderAll(List.of(new Load(html, width))).get(0);
    }

    /** One page to load: a file and the window width in CSS pixels. */
    public record Load(Path html, int width) {
        public Load {
            if (width < NARROWEST_WIDTH) {
                throw new IllegalArgumentException("headless Chromium lays out no narrower than " + NARROWEST_WIDTH
                        + " px, asked for " + width);
            }
        }
    }

    /** Loads each file at the same width; see {@link #renderAll(List)}. */
    public static List<Page> renderAll(List<Path> htmls, int width) throws IOException, InterruptedException {
        return renderAll(htmls.stream().map(h -> new Load(h, width)).toList());
    }

    /**
     * Loads each page in its own browser, all at once (the browser mostly waits, so parallel loads cost little more
     * than one), and returns the pages in the order given.
     */
    public static List<Page> renderAll(List<Load> loads) throws IOException, InterruptedException {
        Path browser = require();
        Path work = Files.createTempDirectory("lodestep-browser");
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(
                Math.min(6, Math.max(1, loads.size())));
        try {
            List<java.util.concurrent.Future<Page>> futures = new ArrayList<>();
            for (int i = 0; i < loads.size(); i++) {
                Load load = loads.get(i);
                Path dir = Files.createDirectory(work.resolve("p" + i));
                futures.add(pool.submit(() -> renderOne(browser, dir, load.html(), load.width())));
            }
            List<Page> pages = new ArrayList<>();
            for (java.util.concurrent.Future<Page> f : futures) {
                try {
                    pages.add(f.get());
                } catch (java.util.concurrent.ExecutionException e) {
                    if (e.getCause() instanceof Error err) {
                        throw err;
                    }
                    throw new IOException(e.getCause());
                }
            }
            return pages;
        } finally {
            pool.shutdownNow();
            deleteTree(work);
        }
    }

    private static Page renderOne(Path browser, Path work, Path html, int width)
            throws IOException, InterruptedException {
        String page = Files.readString(html, StandardCharsets.UTF_8);
        int end = page.lastIndexOf("</body>");
        if (end < 0) {
            fail(html + " has no </body>");
        }
        Path probed = work.resolve("probed.html");
        Files.writeString(probed, page.substring(0, end) + PROBE + page.substring(end), StandardCharsets.UTF_8);
        // A window tall enough for the whole page in one load, most of the time; a taller page loads again.
        int guess = Math.max(6000, 7000 * 1000 / width);
        Page p = run(browser, work, probed, width, guess);
        if (p.scrollHeight() > guess) {
            p = run(browser, work, probed, width, p.scrollHeight() + 16);
        }
        return p;
    }

    private static Page run(Path browser, Path work, Path probed, int width, int height)
            throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory(work, "profile");
        Path shot = work.resolve("shot-" + height + ".png");
        Path pdf = work.resolve("print-" + height + ".pdf");
        Path out = work.resolve("out.txt");
        Path err = work.resolve("err.txt");
        List<String> cmd = List.of(browser.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
                "--hide-scrollbars", "--force-device-scale-factor=1", "--disable-extensions", "--disable-dev-shm-usage",
                "--disable-features=Translate,MediaRouter,OptimizationHints", "--no-default-browser-check",
                "--password-store=basic", "--use-mock-keychain", "--mute-audio", "--user-data-dir=" + profile,
                "--enable-logging=stderr", "--v=0", "--dump-dom", "--screenshot=" + shot,
                "--print-to-pdf=" + pdf, "--no-pdf-header-footer",
                "--window-size=" + width + "," + height, probed.toUri().toString());
        Process proc = new ProcessBuilder(cmd).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        // A guard against a hung browser, not a speed check.
        if (!proc.waitFor(120, TimeUnit.SECONDS)) {
            proc.destroyForcibly();
            fail("chromium did not finish loading " + probed);
        }
        String dom = Files.readString(out, StandardCharsets.UTF_8);
        List<String> console = new ArrayList<>();
        for (String line : Files.readAllLines(err, StandardCharsets.UTF_8)) {
            if (line.contains(":CONSOLE")) {
                console.add(line);
            }
        }
        Matcher m = TITLE.matcher(dom);
        if (!m.find() || !Files.exists(shot)) {
            fail("chromium gave no layout or screenshot (exit " + proc.exitValue() + "); stderr: "
                    + Files.readString(err).lines().filter(l -> !l.contains("dbus")).limit(20).toList());
        }
        List<Box> boxes = new ArrayList<>();
        if (!m.group(4).isEmpty()) {
            for (String b : m.group(4).split(";")) {
                String[] v = b.split(",");
                boxes.add(new Box(Integer.parseInt(v[0]), Integer.parseInt(v[1]), Integer.parseInt(v[2]),
                        Integer.parseInt(v[3])));
            }
        }
        BufferedImage img = ImageIO.read(shot.toFile());
        List<double[]> sizes = new ArrayList<>();
        if (Files.exists(pdf)) {
            // Chromium writes each page's MediaBox uncompressed: "/MediaBox [0 0 594.95996 841.91998]".
            Matcher mb = MEDIA_BOX.matcher(new String(Files.readAllBytes(pdf), StandardCharsets.ISO_8859_1));
            while (mb.find()) {
                sizes.add(new double[] {Double.parseDouble(mb.group(1)), Double.parseDouble(mb.group(2))});
            }
        }
        return new Page(img, boxes, Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)),
                Integer.parseInt(m.group(3)), console, sizes);
    }

    private static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
