package aequa.classes;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** The rounding rule of {@link ReadableBreaks}: fewest figures (at least 2) that keep every value in its class. */
class ReadableBreaksTest {

    @Test
    void roundsToTwoFiguresWhenTheGapAllows() {
        double[] sorted = {1.0, 2.0, 2.9, 3.7, 8.0};
        // 3.31 lies in the gap (2.9, 3.7]: two figures, 3.3, still separates the same values
        assertArrayEquals(new double[] {3.3}, ReadableBreaks.roundInner(sorted, new double[] {3.31}));
    }

    @Test
    void takesMoreFiguresWhenTwoWouldMoveAValue() {
        double[] sorted = {1.0, 2.0, 2.04, 3.0};
        // break 2.02 between 2.0 and 2.04: 2 figures give 2.0, which would move 2.0 up a class; 3 give 2.02
        assertArrayEquals(new double[] {2.02}, ReadableBreaks.roundInner(sorted, new double[] {2.02}));
        // break 12345.6 just below a value 12346: rounding to 12000 or 12300 keeps membership (no value between)
        double[] wide = {10, 12346, 20000};
        assertArrayEquals(new double[] {12000}, ReadableBreaks.roundInner(wide, new double[] {12345.6}));
    }

    @Test
    void breakAtAValueMayRoundOnlyWithinItsGap() {
        double[] sorted = {0.151, 0.2549, 0.2551, 0.9};
        // a break equal to 0.2551 must stay in (0.2549, 0.2551]: 0.26 and 0.255 fail, 0.2550 passes
        assertArrayEquals(new double[] {0.255}, ReadableBreaks.roundInner(sorted, new double[] {0.25505}));
    }

    @Test
    void membershipNeverChangesOnSeededData() {
        Random random = new Random(2024);
        for (int trial = 0; trial < 200; trial++) {
            int n = 5 + random.nextInt(60);
            double scale = Math.pow(10, random.nextInt(9) - 4);
            double[] sorted = new double[n];
            for (int i = 0; i < n; i++) {
                sorted[i] = (random.nextDouble() - 0.3) * scale;
            }
            Arrays.sort(sorted);
            double[] raw = random.doubles(1 + random.nextInt(6), sorted[0], sorted[n - 1]).sorted().distinct().toArray();
            double[] rounded = ReadableBreaks.roundInner(sorted, raw);
            for (int b = 0; b < raw.length; b++) {
                assertEquals(ReadableBreaks.lowerBound(sorted, raw[b]), ReadableBreaks.lowerBound(sorted, rounded[b]),
                        "trial " + trial + ": break " + raw[b] + " -> " + rounded[b]);
                assertTrue(b == 0 || rounded[b] > rounded[b - 1], "ascending");
            }
        }
    }

    @Test
    void outerLimitsRoundOutwards() {
        assertEquals(0.123, ReadableBreaks.floorOuter(0.12345), 0);
        assertEquals(0.124, ReadableBreaks.ceilOuter(0.12345), 0);
        assertEquals(-1240, ReadableBreaks.floorOuter(-1234.5), 0);
        assertEquals(98800, ReadableBreaks.ceilOuter(98765), 0);
        assertEquals(0, ReadableBreaks.floorOuter(0), 0);
    }
}
