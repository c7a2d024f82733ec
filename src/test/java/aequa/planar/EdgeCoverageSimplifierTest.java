package aequa.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.coverage.CoverageUnion;
import org.locationtech.jts.coverage.CoverageValidator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * A hand-made coverage: a 10 x 10 square cut into three polygons that meet at a triple junction (5, 5),
 * with zig-zag shared borders (amplitude 0.1, wavelength 1). Checked against JTS (a general-purpose
 * reference library): its CoverageValidator finds no gap or overlap, every polygon is valid, the union of
 * the parts is the square, and every vertex of one polygon that lies on a neighbour's boundary is also a
 * vertex of that neighbour (shared borders are bit-identical).
 */
class EdgeCoverageSimplifierTest {

    private static final GeometryFactory FACTORY = new GeometryFactory();

    /** Zig-zag from (x0, y0) to (x1, y1) in n steps, sideways offsets of +-amplitude at inner points. */
    private static List<Coordinate> wiggle(double x0, double y0, double x1, double y1, int n, double amplitude) {
        List<Coordinate> line = new ArrayList<>();
        double length = Math.hypot(x1 - x0, y1 - y0);
        double nx = -(y1 - y0) / length;
        double ny = (x1 - x0) / length;
        for (int k = 0; k <= n; k++) {
            double t = (double) k / n;
            double offset = k == 0 || k == n ? 0 : (k % 2 == 0 ? amplitude : -amplitude);
            line.add(new Coordinate(x0 + t * (x1 - x0) + offset * nx, y0 + t * (y1 - y0) + offset * ny));
        }
        return line;
    }

    private static Geometry polygon(List<List<Coordinate>> pieces) {
        List<Coordinate> ring = new ArrayList<>();
        for (List<Coordinate> piece : pieces) {
            ring.addAll(ring.isEmpty() ? piece : piece.subList(1, piece.size()));
        }
        return FACTORY.createPolygon(ring.toArray(new Coordinate[0]));
    }

    private static List<Coordinate> reverse(List<Coordinate> line) {
        List<Coordinate> r = new ArrayList<>(line);
        java.util.Collections.reverse(r);
        return r;
    }

    private static Geometry[] tripleJunction() {
        List<Coordinate> bottomMid = wiggle(5, 0, 5, 5, 10, 0.1);   // left | bottom-right
        List<Coordinate> topMid = wiggle(5, 5, 5, 10, 10, 0.1);     // left | top-right
        List<Coordinate> rightMid = wiggle(5, 5, 10, 5, 10, 0.1);   // bottom-right | top-right
        Geometry left = polygon(List.of(List.of(new Coordinate(0, 0), new Coordinate(5, 0)), bottomMid, topMid,
                List.of(new Coordinate(5, 10), new Coordinate(0, 10), new Coordinate(0, 0))));
        Geometry bottomRight = polygon(List.of(List.of(new Coordinate(5, 0), new Coordinate(10, 0),
                new Coordinate(10, 5)), reverse(rightMid), reverse(bottomMid)));
        Geometry topRight = polygon(List.of(rightMid, List.of(new Coordinate(10, 5), new Coordinate(10, 10),
                new Coordinate(5, 10)), reverse(topMid)));
        return new Geometry[] {left, bottomRight, topRight};
    }

    @Test
    void theHandMadeCoverageIsValidBeforeSimplification() {
        Geometry[] coverage = tripleJunction();
        assertTrue(CoverageValidator.isValid(coverage));
        assertEquals(100, CoverageUnion.union(coverage).getArea(), 1e-9);
    }

    @Test
    void sharedBordersStayIdenticalAndEveryPolygonValid() {
        Geometry[] coverage = tripleJunction();
        Geometry[] simplified = EdgeCoverageSimplifier.simplify(coverage, 0.5);

        int before = Arrays.stream(coverage).mapToInt(Geometry::getNumPoints).sum();
        int after = Arrays.stream(simplified).mapToInt(Geometry::getNumPoints).sum();
        // each zig-zag triangle has area 0.5 * 1 * 0.1 = 0.05 < 0.5^2, so the wiggles go
        assertTrue(after < before / 3, "simplified " + before + " -> " + after);
        for (Geometry polygon : simplified) {
            assertTrue(polygon.isValid(), polygon.toText());
            // the triple junction is a node and never moves
            assertTrue(vertices(polygon).contains(new Coordinate(5, 5)), polygon.toText());
        }
        assertTrue(CoverageValidator.isValid(simplified));
        double sum = Arrays.stream(simplified).mapToDouble(Geometry::getArea).sum();
        assertEquals(100, CoverageUnion.union(simplified).getArea(), 1e-9);
        assertEquals(100, sum, 1e-9);
        for (int i = 0; i < simplified.length; i++) {
            for (int j = 0; j < simplified.length; j++) {
                if (i != j) {
                    assertSharedVerticesIdentical(simplified[i], simplified[j]);
                }
            }
        }
    }

    @Test
    void zeroToleranceKeepsEveryVertex() {
        Geometry[] coverage = tripleJunction();
        Geometry[] simplified = EdgeCoverageSimplifier.simplify(coverage, 0);
        for (int i = 0; i < coverage.length; i++) {
            // rings may start at another vertex (their first node), so compare in JTS's normal form
            assertTrue(coverage[i].norm().equalsExact(simplified[i].norm()), simplified[i].toText());
        }
    }

    @Test
    void anIslandInAHoleStaysATriangleAtLeastAndSharesItsRing() {
        Geometry frame = FACTORY.createPolygon(FACTORY.createLinearRing(new Coordinate[] {new Coordinate(0, 0),
            new Coordinate(10, 0), new Coordinate(10, 10), new Coordinate(0, 10), new Coordinate(0, 0)}),
                new org.locationtech.jts.geom.LinearRing[] {FACTORY.createLinearRing(
                    new Coordinate[] {new Coordinate(4, 4), new Coordinate(4, 6), new Coordinate(6, 6),
                        new Coordinate(6, 4), new Coordinate(4, 4)})});
        Geometry island = FACTORY.createPolygon(new Coordinate[] {new Coordinate(4, 4), new Coordinate(6, 4),
            new Coordinate(6, 6), new Coordinate(4, 6), new Coordinate(4, 4)});
        // a tolerance far above the island's size would erase it without the loop guard
        Geometry[] simplified = EdgeCoverageSimplifier.simplify(new Geometry[] {frame, island}, 100);
        assertTrue(simplified[1].isValid());
        assertTrue(simplified[0].isValid());
        assertTrue(simplified[1].getNumPoints() >= 4);
        assertTrue(CoverageValidator.isValid(simplified));
        assertEquals(100, simplified[0].getArea() + simplified[1].getArea(), 1e-9);
    }

    private static Set<Coordinate> vertices(Geometry g) {
        return new HashSet<>(Arrays.asList(g.getCoordinates()));
    }

    private static void assertSharedVerticesIdentical(Geometry a, Geometry b) {
        Geometry boundaryB = b.getBoundary();
        Set<Coordinate> verticesB = vertices(b);
        for (Coordinate c : a.getCoordinates()) {
            if (boundaryB.distance(FACTORY.createPoint(c)) == 0) {
                assertTrue(verticesB.contains(c), "vertex " + c + " of " + a + " lies on " + b + " but is not its vertex");
            }
        }
    }
}
