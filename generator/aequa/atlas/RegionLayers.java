package aequa.atlas;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import aequa.ellipsoid.CoverageChecks;
import aequa.ellipsoid.GeodesicArea;
import aequa.ellipsoid.RegionValidator;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.project.LoadedProject;
import aequa.project.RegionSourceSpec;

/** Reads, checks and measures each geometry source once, however many maps use it. */
final class RegionLayers {

    private final LoadedProject project;
    private final Findings findings;
    private final Map<String, RegionLayer> loaded = new HashMap<>();

    RegionLayers(LoadedProject project, Findings findings) {
        this.project = project;
        this.findings = findings;
    }

    RegionLayer get(String sourceId) {
        return loaded.computeIfAbsent(sourceId, this::load);
    }

    private RegionLayer load(String sourceId) {
        RegionSourceSpec spec = project.file().regions().get(sourceId);
        List<Region> read = RegionReaders.read(project.dir(), spec, findings);
        List<Region> usable = RegionValidator.validate(read, spec.file(), findings);
        CoverageChecks.report(usable, spec.file(), findings);
        Map<String, Double> areas = new LinkedHashMap<>();
        for (Region region : usable) {
            areas.put(region.key(), GeodesicArea.areaKm2(region.lonLat()));
        }
        return new RegionLayer(sourceId, spec.file(), usable, areas);
    }
}
