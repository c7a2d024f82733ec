package aequa.composite;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import aequa.ellipsoid.GeodesicArea;
import aequa.ellipsoid.LonLatDensifier;
import aequa.ellipsoid.RegionValidator;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.project.RegionSourceSpec;
import aequa.projection.SourceCrs;
import aequa.testing.RealProject;

/**
 * A real boundary file of src/test/resources/geometry (sources and licences in its SOURCE.md), read, repaired,
 * densified and measured as the load step does.
 */
record RealRegions(List<Region> regions, Map<String, Double> areaKm2ByKey) {

    static RealRegions read(String file, String keyProperty) {
        Findings findings = new Findings();
        List<Region> read = RegionReaders.read(RealProject.GEOMETRY, new RegionSourceSpec(file, keyProperty, "name", ""),
                SourceCrs::toLonLat, findings);
        List<Region> valid = RegionValidator.validate(read, file, findings);
        List<Region> densified = new ArrayList<>();
        Map<String, Double> areas = new LinkedHashMap<>();
        for (Region r : valid) {
            Region fine = r.withLonLat(LonLatDensifier.densify(r.lonLat(), LonLatDensifier.MAX_STEP_DEG));
            densified.add(fine);
            areas.put(r.key(), GeodesicArea.areaKm2(fine.lonLat()));
        }
        return new RealRegions(densified, areas);
    }

    /** The keys of the regions whose key starts with one of the given prefixes (US: the state FIPS code). */
    List<String> keysStartingWith(String... prefixes) {
        List<String> keys = new ArrayList<>();
        for (Region r : regions) {
            for (String p : prefixes) {
                if (r.key().startsWith(p)) {
                    keys.add(r.key());
                }
            }
        }
        return keys;
    }
}
