package aequa.fuzzing;

import java.nio.file.Path;

import com.code_intelligence.jazzer.junit.FuzzTest;

import aequa.findings.Findings;
import aequa.inputs.regions.RegionReaders;
import aequa.project.RegionSourceSpec;
import aequa.projection.SourceCrs;

/**
 * Any bytes as a region file: GeoJSON (streamed tokens, coordinates, read limits) and GeoPackage (SQLite,
 * layer lookup, GeoPackageBinary, WKB, the CRS transform). The reader ends with regions and findings, never
 * an exception, within {@value FuzzLimits#SECONDS_PER_INPUT} s. Seeds in {@code RegionFilesFuzzTestInputs/}.
 */
class RegionFilesFuzzTest {

    private static final Path FOLDER = FuzzFolder.of("regions");
    private static final RegionSourceSpec GEOJSON = new RegionSourceSpec("regions.geojson", "code", "name", null);
    private static final RegionSourceSpec GEOPACKAGE = new RegionSourceSpec("regions.gpkg", "code", "label", null);

    @FuzzTest(maxDuration = FuzzLimits.CAMPAIGN)
    void geoJson(byte[] input) {
        read(GEOJSON, input);
    }

    @FuzzTest(maxDuration = FuzzLimits.CAMPAIGN)
    void geoPackage(byte[] input) {
        read(GEOPACKAGE, input);
    }

    private static void read(RegionSourceSpec spec, byte[] input) {
        FuzzFolder.withinSeconds(FuzzLimits.SECONDS_PER_INPUT, () -> {
            FuzzFolder.write(FOLDER, spec.file(), input);
            Findings findings = new Findings();
            RegionReaders.read(FOLDER, spec, SourceCrs::toLonLat, findings);
            FuzzFolder.assertClear(findings, spec.file());
        });
    }
}
