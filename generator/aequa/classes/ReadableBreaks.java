package aequa.classes;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Rounds class limits to numbers a reader can take in, under one stated rule.
 *
 * <p><b>Inner breaks</b> (the rule): a break {@code b} is rounded half-up to the fewest significant figures,
 * at least {@value #MIN_SIGNIFICANT}, for which the rounded value {@code r} still separates the same values:
 * {@code below < r <= above}, where {@code below} is the largest value less than {@code b} and {@code above}
 * the smallest value at least {@code b}. Every value therefore stays in the class it had before rounding.
 * {@code r} must also stay above the previous rounded break and below the next raw break, so limits stay
 * strictly ascending. If no shorter form qualifies, the break is kept at full precision (17 figures).
 * Two figures bound the shift of a break by 5 % of its magnitude.
 *
 * <p><b>Outer limits</b> are rounded outwards (down for the lowest, up for the highest) to
 * {@value #OUTER_SIGNIFICANT} significant figures, so every value stays inside the limits.
 */
final class ReadableBreaks {

    static final int MIN_SIGNIFICANT = 2;
    static final int OUTER_SIGNIFICANT = 3;
    private static final int MAX_SIGNIFICANT = 17;

    private ReadableBreaks() {
    }

    /**
     * @param sorted the classified values, ascending
     * @param raw    inner breaks, strictly ascending
     * @return the rounded inner breaks, strictly ascending, each separating exactly the values its raw
     *         break separated
     */
    static double[] roundInner(double[] sorted, double[] raw) {
        double[] rounded = new double[raw.length];
        double previous = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < raw.length; i++) {
            double b = raw[i];
            int firstAtOrAbove = lowerBound(sorted, b);
            double below = firstAtOrAbove == 0 ? Double.NEGATIVE_INFINITY : sorted[firstAtOrAbove - 1];
            double above = firstAtOrAbove == sorted.length ? Double.POSITIVE_INFINITY : sorted[firstAtOrAbove];
            double next = i + 1 < raw.length ? raw[i + 1] : Double.POSITIVE_INFINITY;
            double chosen = b;
            for (int s = MIN_SIGNIFICANT; s < MAX_SIGNIFICANT; s++) {
                double r = round(b, s, RoundingMode.HALF_UP);
                if (r > below && r <= above && r > previous && r < next) {
                    chosen = r;
                    break;
                }
            }
            rounded[i] = chosen;
            previous = chosen;
        }
        return rounded;
    }

    /** {@code value} rounded down to {@value #OUTER_SIGNIFICANT} significant figures. */
    static double floorOuter(double value) {
        return round(value, OUTER_SIGNIFICANT, RoundingMode.FLOOR);
    }

    /** {@code value} rounded up to {@value #OUTER_SIGNIFICANT} significant figures. */
    static double ceilOuter(double value) {
        return round(value, OUTER_SIGNIFICANT, RoundingMode.CEILING);
    }

    /** {@code value} rounded to {@code significant} figures in the given direction; 0 stays 0. */
    static double round(double value, int significant, RoundingMode mode) {
        if (value == 0 || !Double.isFinite(value)) {
            return value;
        }
        return new BigDecimal(value).round(new MathContext(significant, mode)).doubleValue();
    }

    /** The number of values in {@code sorted} strictly less than {@code x}. */
    static int lowerBound(double[] sorted, double x) {
        int lo = 0;
        int hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < x) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
