package aequa.ellipsoid;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

class LonLatDensifierTest {

    private static final GeometryFactory FACTORY = new GeometryFactory();

    @Test
    void sharedEdgesGetBitIdenticalVerticesWhicheverWayTheyRun() {
        // the property coverage simplification relies on (JTS CoverageSimplifier needs vertex-exact shared
        // edges; LIBRARIES.md section 2); seeded random edges
        Random random = new Random(42);
        for (int trial = 0; trial < 200; trial++) {
            Coordinate a = new Coordinate(random.nextDouble() * 20 - 10, random.nextDouble() * 20 + 30);
            Coordinate b = new Coordinate(random.nextDouble() * 20 - 10, random.nextDouble() * 20 + 30);
            Coordinate c = new Coordinate(a.x + 5, a.y - 5);
            Coordinate[] forward = LonLatDensifier.densify(FACTORY.createLinearRing(new Coordinate[] {a, b, c, a}).getCoordinateSequence(), 0.37).toCoordinateArray();
            Coordinate[] backward = LonLatDensifier.densify(FACTORY.createLinearRing(new Coordinate[] {b, a, c, b}).getCoordinateSequence(), 0.37).toCoordinateArray();
            Coordinate[] abForward = Arrays.copyOfRange(forward, 0, indexOf(forward, b) + 1);
            Coordinate[] abBackward = Arrays.copyOfRange(backward, 0, indexOf(backward, a) + 1);
            java.util.Collections.reverse(Arrays.asList(abBackward));
            assertArrayEquals(abForward, abBackward);
        }
    }

    private static int indexOf(Coordinate[] ring, Coordinate c) {
        for (int i = 1; i < ring.length; i++) {
            if (ring[i].equals2D(c)) {
                return i;
            }
        }
        throw new AssertionError(c + " not in ring");
    }

    @Test
    void stepsAreAtMostTheGivenSizeAndKeepTheShape() throws ParseException {
        Geometry box = new WKTReader(FACTORY).read("POLYGON((0 0, 10 0, 10 3, 0 3, 0 0), (1 1, 1 2, 2 2, 2 1, 1 1))");
        Geometry dense = LonLatDensifier.densify(box, 0.5);
        // 10/0.5 + 3/0.5 each twice = 52 edges on the shell, 4 * 2 on the hole, plus the closing vertices
        assertEquals(53 + 9, dense.getNumPoints());
        assertEquals(box.getArea(), dense.getArea(), 1e-12);
        assertTrue(dense.equalsTopo(box));
    }

    @Test
    void alreadyDenseInputIsReturnedAsItIs() throws ParseException {
        Geometry fine = new WKTReader(FACTORY).read("MULTIPOLYGON(((0 0, 0.5 0, 0.5 0.5, 0 0)), ((2 2, 2.4 2, 2.4 2.3, 2 2)))");
        assertSame(fine, LonLatDensifier.densify(fine, 0.5), "no edge is longer than the step: nothing to copy");
        Geometry oneLongEdge = new WKTReader(FACTORY).read("MULTIPOLYGON(((0 0, 0.5 0, 0.5 0.5, 0 0)), ((2 2, 3 2, 3 2.3, 2 2)))");
        Geometry dense = LonLatDensifier.densify(oneLongEdge, 0.5);
        assertEquals(4 + 6, dense.getNumPoints(), "the second part's 1-degree edges gain one vertex each");
    }
}
