package aequa.composite;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

import aequa.ellipsoid.GeodesicDistance;

/**
 * Groups regions that lie near each other (single linkage): every vertex goes into a cube of side
 * {@code linkM} in geocentric space, and regions with vertices in the same or neighbouring cubes belong to one
 * group. So regions less than {@code linkM} apart (straight-line, which on these scales equals the geodesic
 * distance within 0.1 %) are always grouped, and regions more than 2 sqrt(3) {@code linkM} apart never are;
 * between the two, the grid decides, the same way on every run. Touching regions share vertices and always
 * group. Our own code: a uniform grid is the simplest structure that makes this linear in the vertex count.
 */
final class RegionLinks {

    /** Cube indices are packed 21 bits per axis; cubes smaller than this would overflow them. */
    private static final double MIN_LINK_M = 100;

    private RegionLinks() {
    }

    /** The group number of each region (groups numbered in order of their first region). */
    static int[] groups(List<? extends Geometry> lonLatGeometries, double linkM) {
        double cell = Math.max(linkM, MIN_LINK_M);
        int n = lonLatGeometries.size();
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) {
            parent[i] = i;
        }
        Map<Long, Integer> occupant = new HashMap<>();
        double[] xyz = new double[3];
        for (int r = 0; r < n; r++) {
            for (Coordinate c : lonLatGeometries.get(r).getCoordinates()) {
                GeodesicDistance.geocentric(c.x, c.y, xyz, 0);
                long key = pack((long) Math.floor(xyz[0] / cell), (long) Math.floor(xyz[1] / cell),
                        (long) Math.floor(xyz[2] / cell));
                Integer first = occupant.putIfAbsent(key, r);
                if (first != null) {
                    union(parent, first, r);
                }
            }
        }
        for (Map.Entry<Long, Integer> e : occupant.entrySet()) {
            long key = e.getKey();
            long x = unpack(key, 42);
            long y = unpack(key, 21);
            long z = unpack(key, 0);
            for (int dx = -1; dx <= 1; dx++) {
                for (int dy = -1; dy <= 1; dy++) {
                    for (int dz = -1; dz <= 1; dz++) {
                        Integer neighbour = occupant.get(pack(x + dx, y + dy, z + dz));
                        if (neighbour != null) {
                            union(parent, e.getValue(), neighbour);
                        }
                    }
                }
            }
        }
        int[] group = new int[n];
        Map<Integer, Integer> numbers = new HashMap<>();
        for (int r = 0; r < n; r++) {
            group[r] = numbers.computeIfAbsent(find(parent, r), root -> numbers.size());
        }
        return group;
    }

    private static long pack(long x, long y, long z) {
        long mask = (1L << 21) - 1;
        return ((x & mask) << 42) | ((y & mask) << 21) | (z & mask);
    }

    private static long unpack(long key, int shift) {
        long v = (key >>> shift) & ((1L << 21) - 1);
        return v >= (1L << 20) ? v - (1L << 21) : v;
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    private static void union(int[] parent, int a, int b) {
        int ra = find(parent, a);
        int rb = find(parent, b);
        if (ra != rb) {
            parent[Math.max(ra, rb)] = Math.min(ra, rb);
        }
    }
}
