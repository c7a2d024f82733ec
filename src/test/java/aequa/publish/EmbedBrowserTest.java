package aequa.publish;

import static aequa.publish.PageMeasures.number;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.WebDriverWait;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.endtoend.DemoSite;

/**
 * A map inside a plain test article page, in Debian's Chromium ({@link HeadlessChromium}), both ways a desk can
 * put it there: the frame code copied from the map page (the embed page in an iframe, sized by the host
 * script) and the HTML fragment. The demo site is served over HTTP from 127.0.0.1 and the articles from
 * localhost, so the frame is on another origin (RFC 6454: scheme, host and port) as it is on a newsroom's page.
 *
 * <p>At 320, 768 and 1,280 px wide: no horizontal scroll (document scrollWidth at most clientWidth, in the
 * article and in the frame); the frame as tall as its content, also after the window is resized; the key and
 * caption inside the width and set at 12 px or more; a screenshot of each (target/screenshots/embed_*) whose
 * size is the element's and whose pixels at the key's swatches are the swatches' colours. Also: the copy buttons
 * copy the code with full addresses, and the hatch lines of a no-data region keep their own stroke.
 */
class EmbedBrowserTest {

    private static final int[] WIDTHS_PX = {320, 768, 1280};
    /** Tall enough that a whole frame fits in the viewport, where element screenshots are taken. */
    private static final int WINDOW_HEIGHT_PX = 2000;
    private static final Duration SETTLE = Duration.ofSeconds(10);

    private static HeadlessChromium chromium;
    private static ChromeDriver driver;
    private static PageMeasures page;
    private static LoopbackFileServer server;
    private static Path articles;
    private static JsonNode report;
    private static String siteAddress;
    private static String articleAddress;

    @BeforeAll
    static void start() throws IOException {
        chromium = HeadlessChromium.start("EmbedBrowserTest");
        driver = chromium.driver();
        page = new PageMeasures(driver);
        Path site = DemoSite.folder();
        report = new ObjectMapper().readTree(site.resolve("report.json").toFile());
        articles = Files.createTempDirectory("aequa-articles-");
        server = LoopbackFileServer.start(Map.of("/site/", site, "/article/", articles));
        siteAddress = server.address("127.0.0.1", "/site/");
        articleAddress = server.address("localhost", "/article/");
    }

    @AfterAll
    static void stop() throws IOException {
        if (server != null) {
            server.close();
        }
        if (chromium != null) {
            chromium.close();
        }
        if (articles != null) {
            StagingFolder.deleteTree(articles);
        }
    }

    @Test
    void theFramedMapFitsItsColumnAndFollowsItsContentAtEachWidth() throws Exception {
        List<JsonNode> maps = twoMaps();
        StringBuilder body = new StringBuilder();
        for (JsonNode map : maps) {
            body.append(paragraphs()).append(frameCodeOf(map)).append('\n');
        }
        article("frames.html", body.append(paragraphs()).toString());
        List<Long> heightsPx = new ArrayList<>();
        resize(WIDTHS_PX[0]);
        driver.get(articleAddress + "frames.html");
        for (int pass = 0; pass < 2; pass++) { // first each width in turn in one page, then each freshly loaded
            for (int width : WIDTHS_PX) {
                resize(width);
                if (pass == 1) {
                    driver.get(articleAddress + "frames.html");
                }
                List<WebElement> frames = driver.findElements(By.cssSelector("iframe[data-aequa-embed]"));
                assertEquals(maps.size(), frames.size());
                page.assertNoHorizontalScroll("article with frames at " + width);
                for (int i = 0; i < frames.size(); i++) {
                    WebElement frame = frames.get(i);
                    long heightPx = waitUntilFitted(frame, width);
                    if (i == 0 && pass == 0) {
                        heightsPx.add(heightPx);
                    }
                    driver.switchTo().frame(frame);
                    try {
                        page.assertNoHorizontalScroll("embed page at " + width);
                        page.assertReadableInsideWidth(width, ".key-list", "figcaption", ".embed-cautions");
                    } finally {
                        driver.switchTo().defaultContent();
                    }
                    if (pass == 0) {
                        checkScreenshotOfFrame(frame, "embed_frame_" + maps.get(i).get("id").asText() + "_" + width + ".png");
                    }
                }
            }
        }
        // the fallback height of the frame code is estimated for a 640 px column; at 1280 px the test article's
        // column is 672 px, so the estimate must be near the measured height (within a quarter, either way)
        int fallbackPx = Integer.parseInt(driver.findElement(By.cssSelector("iframe[data-aequa-embed]")).getDomAttribute("height"));
        assertEquals(heightsPx.get(2), fallbackPx, heightsPx.get(2) / 4.0, "fallback height against the measured one at 1280 px");
        // the map grows with the width and the key wraps less: the frame's height must have followed
        assertNotEquals(heightsPx.get(0), heightsPx.get(2), "heights at 320 and 1280 px: " + heightsPx);
    }

    /** Where the host page runs no script of ours, the frame keeps the height written in the code. */
    @Test
    void withoutTheHostScriptTheFrameKeepsItsFallbackHeight() throws Exception {
        String code = frameCodeOf(twoMaps().get(0));
        String frameOnly = code.substring(0, code.indexOf("<script"));
        assertTrue(frameOnly.contains("</iframe>"), code);
        article("frame-without-script.html", paragraphs() + frameOnly + paragraphs());
        resize(768);
        driver.get(articleAddress + "frame-without-script.html");
        WebElement frame = driver.findElement(By.cssSelector("iframe[data-aequa-embed]"));
        new WebDriverWait(driver, SETTLE).until(d -> {
            d.switchTo().frame(frame);
            try {
                return "complete".equals(((JavascriptExecutor) d).executeScript("return document.readyState;"));
            } finally {
                d.switchTo().defaultContent();
            }
        });
        assertEquals(Double.parseDouble(frame.getDomAttribute("height")), number(rect(frame).get("height")), 0.5);
        page.assertNoHorizontalScroll("article with a frame and no host script");
    }

    @Test
    void fragmentsFitTheColumnAtEachWidth() throws Exception {
        List<JsonNode> maps = twoMaps();
        StringBuilder body = new StringBuilder();
        for (JsonNode map : maps) {
            String fragment = Files.readString(DemoSite.folder().resolve(map.at("/files/fragment").asText()), StandardCharsets.UTF_8);
            body.append(paragraphs()).append(fragment).append('\n');
        }
        article("fragments.html", body.append(paragraphs()).toString());
        for (int width : WIDTHS_PX) {
            resize(width);
            driver.get(articleAddress + "fragments.html");
            page.assertNoHorizontalScroll("article with fragments at " + width);
            List<WebElement> svgs = driver.findElements(By.cssSelector("figure > svg[role='img']"));
            assertEquals(maps.size(), svgs.size());
            for (WebElement svg : svgs) {
                Map<String, Object> box = rect(svg);
                double widthPx = number(box.get("width"));
                assertTrue(widthPx > 0 && number(box.get("right")) <= page.clientWidth() + 0.5, "SVG inside the column: " + box);
                String[] viewBox = svg.getDomAttribute("viewBox").split(" ");
                double expected = widthPx * Double.parseDouble(viewBox[3]) / Double.parseDouble(viewBox[2]);
                assertEquals(expected, number(box.get("height")), 1.0, "the SVG keeps its proportions at " + width);
            }
            page.assertReadableInsideWidth(width, "figure > ul", "figure > figcaption");
            List<WebElement> keys = driver.findElements(By.cssSelector("figure > ul"));
            for (int i = 0; i < keys.size(); i++) {
                ((JavascriptExecutor) driver).executeScript("arguments[0].scrollIntoView({block: 'center'});", keys.get(i));
                Path shot = chromium.screenshot("embed_fragment_" + maps.get(i).get("id").asText() + "_" + width + ".png");
                BufferedImage image = ImageIO.read(shot.toFile());
                double scale = page.devicePixelRatio();
                long innerWidth = Math.round(page.innerWidth());
                assertEquals(Math.round(innerWidth * scale), image.getWidth(), 1, "screenshot is the viewport's width");
                assertSwatchesShow(keys.get(i).findElements(By.cssSelector("li > span:first-child")), image, 0, 0, scale);
            }
        }
    }

    @Test
    void copyButtonsCopyTheCodeWithFullAddresses() throws Exception {
        JsonNode map = twoMaps().get(0);
        String page = siteAddress + map.at("/files/page").asText();
        driver.executeCdpCommand("Browser.grantPermissions", Map.of("origin", siteAddress.substring(0, siteAddress.indexOf("/site/")),
                "permissions", List.of("clipboardReadWrite", "clipboardSanitizedWrite")));
        resize(1280);
        driver.get(page);
        WebElement frameWay = driver.findElement(By.cssSelector("[data-embed-way='frame']"));
        String code = frameWay.findElement(By.tagName("textarea")).getDomProperty("value");
        String embed = siteAddress + map.at("/files/embed").asText();
        assertTrue(code.startsWith("<iframe src=\"" + embed + "\""), code);
        assertTrue(code.contains("<script src=\"" + siteAddress + "assets/embed-host.js\""), code);

        assertEquals(code, pressCopy(frameWay));
        WebElement fragmentWay = driver.findElement(By.cssSelector("[data-embed-way='fragment']"));
        String fragment = Files.readString(DemoSite.folder().resolve(map.at("/files/fragment").asText()), StandardCharsets.UTF_8);
        String mapFolder = siteAddress + map.at("/files/page").asText().replace("index.html", "");
        String expected = fragment.replace("href=\"index.html\"", "href=\"" + mapFolder + "index.html\"")
                .replace("href=\"../../method.html#cautions\"", "href=\"" + siteAddress + "method.html#cautions\"");
        assertNotEquals(fragment, expected, "the fragment links to the map page and the cautions");
        assertEquals(expected, pressCopy(fragmentWay));
    }

    /** In the browser, a no-data region's hatch lines keep their own stroke; only the fill gets the border. */
    @Test
    void hatchLinesKeepTheirColourWhileFillsGetTheBorder() throws IOException {
        JsonNode map = null;
        for (JsonNode candidate : report.get("maps")) {
            for (JsonNode region : candidate.get("regions")) {
                if (map == null && region.toString().contains("\"no-data\"")) {
                    map = candidate;
                }
            }
        }
        assertTrue(map != null, "the demo has a map with a region without data");
        driver.get(siteAddress + map.at("/files/embed").asText());
        @SuppressWarnings("unchecked")
        List<String> strokes = (List<String>) ((JavascriptExecutor) driver).executeScript(
                noDataRegionParts("g[data-class='no-data']")
                        + "const borders = r.closest('[stroke]').getAttribute('stroke');"
                        + "const probe = document.createElementNS('http://www.w3.org/2000/svg', 'g');"
                        + "probe.setAttribute('stroke', borders); r.appendChild(probe);"
                        + "const own = groups[1].style.stroke;"
                        + "return [getComputedStyle(fill).stroke, getComputedStyle(probe).stroke,"
                        + "        getComputedStyle(hatch).stroke, own];");
        assertEquals(strokes.get(1), strokes.get(0), "the fill is stroked with the border colour");
        assertEquals(strokes.get(3), strokes.get(2), "the hatch lines keep the colour they were drawn with");
        assertNotEquals(strokes.get(0), strokes.get(2), "hatch lines are not border lines");

        // the map page's hover rule (.map-frame .is-lit, set by hover.js) outlines the fill, not the hatch lines
        driver.get(siteAddress + map.at("/files/page").asText());
        @SuppressWarnings("unchecked")
        List<String> lit = (List<String>) ((JavascriptExecutor) driver).executeScript(
                noDataRegionParts(".map-frame g[data-class='no-data']")
                        + "const before = getComputedStyle(fill).stroke; r.classList.add('is-lit');"
                        + "const ink = getComputedStyle(document.body).color;"
                        + "return [before, getComputedStyle(fill).stroke, ink, getComputedStyle(hatch).stroke, groups[1].style.stroke];");
        assertEquals(lit.get(2), lit.get(1), "a lit region is outlined in the ink colour");
        assertNotEquals(lit.get(0), lit.get(1), "lighting changes the outline");
        assertEquals(lit.get(4), lit.get(3), "the hatch lines of a lit region keep their colour");
    }

    /**
     * Script that finds the first no-data region matching {@code selector} ({@code r}), its two groups
     * ({@code groups}: fill, then hatch lines) and the first path of each ({@code fill}, {@code hatch}).
     */
    private static String noDataRegionParts(String selector) {
        return "const r = document.querySelector(\"" + selector + "\");"
                + "const groups = r.querySelectorAll(':scope > g');"
                + "const fill = groups[0].querySelector('path'), hatch = groups[1].querySelector('path');";
    }

    private static String pressCopy(WebElement way) {
        WebElement button = way.findElement(By.cssSelector("button.embed-copy"));
        WebElement status = way.findElement(By.cssSelector("[role='status']"));
        assertTrue(button.isDisplayed(), "the copy button shows when scripts run");
        assertEquals("button", button.getAttribute("type"));
        ((JavascriptExecutor) driver).executeScript("arguments[0].scrollIntoView({block: 'center'});", button);
        button.click();
        new WebDriverWait(driver, SETTLE).until(d -> !status.getText().isBlank());
        assertEquals(button.getAttribute("data-copied"), status.getText(), "status after copying");
        return (String) ((JavascriptExecutor) driver).executeAsyncScript(
                "const done = arguments[arguments.length - 1]; navigator.clipboard.readText().then(done, e => done('failed: ' + e));");
    }

    /** Waits until the frame is as tall as the embed page's content, and returns that height in CSS pixels. */
    private static long waitUntilFitted(WebElement frame, int width) {
        long[] last = new long[2];
        try {
            new WebDriverWait(driver, SETTLE).until(d -> {
                long outer = Math.round(number(rect(frame).get("height")));
                driver.switchTo().frame(frame);
                try {
                    last[1] = Math.round(number(((JavascriptExecutor) driver).executeScript(
                            "return Math.ceil(document.documentElement.getBoundingClientRect().height);")));
                } finally {
                    driver.switchTo().defaultContent();
                }
                last[0] = outer;
                return Math.abs(outer - last[1]) <= 1;
            });
        } catch (org.openqa.selenium.TimeoutException e) {
            throw new AssertionError("at " + width + " px the frame stayed " + last[0] + " px tall for content of " + last[1] + " px", e);
        }
        return last[0];
    }

    private static void checkScreenshotOfFrame(WebElement frame, String name) throws IOException {
        ((JavascriptExecutor) driver).executeScript("arguments[0].scrollIntoView({block: 'start'});", frame);
        byte[] png = frame.getScreenshotAs(OutputType.BYTES);
        Files.write(HeadlessChromium.SCREENSHOTS.resolve(name), png);
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(png));
        Map<String, Object> box = rect(frame);
        double scale = page.devicePixelRatio();
        assertEquals(Math.round(number(box.get("width")) * scale), image.getWidth(), 1, name + ": width of the frame");
        assertEquals(Math.round(number(box.get("height")) * scale), image.getHeight(), 1, name + ": height of the frame");
        driver.switchTo().frame(frame);
        try {
            assertSwatchesShow(driver.findElements(By.cssSelector(".key-list .key-swatch")), image, 0, 0, scale);
        } finally {
            driver.switchTo().defaultContent();
        }
    }

    /**
     * The pixel at the centre of each key swatch, in a screenshot whose top left is at ({@code originX},
     * {@code originY}) of the swatches' viewport, has the swatch's colour (within 3 of 255 per channel, for
     * colour management).
     */
    private static void assertSwatchesShow(List<WebElement> swatches, BufferedImage image, double originX, double originY,
                                           double scale) {
        assertFalse(swatches.isEmpty(), "a key with swatches");
        for (WebElement swatch : swatches) {
            Map<String, Object> box = rect(swatch);
            int x = (int) Math.round((number(box.get("left")) + number(box.get("width")) / 2 - originX) * scale);
            int y = (int) Math.round((number(box.get("top")) + number(box.get("height")) / 2 - originY) * scale);
            assertTrue(x >= 0 && y >= 0 && x < image.getWidth() && y < image.getHeight(), "swatch inside the screenshot: " + box);
            int[] want = rgb(swatch.getCssValue("background-color"));
            int got = image.getRGB(x, y);
            int[] have = {(got >> 16) & 0xff, (got >> 8) & 0xff, got & 0xff};
            for (int c = 0; c < 3; c++) {
                assertEquals(want[c], have[c], 3, "swatch colour in the screenshot at " + x + "," + y);
            }
        }
    }

    private static void resize(int widthPx) {
        page.resize(widthPx, WINDOW_HEIGHT_PX);
    }

    private static Map<String, Object> rect(WebElement element) {
        return page.rect(element);
    }

    private static int[] rgb(String css) {
        String[] parts = css.replaceAll("[^0-9,]", "").split(",");
        return new int[] {Integer.parseInt(parts[0]), Integer.parseInt(parts[1]), Integer.parseInt(parts[2])};
    }

    /** The first two maps with a colour key (choropleths), so the key checks have swatches to look at. */
    private static List<JsonNode> twoMaps() throws IOException {
        List<JsonNode> maps = new ArrayList<>();
        for (JsonNode map : report.get("maps")) {
            String webSvg = Files.readString(DemoSite.folder().resolve(map.at("/files/webSvg").asText()), StandardCharsets.UTF_8);
            if (maps.size() < 2 && !webSvg.contains("id='symbols'")) {
                maps.add(map);
            }
        }
        assertEquals(2, maps.size());
        return maps;
    }

    /** The frame code as a desk copies it from the map page (the page's script makes the addresses full). */
    private static String frameCodeOf(JsonNode map) {
        driver.get(siteAddress + map.at("/files/page").asText());
        return driver.findElement(By.cssSelector("[data-embed-way='frame'] textarea")).getDomProperty("value");
    }

    private static String paragraphs() {
        return "<p>This paragraph stands for the text of a news article around the map. It is long enough to wrap"
                + " onto several lines in a narrow column, as an article's text does.</p>\n"
                + "<p>A second paragraph follows, so that the map sits between ordinary blocks of text.</p>\n";
    }

    private static void article(String name, String body) throws IOException {
        String page = "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n"
                + "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n<title>Test article</title>\n"
                + "<style>body { margin: 0 auto; max-width: 42rem; padding: 0 16px; font: 18px/1.5 serif; }</style>\n"
                + "</head>\n<body>\n<h1>Test article</h1>\n" + body + "</body>\n</html>\n";
        Files.writeString(articles.resolve(name), page, StandardCharsets.UTF_8);
    }
}
