package aequa.fuzzing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Arrays;

import org.junit.jupiter.api.BeforeAll;

import com.code_intelligence.jazzer.junit.FuzzTest;

import aequa.atlas.AtlasLoader;
import aequa.atlas.LoadOptions;
import aequa.findings.Findings;
import aequa.project.LoadedProject;
import aequa.project.ProjectLoader;

/**
 * The whole load step (read, validate and repair, measure, choose a projection, project, audit, simplify,
 * join, classify, colour) on any region file and figures file: an atlas and findings, never an exception.
 * The input is the GeoJSON, a NUL byte, then the CSV. Seeds in {@code LoadStepFuzzTestInputs/load}.
 */
class LoadStepFuzzTest {

    /** Two adjacent squares of one degree, keys A and B (RFC 7946 FeatureCollection). */
    static final String SQUARES = """
            {"type":"FeatureCollection","features":[
            {"type":"Feature","properties":{"code":"A","name":"Alpha"},"geometry":{"type":"Polygon","coordinates":[[[10,50],[11,50],[11,51],[10,51],[10,50]]]}},
            {"type":"Feature","properties":{"code":"B","name":"Beta"},"geometry":{"type":"Polygon","coordinates":[[[11,50],[12,50],[12,51],[11,51],[11,50]]]}}
            ]}
            """;

    private static final String PROJECT = """
            site: {title: "Fuzz"}
            regions:
              r: {file: regions/r.geojson, key: code, name: name}
            figures:
              f: {file: figures/f.csv, key: code}
            maps:
              - {id: rate, title: "Rate", regions: r, figures: f, indicator: rate, measure: rate, unit: "%",
                 classes: {method: quantile, count: 3}}
            """;

    private static final Path FOLDER = FuzzFolder.of("load");

    static {
        FuzzFolder.write(FOLDER, "aequa.yaml", PROJECT.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Loads the two squares once before any input is timed, which also checks that the fixture is sound:
     * it must give one map and no error. The first load initialises Apache SIS's referencing (seconds).
     */
    @BeforeAll
    static void aSoundProjectLoads() {
        Findings findings = new Findings();
        FuzzFolder.write(FOLDER, "regions/r.geojson", SQUARES.getBytes(StandardCharsets.UTF_8));
        FuzzFolder.write(FOLDER, "figures/f.csv", "code,rate\nA,1.5\nB,2.5\n".getBytes(StandardCharsets.UTF_8));
        LoadedProject project = ProjectLoader.load(FOLDER, findings).orElseThrow(() -> new AssertionError(findings.list()));
        assertEquals(1, AtlasLoader.load(project, LoadOptions.defaults(), findings).maps().size(), findings.list().toString());
        assertFalse(findings.hasErrors(), findings.list().toString());
    }

    @FuzzTest(maxDuration = FuzzLimits.CAMPAIGN)
    void load(byte[] input) {
        FuzzFolder.withinSeconds(FuzzLimits.SECONDS_PER_LOAD, () -> {
            int nul = 0;
            while (nul < input.length && input[nul] != 0) {
                nul++;
            }
            FuzzFolder.write(FOLDER, "regions/r.geojson", Arrays.copyOfRange(input, 0, nul));
            FuzzFolder.write(FOLDER, "figures/f.csv", Arrays.copyOfRange(input, Math.min(nul + 1, input.length), input.length));
            Findings findings = new Findings();
            LoadedProject project = ProjectLoader.load(FOLDER, findings).orElseThrow(() -> new AssertionError(findings.list()));
            AtlasLoader.load(project, LoadOptions.defaults(), findings);
            FuzzFolder.assertClear(findings);
        });
    }
}
