package aequa.inputs.figures;

import java.util.regex.Pattern;

/**
 * Reads numbers written as text under a declared decimal mark and thousands separator, strictly.
 *
 * <p>Our own code rather than {@link java.text.NumberFormat}: that class parses a leading number and
 * ignores what follows ({@code "12abc"} gives 12, {@code "12,5"} with a decimal point gives 125 or 12
 * depending on grouping), and silently accepts misplaced grouping; a statistics cell must be a number as
 * a whole or be reported. The grammar accepted, after trimming surrounding whitespace:
 * <pre>
 *   sign?  ( digits | d{1,3} (T ddd)+ )  ( D digits )?  ( [eE] [+-]? digits )?
 *   sign?  D digits  ( [eE] [+-]? digits )?
 * </pre>
 * where D is the decimal mark, T the thousands separator (the grouped form only when one is declared),
 * and sign is {@code +}, {@code -} or U+2212 MINUS SIGN. The value is then converted by
 * {@link Double#parseDouble}, which rounds correctly to the nearest double. Infinite results are refused.
 */
final class NumberParser {

    /** Digits grouped by three with a space, no-break space, narrow no-break space or apostrophe. */
    private static final Pattern SPACE_GROUPED = Pattern.compile(
            "[+\\-\u2212]?\\d{1,3}(?:[ '\u00A0\u202F]\\d{3})+(?:[.,]\\d+)?");

    private final DecimalMark decimal;
    private final String thousands;
    private final Pattern grammar;
    private final Pattern digitsOtherMarkDigits;
    private final Pattern groupedByOtherMark;

    NumberParser(DecimalMark decimal, String thousands) {
        this.decimal = decimal;
        this.thousands = thousands;
        String d = Pattern.quote(String.valueOf(decimal.character()));
        String integer = thousands.isEmpty() ? "\\d+" : "(?:\\d+|\\d{1,3}(?:" + Pattern.quote(thousands) + "\\d{3})+)";
        String exponent = "(?:[eE][+-]?\\d+)?";
        grammar = Pattern.compile("[+\\-\u2212]?(?:" + integer + "(?:" + d + "\\d+)?|" + d + "\\d+)" + exponent);
        String other = Pattern.quote(decimal == DecimalMark.POINT ? "," : ".");
        digitsOtherMarkDigits = Pattern.compile("[+\\-\u2212]?\\d+" + other + "\\d+");
        groupedByOtherMark = Pattern.compile("[+\\-\u2212]?\\d{1,3}(?:" + other + "\\d{3})+");
    }

    /** The number {@code trimmedText} stands for, or NaN when it is not a number under this format. */
    double parse(String trimmedText) {
        if (!grammar.matcher(trimmedText).matches()) {
            return Double.NaN;
        }
        String canonical = thousands.isEmpty() ? trimmedText : trimmedText.replace(thousands, "");
        canonical = canonical.replace('\u2212', '-').replace(decimal.character(), '.');
        double value = Double.parseDouble(canonical);
        return Double.isInfinite(value) ? Double.NaN : value;
    }

    /**
     * One sentence on how to make {@code trimmedText} (which {@link #parse} refused) readable: the usual
     * causes are a decimal comma or point other than the declared one, an undeclared thousands separator,
     * and a percent sign.
     */
    String hint(String trimmedText) {
        boolean pointDecimal = decimal == DecimalMark.POINT;
        String other = pointDecimal ? "," : ".";
        if (digitsOtherMarkDigits.matcher(trimmedText).matches()) {
            String asDecimal = "It looks like a decimal " + (pointDecimal ? "comma" : "point")
                    + " but this source declares decimal: \"" + decimal.character() + "\"; set decimal: \""
                    + other + "\" for this source";
            return groupedByOtherMark.matcher(trimmedText).matches()
                    ? asDecimal + ", or thousands: \"" + other + "\" if it separates thousands."
                    : asDecimal + ".";
        }
        if (SPACE_GROUPED.matcher(trimmedText).matches()) {
            return "It looks like digits grouped by thousands; declare the separator with thousands: for this source.";
        }
        if (!thousands.isEmpty() && trimmedText.contains(thousands)) {
            return "Between thousands separators \"" + thousands + "\" there must be exactly three digits.";
        }
        if (trimmedText.endsWith("%")) {
            return "Remove the percent sign; state the unit in the map's unit: setting instead.";
        }
        return "Write a number, or declare this text as a missing, suppressed or not-applicable marker"
                + " for this source.";
    }
}
