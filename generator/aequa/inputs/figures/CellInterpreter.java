package aequa.inputs.figures;


/**
 * Decides what one field says: a reported number, or one of the declared markers, or a malformed text.
 * The order is: declared markers first (so a source may declare "0" or "-" as suppressed), then a blank
 * field (always no data), then a number under the declared format; anything else is malformed and kept
 * as no data with the reason in {@link FigureCell#problem()}, for the join to report where it is used.
 *
 * <p>A number, typed by the source or read from text, must be finite and of magnitude below {@link #EXACT_LIMIT}: a
 * database REAL may hold infinity, and a value such as 1e308 overflows the first sum or product of
 * classification and normalisation, so either would reach the map as garbage; both are malformed instead.
 */
final class CellInterpreter {

    /** The reading of one field. {@code value} is NaN unless {@code status} is REPORTED. */
    record Reading(CellStatus status, double value, String problem) {
    }

    /**
     * 2^53: from there on a double no longer holds every whole number (IEEE 754 binary64 has a 53-bit
     * significand), so counts are no longer exact; far above any statistic aequa maps, far below overflow.
     * A whole number just above it is read as 2^53 itself, so it is refused too.
     */
    static final double EXACT_LIMIT = 9_007_199_254_740_992.0;

    private final FigureSourceSettings settings;
    private final NumberParser numbers;

    CellInterpreter(FigureSourceSettings settings) {
        this.settings = settings;
        this.numbers = new NumberParser(settings.decimal(), settings.thousands());
    }

    Reading read(SourceField field) {
        if (field.typed()) {
            return reported(field.number(), field.text());
        }
        String trimmed = trim(field.text());
        CellStatus marker = settings.markers().get(trimmed);
        if (marker != null) {
            return new Reading(marker, Double.NaN, "");
        }
        if (trimmed.isEmpty()) {
            return new Reading(CellStatus.NO_DATA, Double.NaN, "");
        }
        double value = numbers.parse(trimmed);
        if (Double.isNaN(value)) {
            return new Reading(CellStatus.NO_DATA, Double.NaN, numbers.hint(trimmed));
        }
        return reported(value, trimmed);
    }

    private static Reading reported(double value, String text) {
        if (!(Math.abs(value) < EXACT_LIMIT)) { // also NaN
            return new Reading(CellStatus.NO_DATA, Double.NaN, "The value " + text
                    + " is not a finite number within plus or minus 9,007,199,254,740,991 (2^53 - 1), so it cannot be"
                    + " mapped exactly; check the cell, or state the figure in a larger unit (thousands, millions).");
        }
        return new Reading(CellStatus.REPORTED, value, "");
    }

    /** {@code text} without surrounding whitespace, counting no-break spaces as whitespace. */
    static String trim(String text) {
        int start = 0;
        int end = text.length();
        while (start < end && isSpace(text.charAt(start))) {
            start++;
        }
        while (end > start && isSpace(text.charAt(end - 1))) {
            end--;
        }
        return text.substring(start, end);
    }

    private static boolean isSpace(char c) {
        return Character.isWhitespace(c) || Character.isSpaceChar(c);
    }
}
