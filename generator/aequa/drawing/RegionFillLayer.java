package aequa.drawing;

import java.awt.geom.Path2D;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Geometry;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.colour.Rgb;
import aequa.statistics.FigureStatus;
import aequa.wording.Wording;

/**
 * The regions of one panel: one group per region (id from its key; on the web also data attributes and a
 * title), its fill, the hatching of no-data and withheld regions, and the hatched overlay of unreliable
 * values. Then the border network: inner borders once each, and the outer edge.
 */
final class RegionFillLayer {

    /** Hatch spacing, points: about 1.2 mm, open enough to survive newsprint dot gain (chosen by eye). */
    static final double HATCH_SPACING_PT = 3.4;

    private RegionFillLayer() {
    }

    static double hatchSpacing(Canvas canvas) {
        return HATCH_SPACING_PT * canvas.unitsPerPt();
    }

    /**
     * @param pageGeometries each region's geometry in page units, in the order of {@code model.regions()}
     * @param period         index into each region's values
     * @param idPrefix       prefix of the region ids, {@code r} or {@code r-<period>}
     * @param dataAttributes write data-* attributes and titles (web)
     */
    static void paint(Canvas canvas, MapModel model, Theme theme, RegionFills fills, List<Geometry> pageGeometries,
                      int period, String idPrefix, boolean dataAttributes, FixedDecimal precision, boolean plainFill,
                      Wording w) {
        List<MapRegion> regions = model.regions();
        double spacing = hatchSpacing(canvas);
        double hatchPt = theme.lines().hatch().pt();
        for (int i = 0; i < regions.size(); i++) {
            MapRegion region = regions.get(i);
            Geometry page = pageGeometries.get(i);
            if (page.isEmpty()) {
                continue;
            }
            RegionValue value = valueOf(region, period);
            Map<String, String> attributes = new LinkedHashMap<>();
            String title = null;
            if (dataAttributes) {
                attributes.put("data-key", region.key());
                attributes.put("data-name", region.name());
                attributes.put("data-value", RegionFills.classed(value) ? machineNumber(value.normalisedValue()) : "");
                attributes.put("data-class", RegionFills.classed(value) ? Integer.toString(value.classIndex()) : statusName(value));
                title = w.text("draw.tooltip", "region", region.name(), "value", describe(model, value, w));
            }
            canvas.begin(Ids.of(idPrefix, region.key()), attributes, title);
            Path2D.Double path = PagePaths.area(page, precision);
            Rgb fill = plainFill && RegionFills.classed(value) ? theme.colours().land() : fills.fill(value);
            canvas.fill(path, fill);
            RegionFills.Hatch hatch = RegionFills.hatching(value);
            for (Hatching.Direction direction : RegionFills.directions(hatch)) {
                canvas.stroke(PagePaths.lines(Hatching.lines(page, spacing, direction), precision), theme.colours().noDataHatch(), hatchPt);
            }
            if (!plainFill && RegionFills.classed(value) && value.unreliable()) {
                canvas.stroke(PagePaths.lines(Hatching.lines(page, spacing, Hatching.Direction.FALLING), precision), fills.text(value), hatchPt);
            }
            canvas.end();
        }
    }

    /**
     * Inner borders (each shared edge once) and the outer edge, as two groups.
     *
     * @param inner false when the inner borders are drawn another way (web SVG: by a style rule)
     */
    static void paintBorders(Canvas canvas, Theme theme, List<Geometry> pageGeometries, FixedDecimal precision, String idSuffix,
                             boolean inner) {
        Path2D.Double[] network = PagePaths.borders(pageGeometries, precision);
        if (inner) {
            canvas.begin("borders" + idSuffix);
            canvas.stroke(network[0], theme.colours().border(), theme.lines().border().pt());
            canvas.end();
        }
        canvas.begin("outline" + idSuffix);
        canvas.stroke(network[1], theme.colours().outline(), theme.lines().outline().pt());
        canvas.end();
    }

    static RegionValue valueOf(MapRegion region, int period) {
        return period < region.values().size() ? region.values().get(period) : RegionValue.noData();
    }

    /**
     * The figure for scripts ({@code data-value}): a machine number with a point and no grouping, like the CSV
     * download, at most 6 decimals; readers see the title instead.
     */
    static String machineNumber(double value) {
        String plain = BigDecimal.valueOf(value).setScale(6, RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString();
        return plain.equals("-0") ? "0" : plain;
    }

    /** {@code 12.5 clinics per 1,000 km²}, or the status in words, in the drawing's language. */
    static String describe(MapModel model, RegionValue value, Wording w) {
        if (!RegionFills.classed(value)) {
            return w.text(switch (RegionFills.status(value)) {
                case SUPPRESSED -> "draw.statusWithheld";
                case NOT_APPLICABLE -> "draw.statusNotApplicable";
                default -> "draw.statusNoData";
            });
        }
        String unit = model.spec().unit();
        String figure = w.numbers().figure(value.normalisedValue(), model.classification().limits());
        String text = unit.isBlank() ? figure : w.text("draw.valueUnit", "value", figure, "unit", unit);
        return value.unreliable() ? w.text("draw.unreliableValue", "value", text) : text;
    }

    static String statusName(RegionValue value) {
        FigureStatus status = RegionFills.status(value);
        switch (status) {
            case SUPPRESSED:
                return "withheld";
            case NOT_APPLICABLE:
                return "not-applicable";
            case NO_DATA:
                return "no-data";
            default:
                return "reported";
        }
    }
}
