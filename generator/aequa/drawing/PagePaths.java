package aequa.drawing;

import java.awt.geom.Path2D;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * Turns page-unit geometry into {@link Path2D}s rounded to the output precision, and extracts the border
 * network of a polygon coverage.
 *
 * <p>Rounding here, before JFreeSVG sees the numbers, lets consecutive vertices that would be written the
 * same be dropped (lossless at the written precision), and makes the two sides of a shared edge identical,
 * which is what lets {@link #borders} find shared edges by exact comparison.
 */
final class PagePaths {

    private PagePaths() {
    }

    /**
     * The filled outline of a Polygon or MultiPolygon; empty for other types. Holes are cut by the even-odd
     * rule (JTS does not fix ring orientation); without holes the default non-zero rule gives the same
     * picture and saves the {@code fill-rule} attribute.
     */
    static Path2D.Double area(Geometry pageGeometry, FixedDecimal precision) {
        boolean holes = false;
        for (int i = 0; i < pageGeometry.getNumGeometries(); i++) {
            Geometry part = pageGeometry.getGeometryN(i);
            holes |= part instanceof Polygon && ((Polygon) part).getNumInteriorRing() > 0;
        }
        Path2D.Double path = new Path2D.Double(holes ? Path2D.WIND_EVEN_ODD : Path2D.WIND_NON_ZERO);
        for (int i = 0; i < pageGeometry.getNumGeometries(); i++) {
            Geometry part = pageGeometry.getGeometryN(i);
            if (part instanceof Polygon) {
                Polygon polygon = (Polygon) part;
                ring(path, polygon.getExteriorRing(), precision);
                for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                    ring(path, polygon.getInteriorRingN(h), precision);
                }
            }
        }
        return path;
    }

    /** Open polylines (LineString or MultiLineString) as a stroked path. */
    static Path2D.Double lines(Geometry pageGeometry, FixedDecimal precision) {
        Path2D.Double path = new Path2D.Double();
        for (int i = 0; i < pageGeometry.getNumGeometries(); i++) {
            Geometry part = pageGeometry.getGeometryN(i);
            if (part instanceof LineString) {
                Coordinate[] cs = part.getCoordinates();
                double lastX = Double.NaN;
                double lastY = Double.NaN;
                int drawn = 0;
                for (Coordinate c : cs) {
                    double x = precision.round(c.x);
                    double y = precision.round(c.y);
                    if (x == lastX && y == lastY) {
                        continue;
                    }
                    if (drawn == 0) {
                        path.moveTo(x, y);
                    } else {
                        path.lineTo(x, y);
                    }
                    drawn++;
                    lastX = x;
                    lastY = y;
                }
            }
        }
        return path;
    }

    /**
     * The border network of a coverage: every rounded segment used by two rings is an inner border, drawn
     * once; every segment used by one ring is on the outer edge. Iteration follows the given order of
     * geometries and vertices, so the result is deterministic.
     *
     * @return {@code [inner, outer]}
     */
    static Path2D.Double[] borders(List<Geometry> pageGeometries, FixedDecimal precision) {
        double quantum = precision.quantum();
        int vertices = 0;
        for (Geometry g : pageGeometries) {
            vertices += g.getNumPoints();
        }
        // sized for every segment up front: rehashing was a visible share of the time on 3,000-region maps
        Map<Segment, Integer> uses = new HashMap<>(vertices * 2);
        forEachSegment(pageGeometries, quantum, (s, ax, ay, bx, by) -> uses.merge(s, 1, Integer::sum));
        Path2D.Double inner = new Path2D.Double();
        Path2D.Double outer = new Path2D.Double();
        Map<Segment, Boolean> emitted = new HashMap<>(vertices * 2);
        double[] innerEnd = {Double.NaN, Double.NaN};
        double[] outerEnd = {Double.NaN, Double.NaN};
        forEachSegment(pageGeometries, quantum, (s, ax, ay, bx, by) -> {
            boolean shared = uses.get(s) > 1;
            if (emitted.putIfAbsent(s, Boolean.TRUE) != null) {
                return;
            }
            Path2D.Double target = shared ? inner : outer;
            double[] end = shared ? innerEnd : outerEnd;
            if (ax != end[0] || ay != end[1]) {
                target.moveTo(ax, ay);
            }
            target.lineTo(bx, by);
            end[0] = bx;
            end[1] = by;
        });
        return new Path2D.Double[]{inner, outer};
    }

    private interface SegmentVisitor {
        void visit(Segment key, double ax, double ay, double bx, double by);
    }

    /** A segment between two quantised points, direction-free. */
    private record Segment(long from, long to) {
        static Segment of(long a, long b) {
            return a < b ? new Segment(a, b) : new Segment(b, a);
        }
    }

    private static void forEachSegment(List<Geometry> geometries, double quantum, SegmentVisitor visitor) {
        for (Geometry geometry : geometries) {
            for (int i = 0; i < geometry.getNumGeometries(); i++) {
                Geometry part = geometry.getGeometryN(i);
                if (!(part instanceof Polygon)) {
                    continue;
                }
                Polygon polygon = (Polygon) part;
                ringSegments(polygon.getExteriorRing(), quantum, visitor);
                for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                    ringSegments(polygon.getInteriorRingN(h), quantum, visitor);
                }
            }
        }
    }

    private static void ringSegments(LineString ring, double quantum, SegmentVisitor visitor) {
        Coordinate[] cs = ring.getCoordinates();
        if (cs.length < 2) {
            return;
        }
        long previousX = Math.round(cs[0].x / quantum);
        long previousY = Math.round(cs[0].y / quantum);
        for (int i = 1; i < cs.length; i++) {
            long x = Math.round(cs[i].x / quantum);
            long y = Math.round(cs[i].y / quantum);
            if (x == previousX && y == previousY) {
                continue;
            }
            Segment key = Segment.of(pack(previousX, previousY), pack(x, y));
            visitor.visit(key, previousX * quantum, previousY * quantum, x * quantum, y * quantum);
            previousX = x;
            previousY = y;
        }
    }

    private static long pack(long x, long y) {
        return (x << 32) ^ (y & 0xffffffffL);
    }

    private static void ring(Path2D.Double path, LineString ring, FixedDecimal precision) {
        Coordinate[] cs = ring.getCoordinates();
        double lastX = Double.NaN;
        double lastY = Double.NaN;
        int distinct = 0;
        double[] xs = new double[cs.length];
        double[] ys = new double[cs.length];
        for (Coordinate c : cs) {
            double x = precision.round(c.x);
            double y = precision.round(c.y);
            if (x == lastX && y == lastY) {
                continue;
            }
            xs[distinct] = x;
            ys[distinct] = y;
            distinct++;
            lastX = x;
            lastY = y;
        }
        if (distinct > 1 && xs[0] == xs[distinct - 1] && ys[0] == ys[distinct - 1]) {
            distinct--;
        }
        if (distinct < 3) {
            return;
        }
        path.moveTo(xs[0], ys[0]);
        for (int i = 1; i < distinct; i++) {
            path.lineTo(xs[i], ys[i]);
        }
        path.closePath();
    }
}
