package aequa.statistics;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;

/**
 * Spearman's rank correlation coefficient: the Pearson correlation of the ranks, ties given the mean of
 * the ranks they span (Spearman 1904; the tie handling as in Kendall and Gibbons, "Rank Correlation
 * Methods", 5th ed. 1990, ch. 3, from memory). Our own code: the project has no statistics library, and
 * this is the only statistic the stage needs.
 */
final class RankCorrelation {

    private RankCorrelation() {
    }

    /**
     * @return the coefficient in [-1, 1]; NaN when there are fewer than two pairs or either series is
     *         constant (no ranking to correlate)
     */
    static double spearman(double[] x, double[] y) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("Series of different lengths: " + x.length + ", " + y.length);
        }
        if (x.length < 2) {
            return Double.NaN;
        }
        return pearson(ranks(x), ranks(y));
    }

    /** Ranks 1..n, ties sharing their mean rank. */
    static double[] ranks(double[] values) {
        Integer[] order = IntStream.range(0, values.length).boxed().toArray(Integer[]::new);
        Arrays.sort(order, Comparator.comparingDouble(i -> values[i]));
        double[] ranks = new double[values.length];
        int start = 0;
        while (start < order.length) {
            int end = start;
            while (end + 1 < order.length && values[order[end + 1]] == values[order[start]]) {
                end++;
            }
            double meanRank = (start + end) / 2.0 + 1.0;
            for (int k = start; k <= end; k++) {
                ranks[order[k]] = meanRank;
            }
            start = end + 1;
        }
        return ranks;
    }

    private static double pearson(double[] a, double[] b) {
        double meanA = Arrays.stream(a).average().orElseThrow();
        double meanB = Arrays.stream(b).average().orElseThrow();
        double covariance = 0;
        double varianceA = 0;
        double varianceB = 0;
        for (int i = 0; i < a.length; i++) {
            covariance += (a[i] - meanA) * (b[i] - meanB);
            varianceA += (a[i] - meanA) * (a[i] - meanA);
            varianceB += (b[i] - meanB) * (b[i] - meanB);
        }
        if (varianceA == 0 || varianceB == 0) {
            return Double.NaN;
        }
        return covariance / Math.sqrt(varianceA * varianceB);
    }
}
