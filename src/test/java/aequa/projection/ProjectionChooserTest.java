package aequa.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.DoubleBinaryOperator;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;

import aequa.testing.ForkedJvm;

/**
 * The automatic choice on reference footprints, each checked two ways: the family is the one the trade's
 * rules name for such an extent (common practice: Snyder 1987, "Choosing a projection"; the brief's
 * list), and the chosen omegaMaxDeg is within 2 % of the best found by an exhaustive grid search over that
 * family's parameters, run here.
 */
class ProjectionChooserTest {

    private static final double WITHIN = 1.02;

    @Test
    void wholeWorldGetsAWorldFamily() {
        Footprint world = Footprint.of(List.of(Regions.box(-180, -90, 180, 90)));
        ProjectionChoice choice = ProjectionChooser.choose(world, ProjectionRequest.automatic());
        ProjectionFamily family = choice.projection().family();
        assertTrue(family == ProjectionFamily.EQUAL_EARTH || family == ProjectionFamily.MOLLWEIDE, family.toString());
        double best = Double.POSITIVE_INFINITY;
        for (double lon = -180; lon < 180; lon += 15) {
            best = Math.min(best, omegaMax(family, Map.of("centre-lon", lon), world));
        }
        assertTrue(choice.omegaMaxDeg() <= best * WITHIN, choice.omegaMaxDeg() + " vs grid " + best);
        assertComplete(choice, world);
    }

    @Test
    void midLatitudeEastWestBoxGetsAConic() {
        Footprint box = Footprint.of(List.of(Regions.box(-125, 25, -65, 50)));
        ProjectionChoice choice = ProjectionChooser.choose(box, ProjectionRequest.automatic());
        assertEquals(ProjectionFamily.ALBERS_CONIC, choice.projection().family(), choice.reason());
        double best = gridMinimum((p1, p2) -> omegaMax(ProjectionFamily.ALBERS_CONIC, albers(p1, p2), box),
                new Range(22, 35, 1), new Range(38, 52, 1), 0.5, 0.1, Double.NEGATIVE_INFINITY);
        assertTrue(choice.omegaMaxDeg() <= best * WITHIN, choice.omegaMaxDeg() + " vs grid " + best);
        assertComplete(choice, box);
    }

    @Test
    void polarCapGetsTheBetterOfThePolarAzimuthalAndTheLimitingConic() {
        // issue #16: for a cap the chooser keeps the better of the polar azimuthal and the Albers conic with one
        // standard parallel at the pole; both are searched here on grids
        Footprint cap = Footprint.of(List.of(Regions.box(-180, 60, 180, 90)));
        ProjectionChoice choice = ProjectionChooser.choose(cap, ProjectionRequest.automatic());
        double azimuthal = Double.POSITIVE_INFINITY;
        for (double lat = 80; lat <= 90; lat += 0.5) {
            for (double lon = -180; lon < 180; lon += 30) {
                azimuthal = Math.min(azimuthal, omegaMax(ProjectionFamily.LAMBERT_AZIMUTHAL, Map.of("centre-lon", lon, "centre-lat", lat), cap));
            }
        }
        double conic = Double.POSITIVE_INFINITY;
        for (double p2 = 60; p2 < 90; p2 += 0.1) {
            conic = Math.min(conic, omegaMax(ProjectionFamily.ALBERS_CONIC, albers(90, p2), cap));
        }
        assertTrue(choice.omegaMaxDeg() <= Math.min(azimuthal, conic) * WITHIN, choice.omegaMaxDeg() + " vs grids " + azimuthal + ", " + conic);
        assertEquals(conic < azimuthal ? ProjectionFamily.ALBERS_CONIC : ProjectionFamily.LAMBERT_AZIMUTHAL, choice.projection().family());
        assertTrue(choice.reason().contains("North Pole"), choice.reason());
        // the polar azimuthal's own optimum is centred on the pole
        ProjectionChoice forced = ProjectionChooser.choose(cap, new ProjectionRequest(
                Optional.of(ProjectionFamily.LAMBERT_AZIMUTHAL), Map.of(), Optional.empty()));
        assertEquals(90.0, value(forced, "centre-lat"), 0.0);
        assertTrue(forced.omegaMaxDeg() <= azimuthal * WITHIN, forced.omegaMaxDeg() + " vs grid " + azimuthal);
    }

    @Test
    void equatorialBeltGetsTheNormalCylindrical() {
        Footprint belt = Footprint.of(List.of(Regions.box(-20, -10, 160, 10)));
        ProjectionChoice choice = ProjectionChooser.choose(belt, ProjectionRequest.automatic());
        assertEquals(ProjectionFamily.CYLINDRICAL, choice.projection().family(), choice.reason());
        double best = Double.POSITIVE_INFINITY;
        for (double parallel = 0; parallel <= 20; parallel += 0.1) {
            best = Math.min(best, omegaMax(ProjectionFamily.CYLINDRICAL, Map.of("centre-lon", 70.0, "standard-parallel-1", parallel), belt));
        }
        assertTrue(choice.omegaMaxDeg() <= best * WITHIN, choice.omegaMaxDeg() + " vs grid " + best);
    }

    @Test
    void longNorthSouthStripGetsTheTransverseAspect() {
        Footprint strip = Footprint.of(List.of(Regions.box(10, -40, 16, 40)));
        ProjectionChoice choice = ProjectionChooser.choose(strip, ProjectionRequest.automatic());
        assertEquals(ProjectionFamily.CYLINDRICAL_TRANSVERSE, choice.projection().family(), choice.reason());
        double best = gridMinimum((lon, offset) -> omegaMax(ProjectionFamily.CYLINDRICAL_TRANSVERSE, transverse(lon, offset), strip),
                new Range(10, 16, 0.5), new Range(0, 5, 0.5), 0.25, 0.05, 0);
        assertTrue(choice.omegaMaxDeg() <= best * WITHIN, choice.omegaMaxDeg() + " vs grid " + best);
    }

    @Test
    void forcedFamilyAndParametersAreHonoured() {
        Footprint box = Footprint.of(List.of(Regions.box(-125, 25, -65, 50)));
        ProjectionChoice choice = ProjectionChooser.choose(box, new ProjectionRequest(
                Optional.of(ProjectionFamily.LAMBERT_AZIMUTHAL), Map.of("centre-lon", -100.0), Optional.empty()));
        assertEquals(ProjectionFamily.LAMBERT_AZIMUTHAL, choice.projection().family());
        assertEquals(-100.0, value(choice, "centre-lon"), 0.0);
        assertTrue(choice.reason().contains("project file"), choice.reason());
        // a forced parameter without a family applies to whichever family wins
        ProjectionChoice auto = ProjectionChooser.choose(box, new ProjectionRequest(Optional.empty(),
                Map.of("centre-lon", -90.0), Optional.empty()));
        assertEquals(-90.0, value(auto, "centre-lon"), 0.0);
    }

    @Test
    void previousChoiceIsKeptUnlessClearlyWorse() {
        Footprint box = Footprint.of(List.of(Regions.box(-125, 25, -65, 50)));
        ProjectionChoice fresh = ProjectionChooser.choose(box, ProjectionRequest.automatic());
        Map<String, Double> nearby = parameterMap(fresh.projection());
        nearby.put("standard-parallel-1", nearby.get("standard-parallel-1") + 0.2);   // a little worse than the best
        ProjectionChoice kept = ProjectionChooser.choose(box, new ProjectionRequest(Optional.empty(), Map.of(),
                Optional.of(new ProjectionRequest.Previous(ProjectionFamily.ALBERS_CONIC, nearby))));
        assertEquals(nearby, parameterMap(kept.projection()), kept.reason());
        assertTrue(kept.reason().contains("previous"), kept.reason());
        // next month's data add a small region: the map keeps last month's projection
        Footprint grown = Footprint.of(List.of(Regions.box(-125, 25, -65, 50), Regions.box(-68, 44, -66, 47)));
        ProjectionChoice nextMonth = ProjectionChooser.choose(grown, new ProjectionRequest(Optional.empty(), Map.of(),
                Optional.of(new ProjectionRequest.Previous(ProjectionFamily.ALBERS_CONIC, parameterMap(fresh.projection())))));
        assertEquals(parameterMap(fresh.projection()), parameterMap(nextMonth.projection()));
        ProjectionChoice replaced = ProjectionChooser.choose(box, new ProjectionRequest(Optional.empty(), Map.of(),
                Optional.of(new ProjectionRequest.Previous(ProjectionFamily.LAMBERT_AZIMUTHAL, Map.of("centre-lon", 0.0, "centre-lat", 0.0)))));
        assertEquals(parameterMap(fresh.projection()), parameterMap(replaced.projection()));
    }

    /**
     * The chooser searches families in parallel; its choice must not depend on the pool, the locale or the
     * time zone: the same footprint chosen in a JVM that differs in all three ({@link ForkedJvm}) gives the
     * same WKT 2, reason and largest omega, to the last digit.
     */
    @Test
    void choiceIsTheSameInAnotherJvm() throws Exception {
        assertEquals(ChoiceInAnotherJvm.describe(), ForkedJvm.output(ChoiceInAnotherJvm.class));
    }

    /** Chooses for two boxes over central Europe and prints what {@link #choiceIsTheSameInAnotherJvm} compares. */
    static final class ChoiceInAnotherJvm {
        public static void main(String[] args) {
            ForkedJvm.print(describe());
        }

        static String describe() {
            List<Geometry> regions = List.of(Regions.box(5, 45, 15, 55), Regions.box(15, 40, 25, 50));
            ProjectionChoice choice = ProjectionChooser.choose(Footprint.of(regions), ProjectionRequest.automatic());
            return choice.projection().wkt2() + "\n" + choice.reason() + "\n" + choice.omegaMaxDeg() + "\n";
        }
    }

    private static void assertComplete(ProjectionChoice choice, Footprint footprint) {
        assertTrue(choice.omegaMaxDeg() >= choice.omegaMeanDeg() && choice.omegaMeanDeg() >= 0);
        assertTrue(choice.worstLatDeg() >= footprint.minLatDeg() - 1e-9 && choice.worstLatDeg() <= footprint.maxLatDeg() + 1e-9);
        assertFalse(choice.runnersUp().isEmpty());
        for (ProjectionChoice.Candidate c : choice.runnersUp()) {
            assertTrue(c.omegaMaxDeg() > 0 && !c.parameters().isEmpty(), c.toString());
        }
        assertTrue(choice.reason().startsWith(choice.projection().family().displayName()), choice.reason());
        assertTrue(choice.reason().endsWith("."), choice.reason());
    }

    /** A grid's bounds and step. */
    private record Range(double from, double to, double step) {
    }

    /**
     * The smallest value of {@code f} on a coarse grid over {@code a} x {@code b}, then on a fine grid of
     * step {@code fineStep} within {@code fineRadius} of the coarse best (b kept at or above {@code bFloor}).
     */
    private static double gridMinimum(DoubleBinaryOperator f, Range a, Range b, double fineRadius, double fineStep, double bFloor) {
        double best = Double.POSITIVE_INFINITY;
        double bestA = a.from();
        double bestB = b.from();
        for (double x = a.from(); x <= a.to(); x += a.step()) {
            for (double y = b.from(); y <= b.to(); y += b.step()) {
                double value = f.applyAsDouble(x, y);
                if (value < best) {
                    best = value;
                    bestA = x;
                    bestB = y;
                }
            }
        }
        for (double x = bestA - fineRadius; x <= bestA + fineRadius; x += fineStep) {
            for (double y = Math.max(bFloor, bestB - fineRadius); y <= bestB + fineRadius; y += fineStep) {
                best = Math.min(best, f.applyAsDouble(x, y));
            }
        }
        return best;
    }

    private static double omegaMax(ProjectionFamily family, Map<String, Double> parameters, Footprint footprint) {
        EqualAreaProjection projection = FamilySearch.build(family, parameters);
        return projection == null ? Double.POSITIVE_INFINITY : OmegaScore.of(projection, footprint.samples()).omegaMaxDeg();
    }

    private static Map<String, Double> albers(double p1, double p2) {
        return Map.of("centre-lon", -95.0, "centre-lat", 37.5, "standard-parallel-1", p1, "standard-parallel-2", p2);
    }

    private static Map<String, Double> transverse(double lon, double offset) {
        return Map.of("centre-lon", lon, "centre-lat", 0.0, "standard-line-offset", offset);
    }

    private static double value(ProjectionChoice choice, String key) {
        return choice.projection().parameters().stream().filter(p -> p.key().equals(key)).findFirst().orElseThrow().value();
    }

    private static Map<String, Double> parameterMap(EqualAreaProjection projection) {
        Map<String, Double> map = new HashMap<>();
        for (ProjectionParameter p : projection.parameters()) {
            map.put(p.key(), p.value());
        }
        return map;
    }
}
