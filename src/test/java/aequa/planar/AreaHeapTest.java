package aequa.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Comparator;
import java.util.Random;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;

/**
 * Checked against java.util.TreeSet ordered by (area, vertex), the order the heap promises, under seeded
 * random inserts, key changes, removals and polls, with many equal areas so the tie-break is exercised.
 */
class AreaHeapTest {

    @Test
    void pollsInTheSameOrderAsASortedSet() {
        Random random = new Random(20261202L);
        AreaHeap heap = new AreaHeap();
        for (int round = 0; round < 50; round++) {
            int vertexCount = 1 + random.nextInt(round < 40 ? 40 : 4_000);
            heap.reset(vertexCount);
            double[] areaOf = new double[vertexCount];
            TreeSet<Integer> reference = new TreeSet<>(
                    Comparator.<Integer>comparingDouble(v -> areaOf[v]).thenComparingInt(v -> v));
            for (int step = 0; step < 5 * vertexCount; step++) {
                int vertex = random.nextInt(vertexCount);
                int action = random.nextInt(4);
                if (action < 2) {
                    reference.remove(vertex);
                    areaOf[vertex] = random.nextInt(20); // few distinct areas: many ties
                    reference.add(vertex);
                    heap.put(vertex, areaOf[vertex]);
                } else if (action == 2) {
                    reference.remove(vertex);
                    heap.remove(vertex);
                } else if (!reference.isEmpty()) {
                    assertEquals(reference.pollFirst().intValue(), heap.poll());
                }
            }
            while (!reference.isEmpty()) {
                assertEquals(reference.pollFirst().intValue(), heap.poll());
            }
            assertTrue(heap.isEmpty());
        }
    }
}
