package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.logging.Level;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.PrintsPage;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.logging.LogType;
import org.openqa.selenium.print.PageSize;
import org.openqa.selenium.print.PrintOptions;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.endtoend.DemoSite;

/**
 * The published site in a real browser: Debian's Chromium, headless, through Selenium ({@link HeadlessChromium}).
 *
 * <p>The site is the folder named by the system property {@value #SITE_PROPERTY} (for example
 * {@code mvn test -Dtest=BrowserTest -Daequa.browser.site=site-out}); without it, the demo project is
 * published through the command line (see {@link DemoSite}). Checks: no console errors on any page; each map's SVG is visible with
 * one region element per drawn region of report.json; a legend and a caption; every link resolves; the page
 * fits a phone's width; a map page prints on one A4 and one Letter sheet; the hover script lights a region.
 * A screenshot of every page goes to target/screenshots/.
 *
 * <p>Without Chromium the test is skipped (failed in CI), as {@link HeadlessChromium} says.
 */
class BrowserTest {

    static final String SITE_PROPERTY = "aequa.browser.site";
    private static final Path SCREENSHOTS = HeadlessChromium.SCREENSHOTS;

    private static HeadlessChromium chromium;
    private static ChromeDriver driver;
    private static Path site;
    private static JsonNode report;

    @BeforeAll
    static void startBrowser() throws IOException {
        chromium = HeadlessChromium.start("BrowserTest");
        driver = chromium.driver();
        site = sitePath();
        report = new ObjectMapper().readTree(site.resolve("report.json").toFile());
    }

    private static Path sitePath() {
        String given = System.getProperty(SITE_PROPERTY, "");
        return given.isBlank() ? DemoSite.folder() : Path.of(given).toAbsolutePath().normalize();
    }

    @AfterAll
    static void stopBrowser() throws IOException {
        if (chromium != null) {
            chromium.close();
        }
    }

    @Test
    void everyPageLoadsWithoutConsoleErrorsAndItsLinksResolve() throws IOException {
        List<String> problems = new ArrayList<>();
        for (String page : PublishTestSupport.files(site).keySet()) {
            if (!page.endsWith(".html")) {
                continue;
            }
            open(page);
            for (LogEntry entry : driver.manage().logs().get(LogType.BROWSER)) {
                if (entry.getLevel().intValue() >= Level.SEVERE.intValue()) {
                    problems.add(page + ": console " + entry.getMessage());
                }
            }
            for (WebElement link : driver.findElements(By.cssSelector("a[href], img[src], link[href], script[src]"))) {
                String url = link.getDomProperty(link.getTagName().equals("a") || link.getTagName().equals("link") ? "href" : "src");
                if (url != null && url.startsWith("file:")) {
                    Path target = Path.of(java.net.URI.create(url.replaceAll("#.*$", "")));
                    if (!Files.isRegularFile(target)) {
                        problems.add(page + ": broken link " + url);
                    }
                }
            }
            if (page.endsWith("-fragment.html")) {
                screenshot(page.replace('/', '_').replace(".html", ".png"));
                continue; // a block for other sites' pages: the notice is a plain paragraph (EmbedFragmentTest)
            }
            assertFalse(driver.findElements(By.cssSelector(".site-notice")).isEmpty() && report.at("/site/notice").asText().isEmpty(),
                    "a notice box without a notice on " + page);
            if (!report.at("/site/notice").asText().isEmpty()) {
                assertTrue(driver.findElement(By.cssSelector(".site-notice")).isDisplayed(), page);
            }
            screenshot(page.replace('/', '_').replace(".html", ".png"));
        }
        assertEquals(List.of(), problems);
    }

    @Test
    void eachMapShowsItsRegionsLegendAndCaption() throws IOException {
        for (JsonNode map : report.get("maps")) {
            open(map.at("/files/page").asText());
            WebElement svg = driver.findElement(By.cssSelector(".map-frame svg"));
            assertTrue(svg.isDisplayed(), map.get("id").asText());
            assertTrue(svg.getSize().getWidth() > 200, "map too small: " + svg.getSize());
            long drawn = 0;
            for (JsonNode region : map.get("regions")) {
                drawn += region.path("drawn").asBoolean(true) ? 1 : 0;
            }
            drawn *= Math.max(1, map.path("periods").size()); // small multiples: a panel per period
            List<WebElement> regions = svg.findElements(By.cssSelector("[id^='r-']"));
            assertEquals(drawn, regions.size(), "regions drawn in " + map.get("id").asText());
            assertFalse(svg.findElements(By.cssSelector("[id*='legend' i]")).isEmpty(), "legend inside the SVG");
            assertFalse(svg.findElements(By.cssSelector("[id*='caption' i]")).isEmpty(), "caption inside the SVG");
            WebElement caption = driver.findElement(By.cssSelector("figcaption.map-caption"));
            assertTrue(caption.getText().contains(map.at("/projection/name").asText()), caption.getText());
            String label = svg.getAttribute("aria-labelledby") + svg.getAttribute("aria-label");
            assertTrue(svg.getAttribute("role") != null && !label.equals("nullnull"), "SVG needs role and a label");

            hoverInside(regions.get(regions.size() / 2));
            WebElement tip = driver.findElement(By.cssSelector(".map-tip"));
            assertTrue(tip.isDisplayed() && !tip.getText().isBlank(), "hover tooltip");
            assertEquals(1, svg.findElements(By.cssSelector(".is-lit")).size(), "hover highlight");
        }
    }

    /**
     * Moves the pointer to a point where the region itself is on top (not a label, not a neighbour): the
     * middle of a region's bounding box may lie outside a concave region or under its label.
     */
    private static void hoverInside(WebElement region) {
        JavascriptExecutor js = (JavascriptExecutor) driver;
        js.executeScript("arguments[0].scrollIntoView({block: 'center'});", region);
        @SuppressWarnings("unchecked")
        List<Number> xy = (List<Number>) js.executeScript(
                "const r = arguments[0], b = r.getBoundingClientRect();"
                        + "for (let i = 1; i < 24; i++) for (let j = 1; j < 24; j++) {"
                        + "  const x = b.left + b.width * i / 24, y = b.top + b.height * j / 24;"
                        + "  let e = document.elementFromPoint(x, y);"
                        + "  while (e && e !== r) e = e.parentNode;"
                        + "  if (e === r) return [Math.round(x), Math.round(y)];"
                        + "} return null;", region);
        assertTrue(xy != null, "no visible point inside region " + region.getAttribute("id"));
        new Actions(driver).moveToLocation(xy.get(0).intValue(), xy.get(1).intValue()).perform();
    }

    @Test
    void aMapPageFitsAPhoneAndPrintsOnOneSheet() throws IOException {
        JsonNode first = report.at("/maps/0");
        try {
            PageMeasures page = new PageMeasures(driver);
            page.resize(390, 844);
            open(first.at("/files/page").asText());
            page.assertNoHorizontalScroll("the map page on a phone");
            screenshot("phone_" + first.get("id").asText() + ".png");
            open(first.at("/files/figures").asText());
            screenshot("phone_figures_" + first.get("id").asText() + ".png");
        } finally {
            driver.manage().window().setSize(new Dimension(1280, 1000));
        }
        open(first.at("/files/page").asText());
        // ISO 216 A4 is 21.0 x 29.7 cm; ANSI Letter is 21.59 x 27.94 cm
        for (PageSize sheet : List.of(new PageSize(29.7, 21.0), new PageSize(27.94, 21.59))) {
            PrintOptions print = new PrintOptions();
            print.setPageSize(sheet);
            print.setBackground(true);
            byte[] pdf = Base64.getDecoder().decode(((PrintsPage) driver).print(print).getContent());
            assertEquals(1, pdfPages(pdf), "map page must print on one sheet of " + sheet.getWidth() + " cm");
            Files.write(SCREENSHOTS.resolve("print_" + first.get("id").asText() + "_" + sheet.getWidth() + ".pdf"), pdf);
        }
        // a picture of the print layout for people to look at: Letter at 96 px per inch
        try {
            driver.manage().window().setSize(new Dimension(816, 1056));
            driver.executeCdpCommand("Emulation.setEmulatedMedia", java.util.Map.of("media", "print"));
            open(first.at("/files/page").asText());
            screenshot("print_" + first.get("id").asText() + ".png");
        } finally {
            driver.executeCdpCommand("Emulation.setEmulatedMedia", java.util.Map.of("media", ""));
            driver.manage().window().setSize(new Dimension(1280, 1000));
        }
    }

    /** Counts page objects ("/Type /Page", not "/Pages") in a PDF (ISO 32000-1, 7.7.3.3). */
    private static int pdfPages(byte[] pdf) {
        Matcher m = Pattern.compile("/Type\\s*/Page(?![s])").matcher(new String(pdf, java.nio.charset.StandardCharsets.ISO_8859_1));
        int pages = 0;
        while (m.find()) {
            pages++;
        }
        return pages;
    }

    /**
     * The French and Arabic editions of the demo (the project publishes English, French and Arabic): the
     * page declares its language, the words are French or Arabic, and the Arabic page is laid out right to
     * left (the site's name moves to the right edge of the masthead, as mirrored layouts place it).
     */
    @Test
    void theFrenchAndArabicEditionsReadInTheirLanguage() throws IOException {
        String id = report.at("/maps/0/id").asText();
        JavascriptExecutor js = (JavascriptExecutor) driver;
        open("fr/maps/" + id + "/index.html");
        assertEquals("fr", js.executeScript("return document.documentElement.lang"));
        assertEquals("ltr", js.executeScript("return getComputedStyle(document.body).direction"));
        assertTrue(driver.findElement(By.cssSelector(".key-block h2, .take-away h2")).getText().matches("Légende des couleurs|Légende des cercles|Téléchargements"));
        assertTrue(driver.findElement(By.cssSelector(".map-frame svg")).isDisplayed());
        screenshot("edition-fr.png");
        open("ar/maps/" + id + "/index.html");
        assertEquals("ar", js.executeScript("return document.documentElement.lang"));
        assertEquals("rtl", js.executeScript("return getComputedStyle(document.body).direction"));
        assertTrue(driver.findElement(By.cssSelector(".take-away h2")).getText().equals("التنزيلات"));
        Number nameLeft = (Number) js.executeScript("return document.querySelector('.masthead-name').getBoundingClientRect().left");
        Number width = (Number) js.executeScript("return document.documentElement.clientWidth");
        assertTrue(nameLeft.doubleValue() > width.doubleValue() / 2, "the site's name sits at the right in Arabic: " + nameLeft);
        assertTrue(driver.findElement(By.cssSelector(".map-frame svg")).isDisplayed());
        assertEquals("ltr", js.executeScript("return getComputedStyle(document.querySelector('.map-frame svg')).direction"),
                "the drawn map keeps its left-to-right layout; its Arabic lines carry their own direction");
        screenshot("edition-ar.png");
    }

    /**
     * axe-core (npm, pinned in .ci/axe/package-lock.json; {@code npm ci --prefix .ci/axe} installs it) run on
     * English and Arabic pages: no violation of impact serious or critical (axe's WCAG 2 A/AA rules).
     */
    @Test
    void englishAndArabicPagesHaveNoSeriousAccessibilityViolation() throws IOException {
        Path axe = Path.of(".ci/axe/node_modules/axe-core/axe.min.js");
        assertTrue(Files.isRegularFile(axe), "axe-core missing: run npm ci --prefix .ci/axe");
        String axeSource = Files.readString(axe);
        String id = report.at("/maps/0/id").asText();
        List<String> problems = new ArrayList<>();
        driver.manage().timeouts().scriptTimeout(java.time.Duration.ofSeconds(120));
        for (String page : List.of("index.html", "maps/" + id + "/index.html", "maps/" + id + "/figures.html", "method.html",
                "ar/index.html", "ar/maps/" + id + "/index.html", "ar/maps/" + id + "/figures.html", "ar/method.html")) {
            open(page);
            JavascriptExecutor js = (JavascriptExecutor) driver;
            js.executeScript(axeSource);
            Object found = js.executeAsyncScript("const done = arguments[arguments.length - 1];"
                    + "axe.run(document, {runOnly: {type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']}})"
                    + ".then(r => done(r.violations.filter(v => v.impact === 'serious' || v.impact === 'critical')"
                    + ".map(v => v.id + ' (' + v.impact + '): ' + v.nodes.slice(0, 3).map(n => n.target.join(' ')).join(', '))))"
                    + ".catch(e => done(['axe failed: ' + e]));");
            for (Object violation : (List<?>) found) {
                problems.add(page + ": " + violation);
            }
        }
        assertEquals(List.of(), problems);
    }

    private static void open(String page) {
        driver.get(site.resolve(page).toUri().toString());
    }

    private static void screenshot(String name) throws IOException {
        chromium.screenshot(name);
    }
}
