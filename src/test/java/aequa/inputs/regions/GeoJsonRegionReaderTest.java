package aequa.inputs.regions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.findings.Severity;
import aequa.project.RegionSourceSpec;

class GeoJsonRegionReaderTest {

    @TempDir
    Path dir;

    private List<Region> read(String json, RegionSourceSpec spec, Findings findings) throws IOException {
        Files.writeString(dir.resolve(spec.file()), json, StandardCharsets.UTF_8);
        return RegionReaders.read(dir, spec, findings);
    }

    private static RegionSourceSpec byProperty(String key) {
        return new RegionSourceSpec("regions.geojson", key, "name", "");
    }

    static Path resource(String name) {
        return Path.of("src/test/resources/geometry", name);
    }

    @Test
    void readsTheUsStatesFileCompletely() {
        // Outside reference: src/test/resources/geometry/SOURCE.md (from the shared data README): 56 features,
        // 15,285 vertices not counting each ring's closing vertex.
        Findings findings = new Findings();
        List<Region> states = RegionReaders.read(resource(""), new RegionSourceSpec("us-states-2017.geojson", "@id", "name", ""), findings);
        assertEquals(List.of(), findings.list());
        assertEquals(56, states.size());
        int vertices = 0;
        for (Region r : states) {
            for (int i = 0; i < r.lonLat().getNumGeometries(); i++) {
                var polygon = (org.locationtech.jts.geom.Polygon) r.lonLat().getGeometryN(i);
                vertices += polygon.getExteriorRing().getNumPoints() - 1;
                for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                    vertices += polygon.getInteriorRingN(h).getNumPoints() - 1;
                }
            }
        }
        assertEquals(15_285, vertices);
        Region arizona = states.stream().filter(r -> r.key().equals("04")).findFirst().orElseThrow();
        assertEquals("Arizona", arizona.name());
    }

    @Test
    void membersMayComeInAnyOrderAndKeysMayBeNumbers() throws IOException {
        // RFC 8259 section 4: object members are unordered; RFC 7946 section 3.2: id is a string or number.
        String json = """
                {"features": [
                  {"geometry": {"coordinates": [[[0,0],[1,0],[1,1],[0,0]]], "type": "Polygon"},
                   "properties": {"code": 7, "name": "Seven", "extra": {"nested": [1, 2]}}, "type": "Feature"},
                  {"type": "Feature", "properties": {"name": "Eight", "code": "08"},
                   "geometry": {"type": "MultiPolygon", "coordinates": [[[[0,0,12],[1,0,12],[1,1,12],[0,0,12]]],
                                                                          [[[5,5],[6,5],[6,6],[5,5]]]]}}
                ], "type": "FeatureCollection"}
                """;
        Findings findings = new Findings();
        List<Region> regions = read(json, byProperty("code"), findings);
        assertEquals(List.of(), findings.list());
        assertEquals(List.of("7", "08"), regions.stream().map(Region::key).collect(Collectors.toList()));
        assertEquals("Seven", regions.get(0).name());
        assertEquals("MultiPolygon", regions.get(1).lonLat().getGeometryType());
        assertEquals(2, regions.get(1).lonLat().getNumGeometries());
    }

    @Test
    void aSingleFeatureIsAccepted() throws IOException {
        String json = """
                {"type": "Feature", "id": "solo", "properties": null,
                 "geometry": {"type": "Polygon", "coordinates": [[[0,0],[1,0],[1,1],[0,0]]]}}
                """;
        Findings findings = new Findings();
        List<Region> regions = read(json, byProperty("@id"), findings);
        assertEquals(List.of(), findings.list());
        assertEquals("solo", regions.get(0).key());
    }

    @Test
    void malformedJsonGivesLineAndColumn() throws IOException {
        // the second feature lacks a comma between members (line 3)
        String json = "{\"type\": \"FeatureCollection\", \"features\": [\n"
                + "{\"type\": \"Feature\", \"id\": \"a\", \"geometry\": null},\n"
                + "{\"type\": \"Feature\" \"id\": \"b\"}]}\n";
        Findings findings = new Findings();
        List<Region> regions = read(json, byProperty("@id"), findings);
        Finding finding = only(findings);
        assertEquals("geojson-malformed", finding.code());
        assertEquals(Severity.ERROR, finding.severity());
        assertTrue(finding.place().startsWith("line 3, column "), finding.place());
        assertEquals(1, regions.size(), "features before the error are kept");
    }

    @Test
    void aMissingKeySkipsTheFeatureAndNamesItsPosition() throws IOException {
        String json = """
                {"type": "FeatureCollection", "features": [
                  {"type": "Feature", "properties": {"code": "A"}, "geometry": null},
                  {"type": "Feature", "properties": {"name": "no code"},
                   "geometry": {"type": "Polygon", "coordinates": [[[0,0],[1,0],[1,1],[0,0]]]}}
                ]}
                """;
        Findings findings = new Findings();
        List<Region> regions = read(json, byProperty("code"), findings);
        Finding finding = only(findings);
        assertEquals("region-key-missing", finding.code());
        assertEquals("feature 2 (line 3)", finding.place());
        assertEquals(List.of("A"), regions.stream().map(Region::key).collect(Collectors.toList()));
        assertTrue(regions.get(0).lonLat().isEmpty(), "a null geometry is read as empty and left to validation");
    }

    @Test
    void wrongTypesAreReportedWithTheFeatureKey() throws IOException {
        String json = """
                {"type": "FeatureCollection", "features": [
                  {"type": "Feature", "id": "strings", "geometry": {"type": "Polygon", "coordinates": [[["0","0"],[1,0],[1,1],[0,0]]]}},
                  {"type": "Feature", "id": "flat", "geometry": {"type": "Polygon", "coordinates": [[0,0],[1,0],[1,1],[0,0]]}},
                  {"type": "Feature", "id": "ok", "geometry": {"type": "Polygon", "coordinates": [[[0,0],[1,0],[1,1],[0,0]]]}},
                  {"type": "Feature", "properties": {"code": {"x": 1}}, "id": "objkey", "geometry": null}
                ]}
                """;
        Findings findings = new Findings();
        List<Region> regions = read(json, byProperty("@id"), findings);
        assertEquals(List.of("ok", "objkey"), regions.stream().map(Region::key).collect(Collectors.toList()));
        assertEquals(List.of("geojson-wrong-type feature \"strings\"", "geojson-wrong-type feature \"flat\""),
                findings.list().stream().map(f -> f.code() + " " + f.place()).collect(Collectors.toList()));
        assertTrue(findings.list().get(0).message().contains("line 2"), findings.list().get(0).message());

        Findings byCode = new Findings();
        read(json.replace("\"objkey\"", "\"k\""), byProperty("code"), byCode);
        assertTrue(byCode.list().stream().anyMatch(f -> f.code().equals("region-key-wrong-type")));
    }

    @Test
    void unsupportedGeometryTypesAreSkippedWithAWarning() throws IOException {
        String json = """
                {"type": "FeatureCollection", "features": [
                  {"type": "Feature", "id": "pt", "geometry": {"type": "Point", "coordinates": [1, 2]}},
                  {"type": "Feature", "id": "gc", "geometry": {"type": "GeometryCollection", "geometries": []}}
                ]}
                """;
        Findings findings = new Findings();
        List<Region> regions = read(json, byProperty("@id"), findings);
        assertEquals(List.of(), regions);
        assertEquals(List.of("geometry-unsupported", "geometry-unsupported"),
                findings.list().stream().map(Finding::code).collect(Collectors.toList()));
        assertEquals(Severity.WARNING, findings.list().get(0).severity());
    }

    @Test
    void unclosedRingsAreClosedAndDegenerateRingsDropped() throws IOException {
        // RFC 7946 section 3.1.6: rings are closed, with four or more positions.
        String json = """
                {"type": "FeatureCollection", "features": [
                  {"type": "Feature", "id": "open", "geometry": {"type": "Polygon", "coordinates": [[[0,0],[1,0],[1,1]]]}},
                  {"type": "Feature", "id": "tiny", "geometry": {"type": "Polygon", "coordinates": [[[0,0],[1,0],[0,0]]]}}
                ]}
                """;
        Findings findings = new Findings();
        List<Region> regions = read(json, byProperty("@id"), findings);
        assertEquals(List.of("ring-unclosed feature \"open\"", "ring-degenerate feature \"tiny\""),
                findings.list().stream().map(f -> f.code() + " " + f.place()).collect(Collectors.toList()));
        assertEquals(4, regions.get(0).lonLat().getNumPoints());
        assertTrue(regions.get(1).lonLat().isEmpty());
    }

    @Test
    void aLegacyCrsOtherThanWgs84IsAnError() throws IOException {
        // RFC 7946 section 4: GeoJSON is WGS 84 lon/lat; the 2008 format's crs member named others.
        String json = """
                {"type": "FeatureCollection",
                 "crs": {"type": "name", "properties": {"name": "urn:ogc:def:crs:EPSG::3857"}},
                 "features": []}
                """;
        Findings findings = new Findings();
        read(json, byProperty("@id"), findings);
        assertEquals("crs-unsupported", only(findings).code());
        Findings ok = new Findings();
        read(json.replace("EPSG::3857", "OGC:1.3:CRS84"), byProperty("@id"), ok);
        assertEquals(List.of(), ok.list());
    }

    @Test
    void aBareGeometryAFileThatCannotBeReadOrOfAnotherTypeIsReported() throws IOException {
        Findings findings = new Findings();
        read("{\"type\": \"Polygon\", \"coordinates\": []}", byProperty("@id"), findings);
        assertEquals("geojson-not-features", only(findings).code());
        // a project's missing file is reported by its checks first (project-file-not-found); one that goes
        // between the checks and the read cannot be read
        Findings gone = new Findings();
        RegionReaders.read(dir, new RegionSourceSpec("nowhere.geojson", null, null, null), gone);
        assertEquals("file-unreadable", only(gone).code());
        // a project's checks and `aequa explain` refuse another type before any reader sees it
        Files.writeString(dir.resolve("regions.csv"), "code,name\n");
        assertThrows(IllegalArgumentException.class,
                () -> RegionReaders.read(dir, new RegionSourceSpec("regions.csv", null, null, null), new Findings()));
    }

    private static Finding only(Findings findings) {
        assertEquals(1, findings.list().size(), findings.list().toString());
        return findings.list().get(0);
    }
}
