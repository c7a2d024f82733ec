package aequa.atlas;

import java.util.List;
import java.util.Map;

import aequa.composite.PartPlan;
import aequa.inputs.regions.Region;

/**
 * Places planned parts as the load step does, for a caller outside a project ({@code explain}): each part
 * projected, audited and simplified on its own projection and area scale, then the framed parts placed
 * around the main part ({@link CompositeLayers}), with room for English labels.
 */
public final class PartPlacement {

    private PartPlacement() {
    }

    /**
     * The parts with their frames on the main part's plane, main part first.
     *
     * @param regions       the regions, densified as the load step densifies them
     * @param areaKm2ByKey  their areas, as the load step measures them
     * @param toleranceArea the area check's tolerance
     * @param frameNameBands the least heights of the frames' name bands ({@link LoadOptions#frameNameBands()})
     */
    public static List<MapPart> place(String file, List<Region> regions, Map<String, Double> areaKm2ByKey,
                                      List<PartPlan> plans, double toleranceArea, FrameNameBands frameNameBands) {
        RegionLayer layer = new RegionLayer("explain", file, regions, areaKm2ByKey);
        return CompositeLayers.of(layer, plans, (subset, plan, drawnFootprint, minDrawnWidthM) -> PlanarLayer.of(subset,
                plan.choice().projection(), drawnFootprint, toleranceArea, plan.areaScale(), minDrawnWidthM),
                List.of(aequa.wording.Wording.english()), frameNameBands).parts();
    }
}
