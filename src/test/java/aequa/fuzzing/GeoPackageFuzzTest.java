package aequa.fuzzing;

import java.nio.file.Path;


import com.code_intelligence.jazzer.junit.FuzzTest;

import aequa.findings.Findings;
import aequa.inputs.regions.RegionReaders;
import aequa.project.RegionSourceSpec;
import aequa.projection.SourceCrs;

/**
 * Any bytes as a GeoPackage region file (read through SQLite, layer lookup, GeoPackageBinary, WKB and the
 * CRS transform): regions and findings, never an exception. Seeds in {@code GeoPackageFuzzTestInputs/regions}.
 */
class GeoPackageFuzzTest {

    private static final Path FOLDER = FuzzFolder.of("geopackage");
    private static final RegionSourceSpec SPEC = new RegionSourceSpec("regions.gpkg", "code", "label", null);

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
