package aequa.pages;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.Locale;

/**
 * Numbers as readers see them on the pages: at most {@value #SIGNIFICANT_DIGITS} significant digits,
 * grouped by thousands with commas, a point as decimal mark (fixed, independent of the machine's locale).
 * NaN and infinities become the empty string; callers show the figure's status instead.
 */
public final class NumberText {

    /** Enough for any statistic aequa maps; figures are rarely known to more (common practice). */
    public static final int SIGNIFICANT_DIGITS = 6;

    private NumberText() {
    }

    public static String of(double value) {
        if (!Double.isFinite(value)) {
            return "";
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(SIGNIFICANT_DIGITS, RoundingMode.HALF_EVEN))
                .stripTrailingZeros();
        DecimalFormat format = new DecimalFormat("#,##0.##########", DecimalFormatSymbols.getInstance(Locale.ROOT));
        format.setMaximumFractionDigits(Math.max(0, rounded.scale()));
        return format.format(rounded);
    }

    /** {@code value} with exactly {@code decimals} decimals, for distortion and error figures. */
    public static String fixed(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return "";
        }
        return new BigDecimal(value).setScale(decimals, RoundingMode.HALF_EVEN).toPlainString();
    }
}
