package aequa.colour;

/**
 * A colour in OKLab (Ottosson, B. 2020, "A perceptual color space for image processing",
 * bottosson.github.io/posts/oklab). Lightness is 0 for black and 1 for the D65 white; a and b are
 * opponent axes (green-red, blue-yellow), in practice within +-0.4. Differences are Euclidean
 * ({@link #deltaE}); one just-noticeable difference is about 0.02 (the JND constant of CSS Color
 * Module Level 4, section 13.2, "gamut mapping").
 *
 * <p>Conversions follow the post's sections "Converting from XYZ to Oklab" (matrices M1 and M2 with a cube
 * root between them) and "Converting from linear sRGB to Oklab" (M1 pre-multiplied by the sRGB-to-XYZ
 * matrix, and the published inverses). The coefficients are the post's own, to its 10 decimals.
 */
public record OkLab(double lightness, double a, double b) {

    /** Ottosson 2020, "Converting from XYZ to Oklab": M1, XYZ (D65) to approximate cone responses. */
    private static final double[][] XYZ_TO_LMS = {
            {0.8189330101, 0.3618667424, -0.1288597137},
            {0.0329845436, 0.9293118715, 0.0361456387},
            {0.0482003018, 0.2643662691, 0.6338517070}};
    /** Ottosson 2020, "Converting from XYZ to Oklab": M2, cube-rooted cone responses to L, a, b. */
    private static final double[][] LMS_TO_LAB = {
            {0.2104542553, 0.7936177850, -0.0040720468},
            {1.9779984951, -2.4285922050, 0.4505937099},
            {0.0259040371, 0.7827717662, -0.8086757660}};
    /** Ottosson 2020, "Converting from linear sRGB to Oklab": linear sRGB to cone responses. */
    private static final double[][] SRGB_TO_LMS = {
            {0.4122214708, 0.5363325363, 0.0514459929},
            {0.2119034982, 0.6806995451, 0.1073969566},
            {0.0883024619, 0.2817188376, 0.6299787005}};
    /** Ottosson 2020, same section: the inverse of M2. */
    private static final double[][] LAB_TO_LMS = {
            {1.0, 0.3963377774, 0.2158037573},
            {1.0, -0.1055613458, -0.0638541728},
            {1.0, -0.0894841775, -1.2914855480}};
    /** Ottosson 2020, same section: cone responses back to linear sRGB. */
    private static final double[][] LMS_TO_SRGB = {
            {4.0767416621, -3.3077115913, 0.2309699292},
            {-1.2684380046, 2.6097574011, -0.3413193965},
            {-0.0041960863, -0.7034186147, 1.7076147010}};

    /** From CIE XYZ relative to D65 (Y = 1 for the white). */
    public static OkLab fromXyz(double x, double y, double z) {
        double[] lms = multiply(XYZ_TO_LMS, x, y, z);
        return fromLms(lms);
    }

    public static OkLab fromLinearSrgb(LinearRgb rgb) {
        return fromLms(multiply(SRGB_TO_LMS, rgb.red(), rgb.green(), rgb.blue()));
    }

    public static OkLab fromRgb(Rgb rgb) {
        return fromLinearSrgb(LinearRgb.of(rgb));
    }

    /** Linear sRGB; channels outside [0, 1] mean the colour is outside the sRGB gamut. */
    public LinearRgb toLinearSrgb() {
        double[] root = multiply(LAB_TO_LMS, lightness, a, b);
        double[] lms = multiply(LMS_TO_SRGB, cube(root[0]), cube(root[1]), cube(root[2]));
        return new LinearRgb(lms[0], lms[1], lms[2]);
    }

    /** Euclidean distance in OKLab (Ottosson 2020 designs the space so that this tracks perceived difference). */
    public double deltaE(OkLab other) {
        double dl = lightness - other.lightness;
        double da = a - other.a;
        double db = b - other.b;
        return Math.sqrt(dl * dl + da * da + db * db);
    }

    private static OkLab fromLms(double[] lms) {
        // Math.cbrt keeps the sign, as the post's reference code does for out-of-gamut inputs
        double[] lab = multiply(LMS_TO_LAB, Math.cbrt(lms[0]), Math.cbrt(lms[1]), Math.cbrt(lms[2]));
        return new OkLab(lab[0], lab[1], lab[2]);
    }

    private static double cube(double v) {
        return v * v * v;
    }

    static double[] multiply(double[][] m, double x, double y, double z) {
        return new double[] {
                m[0][0] * x + m[0][1] * y + m[0][2] * z,
                m[1][0] * x + m[1][1] * y + m[1][2] * z,
                m[2][0] * x + m[2][1] * y + m[2][2] * z};
    }
}
