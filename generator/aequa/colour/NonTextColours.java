package aequa.colour;

/**
 * The colours of map furniture that are not fills: region borders and the no-data hatch. No data is drawn
 * as hatch lines in {@link #noDataHatch} on the page colour {@link #noDataGround}, never as a ramp colour.
 *
 * <p>{@link #forBackground} chooses neutral greys (OKLCh chroma 0) of the opposite polarity to the page:
 * on a light page, dark lines at OKLab lightness {@value #BORDER_ON_LIGHT} (border) and
 * {@value #HATCH_ON_LIGHT} (hatch); on a dark page, light lines at {@value #BORDER_ON_DARK} and
 * {@value #HATCH_ON_DARK}. Both reach WCAG 2.2 non-text contrast 3:1 against any page of that polarity
 * (checked, and moved further from the page if not), and are far enough from mid-tones that ramp fills can
 * also keep 3:1 against them (see {@link ColourRamps}).
 *
 * @param background   the page colour
 * @param border       region borders
 * @param noDataHatch  the hatch lines of regions without data
 * @param noDataGround the ground under the hatch lines (the page colour)
 */
public record NonTextColours(Rgb background, Rgb border, Rgb noDataHatch, Rgb noDataGround) {

    static final double BORDER_ON_LIGHT = 0.20;
    static final double HATCH_ON_LIGHT = 0.20;
    static final double BORDER_ON_DARK = 0.93;
    static final double HATCH_ON_DARK = 0.93;
    private static final double LIGHTNESS_STEP = 0.01;

    /** Border and hatch colours that meet 3:1 against {@code background} (guaranteed; black or white at worst). */
    public static NonTextColours forBackground(Rgb background) {
        boolean lightPage = isLight(background);
        Rgb border = neutralMeeting(lightPage ? BORDER_ON_LIGHT : BORDER_ON_DARK, lightPage, background);
        Rgb hatch = neutralMeeting(lightPage ? HATCH_ON_LIGHT : HATCH_ON_DARK, lightPage, background);
        return new NonTextColours(background, border, hatch, background);
    }

    /** Whether black contrasts at least as much with {@code colour} as white does (a "light" page). */
    static boolean isLight(Rgb colour) {
        return WcagContrast.labelColour(colour).equals(WcagContrast.DARK_TEXT); // dark text reads best on it
    }

    /** The neutral at {@code lightness}, moved away from the page until it reaches 3:1 against it. */
    private static Rgb neutralMeeting(double lightness, boolean lightPage, Rgb background) {
        double l = lightness;
        Rgb grey = neutral(l);
        while (WcagContrast.ratio(grey, background) < WcagContrast.NON_TEXT_MINIMUM && l > 0 && l < 1) {
            l = lightPage ? Math.max(0, l - LIGHTNESS_STEP) : Math.min(1, l + LIGHTNESS_STEP);
            grey = neutral(l);
        }
        return grey;
    }

    static Rgb neutral(double lightness) {
        return new OkLch(lightness, 0, 0).toOkLab().toLinearSrgb().toRgb();
    }
}
