package aequa.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** Point numbering checked against java.util.HashMap keyed by the same exact coordinate bits. */
class VertexTableTest {

    @Test
    void equalPointsShareANumberThroughGrowth() {
        VertexTable table = new VertexTable(1);
        Map<List<Long>, Integer> reference = new HashMap<>();
        Random random = new Random(20261202L);
        int previous = -1;
        for (int i = 0; i < 100_000; i++) {
            double x = random.nextInt(400) * 0.25;
            double y = random.nextInt(400) * 0.25;
            // the hint is only a hint: right, wrong or out of range, the number must be the same
            int id = table.idOf(x, y, i % 3 == 0 ? -1 : i % 3 == 1 ? previous : random.nextInt(200_000) - 50_000);
            previous = id;
            Integer expected = reference.putIfAbsent(List.of(Double.doubleToLongBits(x), Double.doubleToLongBits(y)), reference.size());
            assertEquals(expected == null ? reference.size() - 1 : expected, id);
            assertEquals(x, table.x(id));
            assertEquals(y, table.y(id));
        }
        assertEquals(reference.size(), table.size());
    }

    @Test
    void aRingAlongANumberedBorderFindsItsPointsInReverse() {
        VertexTable table = new VertexTable(4);
        for (int i = 0; i < 10; i++) {
            assertEquals(i, table.idOf(i, 0, i - 1));
        }
        int previous = -1;
        for (int i = 9; i >= 0; i--) {
            previous = table.idOf(i, 0, previous);
            assertEquals(i, previous);
        }
        assertEquals(10, table.size());
    }

    @Test
    void negativeZeroIsZeroButNearbyPointsDiffer() {
        VertexTable table = new VertexTable(4);
        int origin = table.idOf(0.0, 0.0, -1);
        assertEquals(origin, table.idOf(-0.0, -0.0, origin + 1));
        assertNotEquals(origin, table.idOf(Math.ulp(0.0), 0.0, origin + 1));
    }

    @Test
    void renumberingMovesTheCoordinates() {
        VertexTable table = new VertexTable(4);
        for (int i = 0; i < 5; i++) {
            table.idOf(i, 10 * i, i - 1);
        }
        table.renumber(new int[] {4, 0, 3, 1, 2});
        assertEquals(List.of(1.0, 3.0, 4.0, 2.0, 0.0),
                List.of(table.x(0), table.x(1), table.x(2), table.x(3), table.x(4)));
        assertEquals(40.0, table.y(2));
    }
}
