package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * The command line as a user meets it: the documented exit codes (README: 0 ok, 1 data problems, 2 usage
 * or project file, 3 internal), one clear message with file and line, and nothing written on failure.
 */
class CommandLineTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    void helpAndVersionSucceed() {
        assertEquals(0, run("--help"));
        assertTrue(out.toString().contains("publish") && out.toString().contains("Exit codes"));
        assertEquals(0, run("--version"));
        assertEquals(0, run("explain", "--help"));
    }

    @Test
    void usageErrorsExitWithTwo() {
        assertEquals(2, run());
        assertEquals(2, run("publish", "--no-such-option"));
        assertEquals(2, run("frobnicate"));
        assertTrue(err.toString().contains("aequa:"), err.toString());
    }

    @Test
    void aScaffoldedProjectPublishes(@TempDir Path tmp) throws IOException {
        Path project = tmp.resolve("starter");
        assertEquals(0, run("scaffold", project.toString()));
        assertEquals(0, run("audit", project.toString()), err.toString());
        Path site = tmp.resolve("site");
        assertEquals(0, run("publish", project.toString(), "--out", site.toString()), err.toString());
        assertTrue(Files.isRegularFile(site.resolve("index.html")));
        assertEquals(2, run("scaffold", project.toString()), "scaffold never overwrites");
    }

    @Test
    void projectFileErrorsNameTheLineAndExitWithTwo(@TempDir Path tmp) throws IOException {
        Path project = scaffolded(tmp);
        Path yaml = project.resolve("aequa.yaml");
        Files.writeString(yaml, Files.readString(yaml).replace("    unit:", "    colour: red\n    unit:"));
        Path site = tmp.resolve("site");
        assertEquals(2, run("publish", project.toString(), "--out", site.toString()));
        assertTrue(err.toString().matches("(?s).*aequa\\.yaml, line \\d+, column \\d+: Unknown key 'colour'.*"), err.toString());
        assertFalse(Files.exists(site), "nothing is written");
    }

    @Test
    void dataErrorsExitWithOneAndLeaveThePreviousSite(@TempDir Path tmp) throws IOException {
        Path project = scaffolded(tmp);
        Path site = tmp.resolve("site");
        assertEquals(0, run("publish", project.toString(), "--out", site.toString()));
        byte[] before = Files.readAllBytes(site.resolve("report.json"));
        Path yaml = project.resolve("aequa.yaml");
        Files.writeString(yaml, Files.readString(yaml) + "checks:\n  missing-figures: error\n");
        Path csv = project.resolve("figures/districts.csv");
        Files.writeString(csv, Files.readString(csv).replace("SE,Dunmarsh,10.4\n", ""));
        assertEquals(1, run("publish", project.toString(), "--out", site.toString()));
        assertTrue(err.toString().contains("SE"), "the finding names the region: " + err);
        assertEquals(new String(before), Files.readString(site.resolve("report.json")), "the previous site is untouched");
    }

    @Test
    void theProjectFileForcesAProjection(@TempDir Path tmp) throws IOException {
        Path project = scaffolded(tmp);
        Path yaml = project.resolve("aequa.yaml");
        Files.writeString(yaml, Files.readString(yaml)
                + "projection:\n  family: albers-conic\n  parameters: { standard-parallel-1: 44, standard-parallel-2: 48 }\n");
        Path site = tmp.resolve("site");
        assertEquals(0, run("publish", project.toString(), "--out", site.toString()), err.toString());
        JsonNode projection = new ObjectMapper().readTree(site.resolve("report.json").toFile()).at("/maps/0/projection");
        assertEquals("albers-conic", projection.path("family").asText());
        boolean forcedKept = false;
        for (JsonNode p : projection.path("parameters")) {
            forcedKept |= p.path("key").asText().equals("standard-parallel-1") && p.path("value").asDouble() == 44.0;
        }
        assertTrue(forcedKept, projection.toString());
    }

    @Test
    void explainSaysWhichProjectionAndWhy(@TempDir Path tmp) throws IOException {
        Path project = scaffolded(tmp);
        assertEquals(0, run("explain", project.resolve("regions/districts.geojson").toString(), "--json"), err.toString());
        JsonNode json = new ObjectMapper().readTree(out.toString());
        assertTrue(json.path("family").isTextual());
        assertTrue(json.path("wkt2").asText().startsWith("PROJCRS"));
        assertTrue(json.path("reason").asText().length() > 20);
        assertEquals(2, run("explain", tmp.resolve("missing.geojson").toString()));
        // a file of a type no region reader reads is a usage error, like the project's checks refuse it
        assertEquals(2, run("explain", project.resolve("figures/districts.csv").toString()));
        assertTrue(err.toString().contains("is not a file type aequa reads regions from"), err.toString());
    }

    /** The US Census Bureau's 2017 states (src/test/resources/geometry/SOURCE.md): FIPS 02 is Alaska, 15 Hawaii. */
    @Test
    void explainListsTheDetachedParts() throws IOException {
        String states = Path.of("src/test/resources/geometry/us-states-2017.geojson").toString();
        assertEquals(0, run("explain", states, "--json"), err.toString());
        JsonNode parts = new ObjectMapper().readTree(out.toString()).path("parts");
        assertEquals(6, parts.size(), parts.toString());
        assertTrue(parts.get(0).path("main").asBoolean());
        // explain keys regions by the feature id, which this file has as the FIPS code
        assertEquals("[\"02\"]", parts.get(1).path("regions").toString());
        assertEquals("[\"15\"]", parts.get(2).path("regions").toString());
        assertTrue(parts.get(1).path("omegaMaxDeg").asDouble() < parts.get(0).path("omegaMaxDeg").asDouble() * 2);
        // named from the file's own 'name' property, not by where it lies
        assertEquals("Alaska", parts.get(1).path("name").asText());
        // placement on the site and in print: every framed part in a quarter of the main map, frames that do not overlap
        for (String layout : List.of("placement", "printPlacement")) {
            List<org.locationtech.jts.geom.Envelope> frames = new java.util.ArrayList<>();
            for (int i = 1; i < parts.size(); i++) {
                JsonNode placement = parts.get(i).path(layout);
                assertTrue(List.of("top-left", "top-right", "bottom-left", "bottom-right").contains(placement.path("corner").asText()),
                        layout + ": " + placement);
                JsonNode f = placement.path("frameM");
                var frame = new org.locationtech.jts.geom.Envelope(f.get(0).asDouble(), f.get(2).asDouble(), f.get(1).asDouble(), f.get(3).asDouble());
                assertTrue(frame.getArea() > 0);
                frames.forEach(other -> assertTrue(!other.intersects(frame), layout + ": frames overlap: " + other + " " + frame));
                frames.add(frame);
            }
        }
        out.getBuffer().setLength(0);
        assertEquals(0, run("explain", states), err.toString());
        assertTrue(out.toString().contains("Parts (insets: auto): the main map and 5 framed parts"), out.toString());
        assertTrue(out.toString().matches("(?s).*Alaska: 1 region.*on the site: placed (top|bottom)-(left|right), (inside the main map's box|beside the main map); frame [0-9,]+ x [0-9,]+ km"
                + "\\s+in print \\(two-columns\\): placed (top|bottom)-(left|right), (inside the main map's box|beside the main map); frame [0-9,]+ x [0-9,]+ km.*"),
                out.toString());
    }

    private Path scaffolded(Path tmp) {
        Path project = tmp.resolve("project");
        assertEquals(0, run("scaffold", project.toString()));
        out.getBuffer().setLength(0);
        return project;
    }
}
