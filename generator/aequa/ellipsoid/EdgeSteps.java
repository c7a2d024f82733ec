package aequa.ellipsoid;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

/**
 * The densification step of every edge of a layer of regions: a uniform step, made finer on the edges of the
 * regions that are too small or too thin for it, so that the straight chords drawn between densified vertices
 * enclose the region's true area (the lon/lat-straight one, {@link LonLatArea}) within a relative error.
 *
 * <p>Why: a chord of a projected parallel cuts off a lens of about R^2 cos^2(phi) |sin(phi)| dLon^3 / 12
 * (a map with little distortion draws a geodesic nearly straight, and the geodesic between two points of a
 * parallel leaves it by sin(phi) cos(phi) dLon^2 / 8 at its middle: spherical trigonometry, e.g. Snyder 1987,
 * eq. 5-5 ff.; the lens is 2/3 of chord times sagitta). That is nothing for a county-sized region and 2.6e-4
 * of a 1.6 km^2 sliver (county 51685 of the US Census file) at 0.05 deg steps, above the default area
 * tolerance. The estimate here sums that bound over a region's edges; the area audit, not this estimate,
 * proves the result.
 *
 * <p>Guarantee kept from {@link LonLatDensifier}: an edge's step depends only on its two end points (in
 * either order) and the layer, so neighbours that share an edge get the same vertices on it.
 */
public final class EdgeSteps {

    /** Mean Earth radius, metres (IUGG R1), enough for an error estimate. */
    private static final double RADIUS_M = 6_371_008.8;

    /** No edge is cut finer than this, in degrees, however thin its region: bounds the vertex count. */
    static final double FINEST_STEP_DEG = 0.0005;

    private final double stepDeg;
    private final Map<Edge, Double> finer;

    private EdgeSteps(double stepDeg, Map<Edge, Double> finer) {
        this.stepDeg = stepDeg;
        this.finer = finer;
    }

    /** The same step on every edge. */
    public static EdgeSteps uniform(double stepDeg) {
        return new EdgeSteps(stepDeg, Map.of());
    }

    /**
     * Steps for a layer: {@code stepDeg} everywhere, except on the edges of regions whose estimated chord error
     * at that step exceeds {@code maxRelativeError} of their area; those edges get the step that brings the
     * estimate under it (never finer than {@value #FINEST_STEP_DEG} deg), the finest any of their regions needs.
     *
     * @param lonLatRegions Polygons or MultiPolygons in lon/lat degrees
     */
    public static EdgeSteps forLayer(List<Geometry> lonLatRegions, double stepDeg, double maxRelativeError) {
        Map<Edge, Double> finer = new HashMap<>();
        for (Geometry region : lonLatRegions) {
            double allowedM2 = maxRelativeError * LonLatArea.areaM2(region);
            double step = stepDeg;
            while (step > FINEST_STEP_DEG && chordErrorM2(region, step) > allowedM2) {
                step = Math.max(FINEST_STEP_DEG, step / 2);
            }
            if (step < stepDeg) {
                double regionStep = step;
                forEachRing(region, ring -> {
                    for (int i = 0; i + 1 < ring.size(); i++) {
                        finer.merge(Edge.of(ring, i), regionStep, Math::min);
                    }
                });
            }
        }
        return new EdgeSteps(stepDeg, finer);
    }

    /** The step of the edge between two points, degrees. */
    double stepDeg(double x0, double y0, double x1, double y1) {
        if (finer.isEmpty()) {
            return stepDeg;
        }
        Double step = finer.get(Edge.of(x0, y0, x1, y1));
        return step == null ? stepDeg : step;
    }

    /** Upper estimate of the area between a region's chords at {@code step} and its lon/lat-straight edges, m2. */
    private static double chordErrorM2(Geometry region, double stepDeg) {
        double[] sum = new double[1];
        double stepRad = Math.toRadians(stepDeg);
        forEachRing(region, ring -> {
            for (int i = 0; i + 1 < ring.size(); i++) {
                double dLon = Math.abs(Math.toRadians(ring.getX(i + 1) - ring.getX(i)));
                double span = Math.max(dLon, Math.abs(Math.toRadians(ring.getY(i + 1) - ring.getY(i))));
                int pieces = Math.max(1, (int) Math.ceil(span / stepRad));
                double lat = Math.toRadians((ring.getY(i) + ring.getY(i + 1)) / 2);
                double cos = Math.cos(lat);
                double piece = dLon / pieces;
                sum[0] += pieces * RADIUS_M * RADIUS_M * cos * cos * Math.abs(Math.sin(lat)) * piece * piece * piece / 12;
            }
        });
        return sum[0];
    }

    private static void forEachRing(Geometry region, java.util.function.Consumer<CoordinateSequence> action) {
        for (int p = 0; p < region.getNumGeometries(); p++) {
            Polygon polygon = (Polygon) region.getGeometryN(p);
            if (polygon.isEmpty()) {
                continue;
            }
            action.accept(polygon.getExteriorRing().getCoordinateSequence());
            for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                action.accept(polygon.getInteriorRingN(h).getCoordinateSequence());
            }
        }
    }

    /** An edge with its end points in lexicographic order, so both directions are one key. */
    private record Edge(double ax, double ay, double bx, double by) {

        static Edge of(CoordinateSequence ring, int i) {
            return of(ring.getX(i), ring.getY(i), ring.getX(i + 1), ring.getY(i + 1));
        }

        static Edge of(double x0, double y0, double x1, double y1) {
            boolean forward = x0 < x1 || (x0 == x1 && y0 <= y1);
            return forward ? new Edge(x0, y0, x1, y1) : new Edge(x1, y1, x0, y0);
        }
    }
}
