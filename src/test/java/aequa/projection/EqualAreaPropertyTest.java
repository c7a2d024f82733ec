package aequa.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The invariants every family must keep: area scale 1 against the ellipsoid's area element M N cos(phi)
 * (the definition of an equal-area projection, Snyder 1987, chapter 4), inverse(forward(p)) = p, and
 * sensible results at the poles, at +-180 and off the domain.
 */
class EqualAreaPropertyTest {

    @Test
    void areaScaleIsOneOverAGridForEveryFamilyAndAspect() {
        for (EqualAreaProjection projection : SampleProjections.everyFamilyAndAspect()) {
            int checked = 0;
            for (double lat = -88.5; lat <= 88.5; lat += 3.0) {
                for (double lon = -178.5; lon <= 178.5; lon += 3.0) {
                    Distortion.Tissot tissot = Distortion.at(projection, lon, lat);
                    if (Double.isNaN(tissot.areaScale()) || tissot.omegaDeg() > 120.0) {
                        continue;   // outside the domain, or so near a singular point that the step is too coarse
                    }
                    assertEquals(1.0, tissot.areaScale(), 1e-9, projection + " at " + lon + ", " + lat);
                    checked++;
                }
            }
            assertTrue(checked > 3000, projection + ": only " + checked + " grid points");
        }
    }

    @Test
    void inverseUndoesForwardOnRandomPoints() {
        Random random = new Random(1987L);
        for (EqualAreaProjection projection : SampleProjections.everyFamilyAndAspect()) {
            int n = 5000;
            double[] points = new double[2 * n];
            for (int i = 0; i < n; i++) {
                points[2 * i] = random.nextDouble() * 360.0 - 180.0;
                points[2 * i + 1] = Math.toDegrees(Math.asin(random.nextDouble() * 2.0 - 1.0));   // uniform on the sphere
            }
            double[] xy = new double[2 * n];
            double[] back = new double[2 * n];
            projection.forward(points, 0, xy, 0, n);
            projection.inverse(xy, 0, back, 0, n);
            int checked = 0;
            for (int i = 0; i < n; i++) {
                double lon = points[2 * i];
                double lat = points[2 * i + 1];
                if (Double.isNaN(xy[2 * i])) {
                    double[] frame = new double[2];
                    projection.frame().toFrame(lon, lat, frame);
                    assertTrue(frame[1] < projection.frame().minFrameLatDeg(), projection + " NaN inside its domain at " + lon + ", " + lat);
                    continue;
                }
                String where = projection + " at " + lon + ", " + lat;
                assertEquals(lat, back[2 * i + 1], 1e-9, where);
                // longitude error measured along the parallel (it is meaningless at the pole itself)
                assertEquals(0.0, Longitudes.difference(lon, back[2 * i]) * Math.cos(Math.toRadians(lat)), 1e-9, where);
                checked++;
            }
            assertTrue(checked > n / 2, projection + ": " + checked);
        }
    }

    @Test
    void polesMapToOnePointOrOneLine() {
        for (EqualAreaProjection projection : SampleProjections.everyFamilyAndAspect()) {
            for (double poleLat : new double[] {90.0, -90.0}) {
                double[] points = new double[2 * 7];
                for (int i = 0; i < 7; i++) {
                    points[2 * i] = -180.0 + 60.0 * i;
                    points[2 * i + 1] = poleLat;
                }
                double[] xy = new double[points.length];
                projection.forward(points, 0, xy, 0, 7);
                if (Double.isNaN(xy[0])) {
                    continue;   // the pole is outside an azimuthal domain
                }
                ProjectionFamily f = projection.family();
                // Snyder 1987: normal cylindrical and Equal Earth maps show the pole as a straight line y = const;
                // Albers shows both poles as circular arcs about the apex (chapter 14), checked for finiteness only.
                boolean poleIsLine = f == ProjectionFamily.CYLINDRICAL || f == ProjectionFamily.EQUAL_EARTH;
                for (int i = 1; i < 7; i++) {
                    assertTrue(Double.isFinite(xy[2 * i]) && Double.isFinite(xy[2 * i + 1]), projection + " pole " + poleLat);
                    if (f == ProjectionFamily.ALBERS_CONIC) {
                        continue;
                    }
                    if (poleIsLine) {
                        assertEquals(xy[1], xy[2 * i + 1], 1e-6, projection + " pole " + poleLat);
                    } else {
                        assertEquals(xy[0], xy[2 * i], 1e-3, projection + " pole " + poleLat);
                        assertEquals(xy[1], xy[2 * i + 1], 1e-3, projection + " pole " + poleLat);
                    }
                }
            }
        }
    }

    @Test
    void plusAndMinus180AreTheTwoEdgesOfNormalAspects() {
        for (ProjectionFamily family : new ProjectionFamily[] {ProjectionFamily.ALBERS_CONIC, ProjectionFamily.CYLINDRICAL,
                ProjectionFamily.EQUAL_EARTH, ProjectionFamily.MOLLWEIDE}) {
            EqualAreaProjection p = Projections.create(family, Map.of("centre-lon", 0.0, "standard-parallel-1", 20.0,
                    "standard-parallel-2", 50.0));
            double[] xy = new double[4];
            p.forward(new double[] {180.0, 40.0, -180.0, 40.0}, 0, xy, 0, 2);
            // with the centre on Greenwich, 180 E and 180 W are the right and left edges, mirror images in x
            assertTrue(xy[0] > 0 && xy[2] < 0, family + ": " + xy[0] + " " + xy[2]);
            assertEquals(xy[0], -xy[2], 1e-6, family.toString());
            assertEquals(xy[1], xy[3], 1e-6, family.toString());
        }
    }

    @Test
    void invalidInputAndOffMapPointsGiveNaN() {
        for (EqualAreaProjection projection : SampleProjections.everyFamilyAndAspect()) {
            double[] xy = new double[6];
            projection.forward(new double[] {10.0, 91.0, Double.NaN, 10.0, 10.0, Double.NaN}, 0, xy, 0, 3);
            for (double v : xy) {
                assertTrue(Double.isNaN(v), projection + " gave " + v + " for invalid input");
            }
        }
        EqualAreaProjection laea = Projections.lambertAzimuthal(10.0, 52.0);
        double[] xy = new double[2];
        laea.forward(new double[] {-170.0, -52.0}, 0, xy, 0, 1);   // the antipode of the centre
        assertTrue(Double.isNaN(xy[0]) && Double.isNaN(xy[1]));
        EqualAreaProjection world = Projections.create(ProjectionFamily.EQUAL_EARTH, Map.of());
        double[] lonLat = new double[2];
        world.inverse(new double[] {3.0e7, 0.0}, 0, lonLat, 0, 1);   // far beyond the map's right edge
        assertTrue(Double.isNaN(lonLat[0]) && Double.isNaN(lonLat[1]));
    }

    @Test
    void forwardWorksInPlace() {
        for (EqualAreaProjection projection : SampleProjections.everyFamilyAndAspect()) {
            double[] expected = new double[2];
            projection.forward(new double[] {12.5, 41.9}, 0, expected, 0, 1);
            double[] inPlace = {0.0, 12.5, 41.9};
            projection.forward(inPlace, 1, inPlace, 1, 1);
            assertEquals(expected[0], inPlace[1], 0.0);
            assertEquals(expected[1], inPlace[2], 0.0);
        }
    }
}
