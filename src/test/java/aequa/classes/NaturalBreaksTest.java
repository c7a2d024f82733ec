package aequa.classes;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** Natural breaks (Fisher 1958) against brute force, a textbook DP and a statistics library's output. */
class NaturalBreaksTest {

    @Test
    void matchesBruteForceOverAllSetPartitions() {
        // Brute force over every partition of the items into k non-empty sets (restricted growth strings),
        // not only contiguous ones: it also confirms Fisher's 1958 result that an optimal partition is
        // contiguous in sorted order.
        Random random = new Random(1958);
        for (int trial = 0; trial < 40; trial++) {
            int n = 4 + random.nextInt(6); // 4..9 values: at most S(9,4) = 7,770 partitions
            int k = 2 + random.nextInt(Math.min(3, n - 2));
            double[] sorted = randomSorted(random, n);
            double expected = bruteForceAllPartitions(sorted, k);
            double actual = sse(sorted, NaturalBreaks.classStarts(sorted, k));
            assertEquals(expected, actual, 1e-9 * (1 + expected), "trial " + trial + " " + Arrays.toString(sorted));
        }
    }

    @Test
    void matchesBruteForceOverContiguousPartitions() {
        Random random = new Random(42);
        for (int trial = 0; trial < 60; trial++) {
            int n = 8 + random.nextInt(11); // 8..18 values
            int k = 2 + random.nextInt(5);
            double[] sorted = randomSorted(random, n);
            int[] expected = bruteForceContiguous(sorted, k);
            assertArrayEquals(expected, NaturalBreaks.classStarts(sorted, k), Arrays.toString(sorted));
        }
    }

    @Test
    void matchesTextbookQuadraticProgramme() {
        // Independent O(k n^2) implementation of Fisher's programme, written here from Fisher 1958 without
        // the monotone-split speed-up, on seeded skewed data.
        Random random = new Random(7);
        for (int trial = 0; trial < 12; trial++) {
            int n = 200 + random.nextInt(200);
            double[] sorted = new double[n];
            for (int i = 0; i < n; i++) {
                sorted[i] = Math.exp(2 * random.nextGaussian());
            }
            Arrays.sort(sorted);
            for (int k = 2; k <= 9; k++) {
                int[] expected = textbookStarts(sorted, k);
                int[] actual = NaturalBreaks.classStarts(sorted, k);
                assertEquals(sse(sorted, expected), sse(sorted, actual), 1e-9 * sse(sorted, expected));
                assertArrayEquals(expected, actual, "n=" + n + " k=" + k);
            }
        }
    }

    @Test
    void matchesSimpleStatisticsCkmeans() throws IOException {
        // Reference: simple-statistics 7.12.1 ckmeans (Wang & Song 2011, exact); see resources SOURCE.md.
        List<String> lines = resourceLines("/classes/ckmeans-reference.txt");
        int cases = 0;
        for (int i = 0; i < lines.size(); i += 5) {
            int k = Integer.parseInt(lines.get(i + 1).split(" ")[1]);
            double[] sorted = numbers(lines.get(i + 2));
            Arrays.sort(sorted);
            double[] minima = numbers(lines.get(i + 3));
            double[] sizes = numbers(lines.get(i + 4));
            int[] starts = NaturalBreaks.classStarts(sorted, k);
            double[] ourMinima = new double[k];
            double[] ourSizes = new double[k];
            ourMinima[0] = sorted[0];
            for (int c = 0; c < k; c++) {
                int from = c == 0 ? 0 : starts[c - 1];
                int to = c == k - 1 ? sorted.length : starts[c];
                ourMinima[c] = sorted[from];
                ourSizes[c] = to - from;
            }
            assertArrayEquals(minima, ourMinima, lines.get(i));
            assertArrayEquals(sizes, ourSizes, lines.get(i));
            cases++;
        }
        assertEquals(3, cases);
    }

    @Test
    void fewerDistinctValuesThanClassesGivesOneClassPerValue() {
        double[] sorted = {1, 1, 1, 4, 4, 9};
        assertArrayEquals(new int[] {3, 5}, NaturalBreaks.classStarts(sorted, 5));
    }

    @Test
    void tiesNeverStraddleABreak() {
        Random random = new Random(3);
        double[] sorted = new double[500];
        for (int i = 0; i < sorted.length; i++) {
            sorted[i] = random.nextInt(40);
        }
        Arrays.sort(sorted);
        for (int start : NaturalBreaks.classStarts(sorted, 7)) {
            assertEquals(true, sorted[start - 1] < sorted[start]);
        }
    }

    @Test
    void largeOffsetDoesNotChangeThePartition() {
        // Centring before forming prefix sums keeps the result for data far from zero.
        Random random = new Random(11);
        double[] small = randomSorted(random, 300);
        double[] shifted = Arrays.stream(small).map(v -> v + 1e7).toArray();
        assertArrayEquals(NaturalBreaks.classStarts(small, 6), NaturalBreaks.classStarts(shifted, 6));
    }

    // ---- helpers -------------------------------------------------------------------------------------

    private static double[] randomSorted(Random random, int n) {
        double[] values = new double[n];
        for (int i = 0; i < n; i++) {
            values[i] = Math.round(random.nextDouble() * 1000) / 10.0 + random.nextInt(3) * 50;
        }
        Arrays.sort(values);
        return values;
    }

    static double sse(double[] sorted, int[] starts) {
        double total = 0;
        for (int c = 0; c <= starts.length; c++) {
            int from = c == 0 ? 0 : starts[c - 1];
            int to = c == starts.length ? sorted.length : starts[c];
            total += sseOf(Arrays.copyOfRange(sorted, from, to));
        }
        return total;
    }

    private static double sseOf(double[] values) {
        double mean = Arrays.stream(values).average().orElse(0);
        return Arrays.stream(values).map(v -> (v - mean) * (v - mean)).sum();
    }

    private static double bruteForceAllPartitions(double[] values, int k) {
        int n = values.length;
        int[] label = new int[n];
        double[] best = {Double.POSITIVE_INFINITY};
        enumerate(values, k, label, 1, 0, best); // label[0] = 0: restricted growth string
        return best[0];
    }

    private static void enumerate(double[] values, int k, int[] label, int position, int maxLabel, double[] best) {
        if (position == values.length) {
            if (maxLabel == k - 1) {
                double total = 0;
                for (int c = 0; c < k; c++) {
                    int cc = c;
                    double[] members = java.util.stream.IntStream.range(0, values.length)
                            .filter(i -> label[i] == cc).mapToDouble(i -> values[i]).toArray();
                    total += sseOf(members);
                }
                best[0] = Math.min(best[0], total);
            }
            return;
        }
        for (int l = 0; l <= Math.min(maxLabel + 1, k - 1); l++) {
            label[position] = l;
            enumerate(values, k, label, position + 1, Math.max(maxLabel, l), best);
        }
    }

    private static int[] bruteForceContiguous(double[] sorted, int k) {
        List<int[]> all = new ArrayList<>();
        choose(sorted.length, k - 1, 1, new int[k - 1], 0, all);
        int[] best = null;
        double bestSse = Double.POSITIVE_INFINITY;
        for (int[] starts : all) {
            double s = sse(sorted, starts);
            if (best == null || s < bestSse - 1e-9 * (1 + bestSse)) {
                bestSse = s;
                best = starts;
            }
        }
        return best;
    }

    private static void choose(int n, int r, int from, int[] current, int depth, List<int[]> out) {
        if (depth == r) {
            out.add(current.clone());
            return;
        }
        for (int i = from; i < n; i++) {
            current[depth] = i;
            choose(n, r, i + 1, current, depth + 1, out);
        }
    }

    /** Fisher's programme, O(k n^2), the leftmost optimal split on ties. */
    private static int[] textbookStarts(double[] sorted, int k) {
        int n = sorted.length;
        double[][] cost = new double[n + 1][n + 1];
        for (int i = 0; i < n; i++) {
            double sum = 0;
            double squares = 0;
            for (int j = i + 1; j <= n; j++) {
                double x = sorted[j - 1];
                sum += x;
                squares += x * x;
                cost[i][j] = Math.max(0, squares - sum * sum / (j - i));
            }
        }
        double[][] d = new double[k + 1][n + 1];
        int[][] split = new int[k + 1][n + 1];
        for (int j = 1; j <= n; j++) {
            d[1][j] = cost[0][j];
        }
        for (int m = 2; m <= k; m++) {
            for (int j = m; j <= n; j++) {
                d[m][j] = Double.POSITIVE_INFINITY;
                for (int i = m - 1; i < j; i++) {
                    double total = d[m - 1][i] + cost[i][j];
                    if (i == m - 1 || total < d[m][j] - 1e-12 * (1 + d[m][j])) {
                        d[m][j] = total;
                        split[m][j] = i;
                    }
                }
            }
        }
        int[] starts = new int[k - 1];
        int j = n;
        for (int m = k; m >= 2; m--) {
            j = split[m][j];
            starts[m - 2] = j;
        }
        return starts;
    }

    static List<String> resourceLines(String path) throws IOException {
        try (InputStream in = NaturalBreaksTest.class.getResourceAsStream(path)) {
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            List<String> lines = new ArrayList<>();
            for (String line : text.split("\n")) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    lines.add(line);
                }
            }
            return lines;
        }
    }

    private static double[] numbers(String line) {
        String[] parts = line.trim().split(" ");
        return Arrays.stream(parts, 1, parts.length).mapToDouble(Double::parseDouble).toArray();
    }
}
