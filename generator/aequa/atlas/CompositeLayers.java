package aequa.atlas;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.util.AffineTransformation;

import aequa.composite.PartLayout;
import aequa.composite.PartPlan;
import aequa.planar.AreaAudit;
import aequa.planar.CoverageSimplification;
import aequa.projection.Footprint;

/**
 * The planar layers of a composite map: one {@link PlanarLayer} per part (the part's regions on its own
 * projection, at its own area scale), the framed parts placed by {@link PartLayout} and moved there. Moving is
 * a translation, so every drawn area stays what the part's audit proved.
 *
 * @param parts          the parts, main part first
 * @param simplifiedM    the drawable geometry per key, on the map's plane
 * @param mapAreaRatio   planar / (area scale x geodesic) area per key
 * @param audit          the worst of the parts' audits
 * @param dropped        the parts' islands too small to draw
 */
record CompositeLayers(List<MapPart> parts, Map<String, Geometry> simplifiedM, Map<String, Double> mapAreaRatio,
                       AreaAudit audit, List<CoverageSimplification.DroppedPart> dropped) {

    /**
     * A part's planar layer ({@link PlanarLayer#of(RegionLayer, aequa.projection.EqualAreaProjection, Footprint,
     * double, double, double)}); the caller may share them between maps. Called for several parts at once.
     */
    interface PlanarLayers {
        PlanarLayer of(RegionLayer subset, PartPlan plan, Footprint drawnFootprint, double minDrawnWidthM);
    }

    /**
     * The parts' layers, the framed parts placed with room for their labels in every language of {@code languages}
     * (the site's: every edition gets the same frames) and name bands at least {@code frameNameBandShare} of the
     * map's drawn width ({@link LoadOptions#frameNameBandShare()}).
     */
    static CompositeLayers of(RegionLayer layer, List<PartPlan> plans, PlanarLayers planarLayers,
                              List<aequa.wording.Wording> languages, double frameNameBandShare) {
        PartPlan mainPlan = plans.get(0);
        double mainWidthM = PlanarLayer.roughWidthM(mainPlan.footprint());
        // the parts' layers stand alone, so they are made side by side (the main part's simplification, which
        // runs on one thread, overlaps the other parts'); the list keeps the parts' order
        List<PlanarLayer> planar = plans.parallelStream().map(plan -> {
            double minWidthM = plan.main() ? 0 : mainWidthM / Math.sqrt(plan.areaScale());
            // a part drawn no larger than the main part is densified for the main part's drawing; an enlarged one for its own
            Footprint drawn = plan.areaScale() > 1 ? plan.footprint() : mainPlan.footprint();
            return planarLayers.of(layer.subset(plan.keys()), plan, drawn, minWidthM);
        }).toList();
        Envelope mainExtent = extent(planar.get(0).simplifiedM().values());
        List<PartLayout.Inset> insets = new ArrayList<>();
        for (int i = 1; i < plans.size(); i++) {
            PartPlan plan = plans.get(i);
            // the same frames in every language: room for the longest label the site's languages give
            double nameWidthM = 0;
            double twoLineWidthM = 0;
            double longestWordWidthM = 0;
            for (aequa.wording.Wording w : languages) {
                String label = MapPart.frameLabel(plan.name(), plan.areaScale(), w);
                double oneLine = PartLayout.nameWidthM(label, mainExtent);
                for (String word : label.split(" ")) {
                    longestWordWidthM = Math.max(longestWordWidthM, PartLayout.nameWidthM(word, mainExtent));
                }
                List<String> lines = MapPart.frameLabelLines(plan.name(), plan.areaScale(), w);
                double twoLines = lines.isEmpty() ? PartLayout.TWO_LINE_WIDTH * oneLine
                        : lines.stream().mapToDouble(line -> PartLayout.nameWidthM(line, mainExtent)).max().orElse(0);
                nameWidthM = Math.max(nameWidthM, oneLine);
                twoLineWidthM = Math.max(twoLineWidthM, twoLines);
            }
            insets.add(new PartLayout.Inset(extent(planar.get(i).simplifiedM().values()), nameWidthM, twoLineWidthM,
                    longestWordWidthM, plan.corner(), plan.areaScale() != 1));
        }
        List<PartLayout.Placement> placements = PartLayout.place(List.copyOf(planar.get(0).simplifiedM().values()), insets,
                frameNameBandShare);

        Map<String, Geometry> geometry = new LinkedHashMap<>();
        Map<String, Double> ratios = new HashMap<>();
        List<MapPart> parts = new ArrayList<>();
        List<CoverageSimplification.DroppedPart> dropped = new ArrayList<>();
        AreaAudit worst = planar.get(0).audit();
        for (int i = 0; i < plans.size(); i++) {
            PartPlan plan = plans.get(i);
            PlanarLayer part = planar.get(i);
            Envelope frame = i == 0 ? mainExtent : placements.get(i - 1).frameM();
            AffineTransformation move = i == 0 ? null
                    : AffineTransformation.translationInstance(placements.get(i - 1).dxM(), placements.get(i - 1).dyM());
            part.simplifiedM().forEach((key, g) -> geometry.put(key, move == null ? g : move.transform(g)));
            ratios.putAll(part.mapAreaRatio());
            dropped.addAll(part.dropped());
            if (part.audit().maxRelativeError() > worst.maxRelativeError() || Double.isNaN(part.audit().maxRelativeError())) {
                worst = part.audit();
            }
            parts.add(new MapPart(plan.id(), plan.name(), plan.keys().stream().sorted().toList(), plan.main(),
                    plan.areaScale(), plan.choice(), part.audit(), plan.areaKm2(), plan.gapKm(),
                    new MapPart.Frame(frame.getMinX(), frame.getMinY(), frame.getMaxX(), frame.getMaxY()),
                    i == 0 ? 0 : placements.get(i - 1).nameBandM(), i == 0 ? 0 : placements.get(i - 1).nameLines(),
                    i == 0 ? 0 : placements.get(i - 1).scaleBandM()));
        }
        List<String> clipped = planar.stream().flatMap(p -> p.audit().clippedKeys().stream()).toList();
        List<String> aroundPole = planar.stream().flatMap(p -> p.audit().aroundPoleKeys().stream()).toList();
        worst = new AreaAudit(worst.maxRelativeError(), worst.worstKey(), worst.tolerance(), clipped, aroundPole);
        return new CompositeLayers(parts, geometry, ratios, worst, dropped);
    }

    private static Envelope extent(java.util.Collection<Geometry> geometries) {
        Envelope e = new Envelope();
        geometries.forEach(g -> {
            if (!g.isEmpty()) {
                e.expandToInclude(g.getEnvelopeInternal());
            }
        });
        return e;
    }
}
