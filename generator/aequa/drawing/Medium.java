package aequa.drawing;

/**
 * The medium a drawing is laid out for, which fixes its page unit.
 *
 * <ul>
 *   <li>{@link #PRINT}: one unit is one millimetre; 1 pt = 25.4 / 72 mm (1 pt = 1/72 inch, 1 inch = 25.4 mm);
 *       coordinates are written to 0.01 mm.</li>
 *   <li>{@link #SCREEN}: one unit is one CSS pixel of the nominal width; 1 pt is 96 / 72 px (CSS Values and
 *       Units Level 3, absolute lengths), scaled up by {@code widthPx / 960} on wider drawings so type keeps
 *       its proportion to the map when the responsive SVG is shown at about 960 px (never scaled down, so
 *       narrow drawings keep legible type and the layout wraps instead); coordinates are written to
 *       0.1 px, a tenth of a pixel at the nominal width.</li>
 * </ul>
 */
public enum Medium {
    PRINT,
    SCREEN;

    /** The nominal width at which one point of type is 96/72 px on screen. */
    static final double SCREEN_REFERENCE_WIDTH_PX = 960.0;

    /** Page units per point of type or line weight, for a page {@code widthUnits} wide. */
    double unitsPerPt(double widthUnits) {
        return this == PRINT ? 25.4 / 72.0 : (96.0 / 72.0) * Math.max(1.0, widthUnits / SCREEN_REFERENCE_WIDTH_PX);
    }

    /** The number formatter for coordinates. */
    FixedDecimal coordinates() {
        return new FixedDecimal(this == PRINT ? 2 : 1);
    }
}
