package aequa.drawing;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;

/**
 * Hatch lines cut to a shape by geometry, not by an SVG clip path or pattern, so print files stay free of
 * clipping masks and every line is an ordinary, editable path. Lines run through the page at 45 or 135
 * degrees or level, anchored to the page origin, so neighbouring regions' hatching lines up.
 */
final class Hatching {

    /** Which way the lines run on the page. */
    enum Direction { RISING, FALLING, LEVEL }

    private static final GeometryFactory FACTORY = new GeometryFactory();

    private Hatching() {
    }

    /**
     * Lines rising to the right on the page (slope +1), falling (slope -1) or level, {@code spacingU} apart
     * measured perpendicular to the lines, intersected with {@code area} (page units). Uses OverlayNGRobust,
     * which does not fail on slightly invalid input where {@code Geometry.intersection} may throw a topology
     * exception (JTS 1.20); it is several times slower on large polygons, which hatching never meets.
     */
    static Geometry lines(Geometry area, double spacingU, Direction direction) {
        Envelope e = area.getEnvelopeInternal();
        if (e.isNull() || spacingU <= 0) {
            return FACTORY.createMultiLineString();
        }
        if (direction == Direction.LEVEL) {
            List<LineString> lines = new ArrayList<>();
            for (double y = Math.floor(e.getMinY() / spacingU) * spacingU; y <= e.getMaxY(); y += spacingU) {
                lines.add(FACTORY.createLineString(new Coordinate[]{new Coordinate(e.getMinX(), y), new Coordinate(e.getMaxX(), y)}));
            }
            return OverlayNGRobust.overlay(FACTORY.createMultiLineString(lines.toArray(new LineString[0])), area, OverlayNG.INTERSECTION);
        }
        boolean rising = direction == Direction.RISING;
        // on the page y grows downwards: a rising line has y + x constant, a falling one y - x constant
        double step = spacingU * Math.sqrt(2);
        double low = rising ? e.getMinX() + e.getMinY() : e.getMinY() - e.getMaxX();
        double high = rising ? e.getMaxX() + e.getMaxY() : e.getMaxY() - e.getMinX();
        List<LineString> lines = new ArrayList<>();
        for (double c = Math.floor(low / step) * step; c <= high; c += step) {
            Coordinate a;
            Coordinate b;
            if (rising) {
                a = new Coordinate(e.getMinX(), c - e.getMinX());
                b = new Coordinate(e.getMaxX(), c - e.getMaxX());
            } else {
                a = new Coordinate(e.getMinX(), c + e.getMinX());
                b = new Coordinate(e.getMaxX(), c + e.getMaxX());
            }
            lines.add(FACTORY.createLineString(new Coordinate[]{a, b}));
        }
        Geometry grid = FACTORY.createMultiLineString(lines.toArray(new LineString[0]));
        return OverlayNGRobust.overlay(grid, area, OverlayNG.INTERSECTION);
    }
}
