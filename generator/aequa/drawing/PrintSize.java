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

    public static PrintSize of(PrintPreset preset) {
        return new PrintSize(preset.widthMm(), Double.NaN);
    }

    public static PrintSize width(double widthMm) {
        return new PrintSize(widthMm, Double.NaN);
    }
}
