package aequa.inputs.regions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.WKTReader;

import aequa.ellipsoid.GeodesicArea;
import aequa.ellipsoid.RegionValidator;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.findings.Severity;
import aequa.project.RegionSourceSpec;
import aequa.projection.SourceCrs;

/**
 * Reads Shapefiles written from the real US state boundaries (src/test/resources/geometry/SOURCE.md: npm
 * us-atlas 3.0.1, US Census Bureau 2017, public domain) by {@link ShapefileFixture} (the .shp/.shx from the ESRI
 * Shapefile Technical Description, 1998; the .dbf by javadbf's DBFWriter) and checks them against the same data
 * read from GeoJSON: same keys, names, and geodesic areas (GeographicLib) within 1e-9.
 */
class ShapefileRegionReaderTest {

    @TempDir
    Path dir;

    static List<Region> states() {
        Findings findings = new Findings();
        List<Region> read = RegionReaders.read(Path.of("src/test/resources/geometry"),
                new RegionSourceSpec("us-states-2017.geojson", "id", "name", ""), findings);
        assertEquals(56, read.size());
        return read;
    }

    static List<ShapefileFixture.Feature> features(List<Region> regions) {
        List<ShapefileFixture.Feature> features = new ArrayList<>();
        for (Region region : regions) {
            features.add(new ShapefileFixture.Feature(List.of(region.key(), region.name()), region.lonLat()));
        }
        return features;
    }

    private List<Region> read(String file, String key, String name, String layer, Findings findings) {
        return RegionReaders.read(dir, new RegionSourceSpec(file, key, name, layer), SourceCrs::toLonLat, findings);
    }

    private static List<Finding> worseThanNotes(Findings findings) {
        return findings.list().stream().filter(f -> f.severity() != Severity.NOTE).toList();
    }

    private static void assertSameRegions(List<Region> expected, List<Region> actual, double relativeArea) {
        Findings ignored = new Findings();
        List<Region> a = RegionValidator.validate(expected, "a", ignored);
        List<Region> b = RegionValidator.validate(actual, "b", ignored);
        assertEquals(a.stream().map(Region::key).toList(), b.stream().map(Region::key).toList());
        assertEquals(a.stream().map(Region::name).toList(), b.stream().map(Region::name).toList());
        for (int i = 0; i < a.size(); i++) {
            double areaA = GeodesicArea.areaKm2(a.get(i).lonLat());
            double areaB = GeodesicArea.areaKm2(b.get(i).lonLat());
            assertEquals(areaA, areaB, relativeArea * areaA, a.get(i).key());
        }
    }

    @Test
    void censusStyleZipGivesTheSameRegionsAsTheGeoJson() throws Exception {
        List<Region> states = states();
        ShapefileFixture.write(dir, "cb_2017_us_state", List.of("GEOID", "NAME"), features(states),
                ShapefileFixture.WGS84_PRJ, "UTF-8", StandardCharsets.UTF_8);
        ShapefileFixture.zip(dir, "cb_2017_us_state", dir.resolve("states.zip"));
        Findings findings = new Findings();
        List<Region> read = read("states.zip", "GEOID", "NAME", "", findings);
        assertEquals(List.of(), findings.list());
        assertEquals("01", read.stream().map(Region::key).sorted().findFirst().orElseThrow(), "leading zero kept");
        assertSameRegions(states, read, 1e-9);
        // the rings come back exactly as GeoJSON had them: reversed to clockwise on writing, back on reading
        for (int i = 0; i < states.size(); i++) {
            assertTrue(states.get(i).lonLat().equalsExact(read.get(i).lonLat()), states.get(i).key());
        }
    }

    @Test
    void looseFilesReadAsTheZipDoes() throws Exception {
        List<Region> states = states().subList(0, 5);
        ShapefileFixture.write(dir, "states", List.of("GEOID", "NAME"), features(states), ShapefileFixture.WGS84_PRJ,
                null, StandardCharsets.UTF_8);
        Findings findings = new Findings();
        List<Region> read = read("states.shp", "GEOID", "NAME", "", findings);
        assertEquals(5, read.size());
        assertSameRegions(states, read, 1e-9);
    }

    @Test
    void projectedPrjIsTransformedWithTheGeoPackagePath() throws Exception {
        // NAD 1983 Contiguous USA Albers in ESRI's WKT 1 (ESRI's .prj for EPSG:5070's parameters, from memory:
        // standard parallels 29.5 and 45.5, origin 23 N 96 W); the fixture is projected with Apache SIS, a
        // general-purpose reference library, and must come back to the same areas
        String albers = "PROJCS[\"NAD_1983_Contiguous_USA_Albers\",GEOGCS[\"GCS_North_American_1983\",DATUM[\"D_North_American_1983\","
                + "SPHEROID[\"GRS_1980\",6378137.0,298.257222101]],PRIMEM[\"Greenwich\",0.0],UNIT[\"Degree\",0.0174532925199433]],"
                + "PROJECTION[\"Albers\"],PARAMETER[\"False_Easting\",0.0],PARAMETER[\"False_Northing\",0.0],"
                + "PARAMETER[\"Central_Meridian\",-96.0],PARAMETER[\"Standard_Parallel_1\",29.5],"
                + "PARAMETER[\"Standard_Parallel_2\",45.5],PARAMETER[\"Latitude_Of_Origin\",23.0],UNIT[\"Meter\",1.0]]";
        List<Region> states = states().stream().filter(r -> r.key().equals("08") || r.key().equals("49")).toList();
        List<ShapefileFixture.Feature> projected = new ArrayList<>();
        for (Region state : states) {
            projected.add(new ShapefileFixture.Feature(List.of(state.key(), state.name()), SisFixture.project(state.lonLat(), albers)));
        }
        ShapefileFixture.write(dir, "albers", List.of("GEOID", "NAME"), projected, albers, "UTF-8", StandardCharsets.UTF_8);
        Findings findings = new Findings();
        List<Region> read = read("albers.shp", "GEOID", "NAME", "", findings);
        assertEquals(List.of(), worseThanNotes(findings));
        // NAD 83 to WGS 84 without a datum-shift grid: SIS shifts by the ellipsoids' difference only (sub-metre)
        assertSameRegions(states, read, 1e-6);
    }

    @Test
    void accentedNamesSurviveThroughTheCodePage() throws Exception {
        WKTReader wkt = new WKTReader(RegionGeometries.FACTORY);
        Geometry square = wkt.read("POLYGON((0 0, 1 0, 1 1, 0 1, 0 0))");
        List<ShapefileFixture.Feature> features = List.of(
                new ShapefileFixture.Feature(List.of("001", "Bogotá, D.C."), square),
                new ShapefileFixture.Feature(List.of("002", "Île-de-France"), square));
        Charset windows1252 = Charset.forName("windows-1252");
        // .cpg naming a Windows code page as "ANSI 1252" (a common spelling of Shapefile writers)
        ShapefileFixture.write(dir, "cpg", List.of("CODE", "NAME"), features, ShapefileFixture.WGS84_PRJ, "ANSI 1252", windows1252);
        Findings findings = new Findings();
        assertEquals(List.of("Bogotá, D.C.", "Île-de-France"),
                read("cpg.shp", "CODE", "NAME", "", findings).stream().map(Region::name).toList());
        assertEquals(List.of("001", "002"), read("cpg.shp", "CODE", "NAME", "", findings).stream().map(Region::key).toList());
        // no .cpg: the language driver byte javadbf wrote (dBASE header offset 29) names the code page
        ShapefileFixture.write(dir, "ldid", List.of("CODE", "NAME"), features, ShapefileFixture.WGS84_PRJ, null, windows1252);
        assertTrue(Files.readAllBytes(dir.resolve("ldid.dbf"))[29] != 0, "the writer records the code page");
        assertEquals(List.of("Bogotá, D.C.", "Île-de-France"),
                read("ldid.shp", "CODE", "NAME", "", findings).stream().map(Region::name).toList());
        assertEquals(List.of(), findings.list());
        // neither: UTF-8 text is recognised, and the guess is reported
        ShapefileFixture.write(dir, "none", List.of("CODE", "NAME"), List.of(
                new ShapefileFixture.Feature(List.of("003", "Κρήτη"), square)), ShapefileFixture.WGS84_PRJ, null, StandardCharsets.UTF_8);
        byte[] dbf = Files.readAllBytes(dir.resolve("none.dbf"));
        dbf[29] = 0;
        Files.write(dir.resolve("none.dbf"), dbf);
        Findings guessed = new Findings();
        assertEquals("Κρήτη", read("none.shp", "CODE", "NAME", "", guessed).get(0).name());
        assertEquals(List.of("shapefile-code-page-assumed"), guessed.list().stream().map(Finding::code).toList());
    }

    @Test
    void holesGoToTheOuterRingThatHoldsThemWhateverThePartOrder() throws Exception {
        WKTReader wkt = new WKTReader(RegionGeometries.FACTORY);
        // two squares, the second with a hole; the fixture writes parts shell, shell, hole
        Geometry expected = wkt.read("MULTIPOLYGON(((0 0, 1 0, 1 1, 0 1, 0 0)), ((2 0, 5 0, 5 3, 2 3, 2 0), (3 1, 3 2, 4 2, 4 1, 3 1)))");
        Geometry shuffled = wkt.read("MULTIPOLYGON(((2 0, 5 0, 5 3, 2 3, 2 0), (3 1, 3 2, 4 2, 4 1, 3 1)), ((0 0, 1 0, 1 1, 0 1, 0 0)))");
        ShapefileFixture.write(dir, "holes", List.of("CODE"), List.of(new ShapefileFixture.Feature(List.of("H"), shuffled)),
                ShapefileFixture.WGS84_PRJ, "UTF-8", StandardCharsets.UTF_8);
        Findings findings = new Findings();
        Geometry read = read("holes.shp", "CODE", "", "", findings).get(0).lonLat();
        assertTrue(read.norm().equalsExact(expected.norm()), read.toText());
        assertEquals(expected.getArea(), read.getArea(), 0.0);
        assertEquals(List.of(), findings.list());
    }

    @Test
    void malformedFilesGiveFindingsWithFileRecordAndHint() throws Exception {
        List<Region> states = states().subList(0, 4);
        ShapefileFixture.write(dir, "s", List.of("GEOID", "NAME"), features(states), ShapefileFixture.WGS84_PRJ, "UTF-8", StandardCharsets.UTF_8);
        byte[] shp = Files.readAllBytes(dir.resolve("s.shp"));
        byte[] dbf = Files.readAllBytes(dir.resolve("s.dbf"));

        // truncated .shp: cut inside the third record
        int third = 100 + 8 + shp.length / 2;
        Files.write(dir.resolve("s.shp"), java.util.Arrays.copyOf(shp, Math.min(third, shp.length - 10)));
        Findings cut = new Findings();
        read("s.shp", "GEOID", "NAME", "", cut);
        Finding truncated = only(cut, "shapefile-shp-malformed");
        assertTrue(truncated.place().startsWith("s.shp, record "), truncated.place());
        assertTrue(!truncated.hint().isEmpty());
        Files.write(dir.resolve("s.shp"), shp);

        // .dbf whose header declares fewer records (bytes 4-7, little-endian) than there are shapes
        byte[] shortDbf = dbf.clone();
        shortDbf[4] = 3;
        Files.write(dir.resolve("s.dbf"), shortDbf);
        Findings wrongCount = new Findings();
        assertEquals(3, read("s.shp", "GEOID", "NAME", "", wrongCount).size());
        Finding dbfShort = only(wrongCount, "shapefile-dbf-short");
        assertEquals("s.dbf, record 4", dbfShort.place());
        assertTrue(dbfShort.message().contains("declares 3 records"), dbfShort.message());
        Files.write(dir.resolve("s.dbf"), dbf);

        // a .prj of a coordinate system nobody can place
        Files.writeString(dir.resolve("s.prj"), "LOCAL_CS[\"site grid\",LOCAL_DATUM[\"site\",0],UNIT[\"Meter\",1.0]]");
        Findings unknownCrs = new Findings();
        assertEquals(List.of(), read("s.shp", "GEOID", "NAME", "", unknownCrs));
        assertEquals("s.prj", only(unknownCrs, "crs-unsupported").place());

        // no .prj: lon/lat range, so WGS 84 is assumed, and said
        Files.delete(dir.resolve("s.prj"));
        Findings assumed = new Findings();
        assertEquals(4, read("s.shp", "GEOID", "NAME", "", assumed).size());
        assertEquals(Severity.WARNING, only(assumed, "crs-assumed").severity());

        // a key field that is not there
        Findings noField = new Findings();
        read("s.shp", "GEOIDFP", "NAME", "", noField);
        assertTrue(only(noField, "shapefile-field-missing").hint().contains("GEOID"));
    }

    @Test
    void nullShapesAreReportedAndReachTheValidatorAsMissingGeometry() throws Exception {
        List<Region> states = states().subList(0, 2);
        List<ShapefileFixture.Feature> features = new ArrayList<>(features(states));
        features.add(new ShapefileFixture.Feature(List.of("99", "Nowhere"), null));
        ShapefileFixture.write(dir, "n", List.of("GEOID", "NAME"), features, ShapefileFixture.WGS84_PRJ, "UTF-8", StandardCharsets.UTF_8);
        Findings findings = new Findings();
        List<Region> read = read("n.shp", "GEOID", "NAME", "", findings);
        assertEquals("n.shp, record 3", only(findings, "shapefile-null-shape").place());
        RegionValidator.validate(read, "n.shp", findings);
        assertTrue(findings.list().stream().anyMatch(f -> f.code().equals("geometry-missing") && f.place().contains("99")),
                findings.list().stream().map(Finding::toString).collect(Collectors.joining("\n")));
    }

    @Test
    void zipWithSeveralShapefilesNeedsALayer() throws Exception {
        List<Region> states = states().subList(0, 2);
        ShapefileFixture.write(dir, "a", List.of("GEOID", "NAME"), features(states), ShapefileFixture.WGS84_PRJ, "UTF-8", StandardCharsets.UTF_8);
        ShapefileFixture.write(dir, "b", List.of("GEOID", "NAME"), features(states.subList(0, 1)), ShapefileFixture.WGS84_PRJ, "UTF-8", StandardCharsets.UTF_8);
        Path zip = dir.resolve("two.zip");
        try (var out = new java.util.zip.ZipOutputStream(Files.newOutputStream(zip))) {
            for (String name : List.of("a.shp", "a.dbf", "a.prj", "b.shp", "b.dbf", "b.prj")) {
                out.putNextEntry(new java.util.zip.ZipEntry("data/" + name));
                out.write(Files.readAllBytes(dir.resolve(name)));
                out.closeEntry();
            }
        }
        Findings findings = new Findings();
        assertEquals(List.of(), read("two.zip", "GEOID", "NAME", "", findings));
        assertTrue(only(findings, "shapefile-layer-missing").message().contains("data/b"));
        assertEquals(1, read("two.zip", "GEOID", "NAME", "b", new Findings()).size());
    }

    private static Finding only(Findings findings, String code) {
        List<Finding> matching = findings.list().stream().filter(f -> f.code().equals(code)).toList();
        assertEquals(1, matching.size(), findings.list().toString());
        return matching.get(0);
    }
}
