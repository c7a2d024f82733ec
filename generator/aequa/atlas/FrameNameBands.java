package aequa.atlas;

/**
 * The least heights of a composite map's frame-name bands, each as a share of the map's drawn width: one for the
 * site's drawings (web SVG and PNG, names at the legend's size) and one for print (SVG and PDF at the project's
 * print width, names at the print theme's smallest type). Each gets its own layout of the frames, since a name that
 * fits a wide screen drawing may take a quarter of a narrow print; 0 keeps the layout's own proportions.
 *
 * @param webShare   for the site's drawings
 * @param printShare for print
 */
public record FrameNameBands(double webShare, double printShare) {

    /** The layout's own proportions for every drawing. */
    public static final FrameNameBands OWN_PROPORTIONS = new FrameNameBands(0, 0);

    public FrameNameBands {
        if (!(webShare >= 0 && webShare < 1) || !(printShare >= 0 && printShare < 1)) {
            throw new IllegalArgumentException("frame name band shares must be in [0, 1): " + webShare + ", " + printShare);
        }
    }
}
