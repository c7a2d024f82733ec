package aequa.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;

/**
 * Every family's PROJ string, run by PROJ itself: {@code cct} from Debian's proj-bin (an outside, general
 * purpose reference implementation; CI installs it, see .ci/run) projects random points, which must land
 * within 1 mm of aequa's own coordinates, and takes aequa's coordinates back ({@code cct -I}) to within 2 mm
 * of the points on the ground. The inverse allows 2 mm because PROJ 9.1's own inverse is that far off: its
 * authalic-to-geodetic latitude is a series truncated after e^6 (Snyder 1987, eq. 3-18), and PROJ's own round
 * trip, cct then cct -I with +proj=laea or +proj=cea on WGS 84, moves a point by up to 1.6 mm (measured here,
 * e.g. 45 N comes back as 44.999999995 N); aequa's coordinates land on the same 1.6 mm. Without cct this test
 * fails: it never skips.
 */
class ProjStringsTest {

    private static final int POINTS = 200;

    /** Metres per degree of latitude, rounded (enough to state a millimetre). */
    private static final double METRES_PER_DEG = 111_320;

    /** The parameter sets: each family's defaults and a placed case, among them the issue's oblique cylinder. */
    private static final List<Map.Entry<ProjectionFamily, Map<String, Double>>> CASES = List.of(
            Map.entry(ProjectionFamily.LAMBERT_AZIMUTHAL, Map.of("centre-lon", 10.0, "centre-lat", 52.0)),
            Map.entry(ProjectionFamily.LAMBERT_AZIMUTHAL, Map.of("centre-lon", 0.0, "centre-lat", -90.0)),
            Map.entry(ProjectionFamily.ALBERS_CONIC, Map.of("centre-lon", -96.0, "centre-lat", 23.0,
                    "standard-parallel-1", 29.5, "standard-parallel-2", 45.5)),
            Map.entry(ProjectionFamily.CYLINDRICAL, Map.of("centre-lon", 20.0, "standard-parallel-1", 30.0)),
            Map.entry(ProjectionFamily.CYLINDRICAL_TRANSVERSE, Map.of("centre-lon", -70.5, "centre-lat", -35.0,
                    "standard-line-offset", 2.5)),
            Map.entry(ProjectionFamily.CYLINDRICAL_OBLIQUE, Map.of("centre-lon", 20.0, "centre-lat", 30.0, "azimuth", 60.0,
                    "standard-line-offset", 20.0)),
            Map.entry(ProjectionFamily.EQUAL_EARTH, Map.of("centre-lon", 150.0)),
            Map.entry(ProjectionFamily.MOLLWEIDE, Map.of("centre-lon", -30.0)));

    @Test
    void projReproducesEveryFamilyWithinOneMillimetre() throws IOException, InterruptedException {
        Random random = new Random(19);
        for (Map.Entry<ProjectionFamily, Map<String, Double>> c : CASES) {
            EqualAreaProjection projection = Projections.create(c.getKey(), c.getValue());
            double[] lonLat = pointsWithinDomain(projection, random);
            double[] xy = new double[lonLat.length];
            projection.forward(lonLat, 0, xy, 0, lonLat.length / 2);
            double[] byProj = cct(projection.projString(), false, lonLat);
            double[] backByProj = cct(projection.projString(), true, xy);
            for (int i = 0; i < lonLat.length; i += 2) {
                String where = projection + " at " + lonLat[i] + ", " + lonLat[i + 1] + ": " + projection.projString();
                assertEquals(xy[i], byProj[i], 1e-3, where);
                assertEquals(xy[i + 1], byProj[i + 1], 1e-3, where);
                double dLon = Longitudes.normalize(backByProj[i] - lonLat[i]) * Math.cos(Math.toRadians(lonLat[i + 1]));
                double dLat = backByProj[i + 1] - lonLat[i + 1];
                assertTrue(Math.hypot(dLon, dLat) * METRES_PER_DEG < 2e-3, where + ": back by " + dLon + ", " + dLat + " deg");
            }
        }
    }

    /**
     * Random points whose frame position keeps away from the cut and the frame poles (2 deg) and, for the
     * azimuthal family, within its domain: where both programs are defined and continuous.
     */
    private static double[] pointsWithinDomain(EqualAreaProjection projection, Random random) {
        List<Double> out = new ArrayList<>();
        double[] frame = new double[2];
        while (out.size() < 2 * POINTS) {
            double lon = -180 + 360 * random.nextDouble();
            double lat = Math.toDegrees(Math.asin(2 * random.nextDouble() - 1));
            projection.frame().toFrame(lon, lat, frame);
            boolean nearCut = projection.frame().hasCut() && Math.abs(frame[0]) > 178;
            if (!nearCut && Math.abs(frame[1]) < 88 && frame[1] > projection.frame().minFrameLatDeg() + 2) {
                out.add(lon);
                out.add(lat);
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** PROJ's cct on the points (pairs); inverse with -I. Output read with the decimals asked for (-d 10). */
    private static double[] cct(String projString, boolean inverse, double[] points) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of("cct", "-d", "10"));
        if (inverse) {
            command.add("-I");
        }
        command.addAll(List.of(projString.split(" ")));
        Process process;
        try {
            process = new ProcessBuilder(command).redirectErrorStream(true).start();
        } catch (IOException e) {
            fail("PROJ's cct is needed for this test (Debian: apt-get install proj-bin; .ci/run installs it): " + e.getMessage());
            return null;
        }
        StringBuilder input = new StringBuilder();
        for (int i = 0; i < points.length; i += 2) {
            input.append(String.format(Locale.ROOT, "%.12f %.12f 0 0%n", points[i], points[i + 1]));
        }
        process.getOutputStream().write(input.toString().getBytes(StandardCharsets.US_ASCII));
        process.getOutputStream().close();
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(process.waitFor(60, TimeUnit.SECONDS), "cct did not finish");
        assertEquals(0, process.exitValue(), "cct failed: " + output + "\n" + projString);
        String[] lines = output.strip().split("\\R");
        assertEquals(points.length / 2, lines.length, output);
        double[] result = new double[points.length];
        for (int i = 0; i < lines.length; i++) {
            String[] fields = lines[i].trim().split("\\s+");
            result[2 * i] = Double.parseDouble(fields[0]);
            result[2 * i + 1] = Double.parseDouble(fields[1]);
        }
        return result;
    }
}
