package aequa.drawing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.project.ClassMethod;
import aequa.classes.Classification;
import aequa.colour.ColourRamp;
import aequa.colour.Rgb;
import aequa.colour.WcagContrast;
import aequa.planar.AreaAudit;
import aequa.project.ColourScheme;
import aequa.project.MapDisplay;
import aequa.project.MapSpec;
import aequa.project.Measure;
import aequa.project.Normalisation;
import aequa.project.Words;
import aequa.projection.ChoiceReason;
import aequa.projection.EqualAreaProjection;
import aequa.projection.ProjectionChoice;
import aequa.projection.Projections;
import aequa.statistics.FigureStatus;

/**
 * Invented maps for drawing tests: a jittered grid of regions cut to an irregular "country", built directly
 * in projected metres (every shared edge is computed from the edge's identity, so neighbours share their
 * vertices exactly, like a real coverage). Values, names and classes are invented; nothing here is an oracle.
 */
public final class MapFixtures {

    static final GeometryFactory FACTORY = new GeometryFactory();
    static final double CELL_M = 40_000;

    /** The key of the fixture region that is an exact 100 km x 100 km square (10,000 km2). */
    static final String SQUARE_KEY = "SQ-100";

    private MapFixtures() {
    }

    /** A single-period choropleth of about {@code cols x rows x 0.7} regions with every status represented. */
    static MapModel choropleth(int cols, int rows) {
        return build(cols, rows, List.of("2024"), "choropleth", ClassMethod.QUANTILE, 5, 4);
    }

    public static MapModel build(int cols, int rows, List<String> periods, String display, ClassMethod method, int classes, int edgePoints) {
        List<Cell> cells = new ArrayList<>();
        for (int j = 0; j < rows; j++) {
            for (int i = 0; i < cols; i++) {
                double u = (i + 0.5) / cols - 0.5;
                double v = (j + 0.5) / rows - 0.5;
                double wobble = 0.08 * Math.sin(7 * u + 3 * v) + 0.05 * Math.cos(11 * v - 2 * u);
                if (u * u / 0.25 + v * v / 0.22 < 1 + wobble) {
                    cells.add(new Cell(i, j, cell(i, j, edgePoints)));
                }
            }
        }
        List<MapRegion> regions = new ArrayList<>();
        List<Double> pooled = new ArrayList<>();
        double[][] values = new double[cells.size()][periods.size()];
        for (int c = 0; c < cells.size(); c++) {
            Cell cell = cells.get(c);
            for (int p = 0; p < periods.size(); p++) {
                double base = 20 + 60 * (cell.i / (double) cols) + 25 * Math.sin(cell.j * 0.7 + cell.i * 0.3) + 8 * p;
                values[c][p] = Math.max(0.5, Math.round(base * 10) / 10.0);
                if (!special(c)) {
                    pooled.add(values[c][p]);
                }
            }
        }
        List<Double> limits = quantileLimits(pooled, classes);
        Classification classification = new Classification(method, limits, new ArrayList<>(java.util.Collections.nCopies(limits.size() - 1, 0)));
        int[] counts = new int[limits.size() - 1];
        for (int c = 0; c < cells.size(); c++) {
            Cell cell = cells.get(c);
            List<RegionValue> rv = new ArrayList<>();
            for (int p = 0; p < periods.size(); p++) {
                rv.add(valueFor(c, values[c][p], classification, counts));
            }
            String key = String.format(java.util.Locale.ROOT, "K%03d", c);
            regions.add(new MapRegion(key, Names.of(c), cell.polygon.getArea() / 1e6, 1.0, cell.polygon, rv));
        }
        // one exact 100 km square, away from the grid, for the area-scale check
        double x0 = -60_000;
        double y0 = -60_000;
        Polygon square = FACTORY.createPolygon(new Coordinate[]{new Coordinate(x0, y0), new Coordinate(x0 + 100_000, y0),
                new Coordinate(x0 + 100_000, y0 + 100_000), new Coordinate(x0, y0 + 100_000), new Coordinate(x0, y0)});
        List<RegionValue> squareValues = new ArrayList<>();
        for (int p = 0; p < periods.size(); p++) {
            squareValues.add(valueFor(0, limits.get(0), classification, counts));
        }
        regions.add(new MapRegion(SQUARE_KEY, "Quadra", 10_000, 1.0, square, squareValues));
        List<Integer> countList = Arrays.stream(counts).boxed().toList();
        Classification finalClasses = new Classification(method, limits, countList);
        regions.sort(java.util.Comparator.comparing(MapRegion::key));
        return model(display, periods, regions, finalClasses, ramp(limits.size() - 1), Projections.lambertAzimuthal(10, 52));
    }

    static MapModel model(String display, List<String> periods, List<MapRegion> regions, Classification classes, ColourRamp ramp,
                          EqualAreaProjection projection) {
        MapSpec spec = MapSpec.builder("clinics").title("Clinics within reach, per 1,000 km\u00b2").regions("r").figures("f")
                .indicator("clinics").periods(periods).measure(display.equals("circles") ? Measure.COUNT : Measure.RATE)
                .normalise(Normalisation.NONE).unit(display.equals("circles") ? "clinics" : "per 1,000 km\u00b2")
                .display(Words.of(MapDisplay.class, display)).source("Invented survey of the Ostmark health office")
                .asOf(periods.get(periods.size() - 1)).build();
        ProjectionChoice choice = new ProjectionChoice(projection, 2.4, 0.9, 12, 58, List.of(),
                new ChoiceReason(ChoiceReason.Basis.AUTOMATIC, ChoiceReason.Setting.ROUND_AREA, ChoiceReason.Comparison.NONE));
        return new MapModel(spec, periods, choice, regions, classes, ramp, new AreaAudit(2e-9, "K001", 1e-6),
                List.of("Figures for 3 regions are missing."));
    }

    /** {@code map} with {@code spec} in place of its own; everything else as it is. */
    static MapModel withSpec(MapModel map, MapSpec spec) {
        return new MapModel(spec, map.periods(), map.projection(), map.regions(), map.classification(), map.ramp(),
                map.areaAudit(), map.notices(), map.parts(), map.outlinesM());
    }

    /** Fills generated for the fixture: lightness falls evenly from a pale to a deep blue-green. */
    static ColourRamp ramp(int n) {
        Rgb light = new Rgb(232, 243, 238);
        Rgb dark = new Rgb(18, 72, 96);
        ColourRamp ends = new ColourRamp(ColourScheme.SEQUENTIAL, List.of(light, dark), List.of(dark, light), List.of());
        List<Rgb> fills = new ArrayList<>();
        List<Rgb> labels = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            Rgb fill = ends.colourAt(n == 1 ? 0 : k / (double) (n - 1));
            fills.add(fill);
            labels.add(WcagContrast.ratio(fill, new Rgb(255, 255, 255)) >= 4.5 ? new Rgb(255, 255, 255) : new Rgb(30, 36, 48));
        }
        return new ColourRamp(ColourScheme.SEQUENTIAL, fills, labels, List.of());
    }

    /** Region indices that carry a special status: 3 no data, 5 withheld, 8 not applicable, 11 and 12 unreliable. */
    private static boolean special(int c) {
        return c == 3 || c == 5 || c == 8;
    }

    private static RegionValue valueFor(int c, double value, Classification classes, int[] counts) {
        if (c == 3) {
            return RegionValue.noData();
        }
        if (c == 5) {
            return new RegionValue(FigureStatus.SUPPRESSED, Double.NaN, Double.NaN, Double.NaN, false, -1);
        }
        if (c == 8) {
            return new RegionValue(FigureStatus.NOT_APPLICABLE, Double.NaN, Double.NaN, Double.NaN, false, -1);
        }
        int cls = classes.classOf(value);
        counts[cls]++;
        return new RegionValue(FigureStatus.REPORTED, value, value, Double.NaN, c == 11 || c == 12, cls);
    }

    private static List<Double> quantileLimits(List<Double> values, int classes) {
        List<Double> sorted = new ArrayList<>(values);
        sorted.sort(null);
        List<Double> limits = new ArrayList<>();
        limits.add(sorted.get(0));
        for (int k = 1; k < classes; k++) {
            limits.add(Math.round(sorted.get(k * sorted.size() / classes) * 10) / 10.0);
        }
        limits.add(sorted.get(sorted.size() - 1));
        return limits;
    }

    private record Cell(int i, int j, Polygon polygon) {
    }

    /** A jittered cell whose edges each carry {@code edgePoints} wiggling intermediate vertices. */
    private static Polygon cell(int i, int j, int edgePoints) {
        List<Coordinate> ring = new ArrayList<>();
        addEdge(ring, i, j, i + 1, j, edgePoints);
        addEdge(ring, i + 1, j, i + 1, j + 1, edgePoints);
        addEdge(ring, i + 1, j + 1, i, j + 1, edgePoints);
        addEdge(ring, i, j + 1, i, j, edgePoints);
        ring.add(new Coordinate(ring.get(0)));
        return FACTORY.createPolygon(ring.toArray(new Coordinate[0]));
    }

    /** Adds the corner (a) and the intermediate points of edge a-b; identical for both neighbours, reversed. */
    private static void addEdge(List<Coordinate> ring, int ai, int aj, int bi, int bj, int points) {
        ring.add(corner(ai, aj));
        boolean forward = ai < bi || (ai == bi && aj < bj);
        for (int k = 0; k < points; k++) {
            int index = forward ? k : points - 1 - k;
            double t = (index + 1.0) / (points + 1.0);
            int si = Math.min(ai, bi);
            int sj = Math.min(aj, bj);
            Coordinate p = corner(Math.min(ai, bi), Math.min(aj, bj));
            Coordinate q = corner(Math.max(ai, bi), Math.max(aj, bj));
            double wiggle = CELL_M * 0.06 * Math.sin(si * 12.9898 + sj * 78.233 + index * 3.7 + (ai == bi ? 1.3 : 0));
            double dx = q.x - p.x;
            double dy = q.y - p.y;
            double len = Math.hypot(dx, dy);
            ring.add(new Coordinate(p.x + t * dx - dy / len * wiggle, p.y + t * dy + dx / len * wiggle));
        }
    }

    private static Coordinate corner(int i, int j) {
        double jx = CELL_M * 0.22 * Math.sin(i * 1.7 + j * 2.3);
        double jy = CELL_M * 0.22 * Math.cos(i * 2.9 - j * 1.1);
        return new Coordinate(i * CELL_M + jx, j * CELL_M + jy);
    }

    /** Invented place names built from syllables. */
    static final class Names {
        private static final String[] FIRST = {"Al", "Ber", "Cas", "Dor", "El", "Fen", "Gal", "Hal", "Is", "Jor", "Kel", "Lun"};
        private static final String[] SECOND = {"vik", "dal", "mora", "stad", "wen", "holm", "ra", "tor", "ven", "ska"};

        static String of(int c) {
            return FIRST[c % FIRST.length] + SECOND[(c / FIRST.length + c) % SECOND.length];
        }
    }

    static Geometry union(List<MapRegion> regions) {
        return FACTORY.buildGeometry(regions.stream().map(MapRegion::planarM).toList()).union();
    }
}
