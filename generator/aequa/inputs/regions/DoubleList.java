package aequa.inputs.regions;

import java.util.Arrays;

/** A growable array of primitive doubles, so a streamed ring costs 8 bytes per number rather than a boxed object. */
final class DoubleList {

    private double[] values;
    private int size;

    DoubleList(int initialCapacity) {
        values = new double[initialCapacity];
    }

    void add(double value) {
        if (size == values.length) {
            values = Arrays.copyOf(values, Math.max(8, values.length * 2));
        }
        values[size++] = value;
    }

    double get(int index) {
        return values[index];
    }

    int size() {
        return size;
    }

    /** The backing array; only the first {@link #size()} entries are meaningful. */
    double[] raw() {
        return values;
    }

    /** Drops the last (x, y) pair, if there is one. */
    void removeLastPosition() {
        size = Math.max(0, size - 2);
    }

    void clear() {
        size = 0;
    }

    /** A new list holding these numbers in an array of exactly {@link #size()} entries. */
    DoubleList exactCopy() {
        DoubleList copy = new DoubleList(0);
        copy.values = Arrays.copyOf(values, size);
        copy.size = size;
        return copy;
    }

    /**
     * The numbers in an array of exactly {@link #size()} entries: the backing array itself when it has no
     * spare room (then the list must not be changed afterwards), else a copy.
     */
    double[] trimmedArray() {
        return values.length == size ? values : Arrays.copyOf(values, size);
    }
}
