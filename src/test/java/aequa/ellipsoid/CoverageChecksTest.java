package aequa.ellipsoid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.coverage.CoverageValidator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.util.GeometricShapeFactory;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;

/** The coverage check by parts agrees with JTS's whole-coverage validator, and stops on piled-up features. */
class CoverageChecksTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private static Polygon cell(double x0, double y0, double x1, double y1) {
        return GEOMETRY.createPolygon(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y0),
                new Coordinate(x1, y1), new Coordinate(x0, y1), new Coordinate(x0, y0)});
    }

    /** A 12 x 12 grid of 0.1 deg cells with one cell overlapping its neighbour, one leaving a sliver, and one
     *  region made of a cell and a far-off island (its bounding box spans the grid). */
    private static List<Region> grid() {
        List<Region> regions = new ArrayList<>();
        for (int i = 0; i < 12; i++) {
            for (int j = 0; j < 12; j++) {
                double x = 10 + i * 0.1;
                double y = 40 + j * 0.1;
                Geometry shape = cell(x, y, x + 0.1, y + 0.1);
                if (i == 3 && j == 3) {
                    shape = cell(x, y, x + 0.1003, y + 0.1); // overlaps the cell to the east
                } else if (i == 7 && j == 7) {
                    shape = cell(x, y, x + 0.0995, y + 0.1); // leaves a 0.0005 deg gap
                } else if (i == 0 && j == 0) {
                    shape = GEOMETRY.createMultiPolygon(new Polygon[] {(Polygon) shape, cell(30, 60, 30.1, 60.1)});
                }
                regions.add(new Region("r" + i + "-" + j, null, shape));
            }
        }
        return regions;
    }

    @Test
    void findsTheSameRegionsAsJtsCoverageValidator() {
        List<Region> regions = grid();
        Findings findings = new Findings();
        CoverageChecks.report(regions, "grid.geojson", findings);

        // reference: JTS CoverageValidator over the whole coverage, same gap width
        Geometry[] invalid = CoverageValidator.validate(regions.stream().map(Region::lonLat).toArray(Geometry[]::new),
                CoverageChecks.GAP_WIDTH_DEG);
        List<String> expected = new ArrayList<>();
        for (int i = 0; i < invalid.length; i++) {
            if (invalid[i] != null && !invalid[i].isEmpty()) {
                expected.add("feature \"" + regions.get(i).key() + "\"");
            }
        }
        List<String> got = findings.list().stream().map(Finding::place).toList();
        assertTrue(expected.size() >= 3, "the fixture has an overlap and a gap: " + expected);
        assertEquals(expected, got);
    }

    @Test
    void featuresPiledOnEachOtherStopTheCheckWithAWarning() {
        List<Region> piled = new ArrayList<>();
        GeometricShapeFactory shapes = new GeometricShapeFactory(GEOMETRY);
        shapes.setNumPoints(40);
        shapes.setSize(1.0);
        for (int i = 0; i < 300; i++) {
            shapes.setCentre(new Coordinate(10 + i * 0.001, 40));
            piled.add(new Region("p" + i, null, shapes.createCircle()));
        }
        Findings findings = new Findings();
        long start = System.nanoTime();
        CoverageChecks.report(piled, "piled.geojson", findings);
        long elapsedMs = (System.nanoTime() - start) / 1_000_000;

        List<Finding> bounded = findings.list().stream().filter(f -> f.code().equals("coverage-check-bounded")).toList();
        assertEquals(1, bounded.size(), findings.list().stream().map(Finding::code).distinct().toList().toString());
        assertTrue(bounded.get(0).message().contains("of 300 regions"), bounded.get(0).message());
        // the regions before the stop are reported first, in input order; the warning closes the list
        assertEquals("coverage-check-bounded", findings.list().get(findings.list().size() - 1).code());
        assertTrue(elapsedMs < 20_000, "took " + elapsedMs + " ms");
    }
}
