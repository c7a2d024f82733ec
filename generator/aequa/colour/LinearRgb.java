package aequa.colour;

/**
 * A colour in linear-light sRGB (IEC 61966-2-1 primaries and D65 white), channels nominally in [0, 1];
 * values outside [0, 1] are out of the sRGB gamut.
 */
public record LinearRgb(double red, double green, double blue) {

    /** Tolerance for calling a colour in gamut; far below the 1/255 step of an 8-bit channel. */
    static final double GAMUT_EPSILON = 1e-7;

    public static LinearRgb of(Rgb rgb) {
        return new LinearRgb(SrgbTransfer.toLinear(rgb.red() / 255.0), SrgbTransfer.toLinear(rgb.green() / 255.0),
                SrgbTransfer.toLinear(rgb.blue() / 255.0));
    }

    public boolean inGamut() {
        return inUnit(red) && inUnit(green) && inUnit(blue);
    }

    /** The nearest 8-bit sRGB colour; channels are clamped to [0, 1] first, so call on in-gamut colours. */
    public Rgb toRgb() {
        return new Rgb(encode(red), encode(green), encode(blue));
    }

    /** Each channel clamped to [0, 1]. */
    public LinearRgb clamped() {
        return new LinearRgb(clamp(red), clamp(green), clamp(blue));
    }

    private static boolean inUnit(double channel) {
        return channel >= -GAMUT_EPSILON && channel <= 1 + GAMUT_EPSILON;
    }

    private static double clamp(double channel) {
        return Math.max(0, Math.min(1, channel));
    }

    private static int encode(double channel) {
        return (int) Math.round(SrgbTransfer.toEncoded(clamp(channel)) * 255);
    }
}
