package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;

/**
 * What the browser tests measure on the page Chromium shows, in CSS pixels: element boxes, the viewport's width,
 * horizontal overflow, and whether text sits inside the width at a readable size. Shared by the browser tests,
 * so each width check is written once.
 */
final class PageMeasures {

    /** WCAG 2.2 sets no minimum type size; 12 CSS px is common practice as the smallest readable body type. */
    static final double MIN_FONT_PX = 12;

    private final ChromeDriver driver;

    PageMeasures(ChromeDriver driver) {
        this.driver = driver;
    }

    /** Resizes the window to {@code widthPx} by {@code heightPx} and checks that the viewport took the width. */
    void resize(int widthPx, int heightPx) {
        driver.manage().window().setSize(new Dimension(widthPx, heightPx));
        long inner = Math.round(number(script("return window.innerWidth;")));
        assertEquals(widthPx, inner, "the viewport is the window's width");
    }

    /** The document is no wider than the window: its scrollWidth is at most its clientWidth. */
    void assertNoHorizontalScroll(String where) {
        long overflow = Math.round(number(script(
                "return document.documentElement.scrollWidth - document.documentElement.clientWidth;")));
        assertTrue(overflow <= 0, where + ": wider than the window by " + overflow + " px");
    }

    /**
     * Every element matching each of {@code selectors} is shown, lies inside the viewport's width and is set at
     * {@link #MIN_FONT_PX} or more; each selector must match at least one element.
     */
    void assertReadableInsideWidth(int widthPx, String... selectors) {
        double client = clientWidth();
        for (String selector : selectors) {
            List<WebElement> elements = driver.findElements(By.cssSelector(selector));
            assertFalse(elements.isEmpty(), selector + " at " + widthPx);
            for (WebElement element : elements) {
                assertTrue(element.isDisplayed(), selector + " shown at " + widthPx);
                Map<String, Object> box = rect(element);
                assertTrue(number(box.get("left")) >= -0.5 && number(box.get("right")) <= client + 0.5
                                && number(box.get("height")) > 0,
                        selector + " inside the width " + client + " at " + widthPx + ": " + box);
                double fontPx = Double.parseDouble(element.getCssValue("font-size").replace("px", ""));
                assertTrue(fontPx >= MIN_FONT_PX, selector + " set at " + fontPx + " px at " + widthPx);
            }
        }
    }

    /** The element's bounding box: left, right, top, width, height. */
    @SuppressWarnings("unchecked")
    Map<String, Object> rect(WebElement element) {
        return (Map<String, Object>) ((JavascriptExecutor) driver).executeScript(
                "const b = arguments[0].getBoundingClientRect();"
                        + "return {left: b.left, right: b.right, top: b.top, width: b.width, height: b.height};", element);
    }

    double clientWidth() {
        return number(script("return document.documentElement.clientWidth;"));
    }

    double innerWidth() {
        return number(script("return window.innerWidth;"));
    }

    double devicePixelRatio() {
        return number(script("return window.devicePixelRatio;"));
    }

    static double number(Object value) {
        return ((Number) value).doubleValue();
    }

    private Object script(String code) {
        return ((JavascriptExecutor) driver).executeScript(code);
    }
}
