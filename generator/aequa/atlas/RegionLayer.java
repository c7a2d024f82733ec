package aequa.atlas;

import java.util.List;
import java.util.Map;

import aequa.inputs.regions.Region;

/**
 * The regions of one geometry source after validation and repair, with their geodesic areas.
 *
 * @param sourceId  the source's id in the project file
 * @param file      the file as the project names it
 * @param regions   the usable regions, in source order, RFC 7946 form (valid, counter-clockwise shells, cut at
 *                  +-180), densified to {@code LonLatDensifier.MAX_STEP_DEG}
 * @param areaKm2ByKey geodesic area on WGS 84 of each region, by key
 * @param droppedWhy why each feature of the file that was read with a key but left out was left out, by key
 */
record RegionLayer(String sourceId, String file, List<Region> regions, Map<String, Double> areaKm2ByKey,
                   Map<String, String> droppedWhy) {

    RegionLayer {
        regions = List.copyOf(regions);
        areaKm2ByKey = Map.copyOf(areaKm2ByKey);
        droppedWhy = Map.copyOf(droppedWhy);
    }

    /** A layer of regions none of which was left out (a part of a source, for instance). */
    RegionLayer(String sourceId, String file, List<Region> regions, Map<String, Double> areaKm2ByKey) {
        this(sourceId, file, regions, areaKm2ByKey, Map.of());
    }
}
