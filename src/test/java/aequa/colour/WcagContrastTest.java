package aequa.colour;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** WCAG 2.2 relative luminance and contrast ratio, against the definitions in its Glossary. */
class WcagContrastTest {

    private static final Rgb WHITE = Rgb.fromHex("#ffffff");
    private static final Rgb BLACK = Rgb.fromHex("#000000");

    @Test
    void blackOnWhiteIsTwentyOneToOne() {
        // WCAG 2.2 Glossary, contrast ratio: (1 + 0.05) / (0 + 0.05) = 21 for white and black
        assertEquals(21.0, WcagContrast.ratio(BLACK, WHITE), 1e-12);
        assertEquals(21.0, WcagContrast.ratio(WHITE, BLACK), 1e-12);
        assertEquals(1.0, WcagContrast.ratio(WHITE, WHITE), 0);
    }

    @Test
    void commonlyCitedAaBoundaryGrey() {
        // #767676 on white is 4.54:1, the lightest grey passing AA 4.5:1 for text; #777777 gives 4.48:1.
        // Common practice (widely cited by accessibility checkers); figures from memory, re-derived here:
        // 0x76 = 118 -> ((118/255 + 0.055) / 1.055)^2.4 = 0.18116 -> 1.05 / 0.23116 = 4.542
        assertEquals(4.54, WcagContrast.ratio(Rgb.fromHex("#767676"), WHITE), 0.005);
        assertEquals(4.48, WcagContrast.ratio(Rgb.fromHex("#777777"), WHITE), 0.005);
    }

    @Test
    void relativeLuminanceWeights() {
        // WCAG 2.2 Glossary, relative luminance: L = 0.2126 R + 0.7152 G + 0.0722 B
        assertEquals(0.2126, WcagContrast.relativeLuminance(Rgb.fromHex("#ff0000")), 1e-12);
        assertEquals(0.7152, WcagContrast.relativeLuminance(Rgb.fromHex("#00ff00")), 1e-12);
        assertEquals(0.0722, WcagContrast.relativeLuminance(Rgb.fromHex("#0000ff")), 1e-12);
    }

    @Test
    void labelColourAlwaysReachesAaOnAnyFill() {
        // black and white ratios multiply to 21, so the better one is at least sqrt(21) = 4.58
        for (int r = 0; r < 256; r += 15) {
            for (int g = 0; g < 256; g += 15) {
                for (int b = 0; b < 256; b += 15) {
                    Rgb fill = new Rgb(r, g, b);
                    double ratio = WcagContrast.ratio(fill, WcagContrast.labelColour(fill));
                    assertTrue(ratio >= Math.sqrt(21) - 1e-9, fill.hex() + " " + ratio);
                }
            }
        }
    }
}
