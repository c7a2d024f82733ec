package aequa.planar;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

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
 * vertex for every ring that runs along that loop. Each vertex that is not a node lies on exactly one edge,
 * so a ring finds an edge that another ring has already stored through its first inner vertex (an array
 * look-up); an edge without inner vertices, a single segment between two nodes, through its pair of nodes.
 * An edge is stored in the direction of the first ring that runs along it.
 *
 * <p>Guarantee: the input must be vertex-exact along shared borders (a valid coverage); borders that share
 * no vertices are treated as separate edges.
 */
final class CoverageEdges {

    /** Per input geometry, per polygon part, per ring (shell first): the ring's edges as signed refs. */
    final List<List<List<int[]>>> ringsByGeometry = new ArrayList<>();
    /** Edge vertex numbers in canonical direction (first and last are nodes; equal for a loop). */
    final List<int[]> edges = new ArrayList<>();
    /** The distinct vertices, numbered cell by cell; the simplifier marks the ones it removes. */
    final VertexGrid vertices;
    final boolean[] isNode;
    /** For a vertex next to an end of a stored edge (not a node): that edge; else -1. */
    private final int[] edgeOfInnerVertex;
    /**
     * Edges that are a single segment, by their pair of nodes (see {@link #nodePair}). The simplifier adds
     * the pairs of edges it shrinks to a single segment (with any value: it asks only whether a pair is in).
     */
    final LongIntTable straightEdgeByNodes = new LongIntTable(1024);

    CoverageEdges(Geometry[] coverage) {
        int points = 0;
        for (Geometry geometry : coverage) {
            points += geometry.getNumPoints();
        }
        // in a coverage most vertices lie on a border shared by two polygons
        VertexTable table = new VertexTable(points / 2 + points / 64);
        List<int[]> rings = new ArrayList<>();
        for (Geometry geometry : coverage) {
            for (int p = 0; p < geometry.getNumGeometries(); p++) {
                Polygon polygon = (Polygon) geometry.getGeometryN(p);
                if (polygon.isEmpty()) {
                    continue;
                }
                rings.add(number(polygon.getExteriorRing(), table));
                for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                    rings.add(number(polygon.getInteriorRingN(h), table));
                }
            }
        }
        vertices = new VertexGrid(table, rings);
        isNode = findNodes(rings, vertices.size());
        edgeOfInnerVertex = new int[vertices.size()];
        Arrays.fill(edgeOfInnerVertex, -1);
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
                    polygonRings.add(splitIntoEdges(rings.get(ringIndex++)));
                }
                polygons.add(polygonRings);
            }
            ringsByGeometry.add(polygons);
        }
    }

    /** The ring's distinct vertex numbers in order, without the closing repeat or consecutive duplicates. */
    private static int[] number(LinearRing ring, VertexTable table) {
        int n = ring.getNumPoints() - 1;
        int[] ids = new int[n];
        int count = 0;
        CoordinateSequence sequence = ring.getCoordinateSequence();
        for (int i = 0; i < n; i++) {
            int id = table.idOf(sequence.getX(i), sequence.getY(i), count == 0 ? -1 : ids[count - 1]);
            if (count == 0 || ids[count - 1] != id) {
                ids[count++] = id;
            }
        }
        while (count > 1 && ids[count - 1] == ids[0]) {
            count--;
        }
        return count == n ? ids : Arrays.copyOf(ids, count);
    }

    private static boolean[] findNodes(List<int[]> rings, int vertexCount) {
        int[] first = new int[vertexCount];
        int[] second = new int[vertexCount];
        Arrays.fill(first, -1);
        Arrays.fill(second, -1);
        boolean[] node = new boolean[vertexCount];
        for (int[] ring : rings) {
            int n = ring.length;
            for (int i = 0; i < n; i++) {
                int v = ring[i];
                addNeighbour(v, ring[i == 0 ? n - 1 : i - 1], first, second, node);
                addNeighbour(v, ring[i == n - 1 ? 0 : i + 1], first, second, node);
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

    /** Records that {@code neighbour} is next to {@code v}; a third distinct neighbour makes v a node. */
    private static void addNeighbour(int v, int neighbour, int[] first, int[] second, boolean[] node) {
        if (neighbour == first[v] || neighbour == second[v]) {
            return;
        }
        if (first[v] < 0) {
            first[v] = neighbour;
        } else if (second[v] < 0) {
            second[v] = neighbour;
        } else {
            node[v] = true;
        }
    }

    /**
     * The ring as edge refs: {@code e + 1} when the ring runs along edge {@code e} in its canonical
     * direction, {@code -(e + 1)} when it runs backwards.
     */
    private int[] splitIntoEdges(int[] ring) {
        int n = ring.length;
        int start = 0;
        while (!isNode[ring[start]]) {
            start++;
        }
        int[] refs = new int[8];
        int count = 0;
        // positions are counted from the first node, modulo n
        for (int first = start, end = start + n; first < end; ) {
            int last = first + 1;
            while (!isNode[ring[wrap(last, n)]]) {
                last++;
            }
            if (count == refs.length) {
                refs = Arrays.copyOf(refs, 2 * count);
            }
            refs[count++] = edgeRef(ring, first, last);
            first = last;
        }
        return Arrays.copyOf(refs, count);
    }

    /** The ref of the edge that runs along ring positions {@code first..last} (modulo its length); the edge is added when new. */
    private int edgeRef(int[] ring, int first, int last) {
        int n = ring.length;
        int start = ring[wrap(first, n)];
        int second = ring[wrap(first + 1, n)];
        boolean straight = last == first + 1;
        int edge = straight ? straightEdgeByNodes.get(nodePair(start, second)) : edgeOfInnerVertex[second];
        if (edge >= 0) {
            int[] path = edges.get(edge);
            return path[0] == start && path[1] == second ? edge + 1 : -(edge + 1);
        }
        edge = edges.size();
        int[] path = new int[last - first + 1];
        for (int k = 0; k < path.length; k++) {
            path[k] = ring[wrap(first + k, n)];
        }
        edges.add(path);
        if (straight) {
            straightEdgeByNodes.put(nodePair(start, second), edge);
        } else {
            edgeOfInnerVertex[path[1]] = edge;
            edgeOfInnerVertex[path[path.length - 2]] = edge;
        }
        return edge + 1;
    }

    /** Two node numbers as one key, the same whichever comes first. */
    static long nodePair(int a, int b) {
        return ((long) Math.min(a, b) << 32) | Math.max(a, b);
    }

    /** A ring position in 0 .. 2n - 1 brought into 0 .. n - 1. */
    private static int wrap(int position, int n) {
        return position < n ? position : position - n;
    }
}
