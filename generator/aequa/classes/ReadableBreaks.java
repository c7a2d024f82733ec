package aequa.classes;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Rounds class limits to numbers a reader can take in, under stated rules.
 *
 * <p><b>One step for the whole map</b> (tried first, {@link #onStep}): every limit is a multiple of one
 * power of ten, the largest not above a thirtieth of the data's range ({@link #stepFor}); inner breaks are
 * rounded half-up to it, the lowest limit down and the highest up. A break then moves by at most half a
 * step, 1.7 % of the range, and every limit of the map is written with the same number of decimals
 * ("18.7 – 27.6", never "18.665 – 27.5729"). Values are classed by the rounded limits, so a value lying
 * within half a step of a break may change class against the unrounded method; the legend, tables and
 * colours always agree. When rounding would merge two breaks or empty a class, the step is divided by ten,
 * at most {@value #STEP_REFINEMENTS} times.
 *
 * <p><b>Fallback, per break</b> (when no step works, for example one outlier far from tightly packed values): a break {@code b} is rounded half-up to the fewest significant figures,
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
    /** How many times the map's step may be divided by ten before the per-break rule takes over. */
    static final int STEP_REFINEMENTS = 3;
    /** The step is the largest power of ten not above the range divided by this. */
    static final double STEPS_PER_RANGE = 30;
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

    /**
     * The largest power of ten not above a thirtieth of {@code rangeWidth} (positive and finite). Thirty steps
     * over the range give one-decimal limits for ranges of 3 to 30, whole numbers for 30 to 300 (tuned by eye
     * on the demo's maps and the US counties; a hundredth gave limits such as 4.19 where 4.2 reads better).
     */
    static BigDecimal stepFor(double rangeWidth) {
        int exponent = (int) Math.floor(Math.log10(rangeWidth / STEPS_PER_RANGE));
        return BigDecimal.ONE.scaleByPowerOfTen(exponent);
    }

    /**
     * All limits on one step, or empty when no step keeps the breaks apart and every class filled.
     *
     * @param sorted the classified values, ascending, at least two distinct
     * @param raw    inner breaks, strictly ascending, each with a value below and at or above it
     * @return the limits: the lowest, the inner breaks, the highest
     */
    static java.util.Optional<double[]> onStep(double[] sorted, double[] raw) {
        BigDecimal step = stepFor(sorted[sorted.length - 1] - sorted[0]);
        for (int attempt = 0; attempt <= STEP_REFINEMENTS; attempt++, step = step.movePointLeft(1)) {
            double[] limits = new double[raw.length + 2];
            limits[0] = toStep(sorted[0], step, RoundingMode.FLOOR);
            for (int i = 0; i < raw.length; i++) {
                limits[i + 1] = toStep(raw[i], step, RoundingMode.HALF_UP);
            }
            limits[limits.length - 1] = toStep(sorted[sorted.length - 1], step, RoundingMode.CEILING);
            if (everyClassFilled(sorted, limits)) {
                return java.util.Optional.of(limits);
            }
        }
        return java.util.Optional.empty();
    }

    private static double toStep(double value, BigDecimal step, RoundingMode mode) {
        return BigDecimal.valueOf(value).divide(step).setScale(0, mode).multiply(step).doubleValue(); // valueOf: 0.3 is 0.3, not 0.29999…
    }

    /** Limits strictly ascending, and at least one value in every class (the last class holds its top). */
    private static boolean everyClassFilled(double[] sorted, double[] limits) {
        int from = 0;
        for (int c = 0; c < limits.length - 1; c++) {
            if (!(limits[c] < limits[c + 1])) {
                return false;
            }
            int to = c == limits.length - 2 ? sorted.length : lowerBound(sorted, limits[c + 1]);
            if (to <= from) {
                return false;
            }
            from = to;
        }
        return true;
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
