package aequa.atlas;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.locationtech.jts.geom.Geometry;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.findings.Severity;
import aequa.inputs.figures.FigureReaders;
import aequa.inputs.figures.FigureTable;
import aequa.inputs.regions.Region;
import aequa.project.LoadedProject;
import aequa.project.MapDisplay;
import aequa.project.MapSpec;
import aequa.project.ProjectFile;
import aequa.composite.CompositePlanner;
import aequa.composite.PartPlan;
import aequa.project.InsetsSpec;
import aequa.projection.Footprint;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionRequest;
import aequa.statistics.MapFigures;
import aequa.statistics.MapStatistics;
import aequa.statistics.RegionArea;

/**
 * Builds the {@link MapModel} of each map. Geometry sources, statistics sources, projection choices and
 * planar layers are computed once and shared by every map that uses the same ones.
 */
final class MapAssembler {

    private final LoadedProject project;
    private final LoadOptions options;
    private final Findings findings;
    private final RegionLayers layers;
    private final GeometryCache cache;
    private final Map<String, FigureTable> tables = new HashMap<>();
    private final Map<String, List<PartPlan>> plans = new HashMap<>();
    private final Map<String, PlanarLayer> planarLayers = new HashMap<>();

    MapAssembler(LoadedProject project, LoadOptions options, Findings findings) {
        this.project = project;
        this.options = options;
        this.findings = findings;
        this.cache = options.geometryCache();
        this.layers = new RegionLayers(project, findings, cache);
    }

    Optional<MapModel> assemble(int mapIndex, MapSpec map) {
        RegionLayer layer = layers.get(map.regions());
        if (layer.regions().isEmpty()) {
            findings.add(Finding.error("map-no-regions", layer.file(), "", "Map '" + map.id() + "' has no usable regions.",
                    "See the findings above for why each feature was left out."));
            return Optional.empty();
        }
        FigureTable table = tables.computeIfAbsent(map.figures(),
                id -> FigureReaders.read(project.dir(), project.file().figures().get(id), findings));
        List<RegionArea> areas = layer.regions().stream()
                .map(r -> new RegionArea(r.key(), layer.areaKm2ByKey().get(r.key()))).toList();
        int before = findings.list().size();
        MapFigures figures = MapStatistics.compute(map, table, areas, layer.droppedWhy(), project.file().checks(), findings);
        List<String> notices = readerNotices(findings.list().subList(before, findings.list().size()));

        Optional<ProjectionRequest> request = ProjectionRequests.of(project, mapIndex, map,
                Optional.ofNullable(options.previousProjections().get(map.id())), findings);
        if (request.isEmpty()) {
            return Optional.empty();
        }
        Optional<List<PartPlan>> plans = partPlans(mapIndex, map, layer, request.get());
        if (plans.isEmpty()) {
            return Optional.empty();
        }
        ProjectionChoice choice = plans.get().get(0).choice();
        PlanarLayer planar;
        List<MapPart> parts = List.of();
        if (plans.get().size() == 1) {
            Footprint footprint = plans.get().get(0).footprint();
            planar = planarLayers.computeIfAbsent(layer.sourceId() + "|" + choice.projection().wkt2(),
                    key -> cache.planar(layer, choice.projection(), project.file().checks().areaTolerance(), 1, 0,
                            () -> PlanarLayer.of(layer, choice.projection(), footprint, project.file().checks().areaTolerance())));
        } else {
            CompositeLayers composite = CompositeLayers.of(layer, plans.get(), this::partLayer, siteLanguages(),
                    options.frameNameBands());
            planar = new PlanarLayer(composite.simplifiedM(), composite.mapAreaRatio(), composite.audit(), composite.dropped());
            parts = composite.parts();
        }
        AuditFindings.add(map.id(), layer, choice.projection(), planar.audit(), findings);
        boolean circles = map.display() == MapDisplay.CIRCLES;
        Optional<ClassedFigures> classed = ClassedFigures.of(map, "/maps/" + mapIndex, figures, options.pageBackground(),
                circles, findings);
        if (classed.isEmpty()) {
            return Optional.empty();
        }
        List<MapRegion> regions = new ArrayList<>();
        for (Region region : layer.regions()) {
            Geometry drawn = planar.simplifiedM().get(region.key());
            regions.add(new MapRegion(region.key(), region.name(), layer.areaKm2ByKey().get(region.key()),
                    planar.mapAreaRatio().get(region.key()), drawn, classed.get().values(figures.figures(region.key()))));
        }
        regions.sort(Comparator.comparing(MapRegion::key));
        Geometry outlinesM = GroupOutlines.of(map.id(), map.outlines(), "/maps/" + mapIndex + "/outlines",
                project.file().regions().get(map.regions()), layer.regions(), planar.simplifiedM(), project.places(), findings);
        if (outlinesM == null) {
            return Optional.empty();
        }
        List<String> allNotices = new ArrayList<>(notices);
        allNotices.addAll(planar.droppedIslands());
        return Optional.of(new MapModel(map, figures.periods(), choice, regions, classed.get().classification(),
                classed.get().ramp(), planar.audit(), allNotices, parts, outlinesM));
    }

    /**
     * The map's parts and their projections (one part unless its insets setting or the data ask for more),
     * shared by maps of the same source and settings; empty after an error finding.
     */
    private Optional<List<PartPlan>> partPlans(int mapIndex, MapSpec map, RegionLayer layer, ProjectionRequest request) {
        boolean ownSetting = map.insets() != null;
        InsetsSpec insets = ownSetting ? map.insets() : project.file().regions().get(map.regions()).insets();
        String pointer = ownSetting ? "/maps/" + mapIndex + "/insets" : "/regions/" + map.regions() + "/insets";
        String key = layer.sourceId() + "|" + request + "|" + insets;
        if (plans.containsKey(key)) {
            return Optional.of(plans.get(key));
        }
        try {
            List<PartPlan> planned = cache.parts(layer, insets, request, () -> CompositePlanner.plan(layer.regions(),
                    layer.areaKm2ByKey(), insets, request, new CompositePlanner.SettingPlace(project.places(), pointer), findings,
                    (keys, partRequest, compute) -> cache.choice(layer.subset(keys), partRequest, compute)));
            if (planned.isEmpty()) {
                return Optional.empty();
            }
            plans.put(key, planned);
            return Optional.of(planned);
        } catch (IllegalArgumentException e) {
            findings.add(Finding.error("projection-parameters-invalid", ProjectFile.FILE_NAME,
                    project.places().place("/maps/" + mapIndex + "/projection"),
                    "The projection settings of map '" + map.id() + "' cannot be used: " + e.getMessage(),
                    "Remove the forced parameters to let aequa choose, or see 'aequa explain' for valid values."));
            return Optional.empty();
        }
    }

    /**
     * One part's planar layer, shared by every map drawing the same regions on the same projection and scale.
     * A composite map asks for its parts' layers side by side: the shared table is read and written under its
     * lock, the layer made outside it (the parts of one map never share a key).
     */
    private PlanarLayer partLayer(RegionLayer subset, PartPlan plan, Footprint drawnFootprint, double minDrawnWidthM) {
        double tolerance = project.file().checks().areaTolerance();
        String key = subset.sourceId() + "|" + plan.keys() + "|" + plan.choice().projection().wkt2() + "|" + plan.areaScale();
        synchronized (planarLayers) {
            PlanarLayer known = planarLayers.get(key);
            if (known != null) {
                return known;
            }
        }
        PlanarLayer made = cache.planar(subset, plan.choice().projection(), tolerance, plan.areaScale(), minDrawnWidthM,
                () -> PlanarLayer.of(subset, plan.choice().projection(), drawnFootprint, tolerance,
                        plan.areaScale(), minDrawnWidthM));
        synchronized (planarLayers) {
            return planarLayers.computeIfAbsent(key, k -> made);
        }
    }

    /** Readers see at most this many notices of one kind; report.json keeps every finding. */
    private static final int NOTICES_PER_KIND = 3;

    /**
     * The warnings of the join a reader of the map should also see (missing figures and the like), at most
     * {@value #NOTICES_PER_KIND} of each kind followed by a count of the rest, so a caption stays readable.
     */
    private static List<String> readerNotices(List<Finding> joinFindings) {
        Map<String, List<String>> byCode = new java.util.LinkedHashMap<>();
        for (Finding f : joinFindings) {
            if (f.severity() == Severity.WARNING && f.code().startsWith("join-")) {
                byCode.computeIfAbsent(f.code(), code -> new ArrayList<>()).add(f.message());
            }
        }
        List<String> notices = new ArrayList<>();
        for (List<String> messages : byCode.values()) {
            notices.addAll(messages.subList(0, Math.min(NOTICES_PER_KIND, messages.size())));
            if (messages.size() > NOTICES_PER_KIND) {
                int more = messages.size() - NOTICES_PER_KIND;
                notices.add("… and " + more + " more like " + (more == 1 ? "it" : "them") + " (listed in report.json).");
            }
        }
        return notices;
    }

    /** The wording of the site's languages (English when none can be read: the project file's check reports it). */
    private List<aequa.wording.Wording> siteLanguages() {
        List<aequa.wording.Wording> languages = project.file().site().languages().stream()
                .map(aequa.wording.Language::parse).flatMap(Optional::stream).map(aequa.wording.Wording::of).toList();
        return languages.isEmpty() ? List.of(aequa.wording.Wording.english()) : languages;
    }
}
