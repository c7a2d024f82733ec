package aequa.colour;

/**
 * Contrast by WCAG 2.2 (W3C Recommendation, 2023): "relative luminance" and "contrast ratio" as defined
 * in its Glossary, and the thresholds of success criteria 1.4.3 (text, 4.5:1)
 * and 1.4.11 (non-text, 3:1).
 */
public final class WcagContrast {

    /** WCAG 2.2 SC 1.4.3 Contrast (Minimum), level AA, normal-size text. */
    public static final double TEXT_MINIMUM = 4.5;
    /** WCAG 2.2 SC 1.4.11 Non-text Contrast, level AA: graphical objects and their adjacent colours. */
    public static final double NON_TEXT_MINIMUM = 3.0;

    /** Text drawn on dark fills. */
    public static final Rgb LIGHT_TEXT = new Rgb(255, 255, 255);
    /** Text drawn on light fills. */
    public static final Rgb DARK_TEXT = new Rgb(0, 0, 0);

    private WcagContrast() {
    }

    /**
     * WCAG 2.2 relative luminance: {@code L = 0.2126 R + 0.7152 G + 0.0722 B} of the linearised channels
     * (the IEC 61966-2-1 curve, {@link SrgbTransfer#toLinear}); 0 for black, 1 for white.
     */
    public static double relativeLuminance(Rgb colour) {
        LinearRgb linear = LinearRgb.of(colour);
        return 0.2126 * linear.red() + 0.7152 * linear.green() + 0.0722 * linear.blue();
    }

    /** WCAG 2.2 contrast ratio {@code (L1 + 0.05) / (L2 + 0.05)}, L1 the lighter; from 1 to 21, symmetric. */
    public static double ratio(Rgb first, Rgb second) {
        double l1 = relativeLuminance(first);
        double l2 = relativeLuminance(second);
        return (Math.max(l1, l2) + 0.05) / (Math.min(l1, l2) + 0.05);
    }

    /**
     * Black or white text, whichever contrasts more with {@code fill}. Always at least 4.5:1: the two
     * ratios multiply to (1.05 / 0.05) = 21, so the larger is at least sqrt(21) = 4.58.
     */
    public static Rgb labelColour(Rgb fill) {
        return ratio(DARK_TEXT, fill) >= ratio(LIGHT_TEXT, fill) ? DARK_TEXT : LIGHT_TEXT;
    }
}
