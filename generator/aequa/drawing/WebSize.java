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
}
