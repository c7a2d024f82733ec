package aequa.planar;

import java.util.Arrays;

/**
 * A map from {@code long} keys to non-negative {@code int} values: open addressing with linear probing on
 * primitive arrays. Ours because the coverage structures and the drawing's border network look up millions
 * of packed vertex-number pairs, and {@code HashMap<Long, Integer>} boxes every key and value and hashes a pair (a, b) packed as
 * {@code a << 32 | b} to {@code a ^ b}, which collides for whole families of pairs. Keys are mixed with a
 * 64-bit finaliser (MurmurHash3's fmix64, Appleby 2011) before probing. No removal.
 */
public final class LongIntTable {

    private static final int ABSENT = -1;

    private long[] keys;
    private int[] values;
    private int size;

    /** @param expected the number of entries expected; the table grows beyond it */
    public LongIntTable(int expected) {
        int capacity = Integer.highestOneBit(Math.max(8, expected * 2 - 1)) << 1;
        keys = new long[capacity];
        values = new int[capacity];
        Arrays.fill(values, ABSENT);
    }

    /** The value stored for {@code key}, or -1 when there is none. */
    public int get(long key) {
        int mask = keys.length - 1;
        for (int slot = slot(key, mask); values[slot] != ABSENT; slot = (slot + 1) & mask) {
            if (keys[slot] == key) {
                return values[slot];
            }
        }
        return ABSENT;
    }

    /** How many keys are stored. */
    public int size() {
        return size;
    }

    public boolean containsKey(long key) {
        return get(key) != ABSENT;
    }

    /** Stores {@code value} (non-negative) for {@code key}, replacing any earlier value. */
    public void put(long key, int value) {
        if (value < 0) {
            throw new IllegalArgumentException("values are non-negative: " + value);
        }
        int mask = keys.length - 1;
        int slot = slot(key, mask);
        while (values[slot] != ABSENT && keys[slot] != key) {
            slot = (slot + 1) & mask;
        }
        if (values[slot] == ABSENT) {
            size++;
        }
        keys[slot] = key;
        values[slot] = value;
        if (2 * size > keys.length) {
            grow();
        }
    }

    private void grow() {
        long[] oldKeys = keys;
        int[] oldValues = values;
        keys = new long[oldKeys.length * 2];
        values = new int[oldKeys.length * 2];
        Arrays.fill(values, ABSENT);
        int mask = keys.length - 1;
        for (int old = 0; old < oldKeys.length; old++) {
            if (oldValues[old] != ABSENT) {
                int slot = slot(oldKeys[old], mask);
                while (values[slot] != ABSENT) {
                    slot = (slot + 1) & mask;
                }
                keys[slot] = oldKeys[old];
                values[slot] = oldValues[old];
            }
        }
    }

    private static int slot(long key, int mask) {
        long h = key;
        h ^= h >>> 33;
        h *= 0xFF51AFD7ED558CCDL;
        h ^= h >>> 33;
        h *= 0xC4CEB9FE1A85EC53L;
        h ^= h >>> 33;
        return (int) h & mask;
    }
}
