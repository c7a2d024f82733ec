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
    /** Point indices sorted by geocentric x, and their x in that order, for the sweep in {@link #gapKm}. */
    private final int[] byX;
    private final double[] sortedX;
    /** The geocentric bounding box: min x, y, z, then max x, y, z. */
    private final double[] box = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};

    private PointCloud(double[] xyz, double[] lonLat) {
        this.xyz = xyz;
        this.lonLat = lonLat;
        int n = lonLat.length / 2;
        this.byX = java.util.stream.IntStream.range(0, n).boxed()
                .sorted(java.util.Comparator.comparingDouble((Integer i) -> xyz[3 * i]).thenComparingInt(i -> i))
                .mapToInt(Integer::intValue).toArray();
        this.sortedX = new double[n];
        for (int k = 0; k < n; k++) {
            sortedX[k] = xyz[3 * byX[k]];
        }
        for (int i = 0; i < n; i++) {
            for (int axis = 0; axis < 3; axis++) {
                box[axis] = Math.min(box[axis], xyz[3 * i + axis]);
                box[3 + axis] = Math.max(box[3 + axis], xyz[3 * i + axis]);
            }
        }
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
     * straight-line (chord) distance, measured along the ellipsoid; of pairs equally near, the first in this
     * cloud's order and then the other's. Infinite when either cloud is empty.
     *
     * <p>Exact, as comparing every pair would be, but pruned: a point of this cloud farther from the other's
     * bounding box than the nearest pair so far is skipped, and the other's points are swept outwards in
     * order of x from the point's own x until the x difference alone exceeds the nearest pair so far.
     */
    double gapKm(PointCloud other) {
        double best = Double.POSITIVE_INFINITY;
        int bestA = -1;
        int bestB = -1;
        for (int i = 0; i < size(); i++) {
            double x = xyz[3 * i];
            double y = xyz[3 * i + 1];
            double z = xyz[3 * i + 2];
            if (other.boxDistance2(x, y, z) > best) {
                continue;
            }
            int start = lowerBound(other.sortedX, x);
            for (int direction = -1; direction <= 1; direction += 2) {
                for (int k = direction < 0 ? start - 1 : start; k >= 0 && k < other.size(); k += direction) {
                    double dx = x - other.sortedX[k];
                    if (dx * dx > best) {
                        break;
                    }
                    int j = other.byX[k];
                    double dy = y - other.xyz[3 * j + 1];
                    double dz = z - other.xyz[3 * j + 2];
                    double d2 = dx * dx + dy * dy + dz * dz;
                    if (d2 < best || d2 == best && i == bestA && j < bestB) {
                        best = d2;
                        bestA = i;
                        bestB = j;
                    }
                }
            }
        }
        if (bestA < 0) {
            return Double.POSITIVE_INFINITY;
        }
        return GeodesicDistance.metres(lonLat[2 * bestA], lonLat[2 * bestA + 1],
                other.lonLat[2 * bestB], other.lonLat[2 * bestB + 1]) / 1000;
    }

    /** The squared straight-line distance from (x, y, z) to this cloud's bounding box (0 inside it). */
    private double boxDistance2(double x, double y, double z) {
        double[] p = {x, y, z};
        double d2 = 0;
        for (int axis = 0; axis < 3; axis++) {
            double outside = Math.max(0, Math.max(box[axis] - p[axis], p[axis] - box[3 + axis]));
            d2 += outside * outside;
        }
        return d2;
    }

    /** The first index whose value is not below {@code x} in the ascending {@code values}. */
    private static int lowerBound(double[] values, double x) {
        int low = 0;
        int high = values.length;
        while (low < high) {
            int mid = (low + high) >>> 1;
            if (values[mid] < x) {
                low = mid + 1;
            } else {
                high = mid;
            }
        }
        return low;
    }
}
