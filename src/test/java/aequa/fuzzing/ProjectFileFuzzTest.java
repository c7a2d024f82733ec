package aequa.fuzzing;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;


import com.code_intelligence.jazzer.junit.FuzzTest;

import aequa.findings.Findings;
import aequa.project.ProjectLoader;

/**
 * Any bytes as {@code aequa.yaml} in a folder that holds a small region file and figures file: a loaded
 * project or findings, never an exception. Seeds in {@code ProjectFileFuzzTestInputs/projectFile}.
 */
class ProjectFileFuzzTest {

    private static final Path FOLDER = FuzzFolder.of("project");

    static {
        FuzzFolder.write(FOLDER, "regions/r.geojson", LoadStepFuzzTest.SQUARES.getBytes(StandardCharsets.UTF_8));
        FuzzFolder.write(FOLDER, "figures/f.csv", "code,rate\nA,1.5\nB,2.5\n".getBytes(StandardCharsets.UTF_8));
    }

    @FuzzTest(maxDuration = FuzzLimits.CAMPAIGN)
    void projectFile(byte[] input) {
        FuzzFolder.withinSeconds(FuzzLimits.SECONDS_PER_INPUT, () -> {
            FuzzFolder.write(FOLDER, "aequa.yaml", input);
            Findings findings = new Findings();
            ProjectLoader.load(FOLDER, findings);
            FuzzFolder.assertClear(findings);
        });
    }
}
