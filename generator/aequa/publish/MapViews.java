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
import aequa.project.ClassMethod;
import aequa.classes.Classification;
import aequa.drawing.PartSentences;
import aequa.pages.EmbedView;
import aequa.pages.FiguresView;
import aequa.pages.IndexView;
import aequa.pages.MapPageView;
import aequa.project.MapDisplay;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionParameter;
import aequa.statistics.FigureStatus;
import aequa.wording.NumberWriter;
import aequa.wording.ProjectionWords;
import aequa.wording.Wording;

/** Turns one {@link MapModel} into the views of its card, page and figures table, in one language. */
final class MapViews {

    private MapViews() {
    }

    static IndexView.Card card(MapModel map, MapFiles files, Wording w) {
        return new IndexView.Card(map.spec().title(), w.numbers().period(map.spec().asOf()), map.spec().unit(), files.page(),
                files.png(), w.text("index.thumbAlt", "title", map.spec().title()));
    }

    static MapPageView page(MapModel map, MapFiles files, String webSvg, Wording w) {
        List<MapPageView.Download> downloads = List.of(
                new MapPageView.Download(w.text("download.printSvg"), fileName(files.printSvg()), "image/svg+xml"),
                new MapPageView.Download(w.text("download.pdf"), fileName(files.pdf()), "application/pdf"),
                new MapPageView.Download(w.text("download.png"), fileName(files.png()), "image/png"),
                new MapPageView.Download(w.text("download.pngDouble"), fileName(files.pngDouble()), "image/png"),
                new MapPageView.Download(w.text("download.csv"), fileName(files.csv()), "text/csv"));
        return new MapPageView(files.fileId(), map.spec().title(), map.spec().unit(), w.numbers().period(map.spec().asOf()),
                caption(map, w), summary(map, w), webSvg, map.spec().notes(), map.spec().source(),
                circles(map) ? List.of() : legend(map, w), circleKey(map, w), downloads, fileName(files.figures()));
    }

    /** What the map page offers for other sites' pages, and where the embed page and fragment link to. */
    static EmbedView embed(MapModel map, MapFiles files, String webSvg) {
        int keyRows = circles(map) ? 1 : map.classification().classCount();
        // the assets are shared at the site's root; a language's folder is one level below it
        String toSiteRoot = files.languagePrefix().isEmpty() ? "../../" : "../../../";
        String frame = FrameCode.of(map.spec().title(), fileName(files.embed()), toSiteRoot + "assets/embed-host.js",
                FrameCode.fallbackHeightPx(webSvg, keyRows));
        return new EmbedView(frame, fileName(files.fragment()), fileName(files.page()), "../../method.html#cautions");
    }

    static FiguresView figures(MapModel map, MapFiles files, Wording w) {
        NumberWriter numbers = w.numbers();
        List<FiguresView.Row> rows = new ArrayList<>();
        java.util.Map<String, String> partOf = new java.util.HashMap<>();
        map.parts().forEach(part -> part.keys().forEach(key -> partOf.put(key, part.nameIn(w))));
        for (MapRegion region : map.regions()) {
            List<FiguresView.Cell> cells = new ArrayList<>();
            for (int p = 0; p < map.periods().size(); p++) {
                RegionValue v = p < region.values().size() ? region.values().get(p) : RegionValue.noData();
                boolean reported = v.status() == FigureStatus.REPORTED;
                cells.add(new FiguresView.Cell(FiguresCsv.statusText(v), statusLabel(v, w),
                        reported ? numbers.significant(v.value()) : "",
                        reported ? numbers.figure(v.normalisedValue(), map.classification().limits()) : "",
                        v.classIndex() < 0 ? "" : numbers.integer(v.classIndex() + 1L), v.unreliable(),
                        reported && Double.isFinite(v.marginOfError())
                                ? w.text("figures.plusMinus", "margin", numbers.significant(v.marginOfError())) : ""));
            }
            rows.add(new FiguresView.Row(region.key(), region.name(), areaText(region.geodesicAreaKm2(), numbers), cells,
                    partOf.getOrDefault(region.key(), "")));
        }
        List<String> periods = map.periods().stream().map(numbers::period).toList();
        return new FiguresView(files.fileId(), map.spec().title(), map.spec().unit(), periods, rows,
                fileName(files.page()), fileName(files.csv()), rows.stream().flatMap(r -> r.cells().stream()).anyMatch(c -> !c.margin().isEmpty()),
                map.composite());
    }

    /** The status of a figure in the page's language. */
    static String statusLabel(RegionValue v, Wording w) {
        return switch (v.status()) {
            case REPORTED -> w.text(v.value() == 0 ? "status.zero" : "status.reported");
            case NO_DATA -> w.text("status.noData");
            case SUPPRESSED -> w.text("status.suppressed");
            case NOT_APPLICABLE -> w.text("status.notApplicable");
        };
    }

    /** "Lambert azimuthal equal-area projection (...) on the WGS 84 ellipsoid; ...; figures: SOURCE, DATE." */
    static String caption(MapModel map, Wording w) {
        String projection = projectionText(map.projection(), w);
        StringBuilder text = new StringBuilder(w.sentence(w.text(map.areaAudit().passed() ? "caption.onEllipsoid" : "caption.onEllipsoidNotTrue", "projection", projection,
                "error", errorPercent(map.areaAudit().maxRelativeError(), w))));
        if (map.composite()) {
            // parts at another area scale: the areas are true at each part's declared scale, and the caption says so
            text.append(' ').append(PartSentences.forPage(map, w));
        }
        String source = map.spec().source();
        String asOf = w.numbers().period(map.spec().asOf());
        if (!source.isEmpty()) {
            text.append(' ').append(asOf.isEmpty() ? w.text("caption.figuresSource", "source", source)
                    : w.text("caption.figuresSourceDate", "source", source, "date", asOf));
        } else if (!asOf.isEmpty()) {
            text.append(' ').append(w.text("caption.figuresDate", "date", asOf));
        }
        return text.toString();
    }

    static String projectionText(ProjectionChoice choice, Wording w) {
        return ProjectionWords.projection(choice, w);
    }

    static String parameterText(ProjectionParameter p, Wording w) {
        return ProjectionWords.parameter(p, w);
    }

    /** A relative error as a percentage with two significant digits (0.00039 %, 0.012 %): all a bound needs. */
    static String errorPercent(double relative, Wording w) {
        return w.numbers().errorPercent(relative * 100);
    }

    /** The text alternative: what the map shows, in how many classes, and its extremes (latest period). */
    static String summary(MapModel map, Wording w) {
        int latest = map.periods().size() - 1;
        List<MapRegion> reported = map.regions().stream()
                .filter(r -> latest >= 0 && latest < r.values().size()
                        && r.values().get(latest).status() == FigureStatus.REPORTED)
                .sorted(Comparator.comparingDouble((MapRegion r) -> r.values().get(latest).normalisedValue())
                        .thenComparing(MapRegion::key))
                .collect(Collectors.toList());
        String regions = w.text("summary.regions", "count", map.regions().size());
        String measure = map.spec().unit().isEmpty() ? w.text("summary.measure") : w.text("summary.measureUnit", "unit", map.spec().unit());
        String text = w.text(circles(map) ? "summary.circles" : "summary.colours", "regions", regions, "measure", measure);
        if (map.classification().method() != ClassMethod.UNCLASSED) {
            text = w.text("summary.classes", "text", text, "count", map.classification().classCount());
        }
        if (map.periods().size() > 1) {
            text = w.text("summary.periods", "text", text, "first", w.numbers().period(map.periods().get(0)),
                    "last", w.numbers().period(map.periods().get(latest)));
        }
        StringBuilder out = new StringBuilder(w.text("summary.end", "text", text));
        if (!reported.isEmpty()) {
            MapRegion low = reported.get(0);
            MapRegion high = reported.get(reported.size() - 1);
            out.append(' ').append(w.text("summary.extremes", "high", high.name(),
                    "highValue", figure(map, high.values().get(latest).normalisedValue(), w),
                    "low", low.name(), "lowValue", figure(map, low.values().get(latest).normalisedValue(), w)));
        }
        int without = map.regions().size() - reported.size();
        if (without > 0) {
            out.append(' ').append(w.text("summary.withoutFigure", "count", without));
        }
        return out.toString();
    }

    /**
     * A region's area for the figures table: whole km² from 100 km² up, else two significant figures
     * (boundary files are rarely accurate to better than a few hundredths of a region's area; report.json
     * keeps the full figure).
     */
    static String areaText(double areaKm2, NumberWriter numbers) {
        if (areaKm2 >= 100 || !(areaKm2 > 0)) {
            return numbers.fixed(areaKm2, 0);
        }
        int decimals = Math.max(0, 1 - (int) Math.floor(Math.log10(areaKm2)));
        return numbers.fixed(areaKm2, decimals);
    }

    /** A mapped figure as readers see it everywhere (aequa.classes.FigureText's precision). */
    private static String figure(MapModel map, double value, Wording w) {
        return w.numbers().figure(value, map.classification().limits());
    }

    private static boolean circles(MapModel map) {
        return map.spec().display() == MapDisplay.CIRCLES;
    }

    /** What the circles of a proportional-symbol map show, and what the largest stands for; empty otherwise. */
    static String circleKey(MapModel map, Wording w) {
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
        String unit = map.spec().unit().strip();
        String sentence = unit.isEmpty() ? w.text("circles.proportional") : w.text("circles.proportionalUnit", "unit", unit);
        if (largest != null) {
            String value = figure(map, largestValue, w);
            if (!unit.isEmpty()) {
                value = w.text("circles.valueUnit", "value", value, "unit", unit);
            }
            sentence += " " + w.text(latest > 0 ? "circles.largestAllPeriods" : "circles.largest", "value", value,
                    "region", largest.name());
        }
        return sentence;
    }

    static List<MapPageView.LegendRow> legend(MapModel map, Wording w) {
        Classification classes = map.classification();
        List<MapPageView.LegendRow> rows = new ArrayList<>();
        int fills = map.ramp().fills().size();
        for (int i = 0; i < classes.classCount() && fills > 0; i++) {
            String range = w.classRange(classes.limits(), i);
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
    static List<String> partSentences(MapModel map, Wording w) {
        NumberWriter numbers = w.numbers();
        List<String> sentences = new ArrayList<>();
        for (MapPart part : map.parts()) {
            ProjectionChoice choice = part.projection();
            String where = part.main() || !Double.isFinite(part.gapKm()) ? w.text("part.regions", "name", part.nameIn(w),
                    "count", part.keys().size(), "area", numbers.areaKm2(Math.round(part.areaKm2()), 0))
                    : w.text("part.regionsAway", "name", part.name(), "count", part.keys().size(),
                    "area", numbers.areaKm2(Math.round(part.areaKm2()), 0), "gap", numbers.distanceKm(part.gapKm()));
            String projection = w.text("part.projection", "projection", w.sentence(projectionText(choice, w)),
                    "max", numbers.degrees(choice.omegaMaxDeg(), 2), "mean", numbers.degrees(choice.omegaMeanDeg(), 2));
            String scale = part.main() ? w.text("part.mainScale") : part.areaScale() == 1 ? w.text("part.sameScale")
                    : w.text("part.otherScale", "scale", part.areaScaleText(numbers));
            String check = w.text("part.areaCheck", "error", errorPercent(part.areaAudit().maxRelativeError(), w));
            sentences.add(String.join(" ", where, projection, scale, check));
        }
        return sentences;
    }
}
