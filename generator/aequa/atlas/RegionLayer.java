package aequa.atlas;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

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

    /**
     * The regions with these keys, in this layer's order, as a layer of their own under the same source id
     * (the geometry cache finds a source's entries by its id and tells parts of it apart by their regions);
     * this layer itself when the keys name all of its regions.
     */
    RegionLayer subset(List<String> keys) {
        if (keys.size() == regions.size()) {
            return this;
        }
        Set<String> wanted = Set.copyOf(keys);
        List<Region> members = regions.stream().filter(r -> wanted.contains(r.key())).toList();
        Map<String, Double> areas = new HashMap<>();
        members.forEach(r -> areas.put(r.key(), areaKm2ByKey.get(r.key())));
        return new RegionLayer(sourceId, file, members, areas);
    }
}
