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
 * <p>Why: between two densified vertices the map draws a straight chord, while the lon/lat-straight edge it
 * stands for is a curve on the map plane. The two enclose a lens of about 2/3 x chord x sagitta (the area of
 * a parabolic segment, Archimedes' quadrature; the curve is smooth, so a parabola fits it to second order).
 * The lens is measured, not modelled: the edge's piece is projected at its two ends and its middle with the
 * map's own projection, and the sagitta is the middle's distance from the chord. That holds for every family
 * and aspect, however distorted the place: a low-distortion estimate (the geodesic's bow from a parallel,
 * R^2 cos^2(phi) |sin(phi)| dLon^3 / 12) let county 51685 of the US Census file miss its area by 1.1e-4 under a
 * forced Albers, and the Northern Marianas by 1.2e-4 under a forced transverse cylinder. An edge cut into n
 * pieces is charged n times the largest lens of its sampled pieces (its first, middle and last); the sum over
 * a region's edges must stay under the allowed share of its area. This is an estimate that picks the step;
 * the area audit, not this estimate, proves the result.
 *
 * <p>Guarantee kept from {@link LonLatDensifier}: an edge's step depends only on its two end points (in
 * either order), the layer and the projection, so neighbours that share an edge get the same vertices on it.
 */
public final class EdgeSteps {

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
     * Projects points to the map plane: {@code count} (lon, lat) pairs in degrees to (x, y) in metres, NaN
     * beyond the projection's domain. The projection stage passes its projection here (this stage comes
     * before it and does not know it).
     */
    @FunctionalInterface
    public interface PlanePoints {
        void forward(double[] lonLatDeg, double[] xyM, int count);
    }

    /**
     * Steps for a layer: {@code stepDeg} everywhere, except on the edges of regions whose chord lenses on the
     * plane of {@code plane} at that step exceed {@code maxRelativeError} of their area; those edges get the
     * step that brings the sum under it (halved, never finer than {@value #FINEST_STEP_DEG} deg), the finest
     * any of their regions needs.
     *
     * @param lonLatRegions Polygons or MultiPolygons in lon/lat degrees
     */
    public static EdgeSteps forLayer(List<Geometry> lonLatRegions, double stepDeg, double maxRelativeError,
                                     PlanePoints plane) {
        // each region's step is found alone, side by side (plane is only read); the finest step of an edge
        // is then the same whatever order the regions were merged in
        double[] regionSteps = lonLatRegions.parallelStream()
                .mapToDouble(region -> regionStepDeg(region, stepDeg, maxRelativeError, plane)).toArray();
        Map<Edge, Double> finer = new HashMap<>();
        for (int r = 0; r < regionSteps.length; r++) {
            if (regionSteps[r] < stepDeg) {
                double regionStep = regionSteps[r];
                forEachRing(lonLatRegions.get(r), ring -> {
                    for (int i = 0; i + 1 < ring.size(); i++) {
                        finer.merge(Edge.of(ring, i), regionStep, Math::min);
                    }
                });
            }
        }
        return new EdgeSteps(stepDeg, finer);
    }

    /** The step one region needs: {@code stepDeg} halved until its chord lenses fit its share of its area. */
    private static double regionStepDeg(Geometry region, double stepDeg, double maxRelativeError, PlanePoints plane) {
        double allowedM2 = maxRelativeError * LonLatArea.areaM2(region);
        double step = stepDeg;
        while (step > FINEST_STEP_DEG && chordLensesM2(region, step, plane) > allowedM2) {
            step = Math.max(FINEST_STEP_DEG, step / 2);
        }
        return step;
    }

    /** The step of the edge between two points, degrees. */
    double stepDeg(double x0, double y0, double x1, double y1) {
        if (finer.isEmpty()) {
            return stepDeg;
        }
        Double step = finer.get(Edge.of(x0, y0, x1, y1));
        return step == null ? stepDeg : step;
    }

    /** Pieces of an edge whose lens is measured: its first, middle and last (one when the edge is one piece). */
    private static final double[] SAMPLED_PIECES = {0, 0.5, 1};

    /**
     * The summed lenses between a region's projected lon/lat-straight edges and their chords at {@code step},
     * m2; samples beyond the projection's domain (NaN) count nothing (the domain check reports those regions).
     */
    static double chordLensesM2(Geometry region, double stepDeg, PlanePoints plane) {
        double[] sum = new double[1];
        forEachRing(region, ring -> {
            int edges = ring.size() - 1;
            // per edge and sampled piece: its start, middle and end, projected in one call for the ring
            double[] lonLat = new double[edges * SAMPLED_PIECES.length * 6];
            int[] pieces = new int[edges];
            for (int i = 0; i < edges; i++) {
                double x0 = ring.getX(i);
                double y0 = ring.getY(i);
                double dx = ring.getX(i + 1) - x0;
                double dy = ring.getY(i + 1) - y0;
                pieces[i] = Math.max(1, (int) Math.ceil(Math.max(Math.abs(dx), Math.abs(dy)) / stepDeg));
                for (int s = 0; s < SAMPLED_PIECES.length; s++) {
                    // the piece whose index is the sampled share of the edge's pieces
                    double start = Math.floor(SAMPLED_PIECES[s] * (pieces[i] - 1)) / pieces[i];
                    double length = 1.0 / pieces[i];
                    int k = (i * SAMPLED_PIECES.length + s) * 6;
                    for (int p = 0; p < 3; p++) {
                        double t = start + length * p / 2;
                        lonLat[k + 2 * p] = x0 + dx * t;
                        lonLat[k + 2 * p + 1] = y0 + dy * t;
                    }
                }
            }
            double[] xy = new double[lonLat.length];
            plane.forward(lonLat, xy, lonLat.length / 2);
            for (int i = 0; i < edges; i++) {
                double largest = 0;
                for (int s = 0; s < SAMPLED_PIECES.length; s++) {
                    int k = (i * SAMPLED_PIECES.length + s) * 6;
                    double lens = lensM2(xy[k], xy[k + 1], xy[k + 2], xy[k + 3], xy[k + 4], xy[k + 5]);
                    if (lens > largest) {
                        largest = lens;
                    }
                }
                sum[0] += pieces[i] * largest;
            }
        });
        return sum[0];
    }

    /**
     * The lens between a chord from (ax, ay) to (bx, by) and the smooth curve through (mx, my) that it
     * stands for: 2/3 x chord x sagitta, the sagitta being the middle point's distance from the chord
     * (cross product / chord length); 0 when a point is NaN.
     */
    private static double lensM2(double ax, double ay, double mx, double my, double bx, double by) {
        double cross = Math.abs((bx - ax) * (my - ay) - (by - ay) * (mx - ax));
        // 2/3 x chord x (cross / chord) = 2/3 x cross; NaN compares false and counts nothing
        return cross >= 0 ? 2.0 / 3 * cross : 0;
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

        // written out (same meaning as a record's: equal bits): every densified edge is looked up, and the
        // generated methods cost several times more under the launcher's first compiler
        @Override
        public boolean equals(Object other) {
            return other instanceof Edge e && bits(ax) == bits(e.ax) && bits(ay) == bits(e.ay)
                    && bits(bx) == bits(e.bx) && bits(by) == bits(e.by);
        }

        @Override
        public int hashCode() {
            long h = bits(ax);
            h = h * 31 + bits(ay);
            h = h * 31 + bits(bx);
            h = h * 31 + bits(by);
            return (int) (h ^ (h >>> 32));
        }

        private static long bits(double value) {
            return Double.doubleToLongBits(value);
        }
    }
}
