package aequa.drawing;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;

import aequa.classes.FigureText;

/**
 * Numbers as readers see them in legends and captions: thousands grouped with a comma, a point for decimals,
 * a true minus sign, no exponent; independent of the machine's locale.
 */
final class Numbers {

    private Numbers() {
    }

    /** {@code value} with exactly {@code decimals} decimals, e.g. {@code 12,345.6} (see {@link FigureText}). */
    static String format(double value, int decimals) {
        return FigureText.format(value, decimals);
    }

    /**
     * The fewest decimals (at most 4) that write every value of {@code values} exactly as rounded to that
     * many decimals and keep neighbouring values distinct; legend limits are already rounded for readers.
     */
    static int decimalsFor(List<Double> values) {
        for (int d = 0; d < 4; d++) {
            boolean enough = true;
            String previous = null;
            for (double v : values) {
                if (!Double.isFinite(v)) {
                    continue;
                }
                BigDecimal exact = BigDecimal.valueOf(v);
                if (exact.setScale(d, RoundingMode.HALF_EVEN).compareTo(exact) != 0) {
                    enough = false;
                    break;
                }
                String written = format(v, d);
                if (written.equals(previous)) {
                    enough = false;
                    break;
                }
                previous = written;
            }
            if (enough) {
                return d;
            }
        }
        return 4;
    }

    /** A compact figure for captions: up to {@code decimals} decimals, trailing zeros removed. */
    static String trim(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return "–";
        }
        String plain = BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString();
        return plain.equals("-0") ? "0" : plain.replace("-", "\u2212");
    }
}
