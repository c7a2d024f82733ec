package aequa.composite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.GeometryFactory;

import aequa.atlas.Atlas;
import aequa.atlas.AtlasLoader;
import aequa.atlas.FrameNameBands;
import aequa.atlas.LoadOptions;
import aequa.atlas.MapModel;
import aequa.atlas.MapPart;
import aequa.atlas.MapRegion;
import aequa.drawing.PrintPreset;
import aequa.drawing.PrintSize;
import aequa.drawing.Themes;
import aequa.drawing.WebSize;
import aequa.findings.Findings;
import aequa.project.LoadedProject;
import aequa.project.ProjectLoader;
import aequa.projection.Distortion;
import aequa.projection.EqualAreaProjection;
import aequa.projection.Footprint;
import aequa.projection.ProjectionFamily;
import aequa.projection.Projections;
import aequa.testing.RealProject;

/**
 * Composite maps of the US Census Bureau's 2017 counties and states (src/test/resources/geometry/SOURCE.md),
 * loaded as a fresh project with no projection or inset settings, and with a listed part drawn at a quarter
 * of the area scale. State FIPS codes (FIPS 5-2): 02 Alaska, 15 Hawaii, 72 Puerto Rico.
 */
class CompositeMapsTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private static MapModel counties;
    private static MapModel countiesOneProjection;
    private static MapModel statesScaled;
    private static MapModel countiesCircles;

    @BeforeAll
    static void load(@TempDir Path project) throws IOException {
        RealProject.in(project).regions("counties", "us-counties-2017.geojson").regions("states", "us-states-2017.geojson")
                .figures("counties", "id", "code_number", RealProject.codeModulo("id", 97))
                .figures("states", "id", "code_number", RealProject.codeModulo("id", 97))
                .projectFile(
                "regions:",
                "  counties: { file: regions/counties.geojson, key: id, name: name }",
                "  states: { file: regions/states.geojson, key: id, name: name }",
                "figures:",
                "  counties: { file: figures/counties.csv, key: code }",
                "  states: { file: figures/states.csv, key: code }",
                "maps:",
                "  - { id: counties, regions: counties, figures: counties, indicator: code_number, measure: rate }",
                "  - { id: counties-one, regions: counties, figures: counties, indicator: code_number, measure: rate, insets: off }",
                "  - id: states",
                "    regions: states",
                "    figures: states",
                "    indicator: code_number",
                "    measure: rate",
                "    insets:",
                "      - { name: Alaska, regions: [\"02\"], scale: 0.25, corner: bottom-left }",
                "      - { name: Hawaii, box: [-161, 18, -154, 23] }",
                "  - { id: counties-circles, regions: counties, figures: counties, indicator: code_number, measure: count, display: circles }");
        Findings findings = new Findings();
        LoadedProject loaded = ProjectLoader.load(project, findings).orElseThrow(() -> new AssertionError(findings.list()));
        // the name bands publish asks for with the default settings (CheckStep): the site's theme at the standard
        // web width, the print theme at the default print width (two columns)
        FrameNameBands bands = new FrameNameBands(WebSize.STANDARD.frameNameBandShare(Themes.bundled("daylight")),
                PrintSize.of(PrintPreset.TWO_COLUMNS).frameNameBandShare(Themes.bundled("newsprint")));
        Atlas atlas = AtlasLoader.load(loaded, LoadOptions.defaults().withFrameNameBands(bands), findings);
        assertTrue(!findings.hasErrors(), findings.list().toString());
        counties = atlas.maps().get(0);
        countiesOneProjection = atlas.maps().get(1);
        statesScaled = atlas.maps().get(2);
        countiesCircles = atlas.maps().get(3);
    }

    @Test
    void theCountiesFallIntoTheContiguousStatesAlaskaHawaiiAndTheTerritories() {
        List<Set<String>> statesByPart = counties.parts().stream().map(p -> {
            Set<String> states = new TreeSet<>();
            p.keys().forEach(k -> states.add(k.substring(0, 2)));
            return (Set<String>) states;
        }).toList();
        assertEquals(49, statesByPart.get(0).size(), "48 contiguous states and DC");
        assertEquals(List.of(Set.of("02"), Set.of("15"), Set.of("72", "78"), Set.of("66", "69"), Set.of("60")),
                statesByPart.subList(1, statesByPart.size()));
        assertTrue(counties.parts().stream().allMatch(p -> p.areaScale() == 1));
    }

    @Test
    void everyPartIsWithinTenPercentOfTheBestProjectionFoundByExhaustiveSearch() {
        RealRegions lonLat = RealRegions.read("us-counties-2017.geojson", "id");
        for (MapPart part : counties.parts()) {
            Set<String> keys = Set.copyOf(part.keys());
            Footprint footprint = Footprint.of(lonLat.regions().stream()
                    .filter(r -> keys.contains(r.key())).map(aequa.inputs.regions.Region::lonLat).toList());
            double best = exhaustiveBestOmegaDeg(footprint);
            double omega = part.projection().omegaMaxDeg();
            assertTrue(omega <= 1.1 * best + 0.01, part.name() + ": omega " + omega + " against a grid search's " + best);
        }
        // the issue's own figure: 6.6 deg for one projection of everything; the contiguous states alone need
        // what 'aequa explain' reports for them alone, 1.37 deg (Albers, this chooser)
        assertTrue(counties.parts().get(0).projection().omegaMaxDeg() < 1.5);
    }

    /** On the site's drawings and in print, whose frames are laid out for names set larger against the map. */
    @Test
    void noRegionOfOnePartTouchesAnotherPartsFrame() {
        for (MapModel map : List.of(counties, counties.forPrint())) {
            for (MapPart framed : map.parts()) {
                if (framed.main()) {
                    continue;
                }
                var frame = GEOMETRY.toGeometry(new Envelope(framed.frame().minXM(), framed.frame().maxXM(),
                        framed.frame().minYM(), framed.frame().maxYM()));
                Set<String> inside = Set.copyOf(framed.keys());
                for (MapRegion region : map.regions()) {
                    boolean intersects = frame.intersects(region.planarM());
                    assertEquals(inside.contains(region.key()) && !region.planarM().isEmpty(), intersects,
                            region.key() + " against the frame of " + framed.name());
                }
                for (MapPart other : map.parts()) {
                    assertTrue(other == framed || other.main() || !overlap(other.frame(), framed.frame()),
                            framed.name() + " and " + other.name());
                }
            }
        }
    }

    /**
     * Print moves framed parts and nothing else, by a translation: the main part's regions stay where they are,
     * every region's drawn area is the same, and the print's frames give the names their room at the default
     * print width (two columns) while the main part keeps most of the width (it had an eighth of it when the
     * site's and the print's frames were one layout laid out for print).
     */
    @Test
    void printMovesFramedPartsOnly() {
        MapModel print = counties.forPrint();
        Set<String> mainKeys = Set.copyOf(counties.parts().get(0).keys());
        assertTrue(counties.parts().stream().anyMatch(MapPart::movedInPrint), "the print lays out its own frames");
        for (int i = 0; i < counties.regions().size(); i++) {
            MapRegion site = counties.regions().get(i);
            MapRegion printed = print.regions().get(i);
            assertEquals(site.key(), printed.key());
            assertEquals(site.planarM().getArea(), printed.planarM().getArea(), 1e-9 * site.planarM().getArea() + 1e-6, site.key());
            if (mainKeys.contains(site.key())) {
                assertTrue(site.planarM().equalsExact(printed.planarM()), site.key());
            }
        }
        Envelope whole = new Envelope();
        print.parts().forEach(p -> whole.expandToInclude(new Envelope(p.frame().minXM(), p.frame().maxXM(), p.frame().minYM(), p.frame().maxYM())));
        double drawnWidthM = Math.max(whole.getWidth(), whole.getHeight() / 1.25); // drawing's tallest map block
        MapPart.Frame main = print.parts().get(0).frame();
        // measured 0.85 (the map is drawn by its height): Alaska and the territories below the contiguous states
        assertTrue((main.maxXM() - main.minXM()) / drawnWidthM > 0.75, "the main part's share of the print's width: " + (main.maxXM() - main.minXM()) / drawnWidthM);
    }

    private static boolean overlap(MapPart.Frame a, MapPart.Frame b) {
        return a.minXM() < b.maxXM() && b.minXM() < a.maxXM() && a.minYM() < b.maxYM() && b.minYM() < a.maxYM();
    }

    @Test
    void drawnAreasDividedByTheDeclaredScalesSumToTheGeodesicAreas() {
        for (MapModel map : List.of(counties, counties.forPrint(), statesScaled, statesScaled.forPrint())) {
            double drawnOverScaleKm2 = 0;
            double simplifiedOverScaleKm2 = 0;
            double geodesicKm2 = 0;
            for (MapPart part : map.parts()) {
                Set<String> keys = Set.copyOf(part.keys());
                for (MapRegion region : map.regions()) {
                    if (keys.contains(region.key())) {
                        // the audited area: the projected outline before simplification (MapRegion.mapAreaRatio)
                        drawnOverScaleKm2 += region.mapAreaRatio() * part.areaScale() * region.geodesicAreaKm2() / part.areaScale();
                        geodesicKm2 += region.geodesicAreaKm2();
                        simplifiedOverScaleKm2 += region.planarM().getArea() / 1e6 / part.areaScale();
                    }
                }
                assertTrue(part.areaAudit().passed(), part.name());
            }
            assertEquals(1, drawnOverScaleKm2 / geodesicKm2, 1e-4, map.id()); // the default area tolerance
            // the simplified outlines as drawn, islets too small to draw left out (reported): on the counties map
            // within the area tolerance too (measured 5.2e-5); with Alaska at a quarter scale, 2.5e-3
            assertEquals(1, simplifiedOverScaleKm2 / geodesicKm2, map.id().equals("counties") ? 1e-4 : 5e-3, map.id());
        }
    }

    @Test
    void aListedPartKeepsItsNameScaleAndCorner() {
        MapPart alaska = statesScaled.parts().get(1);
        assertEquals("Alaska", alaska.name());
        assertEquals(List.of("02"), alaska.keys());
        assertEquals(0.25, alaska.areaScale());
        MapPart main = statesScaled.parts().get(0);
        assertTrue(alaska.frame().maxXM() < (main.frame().minXM() + main.frame().maxXM()) / 2, "left");
        assertTrue(alaska.frame().maxYM() < (main.frame().minYM() + main.frame().maxYM()) / 2, "bottom");
        // drawn at a quarter of the area: the simplified outline's area over its geodesic area, within 2 % (at a
        // quarter scale more of Alaska's islets are too small to draw, and are reported as left out)
        MapRegion drawn = statesScaled.regions().stream().filter(r -> r.key().equals("02")).findFirst().orElseThrow();
        assertEquals(0.25, drawn.planarM().getArea() / 1e6 / drawn.geodesicAreaKm2(), 0.005);
        assertEquals(List.of("15"), statesScaled.parts().get(2).keys());
        assertEquals(3, statesScaled.parts().size(), "the other territories stay in the main part of a listed map");
    }

    /**
     * Circle maps and small multiples draw the same composite: a circle map of the counties has the choropleth's
     * parts and frames, and every panel of small multiples draws every part's regions and frame.
     */
    @Test
    void circleMapsAndSmallMultiplesUseTheSameComposite() {
        assertEquals(counties.parts().stream().map(p -> p.name() + p.keys() + p.frame()).toList(),
                countiesCircles.parts().stream().map(p -> p.name() + p.keys() + p.frame()).toList());
        String circles = new String(aequa.drawing.MapDrawings.webSvg(countiesCircles, aequa.drawing.Themes.bundled("daylight"),
                aequa.drawing.WebSize.STANDARD).bytes(), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(circles.contains("id='frame-part-1'") && circles.contains("id='regions-part-1'") && circles.contains("id='symbols'"));
        List<String> periods = List.of("2020", "2021");
        List<MapRegion> twice = counties.regions().stream().map(r -> new MapRegion(r.key(), r.name(), r.geodesicAreaKm2(),
                r.mapAreaRatio(), r.planarM(), List.of(r.values().get(0), r.values().get(0)))).toList();
        MapModel multiples = new MapModel(counties.spec(), periods, counties.projection(), twice, counties.classification(),
                counties.ramp(), counties.areaAudit(), counties.notices(), counties.parts(), counties.outlinesM());
        String svg = new String(aequa.drawing.MapDrawings.webSvg(multiples, aequa.drawing.Themes.bundled("daylight"),
                aequa.drawing.WebSize.STANDARD).bytes(), java.nio.charset.StandardCharsets.UTF_8);
        for (MapPart part : counties.parts()) {
            long layers = java.util.regex.Pattern.compile("id='regions-" + part.id() + "-").matcher(svg).results().count();
            assertEquals(2, layers, part.name() + ": a layer per panel");
            if (!part.main()) {
                assertEquals(2, java.util.regex.Pattern.compile("id='frame-" + part.id() + "-").matcher(svg).results().count(),
                        part.name() + ": a frame per panel");
            }
        }
    }

    /**
     * A part at its own area scale carries its own area-scale square: in the print SVG, the square in Alaska's
     * frame and the main map's square state areas in the ratio of their labels times the part's declared scale
     * (an equal-area drawing's page area is proportional to ground area times the scale: Snyder 1987, p. 4).
     */
    @Test
    void aPartAtItsOwnAreaScaleHasItsOwnSquare() {
        MapPart alaska = statesScaled.parts().get(1);
        assertTrue(alaska.scaleBandM() > 0);
        assertTrue(counties.parts().stream().allMatch(p -> p.scaleBandM() == 0), "parts at the main scale need no square");
        String svg = new String(aequa.drawing.MapDrawings.printSvg(statesScaled, aequa.drawing.Themes.bundled("newsprint"),
                aequa.drawing.PrintSize.of(aequa.drawing.PrintPreset.TWO_COLUMNS)).bytes(), java.nio.charset.StandardCharsets.UTF_8);
        double[] own = square(group(svg, "frame-part-1"));
        double[] main = square(group(svg, "area-scale"));
        assertEquals(alaska.areaScale() * own[1] / main[1], own[0] * own[0] / (main[0] * main[0]), 1e-3);
        assertTrue(!group(svg, "frame-part-2").contains("km²"), "Hawaii, at the main scale, has no square");
    }

    private static String group(String svg, String id) {
        int start = svg.indexOf("<g id='" + id + "'>");
        assertTrue(start >= 0, id);
        int depth = 0;
        int i = start;
        do {
            int open = svg.indexOf("<g", i + 1);
            int close = svg.indexOf("</g>", i + 1);
            if (open >= 0 && open < close) {
                depth++;
                i = open;
            } else {
                depth--;
                i = close;
            }
        } while (depth >= 0);
        return svg.substring(start, i);
    }

    /** The side of the group's filled square (page units) and the area its label states, km². */
    private static double[] square(String group) {
        var rect = java.util.regex.Pattern.compile("<rect x='[^']*' y='[^']*' width='([0-9.]+)' height='([0-9.]+)' style='fill:").matcher(group);
        assertTrue(rect.find(), group);
        var label = java.util.regex.Pattern.compile(">([0-9,]+) km²<").matcher(group);
        assertTrue(label.find(), group);
        return new double[] {Double.parseDouble(rect.group(1)), Double.parseDouble(label.group(1).replace(",", ""))};
    }

    /**
     * The share of the map's box (regions and frames) that regions fill: the issue measured well under a third
     * for one projection of the counties; the composite map must fill clearly more.
     */
    @Test
    void theCompositeMapFillsMoreOfItsFrame() {
        assertEquals(List.of(), countiesOneProjection.parts(), "insets: off draws one projection");
        double before = fillShare(countiesOneProjection);
        double after = fillShare(counties);
        assertTrue(before < 1.0 / 3, "one projection fills " + before);
        // measured: 6.6 % for one oblique projection, 30.5 % for the composite map (frames included)
        assertTrue(after > 3 * before, "composite fills " + after + " against " + before);
    }

    static double fillShare(MapModel map) {
        Envelope box = new Envelope();
        double areaM2 = 0;
        for (MapRegion r : map.regions()) {
            if (!r.planarM().isEmpty()) {
                box.expandToInclude(r.planarM().getEnvelopeInternal());
                areaM2 += r.planarM().getArea();
            }
        }
        for (MapPart p : map.parts()) {
            box.expandToInclude(new Envelope(p.frame().minXM(), p.frame().maxXM(), p.frame().minYM(), p.frame().maxYM()));
        }
        return areaM2 / box.getArea();
    }

    /**
     * The smallest largest-omega over the footprint's samples found by a grid search, independent of the chooser's
     * optimiser: Lambert azimuthal centres on a 21 x 21 grid over the data's box, and Albers with both standard
     * parallels on an 11-step grid over the data's latitudes (Snyder 1987: the usual choices for regional maps).
     */
    static double exhaustiveBestOmegaDeg(Footprint footprint) {
        double[] samples = footprint.samples().lonLatDeg();
        double best = Double.POSITIVE_INFINITY;
        double lonSpan = footprint.lonSpanDeg();
        double latSpan = footprint.maxLatDeg() - footprint.minLatDeg();
        for (int i = 0; i <= 20; i++) {
            for (int j = 0; j <= 20; j++) {
                double lon = wrap(footprint.centreLonDeg() - lonSpan / 2 + lonSpan * i / 20);
                double lat = footprint.minLatDeg() + latSpan * j / 20;
                best = Math.min(best, omegaMaxDeg(Projections.lambertAzimuthal(lon, lat), samples));
            }
        }
        if (footprint.minLatDeg() > 0 || footprint.maxLatDeg() < 0) {
            for (int a = 0; a <= 10; a++) {
                for (int b = a + 1; b <= 10; b++) {
                    double p1 = footprint.minLatDeg() + latSpan * a / 10;
                    double p2 = footprint.minLatDeg() + latSpan * b / 10;
                    EqualAreaProjection albers = Projections.create(ProjectionFamily.ALBERS_CONIC, Map.of("centre-lon",
                            footprint.centreLonDeg(), "centre-lat", footprint.midLatDeg(), "standard-parallel-1", p1,
                            "standard-parallel-2", p2));
                    best = Math.min(best, omegaMaxDeg(albers, samples));
                }
            }
        }
        return best;
    }

    private static double omegaMaxDeg(EqualAreaProjection projection, double[] lonLat) {
        double worst = 0;
        for (int k = 0; k < lonLat.length; k += 2) {
            double omega = Distortion.at(projection, lonLat[k], lonLat[k + 1]).omegaDeg();
            worst = Math.max(worst, Double.isNaN(omega) ? Double.POSITIVE_INFINITY : omega);
        }
        return worst;
    }

    private static double wrap(double lonDeg) {
        return ((lonDeg + 540) % 360) - 180;
    }

    /** A figure per region: its numeric code, real attribute data enough to classify and draw. */
}
