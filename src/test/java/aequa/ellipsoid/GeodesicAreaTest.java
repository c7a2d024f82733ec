package aequa.ellipsoid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;

class GeodesicAreaTest {

    /** Rows of src/test/resources/geometry/areas.csv (GeographicLib 2.1.2 Planimeter; see SOURCE.md there). */
    static List<Map<String, String>> referenceAreas() throws IOException {
        try (InputStream in = GeodesicAreaTest.class.getResourceAsStream("/geometry/areas.csv");
             MappingIterator<Map<String, String>> rows = new CsvMapper().readerForMapOf(String.class)
                     .with(CsvSchema.emptySchema().withHeader()).readValues(in)) {
            return rows.readAll();
        }
    }

    @Test
    void everyReferencePolygonMatchesPlanimeter() throws IOException, ParseException {
        // Reference: GeographicLib Planimeter (areas.csv). GeographicLib-Java reproduces every row to 3e-12
        // (reference README); we allow 1e-10 relative.
        int checked = 0;
        for (Map<String, String> row : referenceAreas()) {
            if (row.get("wkt_lonlat").isEmpty()) {
                continue;
            }
            Geometry polygon = new WKTReader().read(row.get("wkt_lonlat"));
            double expected = Double.parseDouble(row.get("area_m2"));
            double actual = GeodesicArea.areaM2(polygon);
            assertEquals(expected, actual, 1e-10 * expected, row.get("case_id"));
            assertEquals(expected / 1e6, GeodesicArea.areaKm2(polygon), 1e-10 * expected / 1e6, row.get("case_id"));
            checked++;
        }
        assertEquals(14, checked, "areas.csv holds 14 polygons");
    }

    @Test
    void ellipsoidTotalMatchesPlanimeter() throws IOException {
        // Reference: areas.csv row ellipsoid_total (GeographicLib EllipsoidArea, = 4 pi Rq^2).
        Map<String, String> total = referenceAreas().stream()
                .filter(r -> r.get("case_id").equals("ellipsoid_total")).findFirst().orElseThrow();
        assertEquals(Double.parseDouble(total.get("area_m2")), GeodesicArea.ellipsoidAreaM2(), 1e-3);
    }

    @Test
    void orientationDoesNotChangeTheArea() throws ParseException {
        // The same 1x1 deg equatorial cell, counter-clockwise and clockwise: both give the cell, never the
        // rest of the Earth (the trap described in the reference README). Value from LIBRARIES.md section 3:
        // 12,308,778,361.469 m2 (GeographicLib-Java, undensified geodesic edges).
        Geometry ccw = new WKTReader().read("POLYGON((0 0, 1 0, 1 1, 0 1, 0 0))");
        Geometry cw = ccw.reverse();
        assertEquals(12_308_778_361.469, GeodesicArea.areaM2(ccw), 1e-3);
        assertEquals(12_308_778_361.469, GeodesicArea.areaM2(cw), 1e-3);
    }

    @Test
    void holesAreSubtractedAndPartsSummed() throws ParseException {
        WKTReader wkt = new WKTReader();
        double outer = GeodesicArea.areaM2(wkt.read("POLYGON((0 40, 10 40, 10 50, 0 50, 0 40))"));
        double hole = GeodesicArea.areaM2(wkt.read("POLYGON((2 42, 8 42, 8 48, 2 48, 2 42))"));
        double withHole = GeodesicArea.areaM2(wkt.read(
                "POLYGON((0 40, 10 40, 10 50, 0 50, 0 40), (2 42, 2 48, 8 48, 8 42, 2 42))"));
        assertEquals(outer - hole, withHole, 1e-6 * withHole);
        double both = GeodesicArea.areaM2(wkt.read(
                "MULTIPOLYGON(((0 40, 10 40, 10 50, 0 50, 0 40)), ((20 40, 30 40, 30 50, 20 50, 20 40)))"));
        assertEquals(2 * outer, both, 1e-6 * both, "same-shaped parts 20 deg apart have equal areas");
        assertEquals(0.0, GeodesicArea.areaM2(wkt.read("POLYGON EMPTY")));
    }

    @Test
    void densifiedCellApproachesTheReferenceWithTheSquareOfTheStep() throws IOException, ParseException {
        // reference/README: undensified, a 1x1 deg equatorial cell's geodesic and lon/lat-straight areas
        // differ by 2.6e-5 relative, and the gap shrinks with the square of the step.
        Map<String, String> cell = referenceAreas().stream()
                .filter(r -> r.get("case_id").equals("cell_eq_1x1")).findFirst().orElseThrow();
        double reference = Double.parseDouble(cell.get("area_m2"));
        Geometry coarse = new WKTReader().read("POLYGON((0 0, 1 0, 1 1, 0 1, 0 0))");
        double errorCoarse = Math.abs(GeodesicArea.areaM2(coarse) / reference - 1);
        double errorFine = Math.abs(GeodesicArea.areaM2(LonLatDensifier.densify(coarse, 0.1)) / reference - 1);
        assertEquals(2.6e-5, errorCoarse, 0.1e-5);
        assertTrue(errorFine < errorCoarse / 50, "error " + errorFine + " should shrink about 100-fold");
    }
}
