package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.endtoend.AnalystInputsTest;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.inputs.regions.ShapefileFixture;
import aequa.project.RegionSourceSpec;

/**
 * {@code scaffold DIR --regions FILE --figures FILE} on real data: the US states of the Census Bureau's 2017
 * cartographic boundary file (src/test/resources/geometry, SOURCE.md there), whose features carry the 2-digit
 * state FIPS code (FIPS PUB 5-2: "01" Alabama ... "56" Wyoming) as property {@code id}, and figures counted from the
 * county file of the same source (counties and equivalents per state, property {@code state_fips}).
 */
class ScaffoldFromFilesTest {

    private static final Path GEOMETRY = Path.of("src/test/resources/geometry");
    private static final ObjectMapper JSON = new ObjectMapper();

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    void fipsKeyedFiguresJoinOnTheFipsPropertyAndTheProjectPublishes(@TempDir Path tmp) throws IOException {
        // a name column as well: names match as fully as codes, and the code must win
        Map<String, String> names = new TreeMap<>();
        for (JsonNode state : JSON.readTree(GEOMETRY.resolve("us-states-2017.geojson").toFile()).path("features")) {
            names.put(state.path("properties").path("id").asText(), state.path("properties").path("name").asText());
        }
        StringBuilder withNames = new StringBuilder("state,GEOID,counties\n");
        AnalystInputsTest.countiesPerState().forEach((fips, n) -> withNames.append(names.get(fips)).append(',').append(fips).append(',')
                .append(n).append('\n'));
        Path csv = tmp.resolve("counties.csv");
        Files.writeString(csv, withNames);
        Path project = tmp.resolve("project");

        assertEquals(0, run("scaffold", project.toString(), "--regions", GEOMETRY.resolve("us-states-2017.geojson").toString(),
                "--figures", csv.toString()), err.toString());

        String yaml = Files.readString(project.resolve("aequa.yaml"));
        assertTrue(yaml.contains("key: \"id\""), yaml); // the FIPS property, not the name
        assertTrue(yaml.contains("name: \"name\""), yaml);
        assertTrue(yaml.contains("key: \"GEOID\""), yaml);
        assertTrue(yaml.contains("indicator: \"counties\""), yaml);
        assertFalse(yaml.contains("key-matching"), yaml);
        assertTrue(Files.isRegularFile(project.resolve("regions/us-states-2017.geojson")));
        assertTrue(Files.isRegularFile(project.resolve("figures/counties.csv")));
        // 56 features: 50 states, DC and the territories; every one has a county count in the county file
        assertTrue(out.toString().contains("56 of 56 regions matched on key = id (regions) and GEOID (figures)"), out.toString());

        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("site").toString()), err.toString());
        assertTrue(Files.isRegularFile(tmp.resolve("site/index.html")));
    }

    @Test
    void keysThatLostTheirLeadingZerosAreMatchedRelaxedAndSaidSo(@TempDir Path tmp) throws IOException {
        Path csv = tmp.resolve("counties.csv");
        Files.writeString(csv, figuresCsv(true)); // "1" for Alabama, as a spreadsheet round trip leaves it
        Path project = tmp.resolve("project");

        assertEquals(0, run("scaffold", project.toString(), "--regions", GEOMETRY.resolve("us-states-2017.geojson").toString(),
                "--figures", csv.toString()), err.toString());

        String yaml = Files.readString(project.resolve("aequa.yaml"));
        assertTrue(yaml.contains("key: \"id\"") && yaml.contains("key-matching: relaxed"), yaml);
        assertTrue(out.toString().contains("Only relaxed matching"), out.toString());
        assertTrue(out.toString().contains("56 of 56 regions matched"), out.toString());
        assertEquals(0, run("audit", project.toString()), err.toString());
    }

    @Test
    void aShapefileWithSidecarsAndAWorkbookWithATitleRow(@TempDir Path tmp) throws IOException {
        Path shp = Files.createDirectories(tmp.resolve("shp"));
        List<ShapefileFixture.Feature> features = new ArrayList<>();
        for (Region state : RegionReaders.read(GEOMETRY, new RegionSourceSpec("us-states-2017.geojson", "id", "name", ""),
                new Findings())) {
            features.add(new ShapefileFixture.Feature(List.of(state.name(), state.key()), state.lonLat()));
        }
        ShapefileFixture.write(shp, "states", List.of("NAME", "GEOID"), features, ShapefileFixture.WGS84_PRJ, "UTF-8",
                StandardCharsets.UTF_8);
        Path workbook = tmp.resolve("counties.xlsx");
        AnalystInputsTest.writeWorkbook(AnalystInputsTest.countiesPerState(), workbook);
        Path project = tmp.resolve("project");

        assertEquals(0, run("scaffold", project.toString(), "--regions", shp.resolve("states.shp").toString(),
                "--figures", workbook.toString()), err.toString());

        for (String member : List.of("states.shp", "states.shx", "states.dbf", "states.prj", "states.cpg")) {
            assertTrue(Files.isRegularFile(project.resolve("regions").resolve(member)), member);
        }
        String yaml = Files.readString(project.resolve("aequa.yaml"));
        assertTrue(yaml.contains("key: \"GEOID\"") && yaml.contains("name: \"NAME\""), yaml);
        assertTrue(out.toString().contains("56 of 56 regions matched on key = GEOID (regions) and GEOID (figures)"),
                out.toString());

        // the same Shapefile zipped, as statistics offices publish it, is copied as it is and named by layer
        ShapefileFixture.zip(shp, "states", tmp.resolve("states.zip"));
        Path zipped = tmp.resolve("zipped");
        assertEquals(0, run("scaffold", zipped.toString(), "--regions", tmp.resolve("states.zip").toString(),
                "--figures", workbook.toString()), err.toString());
        String zippedYaml = Files.readString(zipped.resolve("aequa.yaml"));
        assertTrue(zippedYaml.contains("file: \"regions/states.zip\"") && zippedYaml.contains("layer: \"states\"")
                && zippedYaml.contains("key: \"GEOID\""), zippedYaml);
    }

    @Test
    void aTopologyJoinsOnItsFeatureIdAndNamesItsObject(@TempDir Path tmp) throws IOException {
        // states-10m.json: the us-atlas 3.0.1 topology (src/test/resources/topojson/SOURCE.md), objects "states" and
        // "nation", each state's FIPS code as the geometry id and only its name as a property
        Path csv = tmp.resolve("counties.csv");
        Files.writeString(csv, figuresCsv(false));
        Path project = tmp.resolve("project");

        int code = run("scaffold", project.toString(), "--regions", "src/test/resources/topojson/states-10m.json",
                "--figures", csv.toString());

        String yaml = Files.readString(project.resolve("aequa.yaml"));
        assertTrue(yaml.contains("object: \"states\"") && yaml.contains("key: \"@id\""), yaml);
        assertTrue(out.toString().contains("of 56 regions matched on key = @id (regions) and GEOID (figures)"), out.toString());
        assertTrue(code == 0 || code == 1, err.toString());
    }

    @Test
    void aPairMatchingFewerThanHalfTheRegionsIsWrittenWithAWarning(@TempDir Path tmp) throws IOException {
        // county FIPS codes (5 digits) are no state's code: the best pair still matches nothing
        Path csv = tmp.resolve("counties.csv");
        Files.writeString(csv, "county,population\n01001,55869\n01003,223234\n");
        Path project = tmp.resolve("project");

        run("scaffold", project.toString(), "--regions", GEOMETRY.resolve("us-states-2017.geojson").toString(),
                "--figures", csv.toString());

        assertTrue(Files.isRegularFile(project.resolve("aequa.yaml")));
        assertTrue(out.toString().contains("Fewer than half the regions match") && out.toString().contains("check 'key'"),
                out.toString());
    }

    @Test
    void anUnsupportedFileIsAUsageErrorAndNothingIsWritten(@TempDir Path tmp) throws IOException {
        Path ods = tmp.resolve("counties.ods");
        Files.writeString(ods, "not read");
        Path project = tmp.resolve("project");

        assertEquals(2, run("scaffold", project.toString(), "--regions", GEOMETRY.resolve("us-states-2017.geojson").toString(),
                "--figures", ods.toString()));
        assertTrue(err.toString().contains("counties.ods") && err.toString().contains(".xlsx"), err.toString());
        assertFalse(Files.exists(project));

        assertEquals(2, run("scaffold", project.toString(), "--regions", GEOMETRY.resolve("areas.csv").toString(),
                "--figures", ods.toString()));
        assertTrue(err.toString().contains("areas.csv"), err.toString());
        Path latin1 = tmp.resolve("latin1.csv");
        Files.write(latin1, "GEOID,r\u00e9sultat\n01,1\n".getBytes(StandardCharsets.ISO_8859_1));
        assertEquals(2, run("scaffold", project.toString(), "--regions", GEOMETRY.resolve("us-states-2017.geojson").toString(),
                "--figures", latin1.toString()));
        assertTrue(err.toString().contains("latin1.csv") && err.toString().contains("UTF-8"), err.toString());
        assertEquals(2, run("scaffold", project.toString(), "--regions", GEOMETRY.resolve("us-states-2017.geojson").toString()));
        assertFalse(Files.exists(project));
    }

    /** GEOID (2-digit FIPS, or without its leading zero) and the number of counties of each state. */
    private static String figuresCsv(boolean zerosLost) throws IOException {
        StringBuilder csv = new StringBuilder("GEOID,counties\n");
        AnalystInputsTest.countiesPerState().forEach((fips, n) -> csv.append(zerosLost ? String.valueOf(Integer.parseInt(fips)) : fips)
                .append(',').append(n).append('\n'));
        return csv.toString();
    }
}
