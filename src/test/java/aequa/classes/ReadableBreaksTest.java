package aequa.classes;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The rounding rules of {@link ReadableBreaks}: one step for the whole map (a power of ten, at most a
 * thirtieth of the range); failing that, the fewest figures (at least 2) that keep every value in its class.
 */
class ReadableBreaksTest {

    /**
     * The step rule's promises on seeded random data of many magnitudes: every limit is a whole multiple of
     * one power of ten no larger than a thirtieth of the range (so every limit of the map has the same
     * decimals), each inner break moved by at most half a step, the limits enclose every value, no class empty.
     */
    @Test
    void limitsShareOneStepOfAtMostAHundredthOfTheRange() {
        Random random = new Random(20261204);
        for (int trial = 0; trial < 200; trial++) {
            double scale = Math.pow(10, random.nextInt(9) - 4);
            double[] sorted = new double[40];
            for (int i = 0; i < sorted.length; i++) {
                sorted[i] = scale * (1 + 99 * random.nextDouble());
            }
            Arrays.sort(sorted);
            double[] raw = Quantiles.innerBreaks(sorted, 5);
            double[] limits = ReadableBreaks.onStep(sorted, raw).orElseThrow(() -> new AssertionError(Arrays.toString(sorted)));
            double range = sorted[39] - sorted[0];
            java.math.BigDecimal step = ReadableBreaks.stepFor(range);
            assertTrue(step.doubleValue() <= range / 30 && step.doubleValue() * 10 > range / 30, "step " + step);
            java.math.BigDecimal used = null;
            for (int d = 0; d <= ReadableBreaks.STEP_REFINEMENTS && used == null; d++) {
                java.math.BigDecimal candidate = step.movePointLeft(d);
                if (Arrays.stream(limits).allMatch(l -> java.math.BigDecimal.valueOf(l).remainder(candidate).signum() == 0)) {
                    used = candidate;
                }
            }
            assertTrue(used != null, "limits on one step: " + Arrays.toString(limits));
            for (int i = 0; i < raw.length; i++) {
                assertTrue(Math.abs(limits[i + 1] - raw[i]) <= used.doubleValue() / 2 * (1 + 1e-9), "break " + i);
            }
            assertTrue(limits[0] <= sorted[0] && limits[limits.length - 1] >= sorted[39]);
            assertTrue(Classifier.counts(sorted, limits).stream().allMatch(c -> c > 0), Arrays.toString(limits));
        }
    }

    @Test
    void tightlyPackedValuesBelowAnOutlierGetAFinerStepOrThePerBreakRule() {
        // four values 0.0001 apart and one at 1000: the step starts at 10 (a thirtieth of the range, 33,
        // rounded down to a power of ten) and three refinements reach 0.01, still too coarse to keep them apart
        double[] sorted = {10.0001, 10.0002, 10.0003, 10.0004, 1000};
        double[] raw = {10.00015, 10.00025, 10.00035, 505};
        assertTrue(ReadableBreaks.onStep(sorted, raw).isEmpty());
        // the classifier then falls back on the per-break rule, which keeps every value in its class
        assertArrayEquals(new double[] {10.00015, 10.00025, 10.00035, 510},
                ReadableBreaks.roundInner(sorted, raw), 1e-12);
    }

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
