package aequa.projection;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

/**
 * Builds a {@link Footprint}: the longitude arc, latitude range and poles from the vertices and edges; the
 * interior samples from {@link FootprintSampler}; the spherical centre, radius, elongation and orientation
 * from the samples' area-weighted moments on the unit sphere (geodetic latitude is used as spherical
 * latitude here: these figures only steer the search, the choice itself is judged on the ellipsoid).
 */
final class FootprintAnalysis {

    /**
     * Most boundary samples kept: every vertex of the data up to this many (then the extremes plus an even
     * stride through all vertices). The final omega figures are taken over all samples, so for data with up
     * to this many vertices the stated largest omega is the maximum over every vertex (the figure of a polar
     * cap's ring includes its points on the pole) rather than over a sample of the outline, which fell 3 %
     * short for Africa in Natural Earth 1:110m (6.55 against 6.77 deg, FootprintVerticesTest). The search
     * itself works on a thinned set, so this costs one pass per candidate family. Our choice: 100,000
     * vertices (1.6 MB) covers national files at web detail, such as the 68,313 of the US Census 2017 counties.
     */
    static final int BOUNDARY_SAMPLES = 100_000;

    /** Longitude bins for finding the largest empty gap: 0.1 deg each. */
    private static final int BINS = 3600;

    private FootprintAnalysis() {
    }

    static Footprint analyse(Collection<? extends Geometry> geometries) {
        List<Polygon> polygons = new ArrayList<>();
        Vertices vertices = new Vertices();
        boolean[] covered = new boolean[BINS];
        boolean[] poles = new boolean[2];
        for (Geometry g : geometries) {
            collect(g, polygons, vertices, covered, poles);
        }
        if (vertices.count == 0) {
            return wholeGlobe();
        }
        double cutLon = largestGapMiddle(covered);
        double west = Double.POSITIVE_INFINITY;
        double east = Double.NEGATIVE_INFINITY;
        double south = Double.POSITIVE_INFINITY;
        double north = Double.NEGATIVE_INFINITY;
        int[] extremes = new int[4];
        for (int i = 0; i < vertices.count; i++) {
            double u = Double.isNaN(cutLon) ? vertices.lon(i) : unwrap(vertices.lon(i), cutLon);
            double lat = vertices.lat(i);
            if (u < west) { west = u; extremes[0] = i; }
            if (u > east) { east = u; extremes[1] = i; }
            if (lat < south) { south = lat; extremes[2] = i; }
            if (lat > north) { north = lat; extremes[3] = i; }
        }
        if (Double.isNaN(cutLon)) {
            west = -180.0;
            east = 180.0;
        }
        double[][] interior = new FootprintSampler(polygons, false).sample(west, east - west, south, north);
        FootprintSamples samples = withBoundary(interior, vertices, extremes);
        double centreLon = Double.isNaN(cutLon) ? 0.0 : Longitudes.normalize((west + east) / 2);
        return SphericalMoments.of(samples).toFootprint(centreLon, east - west, south, north,
                poles[0], poles[1], samples);
    }

    private static Footprint wholeGlobe() {
        double[][] interior = new FootprintSampler(List.of(), true).sample(-180.0, 360.0, -90.0, 90.0);
        FootprintSamples samples = new FootprintSamples(interior[0], interior[1], interior[1].length, 0);
        return SphericalMoments.of(samples).toFootprint(0.0, 360.0, -90.0, 90.0, true, true, samples);
    }

    private static void collect(Geometry g, List<Polygon> polygons, Vertices vertices, boolean[] covered, boolean[] poles) {
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Geometry part = g.getGeometryN(i);
            if (part instanceof Polygon) {
                Polygon polygon = (Polygon) part;
                polygons.add(polygon);
                var envelope = polygon.getEnvelopeInternal();
                // RFC 7946 draws a polar cap as a ring that runs all the way round and along the pole's line
                if (envelope.getWidth() >= 359.9) {
                    poles[0] |= envelope.getMaxY() >= 89.9;
                    poles[1] |= envelope.getMinY() <= -89.9;
                }
                addLine(polygon.getExteriorRing().getCoordinateSequence(), vertices, covered);
                for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                    addLine(polygon.getInteriorRingN(h).getCoordinateSequence(), vertices, covered);
                }
            } else if (part instanceof LineString) {
                addLine(((LineString) part).getCoordinateSequence(), vertices, covered);
            } else if (part instanceof Point && !part.isEmpty()) {
                addLine(((Point) part).getCoordinateSequence(), vertices, covered);
            } else if (part != g) {
                collect(part, polygons, vertices, covered, poles);
            }
        }
    }

    private static void addLine(CoordinateSequence sequence, Vertices vertices, boolean[] covered) {
        for (int i = 0; i < sequence.size(); i++) {
            double lon = Longitudes.normalize(sequence.getX(i));
            double lat = sequence.getY(i);
            if (Double.isNaN(lon) || !(Math.abs(lat) <= 90.0)) {
                continue;
            }
            vertices.add(lon, lat);
            double previous = i == 0 ? lon : Longitudes.normalize(sequence.getX(i - 1));
            cover(covered, previous, lon);
        }
    }

    /** Marks the bins an edge from lon a to lon b covers; an edge longer than 180 deg runs across +-180. */
    private static void cover(boolean[] covered, double a, double b) {
        double from = Math.min(a, b);
        double to = Math.max(a, b);
        if (to - from > 180.0) {
            mark(covered, to, 180.0);
            mark(covered, -180.0, from);
        } else {
            mark(covered, from, to);
        }
    }

    private static void mark(boolean[] covered, double from, double to) {
        int first = bin(from);
        int last = bin(to);
        for (int k = first; k <= last; k++) {
            covered[k] = true;
        }
    }

    private static int bin(double lon) {
        return Math.min(BINS - 1, Math.max(0, (int) Math.floor((lon + 180.0) * BINS / 360.0)));
    }

    /** The longitude in the middle of the longest run of empty bins (wrapping round), or NaN when none is empty. */
    private static double largestGapMiddle(boolean[] covered) {
        int start = -1;
        for (int k = 0; k < BINS; k++) {
            if (covered[k]) {
                start = k;
                break;
            }
        }
        int bestLength = 0;
        int bestStart = 0;
        int run = 0;
        for (int step = 1; step <= BINS; step++) {
            int k = (start + step) % BINS;
            if (!covered[k]) {
                run++;
                if (run > bestLength) {
                    bestLength = run;
                    bestStart = (k - run + 1 + BINS) % BINS;
                }
            } else {
                run = 0;
            }
        }
        if (bestLength == 0) {
            return Double.NaN;
        }
        return Longitudes.normalize(-180.0 + (bestStart + bestLength / 2.0) * 360.0 / BINS);
    }

    /** lon moved by whole turns into [cutLon, cutLon + 360). */
    private static double unwrap(double lon, double cutLon) {
        double d = lon - cutLon;
        d -= 360.0 * Math.floor(d / 360.0);
        return cutLon + d;
    }

    private static FootprintSamples withBoundary(double[][] interior, Vertices vertices, int[] extremes) {
        int interiorCount = interior[1].length;
        int stride = Math.max(1, (int) Math.ceil((double) vertices.count / (BOUNDARY_SAMPLES - extremes.length)));
        int boundaryCount = extremes.length + (vertices.count + stride - 1) / stride;
        double[] xy = new double[2 * (interiorCount + boundaryCount)];
        double[] w = new double[interiorCount + boundaryCount];
        System.arraycopy(interior[0], 0, xy, 0, 2 * interiorCount);
        System.arraycopy(interior[1], 0, w, 0, interiorCount);
        int n = interiorCount;
        for (int e : extremes) {
            xy[2 * n] = vertices.lon(e);
            xy[2 * n + 1] = vertices.lat(e);
            n++;
        }
        for (int i = 0; i < vertices.count; i += stride) {
            xy[2 * n] = vertices.lon(i);
            xy[2 * n + 1] = vertices.lat(i);
            n++;
        }
        return new FootprintSamples(xy, w, interiorCount, extremes.length);
    }

    /** A growable list of (lon, lat) pairs. */
    private static final class Vertices {
        private double[] xy = new double[1024];
        private int count;

        void add(double lon, double lat) {
            if (2 * count + 2 > xy.length) {
                xy = java.util.Arrays.copyOf(xy, 2 * xy.length);
            }
            xy[2 * count] = lon;
            xy[2 * count + 1] = lat;
            count++;
        }

        double lon(int i) {
            return xy[2 * i];
        }

        double lat(int i) {
            return xy[2 * i + 1];
        }
    }
}
