package aequa.classes;

import java.util.List;

import aequa.project.ClassMethod;

/**
 * The classes of a map.
 *
 * <p>Class {@code i} holds the values v with {@code limits[i] <= v < limits[i+1]}, except the last class,
 * which also holds its upper limit. {@code limits} has one more entry than there are classes; its first
 * entry is at or below the smallest value classified and its last at or above the largest (the data
 * extremes rounded outwards to 3 significant figures; for std-dev and diverging classes the symmetric
 * layout may reach further, leaving end classes empty). For {@link ClassMethod#UNCLASSED} there is one
 * "class" spanning the data and colours are interpolated. Made by {@link Classifier#classify}.
 *
 * @param method the method that produced the limits
 * @param limits the class limits, ascending, rounded for readers, length = number of classes + 1
 * @param counts how many values fall in each class
 */
public record Classification(ClassMethod method, List<Double> limits, List<Integer> counts) {

    public Classification {
        limits = List.copyOf(limits);
        counts = List.copyOf(counts);
        if (limits.size() != counts.size() + 1) {
            throw new IllegalArgumentException("limits must have one entry more than counts: " + limits + " " + counts);
        }
    }

    public int classCount() {
        return counts.size();
    }

    /** The class index of {@code value}, or -1 for NaN. Values outside the limits go to the nearest end class. */
    public int classOf(double value) {
        if (Double.isNaN(value)) {
            return -1;
        }
        int last = counts.size() - 1;
        for (int i = 0; i < last; i++) {
            if (value < limits.get(i + 1)) {
                return i;
            }
        }
        return last;
    }
}
