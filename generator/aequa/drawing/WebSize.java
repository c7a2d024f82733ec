package aequa.drawing;

/**
 * The nominal size of a web drawing: the width of its viewBox in CSS pixels. The SVG itself scales to its
 * container; the nominal width sets type sizes and coordinate precision.
 *
 * @param widthPx 200 to 4000
 */
public record WebSize(int widthPx) {

    public static final WebSize STANDARD = new WebSize(1200);

    public WebSize {
        if (widthPx < 200 || widthPx > 4000) {
            throw new IllegalArgumentException("web width must be 200..4000 px: " + widthPx);
        }
    }

    /**
     * The least height of a composite map's frame-name band, as a share of the map's drawn width, at which a
     * frame's name is set at {@code theme}'s legend size in a web drawing of this width (and of any wider one:
     * screen type grows with the width past the reference width); the load step lays out the site's frames
     * with it, see {@code LoadOptions.frameNameBands}.
     */
    public double frameNameBandShare(Theme theme) {
        double unitsPerPt = Medium.SCREEN.unitsPerPt(widthPx);
        double innerU = widthPx - 2 * Layout.MARGIN_PT * unitsPerPt;
        return Math.min(0.5, PartFrames.nameBandPt(theme, theme.typePt().legend()) * unitsPerPt / innerU);
    }
}
