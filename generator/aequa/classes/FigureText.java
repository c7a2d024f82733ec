package aequa.classes;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;

/**
 * How many decimals a map's figures are written with, one precision policy for the legend, tooltips, tables,
 * the text alternative and the print files: class limits with the fewest decimals that write every limit of
 * the map exactly (limits are already rounded for readers, {@link ReadableBreaks}), the same count for all of
 * them; figures with one decimal more, so a reader can place a figure within its class, and no trailing zeros
 * (a count stays "75", not "75.0"). The marks, grouping and digits are the language's (aequa.wording's
 * NumberWriter). Downloads (CSV, report.json) keep full precision.
 */
public final class FigureText {

    /** No map's limits need more; a limit that does is written with this many (and says so by its length). */
    static final int MAX_DECIMALS = 6;

    private FigureText() {
    }

    /** The decimals of every limit of a map: the fewest that write each of them exactly, at most 6. */
    public static int limitDecimals(List<Double> limits) {
        int decimals = 0;
        for (double limit : limits) {
            if (Double.isFinite(limit)) {
                int scale = BigDecimal.valueOf(limit).stripTrailingZeros().scale();
                decimals = Math.max(decimals, Math.min(MAX_DECIMALS, scale));
            }
        }
        return decimals;
    }

    /** The decimals of a map's figures: one more than its limits. */
    public static int valueDecimals(List<Double> limits) {
        return Math.min(MAX_DECIMALS, limitDecimals(limits) + 1);
    }

    /**
     * The fewest decimals (at most 4) that write every value of {@code values} exactly and keep neighbouring
     * values distinct, for limits drawn along a bar (the histogram and gradient legends, the circle key);
     * legend limits are already rounded for readers. Values that are not finite are skipped.
     */
    public static int distinctDecimals(List<Double> values) {
        for (int d = 0; d < 4; d++) {
            boolean enough = true;
            BigDecimal previous = null;
            for (double v : values) {
                if (!Double.isFinite(v)) {
                    continue;
                }
                BigDecimal exact = BigDecimal.valueOf(v);
                BigDecimal rounded = exact.setScale(d, RoundingMode.HALF_EVEN);
                if (rounded.compareTo(exact) != 0 || (previous != null && rounded.compareTo(previous) == 0)) {
                    enough = false;
                    break;
                }
                previous = rounded;
            }
            if (enough) {
                return d;
            }
        }
        return 4;
    }

    /**
     * The decimals of one mapped figure: {@link #valueDecimals} of the map's limits, fewer when the figure
     * rounded to them ends in zeros (75.0 is written 75); 0 for a value that is not finite.
     */
    public static int figureDecimals(double value, List<Double> limits) {
        if (!Double.isFinite(value)) {
            return 0;
        }
        int decimals = valueDecimals(limits);
        int exact = Math.max(0, BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros().scale());
        return Math.min(decimals, exact);
    }
}
