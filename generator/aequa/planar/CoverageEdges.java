package aequa.planar;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

/**
 * The edge structure of a polygon coverage: every distinct vertex numbered once (keyed by its exact x and y
 * bits, -0.0 read as 0.0), every ring broken at its nodes into edges, each edge stored once in a canonical
 * direction and shared by the rings that run along it.
 *
 * <p>A node is a vertex whose set of distinct neighbouring vertices is not exactly two (a junction of three
 * or more borders, or a point where a ring touches another). A ring without any node (an island, or a hole
 * filled by one other polygon) gets one forced node: its vertex with the smallest number, which is the same
 * vertex for every ring that runs along that loop. Edges are identified by their start node and the vertex
 * that follows it, read in the direction that makes (start, next) smaller; two rings sharing a border thus
 * find the same edge.
 *
 * <p>Guarantee: the input must be vertex-exact along shared borders (a valid coverage); borders that share
 * no vertices are treated as separate edges.
 */
final class CoverageEdges {

    /** Per input geometry, per polygon part, per ring (shell first): the ring's edges as signed refs. */
    final List<List<List<int[]>>> ringsByGeometry = new ArrayList<>();
    /** Edge vertex numbers in canonical direction (first and last are nodes; equal for a loop). */
    final List<int[]> edges = new ArrayList<>();
    final VertexTable vertices = new VertexTable();
    final boolean[] isNode;

    CoverageEdges(Geometry[] coverage) {
        List<int[]> rings = new ArrayList<>();
        for (Geometry geometry : coverage) {
            for (int p = 0; p < geometry.getNumGeometries(); p++) {
                Polygon polygon = (Polygon) geometry.getGeometryN(p);
                if (polygon.isEmpty()) {
                    continue;
                }
                rings.add(number(polygon.getExteriorRing()));
                for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                    rings.add(number(polygon.getInteriorRingN(h)));
                }
            }
        }
        isNode = findNodes(rings, vertices.size());
        Map<Long, Integer> edgeByKey = new HashMap<>();
        int ringIndex = 0;
        for (Geometry geometry : coverage) {
            List<List<int[]>> polygons = new ArrayList<>();
            for (int p = 0; p < geometry.getNumGeometries(); p++) {
                Polygon polygon = (Polygon) geometry.getGeometryN(p);
                if (polygon.isEmpty()) {
                    continue;
                }
                List<int[]> polygonRings = new ArrayList<>();
                for (int r = 0; r <= polygon.getNumInteriorRing(); r++) {
                    polygonRings.add(splitIntoEdges(rings.get(ringIndex++), edgeByKey));
                }
                polygons.add(polygonRings);
            }
            ringsByGeometry.add(polygons);
        }
    }

    /** The ring's distinct vertex numbers in order, without the closing repeat or consecutive duplicates. */
    private int[] number(LinearRing ring) {
        int n = ring.getNumPoints() - 1;
        int[] ids = new int[n];
        int count = 0;
        CoordinateSequence sequence = ring.getCoordinateSequence();
        for (int i = 0; i < n; i++) {
            int id = vertices.idOf(sequence.getX(i), sequence.getY(i));
            if (count == 0 || ids[count - 1] != id) {
                ids[count++] = id;
            }
        }
        while (count > 1 && ids[count - 1] == ids[0]) {
            count--;
        }
        return java.util.Arrays.copyOf(ids, count);
    }

    private static boolean[] findNodes(List<int[]> rings, int vertexCount) {
        int[] first = new int[vertexCount];
        int[] second = new int[vertexCount];
        java.util.Arrays.fill(first, -1);
        java.util.Arrays.fill(second, -1);
        boolean[] node = new boolean[vertexCount];
        for (int[] ring : rings) {
            int n = ring.length;
            for (int i = 0; i < n; i++) {
                int v = ring[i];
                for (int neighbour : new int[] {ring[(i + n - 1) % n], ring[(i + 1) % n]}) {
                    if (neighbour == first[v] || neighbour == second[v]) {
                        continue;
                    }
                    if (first[v] < 0) {
                        first[v] = neighbour;
                    } else if (second[v] < 0) {
                        second[v] = neighbour;
                    } else {
                        node[v] = true;
                    }
                }
            }
        }
        for (int v = 0; v < vertexCount; v++) {
            node[v] |= second[v] < 0;
        }
        for (int[] ring : rings) {
            int smallest = Integer.MAX_VALUE;
            boolean hasNode = false;
            for (int v : ring) {
                hasNode |= node[v];
                smallest = Math.min(smallest, v);
            }
            if (!hasNode && ring.length > 0) {
                node[smallest] = true;
            }
        }
        return node;
    }

    /**
     * The ring as edge refs: {@code e + 1} when the ring runs along edge {@code e} in its canonical
     * direction, {@code -(e + 1)} when it runs backwards.
     */
    private int[] splitIntoEdges(int[] ring, Map<Long, Integer> edgeByKey) {
        int n = ring.length;
        int start = 0;
        while (!isNode[ring[start]]) {
            start++;
        }
        List<Integer> refs = new ArrayList<>();
        int i = 0;
        while (i < n) {
            int length = 1;
            while (!isNode[ring[(start + i + length) % n]]) {
                length++;
            }
            int[] path = new int[length + 1];
            for (int k = 0; k <= length; k++) {
                path[k] = ring[(start + i + k) % n];
            }
            refs.add(edgeRef(path, edgeByKey));
            i += length;
        }
        return refs.stream().mapToInt(Integer::intValue).toArray();
    }

    private int edgeRef(int[] path, Map<Long, Integer> edgeByKey) {
        int last = path.length - 1;
        boolean forward = path[0] < path[last] || (path[0] == path[last] && path[1] <= path[last - 1]);
        // (start << 32 | next) times an odd constant: a bijection that spreads Long.hashCode, which would
        // otherwise collide for every start ^ next alike
        long key = (forward
                ? ((long) path[0] << 32) | path[1]
                : ((long) path[last] << 32) | path[last - 1]) * 0x9E3779B97F4A7C15L;
        Integer edge = edgeByKey.get(key);
        if (edge == null) {
            edge = edges.size();
            edges.add(forward ? path : reversed(path));
            edgeByKey.put(key, edge);
        }
        return forward ? edge + 1 : -(edge + 1);
    }

    static int[] reversed(int[] path) {
        int[] r = new int[path.length];
        for (int k = 0; k < path.length; k++) {
            r[k] = path[path.length - 1 - k];
        }
        return r;
    }
}
