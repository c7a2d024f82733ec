package aequa.publish;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.project.ClassMethod;
import aequa.classes.Classification;
import aequa.colour.ColourRamp;
import aequa.colour.Rgb;
import aequa.planar.AreaAudit;
import aequa.project.ColourScheme;
import aequa.project.MapDisplay;
import aequa.project.MapSpec;
import aequa.project.Measure;
import aequa.project.Normalisation;
import aequa.project.ProjectFile;
import aequa.project.SiteSpec;
import aequa.project.Words;
import aequa.projection.ChoiceReason;
import aequa.projection.ProjectionChoice;
import aequa.projection.Projections;
import aequa.statistics.FigureStatus;

/**
 * Small invented atlases for the publishing tests: a grid of square regions (100 km sides, in metres on a
 * Lambert azimuthal equal-area plane) with figures of every status. Invented data, never an oracle: the
 * tests check properties of the publish (bytes, files, escaping), not the figures.
 */
final class SiteFixtures {

    /** The reason of an automatic choice for compact data, with no other candidate. */
    static final ChoiceReason AUTOMATIC_ROUND = new ChoiceReason(ChoiceReason.Basis.AUTOMATIC,
            ChoiceReason.Setting.ROUND_AREA, ChoiceReason.Comparison.NONE);

    static final String NOTICE = "All places and figures on this site are invented.";

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private SiteFixtures() {
    }

    /** A region name/title/notes set: plain, or hostile (markup, quotes, ampersand, RTL override, length). */
    record Texts(String siteTitle, String mapTitle, String regionName, String notes, String source) {
        static Texts plain() {
            return new Texts("Invented Atlas", "Clinics per 1,000 people", "Norvale", "Figures are invented.",
                    "Invented Survey Office");
        }

        static Texts hostile() {
            String rtl = "\u202Egnp.exe";
            return new Texts("Atlas <script>alert('site')</script> & \"co\"",
                    "Map <script>alert(1)</script> & 'quotes' \"double\" " + rtl,
                    "=HYPERLINK(\"http://x.invalid\",\"click\") <b>bold</b> & " + rtl,
                    "<img src=x onerror=alert(2)> " + "long ".repeat(2000),
                    "@SUM(A1:A9) & <i>source</i>");
        }
    }

    static Atlas atlas(java.nio.file.Path projectDir, Texts texts, int mapCount, int regionsPerMap) {
        List<MapModel> maps = new ArrayList<>();
        for (int m = 0; m < mapCount; m++) {
            maps.add(map("map-" + (char) ('a' + m), texts, regionsPerMap, 0.0));
        }
        return atlas(projectDir, texts, maps);
    }

    static Atlas atlas(java.nio.file.Path projectDir, Texts texts, List<MapModel> maps) {
        SiteSpec site = new SiteSpec(texts.siteTitle(), "Invented Mapping Collective", NOTICE, null, "en");
        ProjectFile project = new ProjectFile(site, Map.of(), Map.of(), null, null,
                maps.stream().map(MapModel::spec).toList());
        return new Atlas(projectDir, project, maps);
    }

    /**
     * One map of {@code regionCount} squares with values 10, 20, 30, ... shifted by {@code shift}; region 1
     * has no data, region 2 is suppressed, region 3 is not applicable, region 4 reports zero and is unreliable.
     */
    static MapModel map(String id, Texts texts, int regionCount, double shift) {
        return map(id, texts, regionCount, shift, "choropleth");
    }

    /** As {@link #map(String, Texts, int, double)}, drawn as {@code display} (choropleth or circles). */
    static MapModel map(String id, Texts texts, int regionCount, double shift, String display) {
        MapSpec spec = MapSpec.builder(id).title(texts.mapTitle() + " " + id).regions("units").figures("figures")
                .indicator("clinics").periods(List.of("2031")).measure(Measure.RATE).normalise(Normalisation.COLUMN)
                .per("people").multiplier(1000.0).unit("clinics per 1,000 people").display(Words.of(MapDisplay.class, display))
                .notes(texts.notes()).source(texts.source()).asOf("March 2031").build();
        List<MapRegion> regions = new ArrayList<>();
        List<Double> reported = new ArrayList<>();
        for (int i = 0; i < regionCount; i++) {
            String key = String.format(java.util.Locale.ROOT, "K%03d", i);
            String name = i == 0 ? texts.regionName() : "Region " + i;
            RegionValue value = switch (i) {
                case 1 -> RegionValue.noData();
                case 2 -> new RegionValue(FigureStatus.SUPPRESSED, Double.NaN, Double.NaN, Double.NaN, false, -1);
                case 3 -> new RegionValue(FigureStatus.NOT_APPLICABLE, Double.NaN, Double.NaN, Double.NaN, false, -1);
                default -> {
                    double v = i == 4 ? 0.0 : 10.0 * i + shift;
                    reported.add(v);
                    yield new RegionValue(FigureStatus.REPORTED, v, v, Double.NaN, i == 4, -2);
                }
            };
            regions.add(new MapRegion(key, name, 10_000.0, 1.0 + 1e-9 * i, square(i), List.of(value)));
        }
        double min = reported.stream().mapToDouble(Double::doubleValue).min().orElse(0);
        double max = reported.stream().mapToDouble(Double::doubleValue).max().orElse(1);
        double mid = (min + max) / 2;
        List<Integer> counts = List.of((int) reported.stream().filter(v -> v < mid).count(),
                (int) reported.stream().filter(v -> v >= mid).count());
        Classification classes = new Classification(ClassMethod.QUANTILE, List.of(min, mid, max), counts);
        List<MapRegion> classified = regions.stream().map(r -> withClass(r, classes)).toList();
        ColourRamp ramp = new ColourRamp(ColourScheme.SEQUENTIAL, List.of(Rgb.fromHex("#dfe9f5"), Rgb.fromHex("#2a5a8c")),
                List.of(Rgb.fromHex("#000000"), Rgb.fromHex("#ffffff")), List.of());
        ProjectionChoice choice = new ProjectionChoice(Projections.lambertAzimuthal(10, 52), 1.25, 0.5, 12, 55,
                List.of(), AUTOMATIC_ROUND);
        return new MapModel(spec, List.of("2031"), choice, classified, classes, ramp,
                new AreaAudit(3e-9, "K002", 1e-4), List.of("One region has no figure."));
    }

    private static MapRegion withClass(MapRegion region, Classification classes) {
        RegionValue v = region.values().get(0);
        if (v.classIndex() != -2) {
            return region;
        }
        RegionValue classed = new RegionValue(v.status(), v.value(), v.normalisedValue(), v.marginOfError(),
                v.unreliable(), classes.classOf(v.normalisedValue()));
        return new MapRegion(region.key(), region.name(), region.geodesicAreaKm2(), region.mapAreaRatio(),
                region.planarM(), List.of(classed));
    }

    /** A 100 km square at grid cell {@code i} (10 per row), in metres. */
    private static Polygon square(int i) {
        double x = (i % 10) * 100_000.0;
        double y = (i / 10) * 100_000.0;
        return GEOMETRY.createPolygon(new Coordinate[] {new Coordinate(x, y), new Coordinate(x + 100_000, y),
            new Coordinate(x + 100_000, y + 100_000), new Coordinate(x, y + 100_000), new Coordinate(x, y)});
    }
}
