package aequa.drawing;

import java.awt.geom.Path2D;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

import aequa.planar.LongIntTable;

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
        // every distinct rounded point gets a number, every segment the pair of its points' numbers, and a
        // segment's uses are counted on primitive arrays: boxed keys in a HashMap were most of the time
        LongIntTable pointNumbers = new LongIntTable(vertices);
        LongIntTable segmentUses = new LongIntTable(vertices);
        forEachSegment(pageGeometries, quantum, pointNumbers, (segment, ax, ay, bx, by) -> {
            int uses = segmentUses.get(segment);
            segmentUses.put(segment, uses < 0 ? 1 : uses + 1);
        });
        Path2D.Double inner = new Path2D.Double();
        Path2D.Double outer = new Path2D.Double();
        double[] innerEnd = {Double.NaN, Double.NaN};
        double[] outerEnd = {Double.NaN, Double.NaN};
        forEachSegment(pageGeometries, quantum, pointNumbers, (segment, ax, ay, bx, by) -> {
            int uses = segmentUses.get(segment);
            if (uses == DRAWN) {
                return;
            }
            segmentUses.put(segment, DRAWN);
            boolean shared = uses > 1;
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

    /** The uses recorded for a segment once it is drawn (no segment has so many rings). */
    private static final int DRAWN = Integer.MAX_VALUE;

    private interface SegmentVisitor {
        /** {@code segment}: the numbers of its two points, smaller first, packed in one long (direction-free). */
        void visit(long segment, double ax, double ay, double bx, double by);
    }

    private static void forEachSegment(List<Geometry> geometries, double quantum, LongIntTable pointNumbers,
                                       SegmentVisitor visitor) {
        for (Geometry geometry : geometries) {
            for (int i = 0; i < geometry.getNumGeometries(); i++) {
                Geometry part = geometry.getGeometryN(i);
                if (!(part instanceof Polygon)) {
                    continue;
                }
                Polygon polygon = (Polygon) part;
                ringSegments(polygon.getExteriorRing(), quantum, pointNumbers, visitor);
                for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                    ringSegments(polygon.getInteriorRingN(h), quantum, pointNumbers, visitor);
                }
            }
        }
    }

    private static void ringSegments(LineString ring, double quantum, LongIntTable pointNumbers, SegmentVisitor visitor) {
        Coordinate[] cs = ring.getCoordinates();
        if (cs.length < 2) {
            return;
        }
        long previousX = Math.round(cs[0].x / quantum);
        long previousY = Math.round(cs[0].y / quantum);
        int previous = pointNumber(pointNumbers, previousX, previousY);
        for (int i = 1; i < cs.length; i++) {
            long x = Math.round(cs[i].x / quantum);
            long y = Math.round(cs[i].y / quantum);
            if (x == previousX && y == previousY) {
                continue;
            }
            int point = pointNumber(pointNumbers, x, y);
            long segment = previous < point ? (long) previous << 32 | point : (long) point << 32 | previous;
            visitor.visit(segment, previousX * quantum, previousY * quantum, x * quantum, y * quantum);
            previousX = x;
            previousY = y;
            previous = point;
        }
    }

    /** The number of the rounded point (x, y) in page quanta, a new one the first time it is met. */
    private static int pointNumber(LongIntTable pointNumbers, long x, long y) {
        long key = pack(x, y);
        int number = pointNumbers.get(key);
        if (number < 0) {
            number = pointNumbers.size();
            pointNumbers.put(key, number);
        }
        return number;
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
