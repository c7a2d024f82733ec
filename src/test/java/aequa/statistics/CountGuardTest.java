package aequa.statistics;

import static aequa.statistics.MapSpecBuilder.mapOf;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;

/** Counts are refused on a choropleth unless normalised; the heuristic is documented in {@link CountGuard}. */
class CountGuardTest {

    @TempDir
    Path dir;

    /** Six regions doubling in area; counts that grow with them (rank correlation 1). */
    private StatisticsFixture growingCounts() {
        StatisticsFixture project = new StatisticsFixture(dir);
        String[] keys = {"A", "B", "C", "D", "E", "F"};
        for (int i = 0; i < keys.length; i++) {
            project.region(keys[i], 10 * Math.pow(2, i));
        }
        return project.csv("key,n\nA,3\nB,5\nC,9\nD,20\nE,41\nF,77\n");
    }

    @Test
    void declaredCountIsRefusedAndPointsToCircles() {
        StatisticsFixture project = growingCounts();
        project.compute(mapOf("n").measure("count").build());
        Finding finding = project.only("count-on-choropleth");
        assertTrue(finding.message().contains("large regions would dominate"), finding.message());
        assertTrue(finding.hint().contains("display: circles"), finding.hint());
        assertTrue(finding.message().contains("declared a count"), finding.message());
    }

    @Test
    void undeclaredCountLikeValuesAreRefusedWithTheEvidence() {
        StatisticsFixture project = growingCounts();
        project.compute(mapOf("n").build());
        Finding finding = project.only("count-on-choropleth");
        assertTrue(finding.message().contains("all 6 are non-negative whole numbers"), finding.message());
        assertTrue(finding.message().contains("1.00"), finding.message());
        assertTrue(finding.hint().contains("measure: rate"), finding.hint());
    }

    @Test
    void countsAreFineWhenNormalisedOrDrawnAsCircles() {
        StatisticsFixture normalised = growingCounts();
        normalised.compute(mapOf("n").measure("count").normalise("area").build());
        assertEquals(List.of(), normalised.codes());
        StatisticsFixture circles = growingCounts();
        circles.compute(mapOf("n").measure("count").display("circles").build());
        assertEquals(List.of(), circles.codes());
    }

    @Test
    void declaredRateIsTrusted() {
        StatisticsFixture project = growingCounts();
        project.compute(mapOf("n").measure("rate").build());
        assertEquals(List.of(), project.codes());
    }

    @Test
    void wholePercentagesUnrelatedToAreaAreNotCounts() {
        // Ranks of (40, 12, 55, 8, 33, 20) against areas ranked 1..6: sum of squared rank differences 44,
        // rho = 1 - 6 * 44 / (6 * 35) = -0.257 (Spearman 1904, the no-ties formula), below 0.5.
        StatisticsFixture project = growingCounts().csv("key,n\nA,40\nB,12\nC,55\nD,8\nE,33\nF,20\n");
        project.compute(mapOf("n").build());
        assertEquals(List.of(), project.codes());
    }

    @Test
    void fractionsAreNotCounts() {
        StatisticsFixture project = growingCounts().csv("key,n\nA,3\nB,5\nC,9\nD,20\nE,41\nF,77.5\n");
        project.compute(mapOf("n").build());
        assertEquals(List.of(), project.codes());
    }

    @Test
    void tooFewValuesToJudge() {
        StatisticsFixture project = new StatisticsFixture(dir).region("A", 1).region("B", 2).region("C", 3)
                .region("D", 4).csv("key,n\nA,1\nB,2\nC,3\nD,4\n");
        project.compute(mapOf("n").build());
        assertEquals(List.of(), project.codes(), "4 values are fewer than " + CountGuard.MIN_VALUES);
    }
}
