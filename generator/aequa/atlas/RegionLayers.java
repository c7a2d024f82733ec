package aequa.atlas;

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

/**
 * Reads, checks and measures each geometry source once, however many maps use it, or takes the result from
 * the {@link GeometryCache} when the source is unchanged.
 */
final class RegionLayers {

    private final LoadedProject project;
    private final Findings findings;
    private final GeometryCache cache;
    private final Map<String, RegionLayer> loaded = new HashMap<>();

    RegionLayers(LoadedProject project, Findings findings, GeometryCache cache) {
        this.project = project;
        this.findings = findings;
        this.cache = cache;
    }

    RegionLayer get(String sourceId) {
        return loaded.computeIfAbsent(sourceId, this::load);
    }

    private RegionLayer load(String sourceId) {
        RegionSourceSpec spec = project.file().regions().get(sourceId);
        return cache.layer(project.dir(), sourceId, spec, findings, () -> compute(sourceId, spec));
    }

    private GeometryCodec.LayerWithFindings compute(String sourceId, RegionSourceSpec spec) {
        Findings findings = new Findings();
        RegionReaders.RegionSource read = RegionReaders.readSource(project.dir(), spec, SourceCrs::toLonLat, findings);
        List<Region> valid = RegionValidator.validate(
                TextLengths.withinLimits(read.regions(), spec.file(), findings), spec.file(), findings);
        if (!read.bordersShared()) { // a clean topology cannot overlap or leave gaps along its shared arcs
            CoverageChecks.report(valid, spec.file(), findings);
        }
        // GeoJSON edges are straight in lon/lat (RFC 7946, section 3.1.1), and so are the drawn ones: the area
        // is measured exactly along them (LonLatArea), not along geodesics between the vertices. Each region
        // is densified and measured alone, in parallel; the lists keep the input order.
        List<Region> densified = valid.parallelStream().map(region -> region.withLonLat(
                LonLatDensifier.densify(region.lonLat(), LonLatDensifier.MAX_STEP_DEG))).toList();
        double[] areasKm2 = densified.parallelStream().mapToDouble(region -> LonLatArea.areaKm2(region.lonLat())).toArray();
        Map<String, Double> areas = new LinkedHashMap<>();
        for (int i = 0; i < densified.size(); i++) {
            areas.put(densified.get(i).key(), areasKm2[i]);
        }
        return new GeometryCodec.LayerWithFindings(new RegionLayer(sourceId, spec.file(), densified, areas,
                DroppedRegions.why(read.regions(), valid, findings.list())), findings.list());
    }
}
