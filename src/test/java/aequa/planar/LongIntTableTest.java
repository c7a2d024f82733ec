package aequa.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** Checked against java.util.HashMap (the JDK's general-purpose map) on the same operations. */
class LongIntTableTest {

    @Test
    void agreesWithHashMapThroughGrowthAndReplacement() {
        LongIntTable table = new LongIntTable(4);
        Map<Long, Integer> reference = new HashMap<>();
        Random random = new Random(20261202L);
        for (int i = 0; i < 200_000; i++) {
            // vertex-number pairs packed as the coverage structures pack them, many sharing a start or a next
            long key = ((long) random.nextInt(3_000) << 32) | random.nextInt(3_000);
            int value = random.nextInt(1_000_000);
            table.put(key, value);
            reference.put(key, value);
        }
        for (Map.Entry<Long, Integer> entry : reference.entrySet()) {
            assertEquals(entry.getValue(), table.get(entry.getKey()));
        }
        for (int i = 0; i < 10_000; i++) {
            long key = ((long) random.nextInt(6_000) << 32) | random.nextInt(6_000);
            assertEquals(reference.getOrDefault(key, -1), table.get(key));
        }
    }

    @Test
    void absentKeysAreNotContained() {
        LongIntTable table = new LongIntTable(0);
        assertFalse(table.containsKey(0));
        table.put(0, 0);
        table.put(Long.MIN_VALUE, 7);
        assertTrue(table.containsKey(0));
        assertEquals(7, table.get(Long.MIN_VALUE));
        assertEquals(-1, table.get(-1));
    }
}
