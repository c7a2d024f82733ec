package aequa.projection;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;

import aequa.ellipsoid.RegionValidator;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.project.RegionSourceSpec;

/**
 * Repeated boundary points are left out of the omega score without changing it. References: Java's
 * {@link LinkedHashSet} (first occurrences in order) for the points kept; the score over every sample,
 * repeats included, computed here with {@link Distortion#omegaDeg} for the score. Real data: Natural Earth
 * admin-0 1:110m (src/test/resources/geometry/SOURCE.md), whose neighbouring countries share vertices.
 */
class DistinctPointsTest {

    @Test
    void keepsTheFirstOccurrenceOfEachPointInOrder() {
        Random random = new Random(7);
        int count = 5_000;
        double[] xy = new double[2 * (count + 3)];
        for (int i = 3; i < count + 3; i++) { // a prefix of three points that must stay untouched
            xy[2 * i] = random.nextInt(40) * 0.25;
            xy[2 * i + 1] = random.nextInt(40) * 0.25;
        }
        xy[0] = 99;
        Set<List<Double>> reference = new LinkedHashSet<>();
        for (int i = 3; i < count + 3; i++) {
            reference.add(List.of(xy[2 * i], xy[2 * i + 1]));
        }
        int kept = DistinctPoints.keepFirst(xy, 3, count);
        assertEquals(reference.size(), kept);
        List<List<Double>> got = new ArrayList<>();
        for (int i = 3; i < kept + 3; i++) {
            got.add(List.of(xy[2 * i], xy[2 * i + 1]));
        }
        assertEquals(new ArrayList<>(reference), got);
        assertEquals(99, xy[0]);
    }

    @Test
    void theScoreOverDistinctSamplesIsTheScoreOverAll() throws IOException {
        Footprint africa = Footprint.of(africa());
        FootprintSamples all = africa.samples();
        FootprintSamples distinct = all.withoutRepeats();
        assertTrue(distinct.count() < all.count() - 100, "shared borders repeat vertices: " + distinct.count() + " of " + all.count());
        assertEquals(all.interiorCount(), distinct.interiorCount());
        assertArrayEquals(Arrays.copyOf(all.weights(), all.interiorCount()), Arrays.copyOf(distinct.weights(), all.interiorCount()));
        EqualAreaProjection projection = ProjectionChooser.choose(africa, ProjectionRequest.automatic()).projection();

        double[] omega = new double[all.count()];
        Distortion.omegaDeg(projection, all.lonLatDeg(), all.count(), omega);
        int worst = 0;
        double weighted = 0;
        double weight = 0;
        for (int i = 0; i < all.count(); i++) {
            if (omega[i] > omega[worst]) {
                worst = i;
            }
            if (i < all.interiorCount()) {
                weighted += omega[i] * all.weight(i);
                weight += all.weight(i);
            }
        }
        OmegaScore score = OmegaScore.of(projection, all);
        assertEquals(omega[worst], score.omegaMaxDeg(), 0.0);
        assertEquals(all.lonDeg(worst), score.worstLonDeg(), 0.0);
        assertEquals(all.latDeg(worst), score.worstLatDeg(), 0.0);
        assertEquals(weighted / weight, score.omegaMeanDeg(), 0.0);
    }

    private static List<Geometry> africa() throws IOException {
        Path geometry = Path.of("src/test/resources/geometry");
        Findings findings = new Findings();
        List<Region> read = RegionReaders.read(geometry, new RegionSourceSpec("ne-admin0-110m.geojson", "adm0_a3", "name", ""), findings);
        Set<String> african = Set.of("DZA", "EGY", "LBY", "TUN", "MAR", "SDN", "TCD", "NER", "MLI", "MRT", "NGA", "CMR",
                "CAF", "COD", "COG", "GAB", "AGO", "ZMB", "ZWE", "MOZ", "TZA", "KEN", "UGA", "ETH", "SOM", "ZAF", "NAM", "BWA");
        return RegionValidator.validate(read, "ne-admin0-110m.geojson", findings).stream()
                .filter(r -> african.contains(r.key())).map(Region::lonLat).toList();
    }
}
