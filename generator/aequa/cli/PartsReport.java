package aequa.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import aequa.atlas.FrameNameBands;
import aequa.atlas.MapPart;
import aequa.atlas.PartPlacement;
import aequa.composite.CompositePlanner;
import aequa.drawing.PrintPreset;
import aequa.drawing.PrintSize;
import aequa.drawing.Themes;
import aequa.composite.PartPlan;
import aequa.ellipsoid.LonLatArea;
import aequa.ellipsoid.LonLatDensifier;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.project.ChecksSpec;
import aequa.project.InsetsSpec;
import aequa.project.SiteSpec;
import aequa.publish.DrawingSettings;
import aequa.projection.ProjectionRequest;

/**
 * The parts {@code explain} reports: what a map of a file's regions is drawn in with the default
 * {@code insets: auto}, each part's regions, gap to the main part, projection and placement on the site's drawings
 * and in print at the default print width (the quarter of the main map its frame sits in, and its frame on the
 * main part's plane), for a person or a script.
 */
final class PartsReport {

    /** The site settings of a project whose file sets none. */
    private static final SiteSpec DEFAULT_SITE = new SiteSpec(null, null, null, null, null);

    private PartsReport() {
    }

    /** The planned parts, and (for a composite map) where the layout puts each one's frame. */
    record Parts(List<PartPlan> plans, List<MapPart> placed) {
    }

    /**
     * The automatic parts of {@code regions} (one part when nothing lies apart), placed as publish places them for a
     * project with the default print settings.
     */
    static Parts plan(String file, List<Region> regions, Findings findings) {
        Map<String, Double> areas = new LinkedHashMap<>();
        List<Region> densified = new ArrayList<>(regions.size());
        for (Region r : regions) {
            // densified and measured as the load step does (RegionLayers): exactly along the lon/lat edges
            Region fine = r.withLonLat(LonLatDensifier.densify(r.lonLat(), LonLatDensifier.MAX_STEP_DEG));
            densified.add(fine);
            areas.put(r.key(), LonLatArea.areaKm2(fine.lonLat()));
        }
        List<PartPlan> plans = CompositePlanner.plan(regions, areas, InsetsSpec.AUTO, ProjectionRequest.automatic(),
                new CompositePlanner.SettingPlace(pointer -> "", "/insets"), findings);
        List<MapPart> placed = plans.size() <= 1 ? List.of()
                : PartPlacement.place(file, densified, areas, plans, ChecksSpec.DEFAULT_AREA_TOLERANCE, defaultFrameNameBands());
        return new Parts(plans, placed);
    }

    private static String size(MapPart.Frame f) {
        return String.format(Locale.ROOT, "%,.0f x %,.0f km", (f.maxXM() - f.minXM()) / 1000, (f.maxYM() - f.minYM()) / 1000);
    }

    /** The frames' least name bands as a project with the default site and print settings lays them out. */
    private static FrameNameBands defaultFrameNameBands() {
        PrintSize print = PrintSize.of(PrintPreset.fromConfigName(DEFAULT_SITE.printWidth()).orElseThrow());
        return new DrawingSettings(Themes.bundled(DEFAULT_SITE.theme()), Themes.bundled(DEFAULT_SITE.printTheme()), print)
                .frameNameBands();
    }

    /**
     * Where a framed part sits against the main map, in words: the quarter its frame's centre lies in, and
     * whether the frame lies inside the main map's box (in an empty corner of it) or beside it.
     */
    static String placement(MapPart part, MapPart main) {
        MapPart.Frame f = part.frame();
        MapPart.Frame m = main.frame();
        double x = (f.minXM() + f.maxXM()) / 2;
        double y = (f.minYM() + f.maxYM()) / 2;
        String corner = (y >= (m.minYM() + m.maxYM()) / 2 ? "top" : "bottom") + "-" + (x < (m.minXM() + m.maxXM()) / 2 ? "left" : "right");
        boolean inside = f.minXM() >= m.minXM() && f.maxXM() <= m.maxXM() && f.minYM() >= m.minYM() && f.maxYM() <= m.maxYM();
        return corner + (inside ? ", inside the main map's box" : ", beside the main map");
    }

    static String text(Parts report) {
        List<PartPlan> parts = report.plans();
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
            if (!p.main() && parts.indexOf(p) < report.placed().size()) {
                MapPart placed = report.placed().get(parts.indexOf(p));
                MapPart main = report.placed().get(0);
                s.append(String.format(Locale.ROOT, "      on the site: placed %s; frame %s%n", placement(placed, main), size(placed.frame())));
                s.append(String.format(Locale.ROOT, "      in print (%s): placed %s; frame %s%n", DEFAULT_SITE.printWidth(),
                        placement(placed.inPrint(), main.inPrint()), size(placed.print().frame())));
            }
        }
        return s.toString();
    }

    /** Where {@code placed} sits against {@code main}, for a script: its quarter (a framed part's) and its frame. */
    private static Map<String, Object> placementJson(MapPart placed, MapPart main) {
        Map<String, Object> placement = new LinkedHashMap<>();
        if (!placed.main()) {
            String words = placement(placed, main);
            placement.put("corner", words.substring(0, words.indexOf(',')));
            placement.put("insideMainBox", words.contains("inside"));
        }
        MapPart.Frame f = placed.frame();
        placement.put("frameM", List.of(f.minXM(), f.minYM(), f.maxXM(), f.maxYM()));
        return placement;
    }

    static List<Map<String, Object>> json(Parts report) {
        List<PartPlan> parts = report.plans();
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
            int index = parts.indexOf(p);
            if (index < report.placed().size()) {
                MapPart placed = report.placed().get(index);
                MapPart main = report.placed().get(0);
                part.put("placement", placementJson(placed, main));
                part.put("printPlacement", placementJson(placed.inPrint(), main.inPrint()));
            }
            return part;
        }).toList();
    }
}
