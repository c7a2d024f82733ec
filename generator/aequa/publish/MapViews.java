package aequa.publish;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

import aequa.atlas.MapModel;
import aequa.atlas.MapPart;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.classes.ClassMethod;
import aequa.classes.Classification;
import aequa.classes.FigureText;
import aequa.pages.FiguresView;
import aequa.pages.IndexView;
import aequa.pages.MapPageView;
import aequa.pages.NumberText;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionParameter;
import aequa.statistics.FigureStatus;

/** Turns one {@link MapModel} into the views of its card, page and figures table. */
final class MapViews {

    private MapViews() {
    }

    static IndexView.Card card(MapModel map, MapFiles files) {
        return new IndexView.Card(map.spec().title(), map.spec().asOf(), map.spec().unit(), files.page(), files.png(),
                "Small map: " + map.spec().title());
    }

    static MapPageView page(MapModel map, MapFiles files, String webSvg) {
        List<MapPageView.Download> downloads = List.of(
                new MapPageView.Download("Map for print (SVG)", fileName(files.printSvg()), "image/svg+xml"),
                new MapPageView.Download("Map for print (PDF)", fileName(files.pdf()), "application/pdf"),
                new MapPageView.Download("Map as picture (PNG)", fileName(files.png()), "image/png"),
                new MapPageView.Download("Map as picture, double resolution (PNG)", fileName(files.pngDouble()), "image/png"),
                new MapPageView.Download("Figures shown (CSV)", fileName(files.csv()), "text/csv"));
        return new MapPageView(files.fileId(), map.spec().title(), map.spec().unit(), map.spec().asOf(), caption(map),
                summary(map), webSvg, map.spec().notes(), map.spec().source(), circles(map) ? List.of() : legend(map), circleKey(map), downloads,
                fileName(files.figures()));
    }

    static FiguresView figures(MapModel map, MapFiles files) {
        List<FiguresView.Row> rows = new ArrayList<>();
        java.util.Map<String, String> partOf = new java.util.HashMap<>();
        map.parts().forEach(part -> part.keys().forEach(key -> partOf.put(key, part.name())));
        for (MapRegion region : map.regions()) {
            List<FiguresView.Cell> cells = new ArrayList<>();
            for (int p = 0; p < map.periods().size(); p++) {
                RegionValue v = p < region.values().size() ? region.values().get(p) : RegionValue.noData();
                boolean reported = v.status() == FigureStatus.REPORTED;
                cells.add(new FiguresView.Cell(FiguresCsv.statusText(v), reported ? NumberText.of(v.value()) : "",
                        reported ? figure(map, v.normalisedValue()) : "",
                        v.classIndex() < 0 ? "" : Integer.toString(v.classIndex() + 1), v.unreliable(),
                        reported && Double.isFinite(v.marginOfError()) ? "\u00b1" + NumberText.of(v.marginOfError()) : ""));
            }
            rows.add(new FiguresView.Row(region.key(), region.name(), areaText(region.geodesicAreaKm2()), cells,
                    partOf.getOrDefault(region.key(), "")));
        }
        return new FiguresView(files.fileId(), map.spec().title(), map.spec().unit(), map.periods(), rows,
                fileName(files.page()), fileName(files.csv()), rows.stream().flatMap(r -> r.cells().stream()).anyMatch(c -> !c.margin().isEmpty()),
                map.composite());
    }

    /** "Lambert azimuthal equal-area projection (...) of the WGS 84 ellipsoid; figures: SOURCE, DATE." */
    static String caption(MapModel map) {
        StringBuilder text = new StringBuilder(map.projection().projection().family().displayName())
                .append(" projection");
        String params = map.projection().projection().parameters().stream().map(MapViews::parameterText)
                .collect(Collectors.joining(", "));
        if (!params.isEmpty()) {
            text.append(" (").append(params).append(')');
        }
        text.append(" on the WGS 84 ellipsoid; areas are true to within ")
                .append(percent(map.areaAudit().maxRelativeError())).append(" %.");
        if (!map.spec().source().isEmpty()) {
            text.append(" Figures: ").append(map.spec().source());
            text.append(map.spec().asOf().isEmpty() ? "." : ", " + map.spec().asOf() + ".");
        } else if (!map.spec().asOf().isEmpty()) {
            text.append(" Figures for ").append(map.spec().asOf()).append('.');
        }
        return text.toString();
    }

    static String parameterText(ProjectionParameter p) {
        String unit = "deg".equals(p.unit()) ? "°" : " " + p.unit();
        return p.name() + " " + NumberText.of(p.value()) + unit;
    }

    static String percent(double relative) {
        double percent = relative * 100;
        if (percent == 0 || !Double.isFinite(percent)) {
            return NumberText.of(percent);
        }
        // two significant figures are all an error bound needs (0.00039 %, 0.012 %)
        return new java.math.BigDecimal(percent).round(new java.math.MathContext(2)).stripTrailingZeros().toPlainString();
    }

    /** The text alternative: what the map shows, in how many classes, and its extremes (latest period). */
    static String summary(MapModel map) {
        int latest = map.periods().size() - 1;
        List<MapRegion> reported = map.regions().stream()
                .filter(r -> latest >= 0 && latest < r.values().size()
                        && r.values().get(latest).status() == FigureStatus.REPORTED)
                .sorted(Comparator.comparingDouble((MapRegion r) -> r.values().get(latest).normalisedValue())
                        .thenComparing(MapRegion::key))
                .collect(Collectors.toList());
        StringBuilder text = new StringBuilder(String.format(Locale.ROOT, "Map of %d regions", map.regions().size()));
        boolean circles = circles(map);
        String measure = map.spec().unit().isEmpty() ? "the figure" : "the figure (" + map.spec().unit() + ")";
        text.append(circles ? "; the area of each circle shows " : "; the colour of each region shows ").append(measure);
        if (map.classification().method() != ClassMethod.UNCLASSED) {
            text.append(" in ").append(map.classification().classCount()).append(" classes");
        }
        if (map.periods().size() > 1) {
            text.append(", one small map per period from ").append(map.periods().get(0)).append(" to ")
                    .append(map.periods().get(latest));
        }
        text.append('.');
        if (!reported.isEmpty()) {
            MapRegion low = reported.get(0);
            MapRegion high = reported.get(reported.size() - 1);
            text.append(" Highest: ").append(high.name()).append(" (")
                    .append(figure(map, high.values().get(latest).normalisedValue())).append("); lowest: ")
                    .append(low.name()).append(" (").append(figure(map, low.values().get(latest).normalisedValue()))
                    .append(").");
        }
        int without = map.regions().size() - reported.size();
        if (without > 0) {
            text.append(' ').append(without).append(without == 1 ? " region has" : " regions have")
                    .append(" no figure to map.");
        }
        return text.toString();
    }

    /**
     * A region's area for the figures table: whole km² from 100 km² up, else two significant figures
     * (boundary files are rarely accurate to better than a few hundredths of a region's area; report.json
     * keeps the full figure).
     */
    static String areaText(double areaKm2) {
        if (areaKm2 >= 100 || !(areaKm2 > 0)) {
            return FigureText.format(areaKm2, 0);
        }
        int decimals = Math.max(0, 1 - (int) Math.floor(Math.log10(areaKm2)));
        return FigureText.format(areaKm2, decimals);
    }

    /** A mapped figure as readers see it everywhere (see {@link FigureText}). */
    private static String figure(MapModel map, double value) {
        return FigureText.figure(value, map.classification().limits());
    }

    private static boolean circles(MapModel map) {
        return "circles".equals(map.spec().display());
    }

    /** What the circles of a proportional-symbol map show, and what the largest stands for; empty otherwise. */
    static String circleKey(MapModel map) {
        if (!circles(map)) {
            return "";
        }
        MapRegion largest = null;
        double largestValue = Double.NEGATIVE_INFINITY;
        int latest = map.periods().size() - 1;
        for (MapRegion region : map.regions()) {
            for (RegionValue v : region.values()) {
                if (v.status() == FigureStatus.REPORTED && v.normalisedValue() > largestValue) {
                    largest = region;
                    largestValue = v.normalisedValue();
                }
            }
        }
        String unit = map.spec().unit().isEmpty() ? "" : " " + map.spec().unit();
        String sentence = "The area of each circle is proportional to the figure"
                + (unit.isEmpty() ? "" : " (" + unit.strip() + ")") + ".";
        if (largest != null) {
            sentence += " The largest circle" + (latest > 0 ? " of all periods" : "") + " stands for "
                    + figure(map, largestValue) + unit
                    + ", in " + largest.name() + ".";
        }
        return sentence;
    }

    static List<MapPageView.LegendRow> legend(MapModel map) {
        Classification classes = map.classification();
        List<MapPageView.LegendRow> rows = new ArrayList<>();
        int fills = map.ramp().fills().size();
        int decimals = FigureText.limitDecimals(classes.limits());
        for (int i = 0; i < classes.classCount() && fills > 0; i++) {
            String from = FigureText.format(classes.limits().get(i), decimals);
            String to = FigureText.format(classes.limits().get(i + 1), decimals);
            boolean last = i == classes.classCount() - 1;
            String range = from + (last ? " to " : " to under ") + to;
            int fillIndex = Math.min(i, fills - 1);
            rows.add(new MapPageView.LegendRow(map.ramp().fills().get(fillIndex).hex(), range, classes.counts().get(i)));
        }
        return rows;
    }

    /** The last path segment, for links between files of the same map folder. */
    static String fileName(String path) {
        return path.substring(path.lastIndexOf('/') + 1);
    }

    /**
     * One sentence per part of a composite map, main part first: its regions, gap, projection, omega, and area
     * scale with its own area check. Empty for a map on one projection.
     */
    static List<String> partSentences(MapModel map) {
        List<String> sentences = new ArrayList<>();
        for (MapPart part : map.parts()) {
            ProjectionChoice choice = part.projection();
            String params = choice.projection().parameters().stream().map(MapViews::parameterText).collect(Collectors.joining(", "));
            StringBuilder s = new StringBuilder(part.name()).append(": ").append(part.keys().size())
                    .append(part.keys().size() == 1 ? " region, " : " regions, ").append(NumberText.of(Math.round(part.areaKm2())))
                    .append(" km²");
            if (!part.main() && Double.isFinite(part.gapKm())) {
                s.append(", ").append(NumberText.of(Math.round(part.gapKm()))).append(" km from the main map");
            }
            s.append(". ").append(choice.projection().family().displayName());
            if (!params.isEmpty()) {
                s.append(" (").append(params).append(')');
            }
            s.append("; omega at most ").append(NumberText.fixed(choice.omegaMaxDeg(), 2)).append("°, on average ")
                    .append(NumberText.fixed(choice.omegaMeanDeg(), 2)).append("°. ");
            s.append(part.main() ? "Its area scale is the map's."
                    : part.areaScale() == 1 ? "Drawn at the main map's area scale, so its areas compare with the rest of the map."
                    : "Drawn at " + part.areaScaleText() + " × the main map's area scale: its areas compare only with each other.");
            s.append(" Largest area difference from the ellipsoid at that scale: ")
                    .append(percent(part.areaAudit().maxRelativeError())).append(" %.");
            sentences.add(s.toString());
        }
        return sentences;
    }
}
