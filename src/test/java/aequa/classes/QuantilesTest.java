package aequa.classes;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;

/** Type-7 quantiles against Hyndman and Fan 1996, section 2, definition 7. */
class QuantilesTest {

    @Test
    void handComputedFromTheDefinition() {
        // Hyndman & Fan 1996, definition 7: m = 1 - p, j = floor(np + m), g = np + m - j,
        // Q(p) = (1 - g) x(j) + g x(j+1). Worked by hand:
        double[] ten = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10};
        // p = 0.2: np + m = 2 + 0.8 = 2.8 -> j = 2, g = 0.8 -> 0.2 * 2 + 0.8 * 3 = 2.8
        assertEquals(2.8, Quantiles.type7(ten, 0.2), 1e-12);
        // p = 0.5: 5 + 0.5 = 5.5 -> j = 5, g = 0.5 -> 5.5
        assertEquals(5.5, Quantiles.type7(ten, 0.5), 1e-12);
        double[] four = {1, 3, 7, 15};
        // p = 0.25: 1 + 0.75 = 1.75 -> j = 1, g = 0.75 -> 0.25 * 1 + 0.75 * 3 = 2.5
        // (cross-check, from memory: R's quantile(c(1, 3, 7, 15), 0.25), default type 7, prints 2.5)
        assertEquals(2.5, Quantiles.type7(four, 0.25), 1e-12);
        // p = 2/3: 8/3 + 1/3 = 3 -> j = 3, g = 0 -> x(3) = 7
        assertEquals(7.0, Quantiles.type7(four, 2.0 / 3), 1e-12);
        // p = 0 and p = 1 give the extremes (j = 1, g = 0; j = n, g = 0)
        assertEquals(1.0, Quantiles.type7(four, 0), 0);
        assertEquals(15.0, Quantiles.type7(four, 1), 0);
        // one value: every quantile is that value
        assertEquals(4.0, Quantiles.type7(new double[] {4}, 0.3), 0);
    }

    @Test
    void matchesNumpyLinearMethod() throws IOException {
        // NumPy 2.4.6 numpy.quantile(method='linear'), documented as H&F type 7; see resources SOURCE.md.
        List<String> reference = NaturalBreaksTest.resourceLines("/classes/numpy-quantile-type7.txt");
        List<String> ckmeans = NaturalBreaksTest.resourceLines("/classes/ckmeans-reference.txt");
        String[] parts = ckmeans.get(2).split(" ");
        double[] sorted = Arrays.stream(parts, 1, parts.length).mapToDouble(Double::parseDouble).sorted().toArray();
        for (String line : reference) {
            String[] pq = line.split(" ");
            double p = Double.parseDouble(pq[0]);
            double expected = Double.parseDouble(pq[1]);
            assertEquals(expected, Quantiles.type7(sorted, p), 1e-12 * Math.abs(expected), "p=" + p);
        }
        assertEquals(7, reference.size());
    }
}
