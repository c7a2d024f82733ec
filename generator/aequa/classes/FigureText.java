package aequa.classes;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.List;
import java.util.Locale;

/**
 * How a map's figures are written for readers, one policy for the legend, tooltips, tables, the text
 * alternative and the print files: class limits with the fewest decimals that write every limit of the map
 * exactly (limits are already rounded for readers, {@link ReadableBreaks}), the same count for all of them;
 * figures with one decimal more, so a reader can place a figure within its class, and no trailing zeros (a
 * count stays "75", not "75.0"; {@link #figure}). Thousands are grouped
 * with a comma, the decimal mark is a point and negatives take a true minus sign, whatever the machine's
 * locale. Downloads (CSV, report.json) keep full precision.
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

    /** A mapped figure: rounded to {@link #valueDecimals} of the map's limits, trailing zeros dropped. */
    public static String figure(double value, List<Double> limits) {
        if (!Double.isFinite(value)) {
            return format(value, 0);
        }
        int decimals = valueDecimals(limits);
        int exact = Math.max(0, BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros().scale());
        return format(value, Math.min(decimals, exact));
    }

    /**
     * The range of class {@code i} in words, as every key of a map says it (the drawn legend, the page's key,
     * the text alternative): "1 to under 2" for every class but the last, which holds its upper limit too
     * ("9 to 10"), following {@link Classification#classOf}: a value equal to a break is in the upper class.
     * Limits with {@link #limitDecimals}.
     */
    public static String classRange(List<Double> limits, int i) {
        int decimals = limitDecimals(limits);
        boolean last = i == limits.size() - 2;
        return format(limits.get(i), decimals) + (last ? " to " : " to under ") + format(limits.get(i + 1), decimals);
    }

    /** {@code value} with exactly {@code decimals} decimals, e.g. {@code 12,345.6}; NaN and infinities as "–". */
    public static String format(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return "\u2013";
        }
        DecimalFormat format = new DecimalFormat("#,##0", DecimalFormatSymbols.getInstance(Locale.ROOT));
        format.setMinimumFractionDigits(decimals);
        format.setMaximumFractionDigits(decimals);
        format.setRoundingMode(RoundingMode.HALF_EVEN);
        String text = format.format(value);
        if (text.matches("-0(\\.0*)?")) {
            text = text.substring(1); // a negative that rounds to zero is zero
        }
        return text.startsWith("-") ? "\u2212" + text.substring(1) : text;
    }
}
