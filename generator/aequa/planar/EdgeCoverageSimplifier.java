package aequa.planar;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.impl.PackedCoordinateSequence;

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
 * <p>Why not JTS's {@code CoverageSimplifier}, which does the same job: it keeps the same vertices here but
 * takes several times as long on a large coverage, the hot loop of a large map. Measured with
 * {@code GeometryBenchmark.main stages 20000 3} (20,000 synthetic Voronoi cells, about 0.96 million vertices
 * as read; 2-core shared machine, JTS 1.20): JTS 1.00 to 3.90 s per run against 0.19 to 0.50 s here, 5.2
 * to 7.9 times, both keeping 139,517 vertices. The benchmark keeps that baseline, so a change here can be
 * weighed against it.
 *
 * <p>Limits: the vertex order and so the orientation of every ring is kept; the result depends on the order
 * of edges (first seen, first simplified), which is deterministic for a given input.
 */
final class EdgeCoverageSimplifier {

    private final CoverageEdges structure;
    private final VertexGrid vertices;
    private final double areaToleranceM2;
    /** Node pairs (see {@link #nodePair}) already joined by an edge that is a single straight segment. */
    private final LongIntTable straightNodePairs;
    // scratch for one edge at a time: the live neighbours of each position and the queue of removable ones
    private int[] previous = new int[16];
    private int[] next = new int[16];
    private final AreaHeap queue = new AreaHeap();

    private EdgeCoverageSimplifier(Geometry[] coverage, double toleranceM) {
        this.structure = new CoverageEdges(coverage);
        this.vertices = structure.vertices;
        this.areaToleranceM2 = toleranceM * toleranceM;
        this.straightNodePairs = structure.straightEdgeByNodes;
    }

    /** The coverage simplified to {@code toleranceM} metres; same length and order, same part structure. */
    static Geometry[] simplify(Geometry[] coverage, double toleranceM) {
        EdgeCoverageSimplifier simplifier = new EdgeCoverageSimplifier(coverage, toleranceM);
        List<int[]> edges = simplifier.structure.edges;
        List<int[]> simplified = new ArrayList<>(edges.size());
        for (int[] edge : edges) {
            simplified.add(simplifier.simplifyEdge(edge));
        }
        return simplifier.assemble(coverage, simplified);
    }

    private static long nodePair(int[] edge) {
        return CoverageEdges.nodePair(edge[0], edge[edge.length - 1]);
    }

    private int[] simplifyEdge(int[] edge) {
        int n = edge.length;
        boolean loop = edge[0] == edge[n - 1];
        int minimumVertices = loop ? 4 : 2;
        if (n <= minimumVertices) {
            return edge;
        }
        if (previous.length < n) {
            previous = new int[Math.max(n, 2 * previous.length)];
            next = new int[previous.length];
        }
        for (int i = 0; i < n; i++) {
            previous[i] = i - 1;
            next[i] = i + 1;
        }
        queue.reset(n);
        for (int i = 1; i < n - 1; i++) {
            offer(edge, i);
        }
        int live = n;
        while (!queue.isEmpty() && live > minimumVertices) {
            int i = queue.poll();
            int a = previous[i];
            int b = next[i];
            boolean lastInnerVertex = live == 3 && !loop;
            if (lastInnerVertex && straightNodePairs.containsKey(nodePair(edge))) {
                continue;
            }
            if (vertices.anyInTriangle(edge[a], edge[i], edge[b])) {
                continue;
            }
            if (lastInnerVertex) {
                straightNodePairs.put(nodePair(edge), 0);
            }
            vertices.remove(edge[i]);
            next[a] = b;
            previous[b] = a;
            live--;
            if (a > 0) {
                offer(edge, a);
            }
            if (b < n - 1) {
                offer(edge, b);
            }
        }
        int[] kept = new int[live];
        int count = 0;
        for (int i = 0; i < n; i = next[i]) {
            kept[count++] = edge[i];
        }
        return kept;
    }

    /** Queues (or requeues) the inner vertex at position {@code v} when its triangle is within the tolerance, else takes it out. */
    private void offer(int[] edge, int v) {
        int a = edge[previous[v]];
        int b = edge[next[v]];
        int c = edge[v];
        double ax = vertices.x(a);
        double ay = vertices.y(a);
        double areaM2 = Math.abs((vertices.x(c) - ax) * (vertices.y(b) - ay) - (vertices.x(b) - ax) * (vertices.y(c) - ay)) / 2;
        if (areaM2 <= areaToleranceM2) {
            queue.put(v, areaM2);
        } else {
            queue.remove(v);
        }
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

    /** The ring's coordinates from its simplified edges, packed x, y; the first point repeated at the end. */
    private LinearRing ring(GeometryFactory factory, int[] refs, List<int[]> simplifiedEdges) {
        int points = 1;
        for (int ref : refs) {
            points += simplifiedEdges.get(Math.abs(ref) - 1).length - 1;
        }
        double[] xy = new double[2 * points];
        int count = 0;
        for (int ref : refs) {
            int[] edge = simplifiedEdges.get(Math.abs(ref) - 1);
            int last = edge.length - 1;
            for (int k = count == 0 ? 0 : 1; k <= last; k++) {
                int vertex = ref > 0 ? edge[k] : edge[last - k];
                xy[2 * count] = vertices.x(vertex);
                xy[2 * count + 1] = vertices.y(vertex);
                count++;
            }
        }
        return factory.createLinearRing(new PackedCoordinateSequence.Double(xy, 2, 0));
    }
}
