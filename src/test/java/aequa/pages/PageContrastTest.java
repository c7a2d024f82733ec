package aequa.pages;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The page colours meet WCAG 2.2 level AA: success criterion 1.4.3 (text contrast at least 4.5:1) and
 * 1.4.11 (focus indicator and other non-text contrast at least 3:1), for the base stylesheet and for the
 * base stylesheet overridden by every theme's CSS in themes/. Contrast ratio and relative luminance as
 * WCAG 2.2 defines them (Understanding WCAG 2.2, "contrast ratio" and "relative luminance"; sRGB per
 * IEC 61966-2-1, linear segment below 0.04045).
 */
class PageContrastTest {

    /** Text colour on background colour, each needing 4.5:1. */
    private static final List<String[]> TEXT_PAIRS = List.of(
            new String[] {"--ink", "--paper"}, new String[] {"--muted", "--paper"}, new String[] {"--link", "--paper"},
            new String[] {"--notice-ink", "--notice-paper"}, new String[] {"--link", "--notice-paper"},
            new String[] {"--tip-ink", "--tip-paper"});

    private static final Pattern PROPERTY = Pattern.compile("(--[a-z-]+)\\s*:\\s*(#[0-9a-fA-F]{6})\\s*;");

    @Test
    void referenceValuesOfTheFormula() {
        // WCAG 2.2, Understanding 1.4.3: black on white is 21:1, white on white 1:1
        assertEquals(21.0, contrast("#000000", "#ffffff"), 1e-9);
        assertEquals(1.0, contrast("#ffffff", "#ffffff"), 1e-9);
        // #767676 on white is the lightest grey that passes 4.5:1 (common practice; 4.54:1)
        assertEquals(4.54, contrast("#767676", "#ffffff"), 0.01);
    }

    @Test
    void baseStylesheetPassesAA() throws IOException {
        assertPasses("templates/assets/site.css", base());
    }

    @Test
    void everyThemeStylesheetPassesAA() throws IOException {
        Path themes = Path.of("themes");
        if (!Files.isDirectory(themes)) {
            return; // no themes in this checkout: the base test above covers the pages
        }
        try (Stream<Path> files = Files.walk(themes)) {
            for (Path css : files.filter(p -> p.toString().endsWith(".css")).toList()) {
                Map<String, String> colours = base();
                colours.putAll(rootColours(Files.readString(css)));
                assertPasses(css.toString(), colours);
            }
        }
    }

    private static Map<String, String> base() throws IOException {
        return rootColours(Files.readString(Path.of("templates/assets/site.css")));
    }

    private static void assertPasses(String name, Map<String, String> colours) {
        List<String> failures = new ArrayList<>();
        for (String[] pair : TEXT_PAIRS) {
            double ratio = contrast(colours.get(pair[0]), colours.get(pair[1]));
            if (ratio < 4.5) {
                failures.add(pair[0] + " on " + pair[1] + " = " + ratio);
            }
        }
        double focus = contrast(colours.get("--focus"), colours.get("--paper"));
        if (focus < 3.0) {
            failures.add("--focus on --paper = " + focus);
        }
        assertTrue(failures.isEmpty(), name + ": " + failures);
    }

    /** The colour custom properties of the first {@code :root} block (screen styles, not print). */
    private static Map<String, String> rootColours(String css) {
        int start = css.indexOf(":root");
        int end = css.indexOf('}', start);
        Map<String, String> out = new LinkedHashMap<>();
        Matcher m = PROPERTY.matcher(css.substring(start, end));
        while (m.find()) {
            out.put(m.group(1), m.group(2));
        }
        return out;
    }

    static double contrast(String a, String b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    private static double luminance(String hex) {
        int rgb = Integer.parseInt(hex.substring(1), 16);
        return 0.2126 * linear((rgb >> 16) & 0xff) + 0.7152 * linear((rgb >> 8) & 0xff) + 0.0722 * linear(rgb & 0xff);
    }

    private static double linear(int channel) {
        double c = channel / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }
}
