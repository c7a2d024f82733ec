package aequa.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.CommonCRS;
import org.junit.jupiter.api.Test;
import org.opengis.referencing.crs.CoordinateReferenceSystem;
import org.opengis.referencing.crs.ProjectedCRS;
import org.opengis.referencing.operation.MathTransform;

/** WKT 2 (ISO 19162:2019) of every family, read back by Apache SIS, the reference library for WKT here. */
class WktTest {

    @Test
    void everyFamilyParsesBackAndTransformsAsAequaDoes() throws Exception {
        double[] points = {12.5, 41.9, -70.0, -33.4, 151.2, -33.9, -100.0, 60.0, 30.0, 5.0};
        for (EqualAreaProjection projection : SampleProjections.everyFamilyAndAspect()) {
            String wkt = projection.wkt2();
            assertTrue(wkt.startsWith("PROJCRS["), wkt);
            CoordinateReferenceSystem parsed = CRS.fromWKT(wkt);
            assertInstanceOf(ProjectedCRS.class, parsed);
            // SIS's operation from (lon, lat) to the parsed CRS must reproduce aequa's forward
            MathTransform sis = CRS.findOperation(CommonCRS.WGS84.normalizedGeographic(), parsed, null).getMathTransform();
            double[] expected = new double[points.length];
            double[] actual = new double[points.length];
            projection.forward(points, 0, expected, 0, points.length / 2);
            sis.transform(points, 0, actual, 0, points.length / 2);
            double centreLon = projection.parameters().get(0).value();
            for (int i = 0; i < points.length; i++) {
                // SIS does not wrap lon - lon0 (see SisProjection.forward), so points more than 180 deg from the
                // central meridian are compared only through aequa's own wrapper, not through SIS's transform.
                boolean sisWraps = Math.abs(points[i - i % 2] - centreLon) <= 180.0;
                if (!Double.isNaN(expected[i]) && sisWraps) {
                    assertEquals(expected[i], actual[i], 1e-6, projection + "\n" + wkt);
                }
            }
        }
    }

    @Test
    void equalEarthKeepsItsEpsgMethodAndTheOthersAreNamedAsAequas() {
        // EPSG method 1078 is Equal Earth (IOGP GN 7-2); SIS 1.7 has no such method, aequa registers it.
        String equalEarth = Projections.create(ProjectionFamily.EQUAL_EARTH, Map.of("centre-lon", -90.0)).wkt2();
        assertTrue(equalEarth.contains("METHOD[\"Equal Earth\", ID[\"EPSG\", 1078]]"), equalEarth);
        assertTrue(equalEarth.contains("PARAMETER[\"Longitude of natural origin\", -90.0"), equalEarth);
        String mollweide = Projections.create(ProjectionFamily.MOLLWEIDE, Map.of()).wkt2();
        assertTrue(mollweide.contains("METHOD[\"Mollweide on the authalic sphere\"]"), mollweide);
        String laea = Projections.lambertAzimuthal(10, 52).wkt2();
        assertTrue(laea.contains("METHOD[\"Lambert Azimuthal Equal Area\", ID[\"EPSG\", 9820]]"), laea);
        assertTrue(laea.contains("ELLIPSOID[\"WGS 1984\", 6378137.0, 298.257223563"), laea);
    }

    @Test
    void wktIsDeterministic() {
        for (EqualAreaProjection projection : SampleProjections.everyFamilyAndAspect()) {
            EqualAreaProjection again = Projections.create(projection.family(), parameterMap(projection));
            assertEquals(projection.wkt2(), again.wkt2());
        }
    }

    private static Map<String, Double> parameterMap(EqualAreaProjection projection) {
        Map<String, Double> map = new java.util.HashMap<>();
        for (ProjectionParameter p : projection.parameters()) {
            map.put(p.key(), p.value());
        }
        return map;
    }
}
