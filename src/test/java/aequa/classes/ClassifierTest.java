package aequa.classes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

import aequa.findings.Finding;
import aequa.project.ClassMethod;
import aequa.project.ClassesSpec;
import aequa.project.Words;

/** The classifier front door: methods, its preconditions, ties, NaN policy. */
class ClassifierTest {

    private static final double[] ONE_TO_TEN = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10};

    private static Classified run(double[] values, String method, Integer count, List<Double> breaks, Double midpoint) {
        return Classifier.classify(values, new ClassesSpec(Words.of(ClassMethod.class, method), count, breaks, midpoint), "aequa.yaml", "map \"m\"");
    }

    private static Classification classes(double[] values, String method, Integer count) {
        return run(values, method, count, null, null).classification().orElseThrow();
    }

    @Test
    void aSpecTheProjectChecksRefuseIsAProgrammingError() {
        // ProjectChecks reports each of these with its line (ClassesSettingsTest) and stops before any input is
        // read, so the classifier never sees one; handed one anyway, it throws instead of guessing
        Object[][] table = {
                {"quantile", 1, null, null},
                {"natural-breaks", 0, null, null},
                {"manual", 3, List.of(), null},
                {"manual", 3, List.of(10.0, 5.0), null},
                {"manual", 3, List.of(5.0, 5.0), null},
                {"manual", 3, List.of(1.0, Double.NaN), null},
                {"diverging", 5, null, null},
                {"diverging", 5, null, Double.NaN},
        };
        for (Object[] row : table) {
            @SuppressWarnings("unchecked")
            List<Double> breaks = (List<Double>) row[2];
            assertThrows(IllegalArgumentException.class,
                    () -> run(ONE_TO_TEN, (String) row[0], (Integer) row[1], breaks, (Double) row[3]), Arrays.toString(row));
        }
    }

    @Test
    void quantilesOfTenIntoFive() {
        // type-7 breaks at 2.8, 4.6, 6.4, 8.2 (Hyndman & Fan 1996 def. 7); rounded to two figures, 2.8 ... 8.2
        Classification c = classes(ONE_TO_TEN, "quantile", 5);
        assertEquals(List.of(1.0, 2.8, 4.6, 6.4, 8.2, 10.0), c.limits());
        assertEquals(List.of(2, 2, 2, 2, 2), c.counts());
        assertEquals(ClassMethod.QUANTILE, c.method());
    }

    @Test
    void quantileTiesGiveFewerClassesWithAReason() {
        double[] values = {0, 0, 0, 0, 0, 0, 1, 2, 3, 4};
        // type 7 at p = .2, .4, .6, .8: 0, 0, 0.4, 2.2; the breaks at 0 would leave classes empty
        Classified result = run(values, "quantile", 5, null, null);
        Classification c = result.classification().orElseThrow();
        assertEquals(List.of(0.0, 0.4, 2.2, 4.0), c.limits());
        assertEquals(List.of(6, 2, 2), c.counts());
        assertEquals(List.of("classes-fewer-than-requested"), codes(result));
        assertTrue(result.findings().get(0).message().startsWith("Made 3 classes instead of 5"));
    }

    @Test
    void naturalBreaksWithFewerDistinctValuesThanClasses() {
        Classified result = run(new double[] {2, 2, 7, 7, 7, 30}, "natural-breaks", 5, null, null);
        Classification c = result.classification().orElseThrow();
        assertEquals(List.of(2, 3, 1), c.counts());
        assertEquals(List.of("classes-fewer-than-requested"), codes(result));
    }

    @Test
    void naturalBreaksSeparateObviousGroups() {
        double[] values = {1, 2, 3, 50, 51, 52, 100, 101};
        Classification c = classes(values, "natural-breaks", 3);
        assertEquals(List.of(3, 3, 2), c.counts());
        // breaks midway between the groups (26.5 and 76), rounded to two figures inside their gaps
        assertEquals(List.of(1.0, 27.0, 76.0, 101.0), c.limits());
    }

    @Test
    void equalIntervalKeepsEmptyClasses() {
        double[] values = {0, 1, 2, 97, 100};
        Classification c = classes(values, "equal-interval", 4);
        assertEquals(List.of(0.0, 25.0, 50.0, 75.0, 100.0), c.limits());
        assertEquals(List.of(3, 0, 0, 2), c.counts());
    }

    @Test
    void standardDeviationClassesAreCentredOnTheMean() {
        // mean 5.5, population sd sqrt(8.25) = 2.8723; 4 classes: breaks at mean - sd, mean, mean + sd
        Classification c = classes(ONE_TO_TEN, "std-dev", 4);
        assertEquals(List.of(2.6, 5.5, 8.4), c.limits().subList(1, 4));
        assertEquals(List.of(2, 3, 3, 2), c.counts());
        // odd count: the middle class straddles the mean (mean +- sd/2 = 4.06, 6.94)
        Classification odd = classes(ONE_TO_TEN, "std-dev", 3);
        assertEquals(List.of(4.1, 6.9), odd.limits().subList(1, 3));
        assertEquals(List.of(4, 2, 4), odd.counts());
    }

    @Test
    void divergingClassesAreSymmetricAroundTheMidpoint() {
        double[] values = {-3, -1, 0.5, 2, 8};
        // reach 8 from midpoint 0, 2 steps a side -> step 4: limits -8, -4, 0, 4, 8
        Classification even = run(values, "diverging", 4, null, 0.0).classification().orElseThrow();
        assertEquals(List.of(-8.0, -4.0, 0.0, 4.0, 8.0), even.limits());
        assertEquals(List.of(0, 2, 2, 1), even.counts());
        // 5 classes: 2.5 steps a side -> step 3.2; limits at +-1.6, +-4.8, +-8
        Classification odd = run(values, "diverging", 5, null, 0.0).classification().orElseThrow();
        assertEquals(List.of(-8.0, -4.8, -1.6, 1.6, 4.8, 8.0), odd.limits());
        assertEquals(List.of(0, 1, 2, 1, 1), odd.counts());
    }

    @Test
    void manualBreaksAreUsedAsGiven() {
        Classified result = run(ONE_TO_TEN, "manual", null, List.of(2.5, 7.25), null);
        Classification c = result.classification().orElseThrow();
        assertEquals(List.of(1.0, 2.5, 7.25, 10.0), c.limits());
        assertEquals(List.of(2, 5, 3), c.counts());
        assertTrue(result.findings().isEmpty());
    }

    @Test
    void unclassedSpansTheData() {
        Classification c = classes(new double[] {0.1234, 0.5, 9.8765}, "unclassed", null);
        assertEquals(List.of(0.123, 9.88), c.limits());
        assertEquals(List.of(3), c.counts());
    }

    @Test
    void nanIsSkippedSilentlyAndInfinityRefused() {
        double[] values = {Double.NaN, 1, 2, 3, 4, Double.NaN};
        Classified result = run(values, "quantile", 2, null, null);
        assertEquals(List.of(), codes(result));
        assertEquals(4, result.classification().orElseThrow().counts().stream().mapToInt(Integer::intValue).sum());
        Classified none = run(new double[] {Double.NaN}, "quantile", 3, null, null);
        assertTrue(none.classification().isEmpty());
        assertEquals(List.of("classes-no-values"), codes(none));
        // the normaliser reports a quotient beyond a double's range and leaves it out (NormalisationTest)
        assertThrows(IllegalArgumentException.class,
                () -> run(new double[] {1, 2, Double.POSITIVE_INFINITY}, "quantile", 2, null, null));
    }

    @Test
    void allEqualValuesMakeOneClass() {
        Classified result = run(new double[] {4, 4, 4}, "natural-breaks", 5, null, null);
        assertEquals(List.of(4.0, 4.0), result.classification().orElseThrow().limits());
        assertEquals(List.of("classes-fewer-than-requested"), codes(result));
    }

    @Test
    void everyMethodCountsEveryValueAgreesWithClassOfAndIgnoresOrder() {
        Random random = new Random(99);
        double[] values = random.doubles(2000).map(v -> Math.exp(3 * v) * 10).toArray();
        double[] shuffled = values.clone();
        for (int i = shuffled.length - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            double t = shuffled[i];
            shuffled[i] = shuffled[j];
            shuffled[j] = t;
        }
        for (ClassMethod method : ClassMethod.values()) {
            Classified a = run(values, method.configName(), 6, List.of(20.0, 50.0, 100.0), 60.0);
            Classified b = run(shuffled, method.configName(), 6, List.of(20.0, 50.0, 100.0), 60.0);
            Classification c = a.classification().orElseThrow();
            assertEquals(c, b.classification().orElseThrow(), method.name());
            assertEquals(values.length, c.counts().stream().mapToInt(Integer::intValue).sum(), method.name());
            int[] byClassOf = new int[c.classCount()];
            for (double v : values) {
                byClassOf[c.classOf(v)]++;
            }
            assertEquals(c.counts(), Arrays.stream(byClassOf).boxed().collect(Collectors.toList()), method.name());
            for (int i = 1; i < c.limits().size(); i++) {
                assertTrue(c.limits().get(i) > c.limits().get(i - 1), method + " limits ascending " + c.limits());
            }
        }
    }

    private static List<String> codes(Classified result) {
        return result.findings().stream().map(Finding::code).collect(Collectors.toList());
    }
}
