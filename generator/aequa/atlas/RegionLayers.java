package aequa.atlas;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import aequa.ellipsoid.CoverageChecks;
import aequa.ellipsoid.LonLatArea;
import aequa.ellipsoid.LonLatDensifier;
import aequa.ellipsoid.RegionValidator;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.project.LoadedProject;
import aequa.project.RegionSourceSpec;
import aequa.projection.SourceCrs;
import aequa.statistics.TextLengths;

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
        RegionReaders.RegionSource read = RegionReaders.readSource(project.dir(), spec, SourceCrs::toLonLat, findings);
        List<Region> valid = RegionValidator.validate(
                TextLengths.withinLimits(read.regions(), spec.file(), findings), spec.file(), findings);
        if (!read.bordersShared()) { // a clean topology cannot overlap or leave gaps along its shared arcs
            CoverageChecks.report(valid, spec.file(), findings);
        }
        List<Region> densified = new ArrayList<>(valid.size());
        Map<String, Double> areas = new LinkedHashMap<>();
        for (Region region : valid) {
            // GeoJSON edges are straight in lon/lat (RFC 7946, section 3.1.1), and so are the drawn ones: the
            // area is measured exactly along them (LonLatArea), not along geodesics between the vertices
            Region fine = new Region(region.key(), region.name(),
                    LonLatDensifier.densify(region.lonLat(), LonLatDensifier.MAX_STEP_DEG));
            densified.add(fine);
            areas.put(region.key(), LonLatArea.areaKm2(fine.lonLat()));
        }
        return new RegionLayer(sourceId, spec.file(), densified, areas);
    }
}
