package aequa.colour;

/**
 * Brings an OKLCh colour into the sRGB gamut by reducing its chroma at constant lightness and hue, rather
 * than clipping channels (clipping shifts hue and lightness). Same idea as the chroma-reduction gamut
 * mapping of CSS Color Module Level 4, section 13.2, without its final clip step: bisection finds the
 * largest in-gamut chroma to 1e-6. Lightness must lie in [0, 1], where the neutral (chroma 0) is in gamut.
 */
public final class GamutMapping {

    private static final int BISECTION_STEPS = 40;

    private GamutMapping() {
    }

    /** The in-gamut colour of the same lightness and hue with the largest chroma not above {@code colour}'s. */
    public static OkLch reduceChroma(OkLch colour) {
        if (!(colour.lightness() >= 0 && colour.lightness() <= 1)) {
            throw new IllegalArgumentException("lightness outside [0, 1]: " + colour.lightness());
        }
        if (colour.toOkLab().toLinearSrgb().inGamut()) {
            return colour;
        }
        double inside = 0;
        double outside = colour.chroma();
        for (int i = 0; i < BISECTION_STEPS; i++) {
            double mid = (inside + outside) / 2;
            if (new OkLch(colour.lightness(), mid, colour.hueDeg()).toOkLab().toLinearSrgb().inGamut()) {
                inside = mid;
            } else {
                outside = mid;
            }
        }
        return new OkLch(colour.lightness(), inside, colour.hueDeg());
    }

    /** {@link #reduceChroma}, then to 8-bit sRGB. */
    public static Rgb toRgb(OkLch colour) {
        return reduceChroma(colour).toOkLab().toLinearSrgb().toRgb();
    }
}
