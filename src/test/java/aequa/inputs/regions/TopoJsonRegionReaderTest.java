package aequa.inputs.regions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.zip.GZIPInputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.ellipsoid.GeodesicArea;
import aequa.ellipsoid.RegionValidator;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.RegionSourceSpec;

/**
 * Reads the real US states topology of npm us-atlas 3.0.1 (src/test/resources/topojson/SOURCE.md) and checks
 * it against the same object decoded by the reference decoder, npm topojson-client 3.1.0, stored as GeoJSON:
 * same keys, names, positions bit for bit, and geodesic areas (GeographicLib) within 1e-9.
 */
class TopoJsonRegionReaderTest {

    private static final Path RESOURCES = Path.of("src/test/resources/topojson");

    @TempDir
    Path dir;

    private static RegionSourceSpec spec(String file, String key, String object) {
        return new RegionSourceSpec(file, key, "name", "", object);
    }

    private List<Region> reference() throws Exception {
        try (InputStream in = new GZIPInputStream(Files.newInputStream(RESOURCES.resolve("states-10m.topojson-client.geojson.gz")))) {
            Files.write(dir.resolve("reference.geojson"), in.readAllBytes());
        }
        return RegionReaders.read(dir, spec("reference.geojson", "@id", ""), new Findings());
    }

    @Test
    void statesMatchTheReferenceDecoder() throws Exception {
        Findings findings = new Findings();
        RegionReaders.RegionSource source = RegionReaders.readSource(RESOURCES, spec("states-10m.json", "@id", "states"),
                SourceCrsResolver.NONE, findings);
        assertEquals(List.of(), findings.list());
        assertTrue(source.bordersShared(), "us-atlas walks each shared arc once each way");
        List<Region> read = source.regions();
        List<Region> reference = reference();
        assertEquals(56, read.size());
        assertEquals(reference.stream().map(Region::key).toList(), read.stream().map(Region::key).toList());
        assertEquals(reference.stream().map(Region::name).toList(), read.stream().map(Region::name).toList());
        assertEquals("01", read.get(0).key(), "text ids keep their leading zero");
        // the reference keeps us-atlas's clockwise outer rings, which the validator reverses; aequa's reader
        // winds them as RFC 7946 wants already, so the validator has nothing to say about winding
        Findings referenceFindings = new Findings();
        Findings readFindings = new Findings();
        List<Region> a = RegionValidator.validate(reference, "reference", referenceFindings);
        List<Region> b = RegionValidator.validate(read, "topology", readFindings);
        assertTrue(referenceFindings.list().stream().anyMatch(f -> f.code().equals("winding-normalised")));
        assertTrue(readFindings.list().stream().noneMatch(f -> f.code().equals("winding-normalised")), readFindings.list().toString());
        for (int i = 0; i < a.size(); i++) {
            assertTrue(a.get(i).lonLat().equalsExact(b.get(i).lonLat()), a.get(i).key());
            double expected = GeodesicArea.areaKm2(a.get(i).lonLat());
            assertEquals(expected, GeodesicArea.areaKm2(b.get(i).lonLat()), 1e-9 * expected, a.get(i).key());
        }
    }

    @Test
    void objectIsRequiredWhenSeveralAndAnyPropertyCanBeTheKey() throws Exception {
        Findings findings = new Findings();
        assertEquals(List.of(), RegionReaders.read(RESOURCES, spec("states-10m.json", "@id", ""), findings));
        Finding missing = findings.list().get(0);
        assertEquals("topojson-object-missing", missing.code());
        assertTrue(missing.message().contains("[states, nation]"), missing.message());
        List<Region> byName = RegionReaders.read(RESOURCES, spec("states-10m.json", "name", "states"), new Findings());
        assertEquals("Alabama", byName.stream().map(Region::key).min(Comparator.naturalOrder()).orElseThrow());
    }

    @Test
    void malformedTopologiesGiveFindings() throws Exception {
        Files.writeString(dir.resolve("bad-arc.topojson"), "{\"type\":\"Topology\",\"transform\":{\"scale\":[1,1],\"translate\":[0,0]},"
                + "\"arcs\":[[[0,0],[1,0],[0,1],[-1,-1]]],"
                + "\"objects\":{\"r\":{\"type\":\"GeometryCollection\",\"geometries\":["
                + "{\"type\":\"Polygon\",\"id\":\"A\",\"arcs\":[[0]]},{\"type\":\"Polygon\",\"id\":\"B\",\"arcs\":[[7]]},"
                + "{\"type\":\"Polygon\",\"arcs\":[[0]]},{\"type\":\"Polygon\",\"id\":\"C\",\"arcs\":[[0]]},{\"type\":\"Point\",\"id\":\"P\",\"coordinates\":[0,0]}]}}}");
        Findings findings = new Findings();
        RegionReaders.RegionSource source = RegionReaders.readSource(dir, spec("bad-arc.topojson", "@id", ""), SourceCrsResolver.NONE, findings);
        assertEquals(List.of("A", "C"), source.regions().stream().map(Region::key).toList());
        assertEquals(List.of("topojson-malformed", "region-key-missing", "geometry-unsupported"),
                findings.list().stream().map(Finding::code).toList());
        assertFalse(source.bordersShared(), "arc 0 walked twice the same way is not a clean border");
        assertEquals("feature \"B\"", findings.list().get(0).place());

        Files.writeString(dir.resolve("cut.topojson"), "{\"type\":\"Topology\",\"arcs\":[[[0,0],[1,");
        Findings cut = new Findings();
        RegionReaders.read(dir, spec("cut.topojson", "@id", ""), cut);
        assertEquals("topojson-malformed", cut.list().get(0).code());
        assertTrue(cut.list().get(0).place().startsWith("line 1"), cut.list().get(0).place());
    }
}
