package aequa.statistics;

import static aequa.statistics.MapSpecBuilder.mapOf;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;
import aequa.findings.Severity;
import aequa.inputs.figures.SourceSpecBuilder;
import aequa.project.ChecksSpec;
import aequa.project.MissingFigures;

/**
 * The join report, one small example project per case, each with the one finding it must produce (the
 * fixture-project style of STYLE.md item 10). Figures are invented; they are not an oracle, the findings are.
 */
class JoinReportTest {

    @TempDir
    Path dir;

    private StatisticsFixture threeRegions() {
        return new StatisticsFixture(dir).region("A", 10).region("B", 20).region("C", 30);
    }

    @Test
    void cleanJoinReportsNothing() {
        StatisticsFixture project = threeRegions().csv("key,rate\nA,1\nB,2\nC,3\n");
        MapFigures figures = project.compute(mapOf("rate").build());
        assertEquals(List.of(), project.codes());
        assertEquals(List.of(""), figures.periods());
        assertEquals(2.0, figures.figures("B").get(0).value());
    }

    @Test
    void keyInStatisticsButNotInGeometry() {
        StatisticsFixture project = threeRegions().csv("key,rate\nA,1\nB,2\nC,3\nZ,4\n");
        project.compute(mapOf("rate").build());
        Finding finding = project.only("join-key-unmatched");
        assertEquals(Severity.WARNING, finding.severity());
        assertEquals("row 5", finding.place());
        assertEquals(List.of("join-key-unmatched"), project.codes());
    }

    @Test
    void regionWithoutFigureIsAWarningByDefault() {
        StatisticsFixture project = threeRegions().csv("key,rate\nA,1\nB,2\n");
        MapFigures figures = project.compute(mapOf("rate").build());
        Finding finding = project.only("join-missing-figure");
        assertEquals(Severity.WARNING, finding.severity());
        assertTrue(finding.message().contains("\"C\""), finding.message());
        assertEquals(FigureStatus.NO_DATA, figures.figures("C").get(0).status());
    }

    @Test
    void regionWithoutFigureIsAnErrorWhenTheProjectSaysSo() {
        StatisticsFixture project = threeRegions().csv("key,rate\nA,1\nB,2\n")
                .checks(new ChecksSpec(null, MissingFigures.ERROR, null, null, null));
        project.compute(mapOf("rate").build());
        assertEquals(Severity.ERROR, project.only("join-missing-figure").severity());
    }

    /**
     * Codes that lost their leading zeros in a spreadsheet (a common failure of real joins: 5-digit county
     * codes read as numbers) leave most regions empty; the build stops with one summary line and the fix.
     */
    @Test
    void joinThatHalfFailsStopsWithASummaryAndTheFix() {
        StatisticsFixture project = new StatisticsFixture(dir);
        StringBuilder csv = new StringBuilder("key,rate\n");
        for (int i = 1; i <= 20; i++) {
            // states 01-09 carry a leading zero, 10-20 do not
            project.region(String.format(java.util.Locale.ROOT, "%02d001", i), 10);
        }
        for (MapSpecRow row : rows(project)) {
            csv.append(row.key().replaceFirst("^0+", "")).append(',').append(row.value()).append('\n');
        }
        project.csv(csv.toString());
        project.compute(mapOf("rate").build());
        Finding low = project.only("join-match-low");
        assertEquals(Severity.ERROR, low.severity());
        assertEquals("11 of 20 regions of map \"m\" matched a figure (55.0 %); at least 95 % must.", low.message());
        assertTrue(low.hint().startsWith("9 statistics keys match a region if leading zeros"), low.hint());
        assertEquals("join-match-low", project.codes().stream().filter(c -> !c.equals("join-duplicate-key")).findFirst().orElseThrow());
    }

    @Test
    void matchThresholdCanBeLoweredOrTurnedOff() {
        StatisticsFixture project = threeRegions().csv("key,rate\nA,1\nB,2\n")
                .checks(new ChecksSpec(null, null, null, null, 60.0));
        project.compute(mapOf("rate").build());
        assertEquals(List.of("join-missing-figure"), project.codes()); // 2 of 3 = 66.7 % >= 60 %
        StatisticsFixture strict = threeRegions().csv("key,rate\nA,1\nB,2\n")
                .checks(new ChecksSpec(null, null, null, null, 70.0));
        strict.compute(mapOf("rate").build());
        assertEquals(List.of("join-match-low", "join-missing-figure"), strict.codes());
    }

    private record MapSpecRow(String key, int value) {
    }

    private static List<MapSpecRow> rows(StatisticsFixture project) {
        return java.util.stream.IntStream.range(0, project.regions.size())
                .mapToObj(i -> new MapSpecRow(project.regions.get(i).key(), i + 1)).toList();
    }

    @Test
    void duplicateKeyKeepsTheFirst() {
        StatisticsFixture project = threeRegions().csv("key,rate\nA,1\nB,2\nC,3\nB,9\n");
        MapFigures figures = project.compute(mapOf("rate").build());
        Finding finding = project.only("join-duplicate-key");
        assertEquals(Severity.ERROR, finding.severity());
        assertEquals("row 5, column \"rate\"", finding.place());
        assertTrue(finding.message().contains("row 3"), finding.message());
        assertEquals(2.0, figures.figures("B").get(0).value());
    }

    @Test
    void nonNumericValueWithRowColumnAndDecimalHint() {
        // The example: "12,5" at row 7, column "rate", read with the default decimal point.
        StatisticsFixture project = new StatisticsFixture(dir);
        for (String key : List.of("A", "B", "C", "D", "E", "F")) {
            project.region(key, 10);
        }
        project.csv("key,rate\nA,1\nB,2\nC,3\nD,4\nE,5\nF,\"12,5\"\n");
        MapFigures figures = project.compute(mapOf("rate").build());
        Finding finding = project.only("join-not-a-number");
        assertEquals("figures.csv", finding.file());
        assertEquals("row 7, column \"rate\"", finding.place());
        assertTrue(finding.message().contains("\"12,5\""), finding.message());
        assertTrue(finding.hint().contains("decimal: \",\""), finding.hint());
        assertEquals(FigureStatus.NO_DATA, figures.figures("F").get(0).status());
    }

    @Test
    void valueOutsideTheDeclaredRange() {
        StatisticsFixture project = threeRegions().csv("key,share\nA,40\nB,140\nC,0\n");
        project.compute(mapOf("share").range(0, 100).build());
        Finding finding = project.only("join-out-of-range");
        assertEquals("row 3, column \"share\"", finding.place());
        assertTrue(finding.message().contains("[0, 100]"), finding.message());
        assertEquals(List.of("join-out-of-range"), project.codes());
    }

    @Test
    void relaxedMatchesAreEachListed() {
        StatisticsFixture project = new StatisticsFixture(dir).region("AB-7", 10).region("01001", 10)
                .csv("key,rate\n\" ab-07\",1\n1001,2\n")
                .source(SourceSpecBuilder.file("figures.csv").keyMatching("relaxed"));
        MapFigures figures = project.compute(mapOf("rate").build());
        assertEquals(List.of("join-relaxed-match", "join-relaxed-match"), project.codes());
        assertEquals(Severity.NOTE, project.findings.list().get(0).severity());
        assertEquals("row 2", project.findings.list().get(0).place());
        assertEquals(1.0, figures.figures("AB-7").get(0).value());
        assertEquals(2.0, figures.figures("01001").get(0).value());
    }

    @Test
    void exactMatchingSuggestsRelaxedWhereItWouldHelp() {
        StatisticsFixture project = new StatisticsFixture(dir).region("01001", 10).csv("key,rate\n1001,2\n");
        project.compute(mapOf("rate").build());
        assertTrue(project.only("join-key-unmatched").hint().contains("key-matching: relaxed"));
        project.only("join-missing-figure");
    }

    @Test
    void relaxedFormSharedByTwoRegionsMatchesNeither() {
        StatisticsFixture project = new StatisticsFixture(dir).region("7", 10).region("07", 10)
                .csv("key,rate\n007,1\n7,2\n07,3\n")
                .source(SourceSpecBuilder.file("figures.csv").keyMatching("relaxed"));
        MapFigures figures = project.compute(mapOf("rate").build());
        assertTrue(project.only("join-key-unmatched").hint().contains("several regions"));
        assertEquals(2.0, figures.figures("7").get(0).value(), "exact matches are unaffected");
        assertEquals(3.0, figures.figures("07").get(0).value());
    }

    @Test
    void indicatorMissing() {
        StatisticsFixture project = threeRegions().csv("key,rate\nA,1\nB,2\nC,3\n");
        project.compute(mapOf("rates").build());
        assertEquals(List.of("join-indicator-missing"), project.codes());
        assertTrue(project.findings.list().get(0).hint().contains("rate"));
    }

    @Test
    void periodsDefaultToTheLatestAndUnknownPeriodsAreErrors() {
        String csv = "key,year,rate\nA,2009,1\nA,2010,2\nB,2010,3\nC,2010,4\n";
        StatisticsFixture latest = threeRegions().csv(csv)
                .source(SourceSpecBuilder.file("figures.csv").periodColumn("year"));
        MapFigures figures = latest.compute(mapOf("rate").build());
        assertEquals(List.of("2010"), figures.periods(), "2010 is later than 2009 (not '2009' > '2010')");
        assertEquals(List.of(), latest.codes());

        StatisticsFixture asked = threeRegions().csv(csv).source(SourceSpecBuilder.file("figures.csv").periodColumn("year"));
        MapFigures both = asked.compute(mapOf("rate").periods("2011", "2009").build());
        assertEquals(List.of("2009", "2011"), both.periods(), "oldest first");
        assertEquals(Severity.ERROR, asked.only("join-period-missing").severity());
    }

    @Test
    void missingFigureListsThePeriods() {
        StatisticsFixture project = threeRegions().csv("key,year,rate\nA,1,1\nA,2,1\nB,1,1\nB,2,1\nC,2,1\n")
                .source(SourceSpecBuilder.file("figures.csv").periodColumn("year"));
        project.compute(mapOf("rate").periods("1", "2").build());
        assertTrue(project.only("join-missing-figure").message().contains("in period 1"));
    }
}
