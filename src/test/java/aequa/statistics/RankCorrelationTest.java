package aequa.statistics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

class RankCorrelationTest {

    @Test
    void workedExampleWithoutTies() {
        // A widely reproduced worked example (IQ against hours of television per week, ten people):
        // rho = 1 - 6 * 194 / (10 * 99) = -29/165 = -0.1757575...; values from memory, and re-computed on
        // this machine with SciPy 1.17.1 scipy.stats.spearmanr: -0.17575757575757575.
        double[] iq = {106, 86, 100, 101, 99, 103, 97, 113, 112, 110};
        double[] tv = {7, 0, 27, 50, 28, 29, 20, 12, 6, 17};
        assertEquals(-29.0 / 165.0, RankCorrelation.spearman(iq, tv), 1e-15);
    }

    @Test
    void tiesTakeTheirMeanRank() {
        // Fractional ("1 2.5 2.5 4") ranking, the tie rule of Spearman's coefficient; reference value from
        // SciPy 1.17.1 scipy.stats.spearmanr([1,2,2,3,5,5,5,8], [2,1,4,4,3,9,7,7]) on this machine.
        assertArrayEquals(new double[] {1, 2.5, 2.5, 4}, RankCorrelation.ranks(new double[] {10, 20, 20, 30}));
        double[] x = {1, 2, 2, 3, 5, 5, 5, 8};
        double[] y = {2, 1, 4, 4, 3, 9, 7, 7};
        assertEquals(0.7144097497387378, RankCorrelation.spearman(x, y), 1e-14);
    }

    @Test
    void invariantUnderMonotoneTransformsAndSymmetric() {
        Random random = new Random(20240607L);
        double[] x = new double[50];
        double[] y = new double[50];
        for (int i = 0; i < x.length; i++) {
            x[i] = random.nextDouble();
            y[i] = x[i] + random.nextGaussian() * 0.3;
        }
        double rho = RankCorrelation.spearman(x, y);
        double[] cubed = java.util.Arrays.stream(x).map(v -> Math.exp(3 * v)).toArray();
        assertEquals(rho, RankCorrelation.spearman(cubed, y), 1e-12, "ranks ignore monotone rescaling");
        assertEquals(rho, RankCorrelation.spearman(y, x), 1e-12);
        assertTrue(rho > 0.5 && rho < 1, "noisy but positive: " + rho);
    }

    @Test
    void constantSeriesHasNoCorrelation() {
        assertTrue(Double.isNaN(RankCorrelation.spearman(new double[] {1, 1, 1}, new double[] {1, 2, 3})));
    }
}
