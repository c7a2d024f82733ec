package aequa.fuzzing;

import java.nio.file.Path;


import com.code_intelligence.jazzer.junit.FuzzTest;

import aequa.findings.Findings;
import aequa.inputs.regions.RegionReaders;
import aequa.project.RegionSourceSpec;
import aequa.projection.SourceCrs;

/**
 * Any bytes as a GeoJSON region file: the reader ends with regions and findings, never an exception, within
 * {@value FuzzLimits#SECONDS_PER_INPUT} s. Seeds in {@code GeoJsonFuzzTestInputs/regions}.
 */
class GeoJsonFuzzTest {

    private static final Path FOLDER = FuzzFolder.of("geojson");
    private static final RegionSourceSpec SPEC = new RegionSourceSpec("regions.geojson", "code", "name", null);

    @FuzzTest(maxDuration = FuzzLimits.CAMPAIGN)
    void regions(byte[] input) {
        FuzzFolder.withinSeconds(FuzzLimits.SECONDS_PER_INPUT, () -> {
            FuzzFolder.write(FOLDER, SPEC.file(), input);
            Findings findings = new Findings();
            RegionReaders.read(FOLDER, SPEC, SourceCrs::toLonLat, findings);
            FuzzFolder.assertClear(findings, SPEC.file());
        });
    }
}
