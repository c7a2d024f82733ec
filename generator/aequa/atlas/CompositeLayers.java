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
 * projection, at its own area scale), the framed parts placed by {@link PartLayout} and moved there, once for the
 * site's drawings and once for print (each part keeps the move from one place to the other). Moving is a
 * translation, so every drawn area stays what the part's audit proved.
 *
 * @param parts          the parts, main part first
 * @param simplifiedM    the drawable geometry per key, on the map's plane, the parts where the site's drawings place them
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
     * (the site's: every edition gets the same frames) and name bands at least the shares {@code frameNameBands}
     * gives of the map's drawn width on the site and in print ({@link LoadOptions#frameNameBands()}).
     */
    static CompositeLayers of(RegionLayer layer, List<PartPlan> plans, PlanarLayers planarLayers,
                              List<aequa.wording.Wording> languages, FrameNameBands frameNameBands) {
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
        List<Geometry> mainRegions = List.copyOf(planar.get(0).simplifiedM().values());
        List<PartLayout.Placement> placements = PartLayout.place(mainRegions, insets, frameNameBands.webShare());
        List<PartLayout.Placement> printPlacements = frameNameBands.printShare() == frameNameBands.webShare() ? placements
                : PartLayout.place(mainRegions, insets, frameNameBands.printShare());

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
            MapPart.Frame drawnFrame = new MapPart.Frame(frame.getMinX(), frame.getMinY(), frame.getMaxX(), frame.getMaxY());
            MapPart.PrintPlace print = i == 0 ? new MapPart.PrintPlace(0, 0, drawnFrame, 0, 0, 0)
                    : printPlace(placements.get(i - 1), printPlacements.get(i - 1));
            parts.add(new MapPart(plan.id(), plan.name(), plan.keys().stream().sorted().toList(), plan.main(),
                    plan.areaScale(), plan.choice(), part.audit(), plan.areaKm2(), plan.gapKm(), drawnFrame,
                    i == 0 ? 0 : placements.get(i - 1).nameBandM(), i == 0 ? 0 : placements.get(i - 1).nameLines(),
                    i == 0 ? 0 : placements.get(i - 1).scaleBandM(), print));
        }
        List<String> clipped = planar.stream().flatMap(p -> p.audit().clippedKeys().stream()).toList();
        List<String> aroundPole = planar.stream().flatMap(p -> p.audit().aroundPoleKeys().stream()).toList();
        worst = new AreaAudit(worst.maxRelativeError(), worst.worstKey(), worst.tolerance(), clipped, aroundPole);
        return new CompositeLayers(parts, geometry, ratios, worst, dropped);
    }

    /** The print place of a part the site's drawings place at {@code site}. */
    private static MapPart.PrintPlace printPlace(PartLayout.Placement site, PartLayout.Placement print) {
        Envelope f = print.frameM();
        return new MapPart.PrintPlace(print.dxM() - site.dxM(), print.dyM() - site.dyM(),
                new MapPart.Frame(f.getMinX(), f.getMinY(), f.getMaxX(), f.getMaxY()), print.nameBandM(), print.nameLines(),
                print.scaleBandM());
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
