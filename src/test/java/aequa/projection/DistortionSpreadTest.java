package aequa.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The reader's distortion figures (area shares below 1, 5 and 10 deg, the 95th percentile by area, the place
 * of the largest omega) against an independent sampling written here: seeded random points spread evenly by
 * area over the box (longitude uniform, sine of latitude uniform: equal-area on the sphere, Archimedes' hat-box
 * theorem; the ellipsoid's flattening moves the weights by under 0.5 %), omega at each by the five-point
 * {@link Distortion#at} rather than the chooser's batch stencil.
 */
class DistortionSpreadTest {

    private static final int POINTS = 20_000;

    /** Two percentage points: the footprint's grid has about 2000 cells, the sampling here 20,000 random points. */
    private static final double SHARE_TOLERANCE = 0.02;

    @Test
    void worldSharesMatchAnIndependentSampling() {
        ProjectionChoice choice = ProjectionChooser.choose(Footprint.of(List.of(Regions.box(-180, -90, 180, 90))), ProjectionRequest.automatic());
        assertTrue(choice.projection().family().world());
        assertMatchesSampling(choice, -180, -90, 180, 90);
        assertEquals("on the pole lines, the map's top and bottom edges", choice.spread().worstPlace());
    }

    @Test
    void regionalSharesMatchAnIndependentSampling() {
        // wide enough that omega passes 1 and 5 deg inside the data
        ProjectionChoice choice = ProjectionChooser.choose(Footprint.of(List.of(Regions.box(-20, 20, 100, 75))), ProjectionRequest.automatic());
        assertMatchesSampling(choice, -20, 20, 100, 75);
        assertTrue(choice.spread().shareBelow1Deg() < 0.9 && choice.spread().shareBelow10Deg() > 0.5, choice.spread().toString());
        assertTrue(choice.spread().worstPlace().startsWith("at the data's "), choice.spread().worstPlace());
    }

    @Test
    void theLargestOmegaIsNamedByItsCompassDirectionFromTheCentre() {
        Footprint box = Footprint.of(List.of(Regions.box(0, 40, 20, 50)));
        EqualAreaProjection laea = Projections.lambertAzimuthal(10, 45);
        assertEquals("at the data's north-east edge", DistortionSpread.place(laea, box, 20, 50));
        assertEquals("at the data's south edge", DistortionSpread.place(laea, box, box.sphericalCentreLonDeg(), 40));
        assertEquals("at the South Pole", DistortionSpread.place(laea, box, 0, -90));
    }

    private static void assertMatchesSampling(ProjectionChoice choice, double west, double south, double east, double north) {
        Random random = new Random(16);
        double[] omega = new double[POINTS];
        double sinSouth = Math.sin(Math.toRadians(south));
        double sinNorth = Math.sin(Math.toRadians(north));
        for (int i = 0; i < POINTS; i++) {
            double lon = west + (east - west) * random.nextDouble();
            double lat = Math.toDegrees(Math.asin(sinSouth + (sinNorth - sinSouth) * random.nextDouble()));
            omega[i] = Distortion.at(choice.projection(), lon, lat).omegaDeg();
        }
        DistortionSpread spread = choice.spread();
        assertEquals(share(omega, 1), spread.shareBelow1Deg(), SHARE_TOLERANCE, spread.toString());
        assertEquals(share(omega, 5), spread.shareBelow5Deg(), SHARE_TOLERANCE, spread.toString());
        assertEquals(share(omega, 10), spread.shareBelow10Deg(), SHARE_TOLERANCE, spread.toString());
        Arrays.sort(omega);
        // the percentile where the sampled omegas 2.5 points either side of 95 % lie
        double low = omega[(int) (0.925 * POINTS)];
        double high = omega[(int) (0.975 * POINTS)];
        assertTrue(spread.omegaP95Deg() >= low && spread.omegaP95Deg() <= high, spread.omegaP95Deg() + " not in [" + low + ", " + high + "]");
    }

    private static double share(double[] omega, double belowDeg) {
        return Arrays.stream(omega).filter(w -> w < belowDeg).count() / (double) omega.length;
    }
}
