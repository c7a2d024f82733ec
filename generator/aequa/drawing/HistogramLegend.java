package aequa.drawing;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.classes.FigureText;
import aequa.colour.Rgb;
import aequa.wording.NumberWriter;

/**
 * The histogram legend: the class bar drawn to true value scale (each class as wide as its range), with a
 * histogram of the mapped values above it, so readers see how the values spread along the ramp and how
 * uneven the classes are. Columns are equal value bins; each takes the fill of the class of its centre.
 */
final class HistogramLegend {

    /** Number of equal-width value bins (chosen by eye for legends 30 to 40 em wide). */
    static final int BINS = 30;

    private HistogramLegend() {
    }

    static double height(double em) {
        return 3.2 * em + 0.9 * em + 1.7 * em;
    }

    static void paint(Canvas canvas, MapModel model, Theme theme, double x, double y, double widthU, double em,
                      NumberWriter numbers) {
        List<Double> limits = model.classification().limits();
        double low = limits.get(0);
        double high = limits.get(limits.size() - 1);
        double span = high > low ? high - low : 1;
        List<Double> values = new ArrayList<>();
        for (MapRegion region : model.regions()) {
            for (RegionValue value : region.values()) {
                if (RegionFills.classed(value)) {
                    values.add(value.normalisedValue());
                }
            }
        }
        int[] bins = new int[BINS];
        for (double v : values) {
            int bin = (int) Math.floor((v - low) / span * BINS);
            bins[Math.max(0, Math.min(BINS - 1, bin))]++;
        }
        int tallest = 1;
        for (int count : bins) {
            tallest = Math.max(tallest, count);
        }
        double histogramH = 3.2 * em;
        double binW = widthU / BINS;
        List<Rgb> fills = model.ramp().fills();
        for (int b = 0; b < BINS; b++) {
            if (bins[b] == 0) {
                continue;
            }
            double h = histogramH * bins[b] / tallest;
            double centre = low + (b + 0.5) * span / BINS;
            int cls = Math.min(model.classification().classOf(centre), fills.size() - 1);
            canvas.fill(new Rectangle2D.Double(x + b * binW + 0.08 * binW, y + histogramH - h, 0.84 * binW, h), fills.get(cls));
        }
        double barY = y + histogramH + 0.15 * em;
        double barH = 0.75 * em;
        int decimals = FigureText.distinctDecimals(limits);
        double size = theme.typePt().legend();
        Typesetter type = canvas.type();
        double lastLabelEnd = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < fills.size() && i + 1 < limits.size(); i++) {
            double from = x + (limits.get(i) - low) / span * widthU;
            double to = x + (limits.get(i + 1) - low) / span * widthU;
            canvas.fill(new Rectangle2D.Double(from, barY, Math.max(to - from, 0.01), barH), fills.get(i));
        }
        for (int i = 0; i < limits.size(); i++) {
            double at = x + (limits.get(i) - low) / span * widthU;
            String label = numbers.fixed(limits.get(i), decimals);
            double w = type.width(label, size, false);
            double start = Math.max(x, Math.min(x + widthU - w, at - w / 2));
            if (start < lastLabelEnd + 0.5 * em) {
                continue; // labels that would touch the previous one are left out; the bar still shows the limit
            }
            canvas.text(label, start, barY + barH + 0.35 * em + type.capHeight(size), size, false, Canvas.Anchor.START,
                    theme.colours().text(), theme.colours().background());
            lastLabelEnd = start + w;
        }
    }
}
