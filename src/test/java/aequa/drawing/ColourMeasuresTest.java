package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import aequa.colour.Rgb;
import aequa.colour.WcagContrast;

class ColourMeasuresTest {

    private static final Rgb WHITE = new Rgb(255, 255, 255);
    private static final Rgb BLACK = new Rgb(0, 0, 0);

    @Test
    void wcagContrastOfBlackOnWhiteIs21() {
        // W3C WCAG 2.2, contrast ratio definition: (1.0 + 0.05) / (0.0 + 0.05) = 21
        assertEquals(21.0, WcagContrast.ratio(BLACK, WHITE), 1e-12);
        assertEquals(1.0, WcagContrast.ratio(WHITE, WHITE), 1e-12);
    }

    @Test
    void relativeLuminanceFollowsTheSrgbDecoding() {
        // IEC 61966-2-1: 128/255 = 0.50196 decodes to ((0.50196 + 0.055) / 1.055)^2.4 = 0.21586 (grey, all channels)
        assertEquals(0.21586, WcagContrast.relativeLuminance(new Rgb(128, 128, 128)), 1e-5);
        // BT.709 weights: pure green carries 0.7152 of white's luminance
        assertEquals(0.7152, WcagContrast.relativeLuminance(new Rgb(0, 255, 0)), 1e-12);
    }

    @Test
    void lightnessOfReferenceGreys() {
        // CIE 15:2004: L* = 100 for white, 0 for black; Y = 0.18 gives L* = 49.496 (116 * 0.18^(1/3) - 16)
        assertEquals(100.0, ColourMeasures.greyLightness(WHITE), 1e-9);
        assertEquals(0.0, ColourMeasures.greyLightness(BLACK), 1e-9);
        // sRGB 119/255 decodes to Y = 0.18447 -> L* = 50.03 (computed with the formulas above)
        assertEquals(116 * Math.cbrt(0.184475) - 16, ColourMeasures.greyLightness(new Rgb(119, 119, 119)), 0.01);
    }

    @Test
    void naiveSeparationTotals() {
        // K = 1 - max(R,G,B), C = (1 - R - K) / (1 - K), ...: white 0 %, black 100 %, pure red M = Y = 100 % -> 200 %
        assertEquals(0.0, ColourMeasures.naiveTotalInkPercent(WHITE), 1e-12);
        assertEquals(100.0, ColourMeasures.naiveTotalInkPercent(BLACK), 1e-12);
        assertEquals(200.0, ColourMeasures.naiveTotalInkPercent(new Rgb(255, 0, 0)), 1e-12);
        // mid grey: K = 1 - 128/255 = 49.8 %, no colour inks
        assertEquals(49.8039, ColourMeasures.naiveTotalInkPercent(new Rgb(128, 128, 128)), 1e-4);
    }

    /**
     * Generated ramps print: for every hue, 3 to 9 classes, sequential and diverging, no fill needs more than
     * 240 % total ink in the naive separation (240 % is newsprint's usual limit, common practice; it is the
     * limit of aequa's newsprint theme).
     */
    @Test
    void generatedRampsStayWithinNewsprintInk() {
        for (double hue = 0; hue < 360; hue += 10) {
            for (int count = 3; count <= 9; count++) {
                for (String scheme : new String[] {"sequential", "diverging"}) {
                    java.util.List<Rgb> fills = aequa.colour.ColourRamps.generate(
                            new aequa.project.ColoursSpec(aequa.project.Words.of(aequa.project.ColourScheme.class, scheme), hue, (hue + 180) % 360), count, WHITE, "aequa.yaml", "m")
                            .ramp().fills();
                    for (Rgb fill : fills) {
                        double ink = ColourMeasures.naiveTotalInkPercent(fill);
                        org.junit.jupiter.api.Assertions.assertTrue(ink <= 240,
                                scheme + " hue " + hue + " count " + count + ": " + fill.hex() + " needs " + ink + " %");
                    }
                }
            }
        }
    }
}
