package aequa.atlas;

import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import aequa.findings.Finding;
import aequa.inputs.regions.Region;

/**
 * Why regions that were read with a key were left out by the checks, in words for the join report: a figure
 * keyed to such a region then says so instead of "matches no region". The reason is taken from the check's
 * own finding for that feature.
 */
final class DroppedRegions {

    /** Finding codes of the region checks that leave a region out, with the reason they stand for. */
    private static final Map<String, String> REASONS = new LinkedHashMap<>();

    static {
        REASONS.put("part-degenerate", "its outline encloses no area (fewer than three distinct positions)");
        REASONS.put("geometry-repaired", "its outline collapsed to nothing when it was repaired");
        REASONS.put("geometry-missing", "it has no geometry");
        REASONS.put("coordinates-out-of-range", "its coordinates lie outside longitude -180..180 and latitude -90..90");
    }

    private DroppedRegions() {
    }

    /** The reasons by key, for every key of {@code read} that is not among {@code kept}. */
    static Map<String, String> why(List<Region> read, List<Region> kept, List<Finding> findings) {
        Set<String> keptKeys = new HashSet<>();
        kept.forEach(r -> keptKeys.add(r.key()));
        Map<String, String> why = new LinkedHashMap<>();
        for (Region r : read) {
            if (keptKeys.contains(r.key()) || why.containsKey(r.key())) {
                continue;
            }
            String place = "feature \"" + r.key() + "\"";
            String reason = "its outline could not be used";
            for (Map.Entry<String, String> code : REASONS.entrySet()) {
                if (findings.stream().anyMatch(f -> f.code().equals(code.getKey()) && f.place().equals(place))) {
                    reason = code.getValue();
                    break;
                }
            }
            why.put(r.key(), reason);
        }
        return why;
    }
}
