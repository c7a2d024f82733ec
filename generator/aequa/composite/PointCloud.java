package aequa.composite;

import java.util.Collection;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

import aequa.ellipsoid.GeodesicDistance;

/**
 * The vertices of a set of regions as geocentric points (metres), for measuring the gap between two sets.
 * The gap is measured between vertices: regions arrive densified to at most 0.05 deg, so the nearest vertices
 * lie within a few kilometres of the nearest points of the outlines, far below the gaps that matter here
 * (hundreds of kilometres).
 */
final class PointCloud {

    /**
     * Vertices compared per set when measuring a gap; a larger set is thinned evenly to this many, which moves
     * the measured gap by at most the thinning stride times the vertex spacing (on the US counties file, whose
     * contiguous states have 161,981 vertices, the largest gap error is 4 km, for gaps from 816 km, measured
     * against the unthinned sets).
     */
    static final int MAX_POINTS = 12_000;

    private final double[] xyz;
    private final double[] lonLat;

    private PointCloud(double[] xyz, double[] lonLat) {
        this.xyz = xyz;
        this.lonLat = lonLat;
    }

    static PointCloud of(Collection<? extends Geometry> lonLatGeometries) {
        int count = lonLatGeometries.stream().mapToInt(Geometry::getNumPoints).sum();
        int stride = Math.max(1, (count + MAX_POINTS - 1) / MAX_POINTS);
        int kept = (count + stride - 1) / stride;
        double[] xyz = new double[3 * kept];
        double[] lonLat = new double[2 * kept];
        int index = 0;
        int n = 0;
        for (Geometry g : lonLatGeometries) {
            for (Coordinate c : g.getCoordinates()) {
                if (index++ % stride == 0 && n < kept) {
                    GeodesicDistance.geocentric(c.x, c.y, xyz, 3 * n);
                    lonLat[2 * n] = c.x;
                    lonLat[2 * n + 1] = c.y;
                    n++;
                }
            }
        }
        return new PointCloud(java.util.Arrays.copyOf(xyz, 3 * n), java.util.Arrays.copyOf(lonLat, 2 * n));
    }

    int size() {
        return lonLat.length / 2;
    }

    /**
     * The geodesic distance in km between the nearest pair of points of the two clouds: the pair nearest in
     * straight-line (chord) distance, measured along the ellipsoid. Infinite when either cloud is empty.
     */
    double gapKm(PointCloud other) {
        double best = Double.POSITIVE_INFINITY;
        int bestA = -1;
        int bestB = -1;
        for (int i = 0; i < size(); i++) {
            double x = xyz[3 * i];
            double y = xyz[3 * i + 1];
            double z = xyz[3 * i + 2];
            for (int j = 0; j < other.size(); j++) {
                double dx = x - other.xyz[3 * j];
                double dy = y - other.xyz[3 * j + 1];
                double dz = z - other.xyz[3 * j + 2];
                double d2 = dx * dx + dy * dy + dz * dz;
                if (d2 < best) {
                    best = d2;
                    bestA = i;
                    bestB = j;
                }
            }
        }
        if (bestA < 0) {
            return Double.POSITIVE_INFINITY;
        }
        return GeodesicDistance.metres(lonLat[2 * bestA], lonLat[2 * bestA + 1],
                other.lonLat[2 * bestB], other.lonLat[2 * bestB + 1]) / 1000;
    }
}
