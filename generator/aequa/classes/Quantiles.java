package aequa.classes;

/**
 * Sample quantiles by Hyndman and Fan's definition 7 (Hyndman, R. J. and Fan, Y. 1996, "Sample quantiles
 * in statistical packages", The American Statistician 50(4), 361-365, section 2, definition 7).
 *
 * <p>With order statistics {@code x(1) <= ... <= x(n)}, {@code m = 1 - p}, {@code j = floor(np + m)} and
 * {@code g = np + m - j}: {@code Q(p) = (1 - g) x(j) + g x(j+1)}. Equivalently, with the 0-based position
 * {@code h = (n - 1) p}, linear interpolation between {@code x[floor(h)]} and {@code x[floor(h) + 1]}.
 *
 * <p>Why type 7: when {@code (n - 1) p} is not a whole number the quantile lies strictly between two
 * neighbouring values, which leaves room to round the break for readers without moving any value to
 * another class; and it is the default of widely used statistics software, so an analyst can reproduce
 * the breaks. (Types 1-3, the discontinuous ones, put every break on a data value instead.)
 */
final class Quantiles {

    private Quantiles() {
    }

    /**
     * @param sorted finite values, ascending, at least one
     * @param p      probability in [0, 1]
     * @return the type-7 sample quantile
     */
    static double type7(double[] sorted, double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("p outside [0, 1]: " + p);
        }
        int n = sorted.length;
        double h = (n - 1) * p;
        int lo = (int) Math.floor(h);
        if (lo >= n - 1) {
            return sorted[n - 1];
        }
        double g = h - lo;
        return g == 0 ? sorted[lo] : sorted[lo] + g * (sorted[lo + 1] - sorted[lo]);
    }

    /** The {@code classCount - 1} inner breaks at probabilities {@code c / classCount}. */
    static double[] innerBreaks(double[] sorted, int classCount) {
        double[] breaks = new double[classCount - 1];
        for (int c = 1; c < classCount; c++) {
            breaks[c - 1] = type7(sorted, (double) c / classCount);
        }
        return breaks;
    }
}
