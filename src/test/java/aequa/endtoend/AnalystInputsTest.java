package aequa.endtoend;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.cli.Main;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.inputs.regions.ShapefileFixture;
import aequa.project.RegionSourceSpec;

/**
 * The "done when": a project made from a census-style Shapefile zip (cb_2017_us_state: .shp, .shx, .dbf
 * with GEOID and NAME, .prj, .cpg) and a figures workbook with a title row publishes with no conversion step, and
 * its maps are byte-identical to those of the same project made from the GeoJSON and CSV of the same data. The
 * boundaries are the real US states (src/test/resources/geometry/SOURCE.md, US Census Bureau 2017, public
 * domain); the figure is real too: each state's count of counties and equivalents in the county file of the
 * same source.
 */
public class AnalystInputsTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path GEOMETRY = Path.of("src/test/resources/geometry");

    @Test
    void shapefileAndWorkbookPublishTheSameMapsAsGeoJsonAndCsv(@TempDir Path work) throws IOException {
        Map<String, Integer> counties = countiesPerState();

        Path plain = Files.createDirectories(work.resolve("plain"));
        Files.copy(GEOMETRY.resolve("us-states-2017.geojson"), plain.resolve("states.geojson"));
        StringBuilder csv = new StringBuilder("GEOID,counties\n");
        counties.forEach((fips, n) -> csv.append(fips).append(',').append(n).append('\n'));
        Files.writeString(plain.resolve("counties.csv"), csv);
        Files.writeString(plain.resolve("aequa.yaml"), project(
                "{ file: states.geojson, key: id, name: name }", "{ file: counties.csv, key: GEOID }"));

        Path analyst = Files.createDirectories(work.resolve("analyst"));
        writeShapefileZip(work.resolve("shp"), analyst.resolve("cb_2017_us_state_20m.zip"));
        writeWorkbook(counties, analyst.resolve("counties.xlsx"));
        Files.writeString(analyst.resolve("aequa.yaml"), project(
                "{ file: cb_2017_us_state_20m.zip, key: GEOID, name: NAME }", "{ file: counties.xlsx, key: GEOID, sheet: Counties }"));

        Map<String, byte[]> plainMaps = publishedMaps(plain, work.resolve("plain-out"));
        Map<String, byte[]> analystMaps = publishedMaps(analyst, work.resolve("analyst-out"));
        assertFalse(plainMaps.isEmpty());
        assertEquals(plainMaps.keySet(), analystMaps.keySet());
        plainMaps.forEach((name, bytes) -> assertArrayEquals(bytes, analystMaps.get(name), name));
    }

    private static String project(String regions, String figures) {
        return String.join("\n",
                "site: { title: \"Counties per state\" }",
                "regions:",
                "  states: " + regions,
                "figures:",
                "  counties: " + figures,
                "maps:",
                "  - { id: county-density, regions: states, figures: counties, indicator: counties, measure: count,",
                "      normalise: area, multiplier: 10000, unit: \"counties per 10,000 km²\" }",
                "");
    }

    /** Publishes and returns the map artwork (SVG, PNG, PDF) by path within the site. */
    private static Map<String, byte[]> publishedMaps(Path project, Path out) throws IOException {
        StringWriter terminal = new StringWriter();
        int code = Main.run(new String[] {"publish", project.toString(), "--out", out.toString()},
                new PrintWriter(terminal, true), new PrintWriter(terminal, true));
        assertEquals(0, code, terminal.toString());
        Map<String, byte[]> maps = new TreeMap<>();
        try (Stream<Path> files = Files.walk(out)) {
            for (Path file : files.filter(f -> f.toString().matches(".*\\.(svg|png|pdf)$")).toList()) {
                maps.put(out.relativize(file).toString(), Files.readAllBytes(file));
            }
        }
        return maps;
    }

    /** The number of counties and equivalents per state FIPS code in the county file of the same source. */
    public static Map<String, Integer> countiesPerState() throws IOException {
        Map<String, Integer> counts = new TreeMap<>();
        for (JsonNode county : JSON.readTree(GEOMETRY.resolve("us-counties-2017.geojson").toFile()).path("features")) {
            counts.merge(county.path("properties").path("state_fips").asText(), 1, Integer::sum);
        }
        return counts;
    }

    /** The states as read from the GeoJSON, written as a Shapefile (ShapefileFixture: from the 1998 description). */
    private static void writeShapefileZip(Path dir, Path zip) throws IOException {
        Files.createDirectories(dir);
        List<ShapefileFixture.Feature> features = new ArrayList<>();
        for (Region state : RegionReaders.read(GEOMETRY, new RegionSourceSpec("us-states-2017.geojson", "id", "name", ""), new Findings())) {
            features.add(new ShapefileFixture.Feature(List.of(state.key(), state.name()), state.lonLat()));
        }
        ShapefileFixture.write(dir, "cb_2017_us_state_20m", List.of("GEOID", "NAME"), features, ShapefileFixture.WGS84_PRJ,
                "UTF-8", StandardCharsets.UTF_8);
        ShapefileFixture.zip(dir, "cb_2017_us_state_20m", zip);
    }

    /** The figures as an analyst keeps them: a title row over the table, the table, a source note below. */
    public static void writeWorkbook(Map<String, Integer> counties, Path file) throws IOException {
        try (OutputStream out = Files.newOutputStream(file)) {
            Workbook workbook = new Workbook(out, "aequa-test", "1.0");
            Worksheet ws = workbook.newWorksheet("Counties");
            ws.value(0, 0, "Counties and equivalents per state, 2017");
            ws.range(0, 0, 0, 1).merge();
            ws.value(2, 0, "GEOID");
            ws.value(2, 1, "counties");
            int row = 3;
            for (Map.Entry<String, Integer> entry : counties.entrySet()) {
                ws.value(row, 0, entry.getKey());
                ws.value(row, 1, entry.getValue());
                row++;
            }
            ws.value(row + 1, 0, "Source: US Census Bureau cartographic boundary files, 2017.");
            workbook.finish();
        }
    }
}
