package aequa.atlas;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;

import aequa.planar.AreaAudit;
import aequa.projection.ProjectionChoice;
import aequa.wording.NumberWriter;
import aequa.wording.Wording;

/**
 * One part of a composite map: the main part, or a detached part drawn in a frame on its own projection.
 * Coordinates are metres on the map's plane (the main part's projection plane, where every framed part has
 * been moved to its place).
 *
 * @param id         {@code main}, {@code part-1}, ...
 * @param name       the name on its frame
 * @param keys       its regions' keys, sorted
 * @param main       whether this is the main part (no frame)
 * @param areaScale  its area scale relative to the main part (1 keeps areas comparable across the map)
 * @param projection its projection and the evidence for it
 * @param areaAudit  its area proof, against its own area scale
 * @param areaKm2    the geodesic area of its regions
 * @param gapKm      its geodesic gap to the main part when the parts were found automatically, else NaN
 * @param frame      its frame (for the main part, the extent of its regions)
 * @param nameBandM  the height of the name band at the top of the frame (0 for the main part)
 * @param nameLines  the lines the name band holds: 1, or up to {@code PartLayout.MAX_NAME_LINES} for a long name (0 for the main part)
 * @param scaleBandM the height of the band at the bottom of the frame that holds the part's own area-scale
 *                   square (0 unless the part is drawn at another area scale than the main part)
 * @param print      where print places the part instead (frame, name and area-scale bands are for the site's
 *                   drawings, whose names are set larger against the map than a narrow print's)
 */
public record MapPart(String id, String name, List<String> keys, boolean main, double areaScale,
                      ProjectionChoice projection, AreaAudit areaAudit, double areaKm2, double gapKm, Frame frame,
                      double nameBandM, int nameLines, double scaleBandM, PrintPlace print) {

    public MapPart {
        keys = List.copyOf(keys);
        java.util.Objects.requireNonNull(print, "print");
    }

    /**
     * Where print places a part: its regions moved by ({@code dxM}, {@code dyM}) from where the site's drawings
     * place them, its frame and bands as {@link MapPart}'s.
     */
    public record PrintPlace(double dxM, double dyM, Frame frame, double nameBandM, int nameLines, double scaleBandM) {
    }

    /** This part as print places it (its print place then moves it no further). */
    public MapPart inPrint() {
        return new MapPart(id, name, keys, main, areaScale, projection, areaAudit, areaKm2, gapKm, print.frame(),
                print.nameBandM(), print.nameLines(), print.scaleBandM(),
                new PrintPlace(0, 0, print.frame(), print.nameBandM(), print.nameLines(), print.scaleBandM()));
    }

    /** Whether print moves the part from where the site's drawings place it. */
    public boolean movedInPrint() {
        return print.dxM() != 0 || print.dyM() != 0;
    }

    /** The part's name for readers: the main part is called "Main map" in the reader's language. */
    public String nameIn(Wording w) {
        return main ? w.text("part.mainName") : name;
    }

    /**
     * The text on the part's frame in the reader's language: its name, and for a part at another area scale how its
     * areas compare, for example "Alaska (areas at 0.25 × the main map)".
     */
    public String frameLabel(Wording w) {
        return frameLabel(name, areaScale, w);
    }

    /**
     * The frame's text in two lines, for a frame too narrow for one: the name, then how its areas compare; a
     * part at the main scale has its name broken by the drawing instead, so this is empty for it.
     */
    public List<String> frameLabelLines(Wording w) {
        return frameLabelLines(name, areaScale, w);
    }

    static String frameLabel(String name, double areaScale, Wording w) {
        return areaScale == 1 ? name : name + " " + scaleNote(areaScale, w);
    }

    static List<String> frameLabelLines(String name, double areaScale, Wording w) {
        return areaScale == 1 ? List.of() : List.of(name, scaleNote(areaScale, w));
    }

    private static String scaleNote(double areaScale, Wording w) {
        return w.text("draw.frameScale", "scale", areaScaleText(areaScale, w.numbers()));
    }

    /** The area scale as readers of {@code numbers}' language see it: at most three significant digits ("0.25", "0,25"). */
    public String areaScaleText(NumberWriter numbers) {
        return areaScaleText(areaScale, numbers);
    }

    private static String areaScaleText(double areaScale, NumberWriter numbers) {
        return numbers.significant(BigDecimal.valueOf(areaScale).round(new MathContext(3)).doubleValue());
    }

    /** A rectangle on the map's plane, metres. */
    public record Frame(double minXM, double minYM, double maxXM, double maxYM) {

        /** Whether the point lies in the rectangle or on its edge. */
        public boolean contains(double xM, double yM) {
            return xM >= minXM && xM <= maxXM && yM >= minYM && yM <= maxYM;
        }
    }
}
