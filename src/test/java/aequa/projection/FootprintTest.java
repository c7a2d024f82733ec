package aequa.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class FootprintTest {

    @Test
    void smallestArcAcrossTheAntimeridian() {
        // two pieces of one island group cut at 180 deg as RFC 7946 (section 3.1.9) requires
        Footprint f = Footprint.of(List.of(Regions.box(177, -19, 180, -16), Regions.box(-180, -19, -178, -16)));
        assertEquals(5.0, f.lonSpanDeg(), 1e-9);
        assertEquals(0.0, Longitudes.difference(179.5, f.centreLonDeg()), 1e-9);
        assertEquals(-19.0, f.minLatDeg(), 1e-12);
        assertEquals(-16.0, f.maxLatDeg(), 1e-12);
        assertFalse(f.containsNorthPole() || f.containsSouthPole());
        for (int i = 0; i < f.samples().count(); i++) {
            double lon = f.samples().lonDeg(i);
            assertTrue(lon >= 177 || lon <= -178, "sample off the islands: " + lon);
        }
    }

    @Test
    void smallestArcLeavesTheLargestGapOut() {
        // regions at 100 W and 160 E: the short way round runs across the Pacific (100 deg), not across Greenwich
        Footprint f = Footprint.of(List.of(Regions.box(-110, 30, -100, 40), Regions.box(150, 30, 160, 40)));
        assertEquals(110.0, f.lonSpanDeg(), 1e-9);
        assertEquals(-155.0, f.centreLonDeg(), 1e-9);
    }

    @Test
    void polarCapInRfc7946FormContainsItsPole() {
        Footprint antarctica = Footprint.of(List.of(Regions.box(-180, -90, 180, -65)));
        assertTrue(antarctica.containsSouthPole());
        assertFalse(antarctica.containsNorthPole());
        assertEquals(360.0, antarctica.lonSpanDeg(), 1e-9);
        assertEquals(-90.0, antarctica.sphericalCentreLatDeg(), 0.5);
        Footprint band = Footprint.of(List.of(Regions.box(-180, 60, 180, 80)));
        assertFalse(band.containsNorthPole());
    }

    @Test
    void interiorWeightsAddUpToTheArea() {
        // exact area of a lon/lat box on the unit sphere: dlon (sin north - sin south) (a standard result)
        Footprint f = Footprint.of(List.of(Regions.box(-10, 35, 30, 60)));
        double expected = Math.toRadians(40) * (Math.sin(Math.toRadians(60)) - Math.sin(Math.toRadians(35)));
        double total = 0;
        for (int i = 0; i < f.samples().interiorCount(); i++) {
            total += f.samples().weight(i);
        }
        assertEquals(expected, total, 0.01 * expected);
        assertTrue(f.samples().interiorCount() >= 1000 && f.samples().count() <= 10_000, "bounded: " + f.samples().count());
    }

    @Test
    void samplesFollowTheRegionsNotTheirBox() {
        // an L of two boxes: the empty corner of the bounding box gets no interior sample
        Footprint f = Footprint.of(List.of(Regions.box(0, 0, 10, 30), Regions.box(10, 0, 30, 10)));
        for (int i = 0; i < f.samples().interiorCount(); i++) {
            assertFalse(f.samples().lonDeg(i) > 10 && f.samples().latDeg(i) > 10, "sample in the empty corner");
        }
    }

    @Test
    void elongationAndOrientation() {
        Footprint northSouth = Footprint.of(List.of(Regions.box(10, -40, 16, 40)));
        assertTrue(northSouth.elongation() > 5, "elongation " + northSouth.elongation());
        assertEquals(0.0, Math.min(northSouth.orientationDeg(), 180 - northSouth.orientationDeg()), 2.0);
        Footprint eastWest = Footprint.of(List.of(Regions.box(-20, -3, 40, 3)));
        assertEquals(90.0, eastWest.orientationDeg(), 2.0);
        Footprint round = Footprint.of(List.of(Regions.box(-5, -5, 5, 5)));
        assertEquals(1.0, round.elongation(), 0.1);
        assertEquals(0.0, round.sphericalCentreLonDeg(), 1e-6);
        assertEquals(0.0, round.sphericalCentreLatDeg(), 1e-6);
        assertEquals(Math.toDegrees(Math.acos(Math.cos(Math.toRadians(5)) * Math.cos(Math.toRadians(5)))),
                round.angularRadiusDeg(), 1e-6);   // corner distance (spherical law of cosines)
    }

    @Test
    void nothingMeansTheWholeGlobe() {
        Footprint f = Footprint.of(List.of());
        assertEquals(360.0, f.lonSpanDeg());
        assertEquals(-90.0, f.minLatDeg());
        assertEquals(90.0, f.maxLatDeg());
        assertTrue(f.samples().interiorCount() > 1000);
    }
}
