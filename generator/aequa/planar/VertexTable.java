package aequa.planar;

import java.util.Arrays;

/**
 * Numbers distinct points 0, 1, 2, ... in order of first sight, keyed by the exact bits of x and y (-0.0 is
 * read as 0.0). An open-addressing hash table on primitive arrays: no boxing, about 40 bytes per point.
 */
final class VertexTable {

    private double[] xs = new double[1024];
    private double[] ys = new double[1024];
    private int[] slots = new int[2048];
    private int size;

    VertexTable() {
        Arrays.fill(slots, -1);
    }

    int size() {
        return size;
    }

    double x(int id) {
        return xs[id];
    }

    double y(int id) {
        return ys[id];
    }

    /** The number of the point (x, y), adding it if new. */
    int idOf(double x, double y) {
        x += 0.0;
        y += 0.0;
        int mask = slots.length - 1;
        int slot = hash(x, y) & mask;
        while (slots[slot] >= 0) {
            int id = slots[slot];
            if (Double.doubleToLongBits(xs[id]) == Double.doubleToLongBits(x)
                    && Double.doubleToLongBits(ys[id]) == Double.doubleToLongBits(y)) {
                return id;
            }
            slot = (slot + 1) & mask;
        }
        if (size == xs.length) {
            xs = Arrays.copyOf(xs, size * 2);
            ys = Arrays.copyOf(ys, size * 2);
        }
        xs[size] = x;
        ys[size] = y;
        slots[slot] = size;
        size++;
        if (2 * size > slots.length) {
            rehash();
        }
        return size - 1;
    }

    private void rehash() {
        slots = new int[slots.length * 2];
        Arrays.fill(slots, -1);
        int mask = slots.length - 1;
        for (int id = 0; id < size; id++) {
            int slot = hash(xs[id], ys[id]) & mask;
            while (slots[slot] >= 0) {
                slot = (slot + 1) & mask;
            }
            slots[slot] = id;
        }
    }

    private static int hash(double x, double y) {
        long h = Double.doubleToLongBits(x) * 0x9E3779B97F4A7C15L + Double.doubleToLongBits(y);
        h *= 0xC2B2AE3D27D4EB4FL;
        return (int) (h ^ (h >>> 29) ^ (h >>> 47));
    }
}
