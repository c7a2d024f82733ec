package aequa.planar;

import java.util.Arrays;

/**
 * Numbers distinct points 0, 1, 2, ... in order of first sight, keyed by the exact bits of x and y (-0.0 is
 * read as 0.0). An open-addressing hash table on primitive arrays, no boxing: 16 bytes per point plus
 * 8 bytes of slots (load factor at most one half).
 */
final class VertexTable {

    /** Point id's x at 2 id, its y at 2 id + 1: one cache line holds both. */
    private double[] xy;
    private int[] slots;
    private int size;

    /** @param expected the number of distinct points expected; the table grows beyond it */
    VertexTable(int expected) {
        int capacity = Math.max(256, expected);
        xy = new double[2 * capacity];
        slots = new int[2 * capacity];
        Arrays.fill(slots, -1);
    }

    int size() {
        return size;
    }

    double x(int id) {
        return xy[2 * id];
    }

    double y(int id) {
        return xy[2 * id + 1];
    }

    /**
     * The number of the point (x, y), adding it if new. {@code previous} is the number of the point before
     * it on its ring (-1 for none): a ring that runs along a border another ring numbered before meets its
     * points in numbering order, backwards or forwards, so the points numbered {@code previous - 1} and
     * {@code previous + 1} are compared first, from memory just read, and the hash table (a cache miss per
     * look-up) is searched only when neither is the point.
     */
    int idOf(double x, double y, int previous) {
        x += 0.0;
        y += 0.0;
        for (int id = previous - 1; id <= previous + 1; id += 2) {
            if (id >= 0 && id < size && Double.doubleToLongBits(xy[2 * id]) == Double.doubleToLongBits(x)
                    && Double.doubleToLongBits(xy[2 * id + 1]) == Double.doubleToLongBits(y)) {
                return id;
            }
        }
        int slot = slot(x, y, slots.length);
        while (slots[slot] >= 0) {
            int id = slots[slot];
            if (Double.doubleToLongBits(xy[2 * id]) == Double.doubleToLongBits(x)
                    && Double.doubleToLongBits(xy[2 * id + 1]) == Double.doubleToLongBits(y)) {
                return id;
            }
            slot = slot + 1 == slots.length ? 0 : slot + 1;
        }
        if (2 * size == xy.length) {
            xy = Arrays.copyOf(xy, 2 * (size + size / 2));
        }
        xy[2 * size] = x;
        xy[2 * size + 1] = y;
        slots[slot] = size;
        size++;
        if (2 * size > slots.length) {
            rehash(xy.length);
        }
        return size - 1;
    }

    /**
     * Renumbers the points: point {@code id} becomes point {@code newIdOf[id]} ({@code newIdOf} must be a
     * permutation of 0 .. size - 1). Afterwards the table only stores coordinates: its hash slots are
     * released (before the coordinates are copied, to keep the peak of memory low) and {@link #idOf} must
     * not be called again. A copy rather than an in-place cycle walk: its scattered writes are independent,
     * where a cycle walk waits on one cache miss after another (measured three times slower).
     */
    void renumber(int[] newIdOf) {
        slots = null;
        double[] moved = new double[2 * size];
        for (int id = 0; id < size; id++) {
            moved[2 * newIdOf[id]] = xy[2 * id];
            moved[2 * newIdOf[id] + 1] = xy[2 * id + 1];
        }
        xy = moved;
    }

    private void rehash(int slotCount) {
        slots = new int[slotCount];
        Arrays.fill(slots, -1);
        for (int id = 0; id < size; id++) {
            int slot = slot(xy[2 * id], xy[2 * id + 1], slotCount);
            while (slots[slot] >= 0) {
                slot = slot + 1 == slotCount ? 0 : slot + 1;
            }
            slots[slot] = id;
        }
    }

    /**
     * A slot for (x, y) in a table of {@code slotCount} slots: the high 32 bits of a multiplicative mix of
     * both coordinates' bits (the best-mixed bits of a product), mapped to the range by a multiply-shift (Lemire 2019, "Fast random integer generation in an
     * interval", ACM TOMACS 29(1)), so the table size need not be a power of two.
     */
    private static int slot(double x, double y, int slotCount) {
        long h = Double.doubleToLongBits(x) * 0x9E3779B97F4A7C15L + Double.doubleToLongBits(y);
        h = (h ^ (h >>> 31)) * 0xC2B2AE3D27D4EB4FL;
        return (int) (((h >>> 32) * slotCount) >>> 32);
    }
}
