package aequa.drawing;

import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.GeometryFactory;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.project.ClassMethod;
import aequa.classes.Classification;
import aequa.classes.FigureText;
import aequa.colour.Rgb;
import aequa.statistics.FigureStatus;
import aequa.wording.NumberWriter;
import aequa.wording.Wording;

/**
 * The map's key. A heading (the unit), then one of: the class list (swatch, range, count of regions), the
 * histogram legend, a gradient for unclassed maps, or nested circles for proportional symbols; then one
 * entry each for no data, withheld and not applicable (only those that occur, with their counts) and for
 * unreliable values. Counts are those of the classification (pooled over all periods) and, for the
 * statuses, of all region-periods, so one legend serves every panel of small multiples.
 *
 * <p>Spacings are in em of the legend's type, so they follow the theme's type size: a swatch is 1.1 em high,
 * 0.6 em from its text, columns 1.4 em apart, 0.3 em under a heading. They were chosen by eye on the bundled
 * themes and follow no published table; the print preflight (PrintPreflight) checks the type they carry, and
 * LegendAndScaleTest reads the drawn legend back.
 */
final class Legend {

    /** One swatch and its text. */
    record Entry(Rgb fill, RegionFills.Hatch hatch, boolean unreliable, String label, String count) {
    }

    private static final GeometryFactory FACTORY = new GeometryFactory();

    private final MapModel model;
    private final Theme theme;
    private final Typesetter type;
    private final boolean histogram;
    private final Symbols symbols;
    private final List<Entry> classEntries = new ArrayList<>();
    private final List<Entry> statusEntries = new ArrayList<>();
    private final double em;
    private final Wording wording;
    private final NumberWriter numbers;

    /**
     * @param symbols the circles of a proportional-symbol map, or null for a choropleth
     * @param wording the language of the legend's words and numbers
     */
    Legend(MapModel model, Theme theme, Typesetter type, boolean histogram, Symbols symbols, Wording wording) {
        this.wording = wording;
        this.numbers = wording.numbers();
        this.model = model;
        this.theme = theme;
        this.type = type;
        this.histogram = histogram;
        this.symbols = symbols;
        this.em = theme.typePt().legend() * type.unitsPerPt();
        Classification classes = model.classification();
        List<Double> limits = classes.limits();
        for (int i = 0; i < classes.classCount() && i < model.ramp().fills().size(); i++) {
            String range = wording.classRange(limits, i);
            classEntries.add(new Entry(model.ramp().fills().get(i), RegionFills.Hatch.NONE, false, range,
                    count(classes.counts().get(i))));
        }
        addStatusEntries();
    }

    private void addStatusEntries() {
        Map<FigureStatus, Integer> counts = new EnumMap<>(FigureStatus.class);
        int unreliable = 0;
        for (MapRegion region : model.regions()) {
            for (RegionValue value : region.values()) {
                counts.merge(RegionFills.status(value), 1, Integer::sum);
                if (RegionFills.classed(value) && value.unreliable()) {
                    unreliable++;
                }
            }
        }
        Theme.Colours c = theme.colours();
        addStatus(counts, FigureStatus.NO_DATA, c.noData(), RegionFills.Hatch.SINGLE, wording.text("draw.noData"));
        addStatus(counts, FigureStatus.SUPPRESSED, c.noData(), RegionFills.Hatch.CROSS, wording.text("draw.withheld"));
        addStatus(counts, FigureStatus.NOT_APPLICABLE, c.notApplicable(), RegionFills.Hatch.LEVEL, wording.text("draw.notApplicable"));
        if (unreliable > 0) {
            statusEntries.add(new Entry(c.background(), RegionFills.Hatch.NONE, true, wording.text("draw.unreliable"), count(unreliable)));
        }
    }

    private String count(int n) {
        return wording.text("draw.count", "count", numbers.integer(n));
    }

    private void addStatus(Map<FigureStatus, Integer> counts, FigureStatus status, Rgb fill, RegionFills.Hatch hatch, String label) {
        Integer n = counts.get(status);
        if (n != null && n > 0) {
            statusEntries.add(new Entry(fill, hatch, false, label, count(n)));
        }
    }

    private boolean unclassed() {
        return model.classification().method() == ClassMethod.UNCLASSED;
    }

    private String heading() {
        String unit = model.spec().unit().isBlank() ? wording.text("draw.value") : model.spec().unit();
        if (symbols != null || unclassed() || histogram) {
            return unit;
        }
        // small multiples share one legend: say that its counts are of all panels together
        int periods = model.periods().size();
        return periods > 1 ? wording.text("draw.regionsAllPeriods", "unit", unit, "count", periods)
                : wording.text("draw.regionsHeading", "unit", unit);
    }

    double height(double widthU) {
        return type.lineHeight(theme.typePt().legend()) + 0.3 * em + keyHeight() + gridHeight(gridEntries(), widthU);
    }

    /** The height of the circles, gradient or histogram between the heading and the grid; 0 for a class list. */
    private double keyHeight() {
        if (symbols != null) {
            return 2 * symbols.maxRadiusU() + 0.6 * em;
        }
        if (unclassed()) {
            return 1.1 * em + 1.6 * em;
        }
        return histogram ? HistogramLegend.height(em) : 0;
    }

    /** The entries of the grid: the statuses, after the classes when the classes are listed there. */
    private List<Entry> gridEntries() {
        return symbols == null && !unclassed() && !histogram ? concat(classEntries, statusEntries) : statusEntries;
    }

    void paint(Canvas canvas, double x, double y, double widthU) {
        double size = theme.typePt().legend();
        double baseline = y + type.capHeight(size);
        canvas.text(heading(), x, baseline, size, true, Canvas.Anchor.START, theme.colours().text(), theme.colours().background());
        double top = y + type.lineHeight(size) + 0.3 * em;
        if (symbols != null) {
            paintCircles(canvas, x, top);
        } else if (unclassed()) {
            paintGradient(canvas, x, top, Math.min(widthU, 30 * em));
        } else if (histogram) {
            HistogramLegend.paint(canvas, model, theme, x, top, Math.min(widthU, 40 * em), em, numbers);
        }
        paintGrid(canvas, gridEntries(), x, top + keyHeight(), widthU);
    }

    // ----- entries in a grid, filled column by column -----

    private double swatchW() {
        return 1.8 * em;
    }

    private double rowHeight() {
        return 1.55 * em;
    }

    private double columnWidth(List<Entry> entries) {
        double widest = 0;
        for (Entry e : entries) {
            widest = Math.max(widest, type.width(e.label() + " " + e.count(), theme.typePt().legend(), false));
        }
        return swatchW() + 0.6 * em + widest + 1.4 * em;
    }

    private int columns(List<Entry> entries, double widthU) {
        return Math.max(1, Math.min(entries.size(), (int) Math.floor((widthU + 1.4 * em) / columnWidth(entries))));
    }

    private double gridHeight(List<Entry> entries, double widthU) {
        if (entries.isEmpty()) {
            return 0;
        }
        int rows = (int) Math.ceil(entries.size() / (double) columns(entries, widthU));
        return rows * rowHeight();
    }

    private void paintGrid(Canvas canvas, List<Entry> entries, double x, double y, double widthU) {
        if (entries.isEmpty()) {
            return;
        }
        int columns = columns(entries, widthU);
        int rows = (int) Math.ceil(entries.size() / (double) columns);
        double columnWidth = columnWidth(entries);
        double size = theme.typePt().legend();
        for (int i = 0; i < entries.size(); i++) {
            Entry e = entries.get(i);
            double left = x + (i / rows) * columnWidth;
            double top = y + (i % rows) * rowHeight();
            Rectangle2D swatch = new Rectangle2D.Double(left, top, swatchW(), 1.1 * em);
            paintSwatch(canvas, swatch, e);
            double baseline = top + 0.55 * em + type.capHeight(size) / 2;
            double textX = left + swatchW() + 0.6 * em;
            canvas.text(e.label(), textX, baseline, size, false, Canvas.Anchor.START, theme.colours().text(), theme.colours().background());
            double countX = textX + type.width(e.label() + " ", size, false);
            canvas.text(e.count(), countX, baseline, size, false, Canvas.Anchor.START, theme.colours().textMuted(), theme.colours().background());
        }
    }

    private void paintSwatch(Canvas canvas, Rectangle2D swatch, Entry e) {
        canvas.fill(swatch, e.fill());
        double spacing = RegionFillLayer.hatchSpacing(canvas);
        if (e.hatch() != RegionFills.Hatch.NONE || e.unreliable()) {
            var area = FACTORY.toGeometry(new org.locationtech.jts.geom.Envelope(
                    swatch.getMinX(), swatch.getMaxX(), swatch.getMinY(), swatch.getMaxY()));
            Rgb ink = e.unreliable() ? theme.colours().unreliableHatch() : theme.colours().noDataHatch();
            List<Hatching.Direction> directions = e.unreliable() ? List.of(Hatching.Direction.FALLING) : RegionFills.directions(e.hatch());
            for (Hatching.Direction direction : directions) {
                canvas.stroke(PagePaths.lines(Hatching.lines(area, spacing, direction), new FixedDecimal(3)), ink, theme.lines().hatch().pt());
            }
        }
        canvas.stroke(swatch, theme.colours().outline(), theme.lines().hatch().pt());
    }

    // ----- unclassed gradient -----

    private void paintGradient(Canvas canvas, double x, double y, double widthU) {
        int steps = 64;
        double stepW = widthU / steps;
        for (int i = 0; i < steps; i++) {
            Rgb colour = model.ramp().colourAt((i + 0.5) / steps);
            // each step reaches under the next, so no hairline gap shows between neighbours when rasterised
            double w = i == steps - 1 ? stepW : 1.5 * stepW;
            canvas.fill(new Rectangle2D.Double(x + i * stepW, y, w, 1.1 * em), colour);
        }
        List<Double> limits = model.classification().limits();
        int decimals = FigureText.distinctDecimals(List.of(limits.get(0), limits.get(limits.size() - 1)));
        double size = theme.typePt().legend();
        double baseline = y + 1.1 * em + 0.3 * em + type.capHeight(size);
        Rgb text = theme.colours().text();
        Rgb bg = theme.colours().background();
        canvas.text(numbers.fixed(limits.get(0), decimals), x, baseline, size, false, Canvas.Anchor.START, text, bg);
        canvas.text(numbers.fixed(limits.get(limits.size() - 1), decimals), x + widthU, baseline, size, false, Canvas.Anchor.END, text, bg);
    }

    // ----- nested circles -----

    private void paintCircles(Canvas canvas, double x, double y) {
        double rMax = symbols.maxRadiusU();
        double centreX = x + rMax;
        double bottom = y + 2 * rMax;
        double size = theme.typePt().legend();
        Theme.Colours c = theme.colours();
        // keep only values whose labels (set at the circles' tops) clear each other
        List<Double> kept = new ArrayList<>();
        double lastTopY = Double.NEGATIVE_INFINITY;
        for (double value : symbols.legendValues()) {
            double topY = bottom - 2 * symbols.radius(value);
            if (topY - lastTopY >= type.lineHeight(size)) {
                kept.add(value);
                lastTopY = topY;
            }
        }
        for (double value : kept) {
            double r = symbols.radius(value);
            Ellipse2D.Double circle = new Ellipse2D.Double(centreX - r, bottom - 2 * r, 2 * r, 2 * r);
            canvas.fill(circle, c.symbol(), 0.25);
            canvas.stroke(circle, c.textMuted(), theme.lines().symbolEdge().pt());
        }
        for (double value : kept) {
            double topY = bottom - 2 * symbols.radius(value);
            double labelX = centreX + rMax + 0.8 * em;
            canvas.stroke(new Line2D.Double(centreX, topY, labelX - 0.3 * em, topY), c.textMuted(), theme.lines().graticule().pt());
            canvas.text(numbers.fixed(value, FigureText.distinctDecimals(List.of(value))), labelX, topY + type.capHeight(size) / 2,
                    size, false, Canvas.Anchor.START, c.text(), c.background());
        }
    }

    private static List<Entry> concat(List<Entry> a, List<Entry> b) {
        List<Entry> all = new ArrayList<>(a);
        all.addAll(b);
        return all;
    }
}
