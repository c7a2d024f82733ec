package aequa.classes;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Class limits laid out symmetrically around a centre: the mean (standard-deviation classes) or a declared
 * midpoint (diverging classes). Classes on the side with fewer values may be empty; they are kept, so
 * that a class's colour always means the same distance from the centre (common practice for diverging
 * schemes).
 *
 * <p>Layout for {@code k} classes and step {@code s}: with an even {@code k = 2h} the centre is a break and
 * the inner breaks are {@code centre + j s} for {@code j = -(h-1) .. h-1}; with an odd {@code k = 2h+1} the
 * middle class straddles the centre and the inner breaks are {@code centre +- (j + 1/2) s} for
 * {@code j = 0 .. h-1}.
 */
final class CentredBreaks {

    private CentredBreaks() {
    }

    /**
     * Standard-deviation classes: step = the population standard deviation (divisor n: the values are all
     * the regions mapped, not a sample of them). Inner breaks are rounded by {@link ReadableBreaks}; the
     * outer limits are the data extremes, or one step beyond the outermost break when that lies further
     * out, rounded outwards.
     *
     * @param sorted     finite values, ascending, not all equal
     * @param classCount at least 2
     * @return the limits, {@code classCount + 1} of them, ascending
     */
    static double[] standardDeviation(double[] sorted, int classCount) {
        int n = sorted.length;
        double sum = 0;
        for (double v : sorted) {
            sum += v;
        }
        double mean = sum / n;
        double squares = 0;
        for (double v : sorted) {
            squares += (v - mean) * (v - mean);
        }
        double sd = Math.sqrt(squares / n);
        double[] inner = ReadableBreaks.roundInner(sorted, offsets(mean, sd, classCount));
        double[] limits = new double[classCount + 1];
        System.arraycopy(inner, 0, limits, 1, inner.length);
        limits[0] = ReadableBreaks.floorOuter(Math.min(sorted[0], inner[0] - sd));
        limits[classCount] = ReadableBreaks.ceilOuter(Math.max(sorted[n - 1], inner[inner.length - 1] + sd));
        return limits;
    }

    /**
     * Diverging classes around {@code midpoint}: equal steps on both sides, the step being the largest
     * distance of a value from the midpoint divided by the number of steps per side, rounded up to
     * {@value ReadableBreaks#MIN_SIGNIFICANT} significant figures. Limits are exact decimal multiples of the
     * step from the midpoint (the midpoint itself is never rounded), and span every value.
     *
     * @param sorted     finite values, ascending, not all equal to the midpoint
     * @param classCount at least 2
     * @param midpoint   finite
     */
    static double[] diverging(double[] sorted, int classCount, double midpoint) {
        double reach = Math.max(sorted[sorted.length - 1] - midpoint, midpoint - sorted[0]);
        int half = classCount / 2;
        boolean odd = classCount % 2 == 1;
        double stepsPerSide = odd ? half + 0.5 : half;
        // divided in decimal so that, say, 8 / 2.5 is 3.2 and not 3.2000000000000002 rounded up to 3.3
        BigDecimal step = new BigDecimal(reach).divide(BigDecimal.valueOf(stepsPerSide),
                new MathContext(ReadableBreaks.MIN_SIGNIFICANT, RoundingMode.CEILING));
        BigDecimal centre = new BigDecimal(midpoint);
        double[] limits = new double[classCount + 1];
        for (int i = 0; i <= classCount; i++) {
            // limit i sits (i - k/2) steps from the centre: whole steps for even k, half steps for odd k
            BigDecimal offset = BigDecimal.valueOf(2L * i - classCount).divide(BigDecimal.valueOf(2));
            limits[i] = centre.add(step.multiply(offset)).doubleValue();
        }
        return limits;
    }

    /** The raw inner breaks around {@code centre} with step {@code step}, per the class layout. */
    static double[] offsets(double centre, double step, int classCount) {
        double[] inner = new double[classCount - 1];
        for (int i = 1; i < classCount; i++) {
            inner[i - 1] = centre + step * (i - classCount / 2.0);
        }
        return inner;
    }
}
