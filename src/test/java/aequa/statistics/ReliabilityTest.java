package aequa.statistics;

import static aequa.statistics.MapSpecBuilder.mapOf;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.project.ChecksSpec;

/**
 * Unreliable rates. Thresholds as in common practice in official statistics: fewer than 20 events
 * (the example), or a relative margin of error above 0.3.
 */
class ReliabilityTest {

    @TempDir
    Path dir;

    private StatisticsFixture project() {
        return new StatisticsFixture(dir).region("A", 1).region("B", 1).region("C", 1).region("D", 1)
                .checks(new ChecksSpec(null, null, 20.0, 0.3, null));
    }

    @Test
    void fewEventsAreFlagged() {
        // 19 < 20 is flagged, 20 is not; a missing events cell does not flag.
        StatisticsFixture project = project().csv("key,rate,deaths\nA,5.1,19\nB,6.0,20\nC,7.5,\nD,0,0\n");
        MapFigures figures = project.compute(mapOf("rate").eventsColumn("deaths").build());
        assertTrue(figures.figures("A").get(0).unreliable());
        assertFalse(figures.figures("B").get(0).unreliable());
        assertFalse(figures.figures("C").get(0).unreliable());
        assertTrue(figures.figures("D").get(0).unreliable(), "a rate of 0 from 0 events rests on nothing");
        assertEquals(List.of("figures-unreliable"), project.codes());
        assertTrue(project.findings.list().get(0).message().startsWith("2 of 4"));
    }

    @Test
    void wideMarginsAreFlaggedAndMarginsTravel() {
        // 10 +/- 3 has relative margin 0.3 (not above 0.3); 10 +/- 3.5 is 0.35; 0 +/- 1 is unbounded.
        StatisticsFixture project = project().csv("key,share,moe\nA,10,3\nB,10,3.5\nC,0,1\nD,10,\n");
        MapFigures figures = project.compute(mapOf("share").marginColumn("moe").build());
        assertFalse(figures.figures("A").get(0).unreliable());
        assertEquals(3.0, figures.figures("A").get(0).marginOfError());
        assertTrue(figures.figures("B").get(0).unreliable());
        assertEquals(3.5, figures.figures("B").get(0).marginOfError());
        assertTrue(figures.figures("C").get(0).unreliable());
        assertTrue(Double.isNaN(figures.figures("D").get(0).marginOfError()));
        assertFalse(figures.figures("D").get(0).unreliable());
    }

    @Test
    void thresholdsOfZeroTurnTheChecksOff() {
        StatisticsFixture project = new StatisticsFixture(dir).region("A", 1)
                .csv("key,rate,deaths,moe\nA,5,1,50\n");
        MapFigures figures = project.compute(mapOf("rate").eventsColumn("deaths").marginColumn("moe").build());
        assertFalse(figures.figures("A").get(0).unreliable());
        assertEquals(50.0, figures.figures("A").get(0).marginOfError());
    }
}
