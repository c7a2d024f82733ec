package aequa.planar;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.PriorityQueue;
import java.util.Set;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

/**
 * Simplifies a polygon coverage edge by edge, so that every border shared by two polygons is simplified
 * once and both get the same vertices, bit for bit.
 *
 * <p>Method: the coverage is broken into edges between nodes ({@link CoverageEdges}). Each edge is
 * simplified with Visvalingam-Whyatt (Visvalingam &amp; Whyatt 1993, "Line generalisation by repeated
 * elimination of points", The Cartographic Journal 30(1), 46-51): the inner vertex whose triangle with its
 * two neighbours has the smallest area is removed, repeatedly, while that area is at most tolerance²
 * (the same reading of a distance tolerance as an area as JTS's topology-preserving VW). Nodes never move.
 *
 * <p>Guards (our own, so the result stays a valid coverage): a vertex is removed only when no other live
 * vertex of any edge lies inside or on its triangle; then the new segment cannot cross or touch any other
 * segment, since a segment that did would need an end inside the triangle or to cross one of the two
 * segments being replaced. A loop edge (a ring with a single node) keeps at least three distinct vertices,
 * so the ring stays a polygon. Of the edges joining the same two nodes at most one may shrink to a single
 * straight segment, so two borders never fall onto each other.
 *
 * <p>Limits: the vertex order and so the orientation of every ring is kept; the result depends on the order
 * of edges (first seen, first simplified), which is deterministic for a given input.
 */
final class EdgeCoverageSimplifier {

    private final CoverageEdges structure;
    private final VertexGrid grid;
    private final double areaToleranceM2;
    private final Set<Long> straightNodePairs = new HashSet<>();

    private EdgeCoverageSimplifier(Geometry[] coverage, double toleranceM) {
        this.structure = new CoverageEdges(coverage);
        this.grid = new VertexGrid(structure.vertices);
        this.areaToleranceM2 = toleranceM * toleranceM;
    }

    /** The coverage simplified to {@code toleranceM} metres; same length and order, same part structure. */
    static Geometry[] simplify(Geometry[] coverage, double toleranceM) {
        EdgeCoverageSimplifier simplifier = new EdgeCoverageSimplifier(coverage, toleranceM);
        List<int[]> edges = simplifier.structure.edges;
        for (int[] edge : edges) {
            if (edge.length == 2) {
                simplifier.straightNodePairs.add(nodePair(edge));
            }
        }
        List<int[]> simplified = new ArrayList<>(edges.size());
        for (int[] edge : edges) {
            simplified.add(simplifier.simplifyEdge(edge));
        }
        return simplifier.assemble(coverage, simplified);
    }

    private static long nodePair(int[] edge) {
        int a = Math.min(edge[0], edge[edge.length - 1]);
        int b = Math.max(edge[0], edge[edge.length - 1]);
        return ((long) a << 32) | b;
    }

    private int[] simplifyEdge(int[] edge) {
        int n = edge.length;
        boolean loop = edge[0] == edge[n - 1];
        int minimumVertices = loop ? 4 : 2;
        if (n <= minimumVertices) {
            return edge;
        }
        int[] previous = new int[n];
        int[] next = new int[n];
        int[] version = new int[n];
        for (int i = 0; i < n; i++) {
            previous[i] = i - 1;
            next[i] = i + 1;
        }
        PriorityQueue<double[]> queue = new PriorityQueue<>((p, q) -> p[0] != q[0]
                ? Double.compare(p[0], q[0]) : Double.compare(p[1], q[1]));
        for (int i = 1; i < n - 1; i++) {
            offer(queue, edge, previous[i], i, next[i], 0);
        }
        int live = n;
        while (!queue.isEmpty() && live > minimumVertices) {
            double[] entry = queue.poll();
            int i = (int) entry[1];
            if (entry[2] != version[i]) {
                continue;
            }
            int a = previous[i];
            int b = next[i];
            if (live == 3 && !loop && !straightNodePairs.add(nodePair(edge))) {
                continue;
            }
            if (grid.anyInTriangle(edge[a], edge[i], edge[b])) {
                if (live == 3 && !loop) {
                    straightNodePairs.remove(nodePair(edge));
                }
                continue;
            }
            grid.remove(edge[i]);
            version[i] = -1;
            next[a] = b;
            previous[b] = a;
            live--;
            for (int neighbour : new int[] {a, b}) {
                if (neighbour > 0 && neighbour < n - 1) {
                    version[neighbour]++;
                    offer(queue, edge, previous[neighbour], neighbour, next[neighbour], version[neighbour]);
                }
            }
        }
        int[] kept = new int[live];
        int count = 0;
        for (int i = 0; i < n; i = next[i]) {
            kept[count++] = edge[i];
        }
        return kept;
    }

    /** Queues vertex {@code v} as (area, index, version) only if its triangle is within the tolerance. */
    private void offer(PriorityQueue<double[]> queue, int[] edge, int a, int v, int b, int version) {
        double areaM2 = triangleArea(edge, a, v, b);
        if (areaM2 <= areaToleranceM2) {
            queue.add(new double[] {areaM2, v, version});
        }
    }

    private double triangleArea(int[] edge, int a, int v, int b) {
        VertexTable t = structure.vertices;
        double ax = t.x(edge[a]);
        double ay = t.y(edge[a]);
        return Math.abs((t.x(edge[v]) - ax) * (t.y(edge[b]) - ay) - (t.x(edge[b]) - ax) * (t.y(edge[v]) - ay)) / 2;
    }

    private Geometry[] assemble(Geometry[] coverage, List<int[]> simplifiedEdges) {
        Geometry[] result = new Geometry[coverage.length];
        for (int g = 0; g < coverage.length; g++) {
            GeometryFactory factory = coverage[g].getFactory();
            List<List<int[]>> polygons = structure.ringsByGeometry.get(g);
            if (polygons.isEmpty()) {
                result[g] = coverage[g];
                continue;
            }
            Polygon[] parts = new Polygon[polygons.size()];
            for (int p = 0; p < parts.length; p++) {
                List<int[]> rings = polygons.get(p);
                LinearRing shell = ring(factory, rings.get(0), simplifiedEdges);
                LinearRing[] holes = new LinearRing[rings.size() - 1];
                for (int h = 0; h < holes.length; h++) {
                    holes[h] = ring(factory, rings.get(h + 1), simplifiedEdges);
                }
                parts[p] = factory.createPolygon(shell, holes);
            }
            result[g] = coverage[g] instanceof Polygon ? parts[0] : factory.createMultiPolygon(parts);
        }
        return result;
    }

    private LinearRing ring(GeometryFactory factory, int[] refs, List<int[]> simplifiedEdges) {
        List<Coordinate> coordinates = new ArrayList<>();
        VertexTable t = structure.vertices;
        for (int ref : refs) {
            int[] edge = simplifiedEdges.get(Math.abs(ref) - 1);
            int[] path = ref > 0 ? edge : CoverageEdges.reversed(edge);
            for (int k = coordinates.isEmpty() ? 0 : 1; k < path.length; k++) {
                coordinates.add(new Coordinate(t.x(path[k]), t.y(path[k])));
            }
        }
        return factory.createLinearRing(coordinates.toArray(new Coordinate[0]));
    }
}
