package aequa.ellipsoid;

import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.impl.PackedCoordinateSequence;

/**
 * Adds vertices along edges that are straight in longitude/latitude (as GeoJSON edges are, RFC 7946,
 * section 3.1.1), so that once projected they follow the curve the projection gives them.
 *
 * <p>Guarantee that keeps coverages intact: the vertices added on an edge depend only on the edge's two end
 * points, not on its direction or on the ring it belongs to. Two regions that share an edge (in either
 * direction) get bit-identical vertices on it, which coverage simplification and validation need. Each
 * edge gets {@code ceil(max(|dLon|, |dLat|) / maxStepDeg) - 1} evenly spaced vertices, computed from the
 * lexicographically smaller end point.
 */
public final class LonLatDensifier {

    /** Metres per degree of latitude, rounded (WGS 84 meridian arc: 110,574 m at the equator to 111,694 m at the poles). */
    private static final double METRES_PER_DEG = 111_320;

    /** Vertices are this many output pixels (or millimetres, for print) apart at most: our choice, see {@link #stepDeg}. */
    private static final double OUTPUT_UNITS_PER_STEP = 2;

    private LonLatDensifier() {
    }

    /**
     * The densification step for a map drawn {@code outputWidth} pixels (or mm) wide that spans {@code mapWidthM}
     * metres: two output units per step, so a projected edge bends at most by its sagitta over two pixels,
     * far below what an eye sees. Clamped to [0.001, {@value #MAX_STEP_DEG}] degree: finer steps add vertices
     * with no visible gain; coarser ones let the map's straight projected edges drift from the geodesic
     * edges the area is measured along, and the area audit fails for small regions (measured on the world
     * file at 1:110m: Luxembourg's map/geodesic area ratio is off by 1.5e-4 at 0.25 deg steps; the error
     * falls with the square of the step, to about 6e-6 at 0.05 deg; PolygonProjectorTest re-derives it).
     */
    public static double stepDeg(double mapWidthM, double outputWidth) {
        double metresPerStep = OUTPUT_UNITS_PER_STEP * mapWidthM / outputWidth;
        return Math.max(0.001, Math.min(MAX_STEP_DEG, metresPerStep / METRES_PER_DEG));
    }

    /** The coarsest step {@link #stepDeg} returns, degrees; see there. */
    public static final double MAX_STEP_DEG = 0.05;

    /**
     * @param lonLat     Polygon or MultiPolygon, lon/lat degrees
     * @param maxStepDeg the largest step in longitude or latitude between consecutive vertices, degrees (&gt; 0)
     * @return a geometry of the same type with the same factory; the input is not changed. When no edge is
     *         longer than the step, the input itself is returned (JTS geometries are treated as immutable
     *         throughout aequa), so an already dense source costs neither time nor heap here.
     */
    public static Geometry densify(Geometry lonLat, double maxStepDeg) {
        if (!(maxStepDeg > 0)) {
            throw new IllegalArgumentException("maxStepDeg must be positive: " + maxStepDeg);
        }
        return densify(lonLat, EdgeSteps.uniform(maxStepDeg));
    }

    /** As {@link #densify(Geometry, double)}, with each edge's step from {@code steps} (finer on thin regions). */
    public static Geometry densify(Geometry lonLat, EdgeSteps steps) {
        if (!needsVertices(lonLat, steps)) {
            return lonLat;
        }
        GeometryFactory factory = lonLat.getFactory();
        Polygon[] parts = new Polygon[lonLat.getNumGeometries()];
        for (int i = 0; i < parts.length; i++) {
            Polygon polygon = (Polygon) lonLat.getGeometryN(i);
            if (polygon.isEmpty()) {
                parts[i] = polygon;
                continue;
            }
            LinearRing shell = factory.createLinearRing(densify(polygon.getExteriorRing().getCoordinateSequence(), steps));
            LinearRing[] holes = new LinearRing[polygon.getNumInteriorRing()];
            for (int h = 0; h < holes.length; h++) {
                holes[h] = factory.createLinearRing(densify(polygon.getInteriorRingN(h).getCoordinateSequence(), steps));
            }
            parts[i] = factory.createPolygon(shell, holes);
        }
        if (lonLat instanceof Polygon) {
            return parts[0];
        }
        return factory.createMultiPolygon(parts);
    }

    /** Densifies one closed ring; returns a packed 2-D sequence. */
    public static CoordinateSequence densify(CoordinateSequence ring, double maxStepDeg) {
        return densify(ring, EdgeSteps.uniform(maxStepDeg));
    }

    private static CoordinateSequence densify(CoordinateSequence ring, EdgeSteps edgeSteps) {
        int n = ring.size();
        int total = n;
        for (int i = 0; i + 1 < n; i++) {
            total += steps(ring.getX(i), ring.getY(i), ring.getX(i + 1), ring.getY(i + 1), edgeSteps) - 1;
        }
        double[] out = new double[2 * total];
        int k = 0;
        for (int i = 0; i + 1 < n; i++) {
            double x0 = ring.getX(i);
            double y0 = ring.getY(i);
            double x1 = ring.getX(i + 1);
            double y1 = ring.getY(i + 1);
            out[k++] = x0;
            out[k++] = y0;
            int steps = steps(x0, y0, x1, y1, edgeSteps);
            boolean forward = x0 < x1 || (x0 == x1 && y0 <= y1);
            double ax = forward ? x0 : x1;
            double ay = forward ? y0 : y1;
            double dx = (forward ? x1 : x0) - ax;
            double dy = (forward ? y1 : y0) - ay;
            for (int s = 1; s < steps; s++) {
                int j = forward ? s : steps - s;
                double t = (double) j / steps;
                out[k++] = ax + dx * t;
                out[k++] = ay + dy * t;
            }
        }
        out[k++] = ring.getX(n - 1);
        out[k++] = ring.getY(n - 1);
        return new PackedCoordinateSequence.Double(out, 2, 0);
    }

    private static boolean needsVertices(Geometry lonLat, EdgeSteps edgeSteps) {
        for (int i = 0; i < lonLat.getNumGeometries(); i++) {
            Polygon polygon = (Polygon) lonLat.getGeometryN(i);
            if (polygon.isEmpty()) {
                continue;
            }
            if (needsVertices(polygon.getExteriorRing().getCoordinateSequence(), edgeSteps)) {
                return true;
            }
            for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                if (needsVertices(polygon.getInteriorRingN(h).getCoordinateSequence(), edgeSteps)) {
                    return true;
                }
            }
        }
        return false;
    }

    private static boolean needsVertices(CoordinateSequence ring, EdgeSteps edgeSteps) {
        for (int i = 0; i + 1 < ring.size(); i++) {
            if (steps(ring.getX(i), ring.getY(i), ring.getX(i + 1), ring.getY(i + 1), edgeSteps) > 1) {
                return true;
            }
        }
        return false;
    }

    private static int steps(double x0, double y0, double x1, double y1, EdgeSteps steps) {
        double span = Math.max(Math.abs(x1 - x0), Math.abs(y1 - y0));
        return Math.max(1, (int) Math.ceil(span / steps.stepDeg(x0, y0, x1, y1)));
    }
}
