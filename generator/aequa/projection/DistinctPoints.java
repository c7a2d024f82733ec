package aequa.projection;

/**
 * Which points of a list repeat an earlier one, by the exact bits of both coordinates: in a coverage every
 * vertex inside it is shared by the rings that meet there, and every ring repeats its first point at its
 * end, so about half of a region file's vertices are repeats (the 3,231 US counties of 2017 have 68,313
 * vertices, 33,416 of them distinct). Omega depends on the point alone, so a repeat adds nothing to a
 * maximum and a boundary sample (weight 0) nothing to a mean. An open-addressing hash table on two
 * primitive arrays; no objects per point.
 */
final class DistinctPoints {

    private DistinctPoints() {
    }

    /**
     * Keeps the first occurrence of every point of the interleaved (x, y) list, in their order: the kept
     * points of {@code xy[2 * from ..]}, {@code count} of them, are moved to the front of that range.
     *
     * @return how many points were kept
     */
    static int keepFirst(double[] xy, int from, int count) {
        int capacity = Integer.highestOneBit(Math.max(4, 2 * count)) << 1;
        long[] keyX = new long[capacity];
        long[] keyY = new long[capacity];
        boolean[] used = new boolean[capacity];
        int mask = capacity - 1;
        int kept = 0;
        for (int i = 0; i < count; i++) {
            double x = xy[2 * (from + i)];
            double y = xy[2 * (from + i) + 1];
            long bx = Double.doubleToLongBits(x);
            long by = Double.doubleToLongBits(y);
            int slot = mix(bx * 31 + by) & mask;
            boolean seen = false;
            while (used[slot]) {
                if (keyX[slot] == bx && keyY[slot] == by) {
                    seen = true;
                    break;
                }
                slot = (slot + 1) & mask;
            }
            if (seen) {
                continue;
            }
            used[slot] = true;
            keyX[slot] = bx;
            keyY[slot] = by;
            xy[2 * (from + kept)] = x;
            xy[2 * (from + kept) + 1] = y;
            kept++;
        }
        return kept;
    }

    /** The finalising mix of MurmurHash3 (Appleby, public domain), folded to an int. */
    private static int mix(long h) {
        h ^= h >>> 33;
        h *= 0xff51afd7ed558ccdL;
        h ^= h >>> 33;
        h *= 0xc4ceb93fe53ae7ccL;
        h ^= h >>> 33;
        return (int) h;
    }
}
