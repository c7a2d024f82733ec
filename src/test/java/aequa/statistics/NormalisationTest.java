package aequa.statistics;

import static aequa.statistics.MapSpecBuilder.mapOf;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.inputs.figures.SourceSpecBuilder;
import aequa.project.ChecksSpec;
import aequa.project.Normalisation;

/** Normalisation as given, per km2 and per column, with numbers checkable by hand. */
class NormalisationTest {

    /**
     * Areas of two 1 x 1 degree cells (lon 0..1) on WGS 84, from GeographicLib's Planimeter as listed in
     * the project's reference table (src/test/resources/geometry/areas.csv, rows cell_eq_1x1 and cell_45N_1x1):
     * 12,308,463,901.8368 m2 and 8,686,494,953.77913 m2.
     */
    private static final double EQUATOR_CELL_KM2 = 12_308.4639018368;
    private static final double CELL_45N_KM2 = 8_686.49495377913;

    @TempDir
    Path dir;

    @Test
    void asGivenIgnoresArea() {
        StatisticsFixture project = new StatisticsFixture(dir).region("A", 5).region("B", 500)
                .csv("key,rate\nA,2.5\nB,2.5\n");
        MapFigures figures = project.compute(mapOf("rate").build());
        assertEquals(2.5, figures.figures("A").get(0).normalisedValue());
        assertEquals(2.5, figures.figures("B").get(0).normalisedValue());
    }

    @Test
    void perKm2OfGeodesicArea() {
        // 1000 clinics in each cell, per 1,000 km2: 1000 / 12308.4639018368 * 1000 = 81.2449065923...
        // and 1000 / 8686.49495377913 * 1000 = 115.121231903...; the same count is denser in the smaller cell.
        StatisticsFixture project = new StatisticsFixture(dir).region("EQ", EQUATOR_CELL_KM2)
                .region("N45", CELL_45N_KM2).csv("key,clinics\nEQ,1000\nN45,1000\n");
        MapFigures figures = project.compute(mapOf("clinics").measure("count").normalise("area").multiplier(1000).build());
        assertEquals(List.of(), project.codes());
        assertEquals(81.2449065923, figures.figures("EQ").get(0).normalisedValue(), 1e-9);
        assertEquals(115.121231903, figures.figures("N45").get(0).normalisedValue(), 1e-8);
        assertEquals(1000.0, figures.figures("EQ").get(0).value(), "the value as given travels along");
    }

    @Test
    void perColumnTimesMultiplier() {
        // 45 births among 15,000 people, per 1,000 people: 45 / 15000 * 1000 = 3.
        // 7 among 2,000: 3.5. Zero births is a reported zero, not no data.
        StatisticsFixture project = new StatisticsFixture(dir).region("A", 1).region("B", 1).region("C", 1)
                .csv("key,births,people\nA,45,15000\nB,7,2000\nC,0,900\n");
        MapFigures figures = project.compute(mapOf("births").measure("count").normalise("column").per("people")
                .multiplier(1000).build());
        assertEquals(List.of(), project.codes());
        assertEquals(3.0, figures.figures("A").get(0).normalisedValue(), 1e-12);
        assertEquals(3.5, figures.figures("B").get(0).normalisedValue(), 1e-12);
        assertEquals(FigureStatus.REPORTED, figures.figures("C").get(0).status());
        assertEquals(0.0, figures.figures("C").get(0).normalisedValue());
    }

    @Test
    void noDataSuppressedZeroAndNotApplicableStayApart() {
        StatisticsFixture project = new StatisticsFixture(dir).region("Z", 1).region("N", 1).region("S", 1)
                .region("X", 1).region("G", 1)
                .csv("key,rate\nZ,0\nN,NA\nS,c\nX,n/a\n")
                .source(SourceSpecBuilder.file("figures.csv").suppressed("c").notApplicable("n/a"))
                .checks(new ChecksSpec(null, null, null, null, 0.0)); // 4 of 5 rows: below the default 95 %
        MapFigures figures = project.compute(mapOf("rate").build());
        assertEquals(FigureStatus.REPORTED, figures.figures("Z").get(0).status());
        assertEquals(0.0, figures.figures("Z").get(0).value());
        assertEquals(FigureStatus.NO_DATA, figures.figures("N").get(0).status());
        assertEquals(FigureStatus.SUPPRESSED, figures.figures("S").get(0).status());
        assertEquals(FigureStatus.NOT_APPLICABLE, figures.figures("X").get(0).status());
        assertEquals(FigureStatus.NO_DATA, figures.figures("G").get(0).status(), "no row at all");
        assertTrue(Double.isNaN(figures.figures("S").get(0).value()));
        assertEquals(List.of("join-missing-figure"), project.codes(), "only the absent row is reported");
    }

    @Test
    void denominatorProblemsAreNotMapped() {
        StatisticsFixture project = new StatisticsFixture(dir).region("ZERO", 1).region("HIDDEN", 1)
                .csv("key,births,people\nZERO,4,0\nHIDDEN,4,c\n")
                .source(SourceSpecBuilder.file("figures.csv").suppressed("c"));
        MapFigures figures = project.compute(mapOf("births").normalise("column").per("people").build());
        assertEquals(FigureStatus.NO_DATA, figures.figures("ZERO").get(0).status());
        assertEquals(FigureStatus.SUPPRESSED, figures.figures("HIDDEN").get(0).status(),
                "a rate over a suppressed denominator is suppressed too");
        assertEquals(List.of("normalise-impossible", "normalise-impossible"), project.codes());
    }

    @Test
    void aQuotientBeyondTheRangeOfADoubleIsNotMapped() {
        // the largest binary64 number is about 1.797e308 (IEEE 754-2008, section 3.6): 1000 per km2 times
        // 1e306 is 1e309, beyond it; 1 per km2 times 1e306 is within it
        StatisticsFixture project = new StatisticsFixture(dir).region("BIG", 1).region("SMALL", 1)
                .csv("key,n\nBIG,1000\nSMALL,1\n");
        MapFigures figures = project.compute(mapOf("n").measure("count").normalise("area").multiplier(1e306).build());
        assertEquals(FigureStatus.NO_DATA, figures.figures("BIG").get(0).status());
        assertEquals(FigureStatus.REPORTED, figures.figures("SMALL").get(0).status());
        assertEquals(1e306, figures.figures("SMALL").get(0).normalisedValue(), 1e292);
        assertEquals(List.of("normalise-impossible"), project.codes());
    }

    @Test
    void regionWithoutAreaCannotBeNormalisedPerKm2() {
        StatisticsFixture project = new StatisticsFixture(dir).region("E", 0).csv("key,n\nE,3\n");
        MapFigures figures = project.compute(mapOf("n").normalise("area").build());
        assertEquals(FigureStatus.NO_DATA, figures.figures("E").get(0).status());
        assertEquals(List.of("normalise-impossible"), project.codes());
    }
}
