package aequa.cli;

import java.util.Locale;

import aequa.atlas.MapModel;
import aequa.project.MapDisplay;

/** One line per map for the terminal: projection, distortion, area proof and classes. */
final class MapSummary {

    private MapSummary() {
    }

    static String line(MapModel map) {
        String display = map.spec().display() == MapDisplay.CIRCLES ? "proportional circles"
                : map.classification().method().configName() + " " + map.classification().classCount() + " classes";
        return String.format(Locale.ROOT, "  %-22s %-34s omega max %5.1f deg, mean %4.1f deg; area error %.1e; %d regions, %s",
                map.id(), map.projection().projection().family().displayName(), map.projection().omegaMaxDeg(),
                map.projection().omegaMeanDeg(), map.areaAudit().maxRelativeError(), map.regions().size(), display);
    }
}
