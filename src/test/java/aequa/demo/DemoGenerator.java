package aequa.demo;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Point;

/**
 * Writes the geometry and figures of the demo project (data-demo/): an invented NGO's maps of invented
 * places placed at real coordinates, with invented figures. Deterministic: the same seed writes the same
 * bytes. Run with
 * {@code mvn -q test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=aequa.demo.DemoGenerator -Dexec.args=data-demo}.
 *
 * <p>Six extents, chosen so that the automatic projection choice differs: the whole world, a wide
 * east-west land at mid-latitudes, a circumpolar ring, an equatorial archipelago across the antimeridian,
 * a long north-south land, and a country with a detached island group and a remote territory (a composite
 * map with insets).
 */
public final class DemoGenerator {

    static final long SEED = 20261202L;

    private DemoGenerator() {
    }

    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "data-demo");
        write(dir);
    }

    static void write(Path projectDir) throws IOException {
        Files.createDirectories(projectDir.resolve("regions"));
        Files.createDirectories(projectDir.resolve("figures"));
        Random random = new Random(SEED);
        InventedNames names = new InventedNames(SEED);

        List<Geometry> world = InventedCells.tile(LocalPlane.lonLat(), new Envelope(-180, 180, -90, 90), 620,
                DemoGenerator::worldLand, 2.0, random);
        world.addAll(IceShelf.cells(random));
        List<Place> worldZones = places("WZ", world, names);
        DemoFiles.geojson(projectDir.resolve("regions/world-zones.geojson"), "Lantern network zones (invented)", worldZones);
        DemoFigures.worldZones(projectDir.resolve("figures/world-zones.csv"), worldZones, random);

        List<Geometry> calloway = InventedCells.tile(LocalPlane.sinusoidal(-96.0), new Envelope(-32, 32, 20, 56), 140,
                (lon, lat) -> blob(lon, lat, -96, 38, 27, 11, 0.25, 7), 0.5, random);
        List<Place> provinces = places("CL", calloway, names);
        DemoFiles.geojson(projectDir.resolve("regions/calloway-provinces.geojson"), "Calloway provinces (invented)", provinces);
        DemoFigures.callowayClinics(projectDir.resolve("figures/calloway-clinics.csv"), provinces, random);

        List<Geometry> boreal = InventedCells.tile(LocalPlane.northPolar(), new Envelope(-34, 34, -34, 34), 170,
                (lon, lat) -> lat > 61 && lat < 81 && ringLand(lon, lat), 0.5, random);
        List<Place> councils = places("BC", boreal, names);
        DemoFiles.geojson(projectDir.resolve("regions/boreal-councils.geojson"), "Boreal councils (invented)", councils);
        DemoFigures.borealBroadband(projectDir.resolve("figures/boreal-councils.csv"), councils, random);

        List<Geometry> isles = InventedCells.tile(LocalPlane.sinusoidal(180.0), new Envelope(-32, 32, -14, 14), 280,
                DemoGenerator::archipelago, 0.5, random);
        List<Place> islands = places("TI", isles, names);
        DemoFiles.geojson(projectDir.resolve("regions/tessaly-isles.geojson"), "Tessaly Isles (invented)", islands);
        DemoFigures.tessalyVaccination(projectDir.resolve("figures/tessaly-isles.csv"), islands, random);

        List<Geometry> serrano = InventedCells.tile(LocalPlane.sinusoidal(-70.0), new Envelope(-9, 9, -57, -14), 150,
                (lon, lat) -> Math.abs((lon + 70) * Math.cos(Math.toRadians(lat)) - 2.2 * Math.sin(lat / 6.0)) < 3.6
                        && lat > -53 && lat < -18, 0.5, random);
        List<Place> districts = places("SD", serrano, names);
        DemoFiles.geojson(projectDir.resolve("regions/serrano-districts.geojson"), "Serrano districts (invented)", districts);
        DemoFigures.serranoLiteracy(projectDir.resolve("figures/serrano-districts.csv"), districts, random);

        // a country with a detached island group 1,100 km off its coast and a remote territory in another ocean,
        // published with insets
        List<Geometry> marrow = InventedCells.tile(LocalPlane.sinusoidal(14.0), new Envelope(-10, 10, 40, 52), 90,
                (lon, lat) -> blob(lon, lat, 14, 46, 7, 4, 0.15, 5), 0.5, random);
        marrow.addAll(InventedCells.tile(LocalPlane.sinusoidal(1.0), new Envelope(-3, 3, 34, 39), 24,
                (lon, lat) -> greatCircleDeg(lon, lat, -0.8, 36) < 0.9 || greatCircleDeg(lon, lat, 1.6, 37.2) < 0.7
                        || greatCircleDeg(lon, lat, 2.2, 35.4) < 0.5, 0.25, random));
        marrow.addAll(InventedCells.tile(LocalPlane.sinusoidal(-31.0), new Envelope(-2, 2, -24, -20), 12,
                (lon, lat) -> blob(lon, lat, -31, -22, 1.2, 0.9, 0.2, 3), 0.25, random));
        List<Place> counties = places("MR", marrow, names);
        DemoFiles.geojson(projectDir.resolve("regions/marrow-counties.geojson"), "Marrow counties (invented)", counties);
        DemoFigures.marrowLibraries(projectDir.resolve("figures/marrow-counties.csv"), counties, random);
    }

    /** A region of the demo: its code, invented name, lon/lat geometry and a representative point. */
    record Place(String code, String name, Geometry lonLat, double lonDeg, double latDeg) {
    }

    private static List<Place> places(String prefix, List<Geometry> cells, InventedNames names) {
        List<Place> places = new ArrayList<>();
        for (int i = 0; i < cells.size(); i++) {
            Geometry cell = cells.get(i);
            Point inside = cell.getInteriorPoint();
            places.add(new Place(String.format(Locale.ROOT, "%s-%02d", prefix, i + 1), names.next(), cell,
                    inside.getX(), inside.getY()));
        }
        return places;
    }

    /** Invented continents: a few caps on the sphere with ragged coasts. */
    private static boolean worldLand(double lon, double lat) {
        double[][] caps = {{-100, 45, 24}, {-62, -14, 19}, {18, 8, 26}, {88, 44, 28}, {134, -24, 14}, {-40, 70, 9}};
        for (double[] cap : caps) {
            double wobble = 3.0 * Math.sin(Math.toRadians(lon * 5)) + 2.0 * Math.cos(Math.toRadians(lat * 7));
            if (greatCircleDeg(lon, lat, cap[0], cap[1]) < cap[2] + wobble) {
                return true;
            }
        }
        return false;
    }

    private static boolean ringLand(double lon, double lat) {
        double coast = 64 + 3.0 * Math.sin(Math.toRadians(lon * 3)) + 1.5 * Math.cos(Math.toRadians(lon * 7));
        return lat > coast && lat < 79;
    }

    private static boolean archipelago(double lon, double lat) {
        double[][] isles = {{155, 3, 3.5}, {163, -4, 4}, {171, 2, 3}, {178, -3, 4.5}, {-174, 4, 3.5}, {-166, -2, 4},
                {-158, 5, 2.5}};
        for (double[] isle : isles) {
            if (greatCircleDeg(lon, lat, isle[0], isle[1]) < isle[2] + 0.6 * Math.sin(lon * 2.3 + lat)) {
                return true;
            }
        }
        return false;
    }

    /** An elliptical blob with a wavy edge, in degrees, centred on (lon0, lat0). */
    static boolean blob(double lon, double lat, double lon0, double lat0, double halfWidthDeg, double halfHeightDeg,
                        double waviness, int waves) {
        double dx = (lon - lon0) * Math.cos(Math.toRadians(lat)) / halfWidthDeg;
        double dy = (lat - lat0) / halfHeightDeg;
        double angle = Math.atan2(dy, dx);
        return Math.hypot(dx, dy) < 1.0 + waviness * Math.sin(waves * angle);
    }

    static double greatCircleDeg(double lon1, double lat1, double lon2, double lat2) {
        double p1 = Math.toRadians(lat1);
        double p2 = Math.toRadians(lat2);
        double dl = Math.toRadians(lon2 - lon1);
        double c = Math.sin(p1) * Math.sin(p2) + Math.cos(p1) * Math.cos(p2) * Math.cos(dl);
        return Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, c))));
    }

    static Writer utf8(Path file) throws IOException {
        return Files.newBufferedWriter(file, StandardCharsets.UTF_8);
    }

    /** For the regions' figures: a smooth invented field over the globe, from 0 to 1. */
    static double field(double lon, double lat, double phase) {
        return 0.5 + 0.25 * Math.sin(Math.toRadians(lon * 2 + phase)) + 0.25 * Math.cos(Math.toRadians(lat * 3 - phase));
    }
}
