package aequa.inputs.regions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.ellipsoid.RegionValidator;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.RegionSourceSpec;

/**
 * Hostile GeoJSON ends in one clear finding per broken limit (file, feature, which limit, how to raise it)
 * and never in an exception; the limits are lowered here through their system properties so small files
 * can cross them. Coordinates that overflow a double, or are merely absurd, become findings too.
 */
class ReadLimitsTest {

    private static final RegionSourceSpec SPEC = new RegionSourceSpec("r.geojson", "code", "name", null);
    private static final String SQUARE = "[[[0,0],[1,0],[1,1],[0,1],[0,0]]]";

    @TempDir
    Path dir;

    @AfterEach
    void restoreLimits() {
        for (ReadLimit limit : ReadLimit.values()) {
            System.clearProperty(limit.property());
        }
    }

    private List<Region> read(String json, Findings findings) throws IOException {
        Files.writeString(dir.resolve(SPEC.file()), json, StandardCharsets.UTF_8);
        return RegionReaders.read(dir, SPEC, findings);
    }

    private static String feature(String code, String properties, String coordinates) {
        return "{\"type\":\"Feature\",\"properties\":{\"code\":\"" + code + "\"" + properties + "},"
                + "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":" + coordinates + "}}";
    }

    private static String collection(String... features) {
        return "{\"type\":\"FeatureCollection\",\"features\":[" + String.join(",", features) + "]}";
    }

    private static Finding onlyLimit(Findings findings, ReadLimit limit) {
        List<Finding> limits = findings.list().stream().filter(f -> f.code().equals("input-limit-exceeded")).toList();
        assertEquals(1, limits.size(), findings.list().toString());
        Finding finding = limits.get(0);
        assertEquals("r.geojson", finding.file());
        assertTrue(finding.hint().contains("-D" + limit.property() + "="), finding.hint());
        return finding;
    }

    @Test
    void theDefaultsLetARealFileThrough() throws IOException {
        Findings findings = new Findings();
        assertEquals(2, read(collection(feature("A", "", SQUARE), feature("B", "", SQUARE)), findings).size());
        assertEquals(List.of(), findings.list());
    }

    @Test
    void deepNestingStopsTheReadInsteadOfTheStack() throws IOException {
        String deep = "[".repeat(5000) + "]".repeat(5000);
        Findings findings = new Findings();
        List<Region> regions = read(collection(feature("A", "", SQUARE), feature("B", "", deep)), findings);
        Finding finding = onlyLimit(findings, ReadLimit.NESTING_DEPTH);
        assertTrue(finding.message().contains("64 levels of nested arrays and objects"), finding.message());
        assertEquals("feature 2", finding.place().split(",")[0]);
        assertEquals(1, regions.size(), "the features before it are kept");
    }

    @Test
    void aLongTextStopsTheRead() throws IOException {
        System.setProperty(ReadLimit.STRING_CHARS.property(), "100");
        Findings findings = new Findings();
        read(collection(feature("A", ",\"name\":\"" + "x".repeat(101) + "\"", SQUARE)), findings);
        assertTrue(onlyLimit(findings, ReadLimit.STRING_CHARS).message().contains("100 characters in one text value"));
    }

    @Test
    void aFeatureWithTooManyPropertiesIsSkipped() throws IOException {
        System.setProperty(ReadLimit.PROPERTIES.property(), "5");
        StringBuilder many = new StringBuilder();
        for (int i = 0; i < 5; i++) {
            many.append(",\"p").append(i).append("\":").append(i);
        }
        Findings findings = new Findings();
        List<Region> regions = read(collection(feature("A", many.toString(), SQUARE), feature("B", ",\"p\":1", SQUARE)), findings);
        Finding finding = onlyLimit(findings, ReadLimit.PROPERTIES);
        assertEquals("feature \"A\"", finding.place());
        assertTrue(finding.message().contains("the feature was skipped"), finding.message());
        assertEquals(List.of("B"), regions.stream().map(Region::key).toList());
    }

    @Test
    void aRingWithTooManyPositionsIsSkippedAndTheNextFeatureRead() throws IOException {
        System.setProperty(ReadLimit.RING_POSITIONS.property(), "10");
        StringBuilder ring = new StringBuilder("[[[0,0]");
        for (int i = 1; i <= 10; i++) {
            ring.append(",[").append(i * 0.1).append(",").append(i % 2).append("]");
        }
        ring.append("]]");
        Findings findings = new Findings();
        List<Region> regions = read(collection(feature("A", "", ring.toString()), feature("B", "", SQUARE)), findings);
        assertEquals("feature \"A\"", onlyLimit(findings, ReadLimit.RING_POSITIONS).place());
        assertEquals(List.of("B"), regions.stream().map(Region::key).toList());
    }

    @Test
    void tooManyVerticesInAllStopTheRead() throws IOException {
        System.setProperty(ReadLimit.FILE_VERTICES.property(), "12");
        Findings findings = new Findings();
        List<Region> regions = read(collection(feature("A", "", SQUARE), feature("B", "", SQUARE), feature("C", "", SQUARE),
                feature("D", "", SQUARE)), findings);
        Finding finding = onlyLimit(findings, ReadLimit.FILE_VERTICES);
        assertTrue(finding.message().contains("12 vertices in one file") && finding.message().contains("reading stopped"),
                finding.message());
        assertEquals("feature 3", finding.place());
        assertEquals(2, regions.size());
    }

    /**
     * 1e308 is a double but no longitude; 1e400 overflows to infinity when parsed (IEEE 754); JSON has no
     * NaN or Infinity literal (RFC 8259, section 6), so those are malformed JSON. None reaches a map.
     */
    @Test
    void hugeAndNonFiniteCoordinatesAreFindings() throws IOException {
        Map<String, String> codes = Map.of(
                "[[[0,0],[1e308,0],[1,1],[0,0]]]", "coordinates-out-of-range",
                "[[[0,0],[1e400,0],[1,1],[0,0]]]", "coordinates-out-of-range",
                "[[[0,0],[NaN,0],[1,1],[0,0]]]", "geojson-malformed",
                "[[[0,0],[Infinity,0],[1,1],[0,0]]]", "geojson-malformed");
        for (Map.Entry<String, String> ring : codes.entrySet()) {
            Findings findings = new Findings();
            List<Region> read = read(collection(feature("A", "", ring.getKey())), findings);
            List<Region> valid = RegionValidator.validate(read, SPEC.file(), findings);
            assertTrue(valid.isEmpty(), ring.getKey());
            assertTrue(findings.list().stream().anyMatch(f -> f.code().equals(ring.getValue()) && f.file().equals("r.geojson")),
                    ring.getKey() + ": " + findings.list());
        }
    }
}
