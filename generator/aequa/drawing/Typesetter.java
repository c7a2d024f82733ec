package aequa.drawing;

import java.awt.Font;
import java.awt.GraphicsEnvironment;
import java.awt.font.FontRenderContext;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Measures and breaks text in page units with the first family of the theme's stack that is installed
 * (else Java's logical {@code SansSerif}). Measurements use fractional metrics and no hinting, so they
 * do not depend on a device. A reader's browser may substitute another face from the stack; widths then
 * differ by a few percent, which the layout's gaps absorb.
 */
final class Typesetter {

    /** Fonts are built at this many times their size; see {@link Canvas}. */
    static final int TEXT_SCALE = 100;
    private static final FontRenderContext MEASURE = new FontRenderContext(null, true, true);

    private final double unitsPerPt;
    private final String family;
    private final Map<Long, Font> fonts = new HashMap<>();

    Typesetter(double unitsPerPt, String family) {
        this.unitsPerPt = unitsPerPt;
        this.family = family;
    }

    /** The first family in {@code stack} installed on this machine, or {@code SansSerif}. */
    static String installedFamily(List<String> stack) {
        Set<String> installed = new HashSet<>(Arrays.asList(
                GraphicsEnvironment.getLocalGraphicsEnvironment().getAvailableFontFamilyNames(java.util.Locale.ROOT)));
        return stack.stream().filter(installed::contains).findFirst().orElse(Font.SANS_SERIF);
    }

    double unitsPerPt() {
        return unitsPerPt;
    }

    /** The font for {@code sizePt}, built {@link #TEXT_SCALE} times larger. */
    Font font(double sizePt, boolean bold) {
        int size = Math.max(1, (int) Math.round(sizePt * unitsPerPt * TEXT_SCALE));
        long key = ((long) size << 1) | (bold ? 1 : 0);
        return fonts.computeIfAbsent(key, k -> new Font(family, bold ? Font.BOLD : Font.PLAIN, size));
    }

    /** The advance width of {@code text} in page units. */
    double width(String text, double sizePt, boolean bold) {
        return font(sizePt, bold).getStringBounds(text, MEASURE).getWidth() / TEXT_SCALE;
    }

    /** Distance between baselines: 1.25 em (common practice for caption type). */
    double lineHeight(double sizePt) {
        return 1.25 * sizePt * unitsPerPt;
    }

    /** Height of capital letters above the baseline, measured on "H". */
    double capHeight(double sizePt) {
        return font(sizePt, false).createGlyphVector(MEASURE, "H").getVisualBounds().getHeight() / TEXT_SCALE;
    }

    /**
     * Breaks {@code text} into lines no wider than {@code widthU} at spaces; a single word wider than the
     * line stays whole on its own line. Returns no lines for blank text.
     */
    List<String> wrap(String text, double sizePt, boolean bold, double widthU) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.trim().split("\\s+")) {
            if (word.isEmpty()) {
                continue;
            }
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && width(candidate, sizePt, bold) > widthU) {
                lines.add(line.toString());
                line.setLength(0);
                line.append(word);
            } else {
                line.setLength(0);
                line.append(candidate);
            }
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }
}
