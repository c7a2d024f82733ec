package aequa.cli;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import aequa.composite.CompositePlanner;
import aequa.composite.PartPlan;
import aequa.ellipsoid.LonLatArea;
import aequa.ellipsoid.LonLatDensifier;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.project.InsetsSpec;
import aequa.projection.ProjectionRequest;

/**
 * The parts {@code explain} reports: what a map of a file's regions is drawn in with the default
 * {@code insets: auto}, each part's regions, gap to the main part and projection, for a person or a script.
 */
final class PartsReport {

    private PartsReport() {
    }

    /** The automatic parts of {@code regions} (one part when nothing lies apart). */
    static List<PartPlan> plan(List<Region> regions, Findings findings) {
        Map<String, Double> areas = new LinkedHashMap<>();
        for (Region r : regions) {
            // measured as the load step measures regions (RegionLayers): exactly along the lon/lat edges
            areas.put(r.key(), LonLatArea.areaKm2(LonLatDensifier.densify(r.lonLat(), LonLatDensifier.MAX_STEP_DEG)));
        }
        return CompositePlanner.plan(regions, areas, InsetsSpec.AUTO, ProjectionRequest.automatic(),
                new CompositePlanner.SettingPlace(pointer -> "", "/insets"), findings);
    }

    static String text(List<PartPlan> parts) {
        if (parts.size() <= 1) {
            return "  Parts: one map; no regions lie far enough apart to be framed (insets: auto).\n";
        }
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT,
                "  Parts (insets: auto): the main map and %d framed %s, each on its own projection at the same area scale:%n",
                parts.size() - 1, parts.size() == 2 ? "part" : "parts"));
        for (PartPlan p : parts) {
            s.append(String.format(Locale.ROOT, "    %s: %d %s, %,.0f km²%s%n", p.name(), p.keys().size(),
                    p.keys().size() == 1 ? "region" : "regions", p.areaKm2(),
                    p.main() ? "" : String.format(Locale.ROOT, ", %,.0f km from the main map", p.gapKm())));
            s.append(String.format(Locale.ROOT, "      %s (%s): omega largest %.2f deg, mean %.2f deg%n",
                    p.choice().projection().family().displayName(), ChoiceReport.parameters(p.choice().projection().parameters()),
                    p.choice().omegaMaxDeg(), p.choice().omegaMeanDeg()));
        }
        return s.toString();
    }

    static List<Map<String, Object>> json(List<PartPlan> parts) {
        return parts.stream().map(p -> {
            Map<String, Object> part = new LinkedHashMap<>();
            part.put("id", p.id());
            part.put("name", p.name());
            part.put("main", p.main());
            part.put("regions", p.keys());
            part.put("areaKm2", p.areaKm2());
            part.put("gapKm", p.main() ? 0.0 : p.gapKm());
            part.put("areaScale", p.areaScale());
            part.put("family", p.choice().projection().family().configName());
            part.put("parameters", ChoiceReport.parameterList(p.choice().projection().parameters()));
            part.put("omegaMaxDeg", p.choice().omegaMaxDeg());
            part.put("omegaMeanDeg", p.choice().omegaMeanDeg());
            part.put("wkt2", p.choice().projection().wkt2());
            part.put("projString", p.choice().projection().projString());
            return part;
        }).toList();
    }
}
