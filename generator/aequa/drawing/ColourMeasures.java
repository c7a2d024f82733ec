package aequa.drawing;

import aequa.colour.Rgb;
import aequa.colour.WcagContrast;

/**
 * The colour measures print checks need beyond WCAG contrast (which aequa.colour.WcagContrast computes):
 * lightness in greyscale and total ink.
 *
 * <p>Channels are 8-bit sRGB (IEC 61966-2-1). Results are plain doubles; no NaN is produced.
 */
public final class ColourMeasures {

    private ColourMeasures() {
    }

    /**
     * CIE 1976 lightness L* in [0, 100] of the colour's luminance (CIE 15:2004, eq. 8.1 with white Y = 1):
     * {@code L* = 116 f(Y) - 16}, {@code f(t) = cbrt(t)} above (6/29)^3, else {@code t / (3 (6/29)^2) + 4/29}.
     * This is the lightness the colour keeps when a page is printed or viewed in greyscale.
     */
    public static double greyLightness(Rgb colour) {
        double y = WcagContrast.relativeLuminance(colour);
        double delta = 6.0 / 29.0;
        double f = y > delta * delta * delta ? Math.cbrt(y) : y / (3 * delta * delta) + 4.0 / 29.0;
        return 116.0 * f - 16.0;
    }

    /**
     * Total ink coverage in percent (0 to 400) of the naive, profile-free sRGB to CMYK separation:
     * {@code K = 1 - max(R, G, B)}, then {@code C = (1 - R - K) / (1 - K)} and likewise M from G and Y from B,
     * with channels scaled to [0, 1] (common practice: the textbook conversion with full black generation).
     * It ignores press profiles, so it is a screening figure: a colour it flags will also be heavy on press,
     * but a colour it passes can still exceed a real profile's limit. Pure black gives 100 %; very dark
     * saturated colours approach 300 %.
     */
    public static double naiveTotalInkPercent(Rgb colour) {
        double r = colour.red() / 255.0;
        double g = colour.green() / 255.0;
        double b = colour.blue() / 255.0;
        double k = 1.0 - Math.max(r, Math.max(g, b));
        if (k >= 1.0) {
            return 100.0;
        }
        double c = (1.0 - r - k) / (1.0 - k);
        double m = (1.0 - g - k) / (1.0 - k);
        double y = (1.0 - b - k) / (1.0 - k);
        return 100.0 * (c + m + y + k);
    }
}
