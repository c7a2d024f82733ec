package aequa.drawing;

/**
 * The physical size of a print drawing.
 *
 * @param widthMm  the exact width in millimetres, 20 to 1000
 * @param heightMm the exact height in millimetres, or NaN to let the content decide (map aspect plus
 *                 legend and caption); when given, the map shrinks to leave room for the furniture
 */
public record PrintSize(double widthMm, double heightMm) {

    public PrintSize {
        if (!(widthMm >= 20 && widthMm <= 1000)) {
            throw new IllegalArgumentException("print width must be 20..1000 mm: " + widthMm);
        }
        if (!Double.isNaN(heightMm) && !(heightMm >= 20 && heightMm <= 2000)) {
            throw new IllegalArgumentException("print height must be 20..2000 mm or NaN: " + heightMm);
        }
    }

    /**
     * The least height of a composite map's frame-name band, as a share of the map's drawn width, at which a
     * frame's name fits at {@code theme}'s smallest type in a print of this width (the print is the narrowest
     * drawing; the load step lays out the print's frames with it, see {@code LoadOptions.frameNameBands}).
     */
    public double frameNameBandShare(Theme theme) {
        double innerPt = widthMm * Layout.PT_PER_MM - 2 * Layout.MARGIN_PT;
        return Math.min(0.5, PartFrames.nameBandPt(theme, theme.typePt().minimum()) / innerPt);
    }

    public static PrintSize of(PrintPreset preset) {
        return new PrintSize(preset.widthMm(), Double.NaN);
    }

    public static PrintSize width(double widthMm) {
        return new PrintSize(widthMm, Double.NaN);
    }
}
