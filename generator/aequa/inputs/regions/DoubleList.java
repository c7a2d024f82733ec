package aequa.inputs.regions;

import java.util.Arrays;

/** A growable array of primitive doubles, so a streamed ring costs 8 bytes per number rather than a boxed object. */
final class DoubleList {

    private double[] values;
    private int size;

    DoubleList(int initialCapacity) {
        values = new double[Math.max(4, initialCapacity)];
    }

    void add(double value) {
        if (size == values.length) {
            values = Arrays.copyOf(values, values.length * 2);
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

    double[] toArray() {
        return Arrays.copyOf(values, size);
    }
}
