package aequa.classes;

/**
 * Natural breaks: the partition of sorted values into contiguous classes that minimises the total
 * within-class sum of squared deviations, computed exactly.
 *
 * <p>This is Fisher's exact optimal grouping (Fisher, W. D. 1958, "On grouping for maximum homogeneity",
 * JASA 53(284), 789-798), the algorithm behind Jenks' natural breaks. Fisher's dynamic programme is
 * <pre>
 *   D[1][j] = cost(0, j)
 *   D[m][j] = min over i in [m-1, j-1] of D[m-1][i] + cost(i, j)
 * </pre>
 * where {@code cost(i, j)} is the weighted sum of squared deviations of items {@code i .. j-1} from their
 * mean. Evaluated naively that is O(k n^2). The sum-of-squares cost satisfies the quadrangle inequality
 * {@code cost(a,c) + cost(b,d) <= cost(a,d) + cost(b,c)} for {@code a <= b <= c <= d} (Wang and Song 2011,
 * "Ckmeans.1d.dp", The R Journal 3(2); Gronlund et al. 2017, "Fast exact k-means, k-medians and Bregman
 * divergence clustering in 1D", arXiv:1701.07204), so the leftmost optimal split {@code opt[m][j]} is
 * non-decreasing in {@code j}. Each layer is therefore filled by divide and conquer over {@code j}, scanning
 * only {@code [opt[m][jlo], opt[m][jhi]]}: O(k n log n) in all, with exactly the same optimum as the naive
 * programme (the tests compare both, and brute force over all set partitions).
 *
 * <p>Ties are handled by running the programme on the distinct values with their multiplicities as weights:
 * equal values never straddle a break, and many ties make the problem smaller. When there are no more
 * distinct values than classes, each distinct value is a class of its own.
 *
 * <p>Numerics: values are centred on their mean before prefix sums are formed, which keeps the
 * cancellation in {@code S2 - S1^2 / W} small for data far from zero; costs are clamped at 0.
 */
final class NaturalBreaks {

    private NaturalBreaks() {
    }

    /**
     * The index into {@code sorted} of the first value of each class after the first.
     *
     * @param sorted     finite values, ascending (ties allowed), at least one
     * @param classCount the number of classes wanted, at least 1
     * @return ascending start indices, {@code min(classCount, distinct values) - 1} of them; every index
     *         points at the first of a run of equal values
     */
    static int[] classStarts(double[] sorted, int classCount) {
        DistinctValues distinct = DistinctValues.of(sorted);
        int d = distinct.size();
        int k = Math.min(classCount, d);
        int[] startsInDistinct = new int[k - 1];
        if (k == d) {
            for (int c = 1; c < k; c++) {
                startsInDistinct[c - 1] = c;
            }
        } else {
            startsInDistinct = optimalStarts(distinct, k);
        }
        int[] starts = new int[k - 1];
        for (int c = 0; c < k - 1; c++) {
            starts[c] = distinct.firstIndex(startsInDistinct[c]);
        }
        return starts;
    }

    /** The class starts, as indices into the distinct values, of the optimal partition into k classes (k < d). */
    static int[] optimalStarts(DistinctValues distinct, int k) {
        Prefix prefix = new Prefix(distinct);
        int d = distinct.size();
        double[] previous = new double[d + 1];
        double[] current = new double[d + 1];
        int[][] opt = new int[k + 1][];
        for (int j = 1; j <= d; j++) {
            previous[j] = prefix.cost(0, j);
        }
        for (int m = 2; m <= k; m++) {
            int[] optM = new int[d + 1];
            fill(prefix, previous, current, optM, m, m, d, m - 1, d - 1);
            opt[m] = optM;
            double[] swap = previous;
            previous = current;
            current = swap;
        }
        int[] starts = new int[k - 1];
        int j = d;
        for (int m = k; m >= 2; m--) {
            j = opt[m][j];
            starts[m - 2] = j;
        }
        return starts;
    }

    /**
     * Fills {@code current[j]} and {@code opt[j]} for {@code j} in {@code [jlo, jhi]}, knowing the leftmost
     * optimal split of each lies in {@code [ilo, ihi]}.
     */
    private static void fill(Prefix prefix, double[] previous, double[] current, int[] opt,
                             int m, int jlo, int jhi, int ilo, int ihi) {
        if (jlo > jhi) {
            return;
        }
        int mid = (jlo + jhi) >>> 1;
        int from = Math.max(ilo, m - 1);
        int to = Math.min(ihi, mid - 1);
        double best = Double.POSITIVE_INFINITY;
        int bestI = from;
        for (int i = from; i <= to; i++) {
            double total = previous[i] + prefix.cost(i, mid);
            if (total < best) {
                best = total;
                bestI = i;
            }
        }
        current[mid] = best;
        opt[mid] = bestI;
        fill(prefix, previous, current, opt, m, jlo, mid - 1, ilo, bestI);
        fill(prefix, previous, current, opt, m, mid + 1, jhi, bestI, ihi);
    }

    /** Weighted prefix sums of centred values, for O(1) within-class sums of squares. */
    static final class Prefix {
        private final double[] weight;
        private final double[] sum;
        private final double[] sumSquares;

        Prefix(DistinctValues distinct) {
            int d = distinct.size();
            double mean = distinct.mean();
            weight = new double[d + 1];
            sum = new double[d + 1];
            sumSquares = new double[d + 1];
            for (int i = 0; i < d; i++) {
                double w = distinct.count(i);
                double x = distinct.value(i) - mean;
                weight[i + 1] = weight[i] + w;
                sum[i + 1] = sum[i] + w * x;
                sumSquares[i + 1] = sumSquares[i] + w * x * x;
            }
        }

        /** Weighted sum of squared deviations from their mean of distinct items {@code i .. j-1}; 0 if empty. */
        double cost(int i, int j) {
            double w = weight[j] - weight[i];
            if (w <= 0) {
                return 0;
            }
            double s = sum[j] - sum[i];
            double ss = sumSquares[j] - sumSquares[i] - s * s / w;
            return ss > 0 ? ss : 0;
        }
    }

    /** The distinct values of a sorted array with their multiplicities and first positions. */
    static final class DistinctValues {
        private final double[] values;
        private final int[] counts;
        private final int[] firstIndex;
        private final int size;
        private final double mean;

        private DistinctValues(double[] values, int[] counts, int[] firstIndex, int size, double mean) {
            this.values = values;
            this.counts = counts;
            this.firstIndex = firstIndex;
            this.size = size;
            this.mean = mean;
        }

        static DistinctValues of(double[] sorted) {
            int n = sorted.length;
            double[] values = new double[n];
            int[] counts = new int[n];
            int[] first = new int[n];
            int size = 0;
            double total = 0;
            for (int i = 0; i < n; i++) {
                total += sorted[i];
                if (size == 0 || sorted[i] != values[size - 1]) {
                    values[size] = sorted[i];
                    first[size] = i;
                    size++;
                }
                counts[size - 1]++;
            }
            return new DistinctValues(values, counts, first, size, total / n);
        }

        int size() {
            return size;
        }

        double value(int i) {
            return values[i];
        }

        int count(int i) {
            return counts[i];
        }

        int firstIndex(int i) {
            return firstIndex[i];
        }

        double mean() {
            return mean;
        }
    }
}
