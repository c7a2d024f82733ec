package aequa.atlas;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.planar.AreaAudit;
import aequa.projection.EqualAreaProjection;
import aequa.projection.ProjectionParameter;

/**
 * Turns a map's {@link AreaAudit} into findings that name the real cause:
 * <ul>
 * <li>{@code projection-pole-inside-region}: a transverse or oblique cylinder's pole lies inside a region;</li>
 * <li>{@code projection-domain-clips-region}: regions reach beyond the projection's domain and would be cut;</li>
 * <li>{@code area-audit-failed}: a region drawn whole still misses its true area. Its hint blames the region's
 *     outline only when the load step reported something about that region; an outline that passed every
 *     check points at aequa's own densification and the tolerance instead.</li>
 * </ul>
 * The first two replace the third for the regions they name (their area is off because of the projection).
 */
final class AuditFindings {

    /** Regions named in one message at most; the rest are counted. */
    private static final int NAMED = 5;

    private AuditFindings() {
    }

    static void add(String mapId, RegionLayer layer, EqualAreaProjection projection, AreaAudit audit, Findings findings) {
        Map<String, Region> byKey = layer.regions().stream().collect(Collectors.toMap(Region::key, Function.identity()));
        String projectionText = projection.family().configName() + " (" + parameters(projection) + ")";
        if (!audit.aroundPoleKeys().isEmpty()) {
            findings.add(Finding.error("projection-pole-inside-region", layer.file(), place(audit.aroundPoleKeys()),
                    String.format(Locale.ROOT, "On map '%s' a pole of the %s projection lies inside %s: the cylinder is "
                            + "cut from pole to pole, so a region around a pole cannot be drawn in one piece with its true area.",
                            mapId, projectionText, names(audit.aroundPoleKeys(), byKey)),
                    "Choose 'centre-lat' and 'azimuth' so that the cylinder's poles fall outside every region (they lie 90 deg "
                            + "from the central line), or leave the family to aequa ('family: auto')."));
        }
        if (!audit.clippedKeys().isEmpty()) {
            findings.add(Finding.error("projection-domain-clips-region", layer.file(), place(audit.clippedKeys()),
                    String.format(Locale.ROOT, "On map '%s' %s reach%s beyond the domain of the %s projection (135 deg "
                            + "from its centre), so %s would be cut off and drawn with too little area.",
                            mapId, names(audit.clippedKeys(), byKey), audit.clippedKeys().size() == 1 ? "es" : "",
                            projectionText, audit.clippedKeys().size() == 1 ? "it" : "they"),
                    "Move the centre ('centre-lon', 'centre-lat') towards these regions, choose a family that shows the "
                            + "whole globe (equal-earth or mollweide), or leave the projection to aequa ('family: auto')."));
        }
        boolean explained = audit.clippedKeys().contains(audit.worstKey()) || audit.aroundPoleKeys().contains(audit.worstKey());
        if (audit.maxRelativeError() > audit.tolerance() && !explained) {
            findings.add(Finding.error("area-audit-failed", layer.file(), "feature \"" + audit.worstKey() + "\"",
                    String.format(Locale.ROOT, "On map '%s' the drawn area differs from the true area by %.2e, more than the allowed %.1e.",
                            mapId, audit.maxRelativeError(), audit.tolerance()),
                    reportedOn(audit.worstKey(), layer.file(), findings)
                            ? "This region's outline was repaired or questioned above; fix it at the source. The threshold is 'checks: area-tolerance'."
                            : "The region's outline passed every check, so the cause is aequa's: its drawn outline follows the "
                                    + "true one too coarsely on this projection. Please report it with the file; meanwhile raise "
                                    + "'checks: area-tolerance' or choose another projection."));
        }
    }

    private static boolean reportedOn(String key, String file, Findings findings) {
        String place = "feature \"" + key + "\"";
        return findings.list().stream().anyMatch(f -> f.file().equals(file) && f.place().equals(place));
    }

    private static String place(List<String> keys) {
        return "feature \"" + keys.get(0) + "\"";
    }

    private static String names(List<String> keys, Map<String, Region> byKey) {
        List<String> named = new ArrayList<>();
        for (String key : keys.subList(0, Math.min(NAMED, keys.size()))) {
            Region region = byKey.get(key);
            String name = region == null || region.name().isEmpty() ? "" : region.name() + " ";
            named.add(name + "(" + key + ")");
        }
        String more = keys.size() > NAMED ? " and " + (keys.size() - NAMED) + (keys.size() - NAMED == 1 ? " more region" : " more regions") : "";
        return (keys.size() == 1 ? "region " : keys.size() + " regions, ") + String.join(", ", named) + more;
    }

    private static String parameters(EqualAreaProjection projection) {
        return projection.parameters().stream()
                .map(p -> p.key() + " " + trimmed(p))
                .collect(Collectors.joining(", "));
    }

    private static String trimmed(ProjectionParameter parameter) {
        return String.format(Locale.ROOT, "%.6f", parameter.value()).replaceAll("\\.?0+$", "");
    }
}
