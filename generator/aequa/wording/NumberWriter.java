package aequa.wording;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;

import com.ibm.icu.number.LocalizedNumberFormatter;
import com.ibm.icu.number.NumberFormatter;
import com.ibm.icu.number.Precision;
import com.ibm.icu.text.NumberingSystem;
import com.ibm.icu.util.MeasureUnit;
import com.ibm.icu.util.NoUnit;
import com.ibm.icu.util.ULocale;

import aequa.classes.FigureText;

/**
 * Every number a reader sees, written one way for one language: the decimal mark, digit grouping (with CLDR's
 * minimum grouping digits, so Spanish writes 1234 but 12 345), digits, percent sign and unit spacing all come
 * from CLDR through ICU4J, never from the machine's locale. One rounding (half to even), one minus sign (the
 * true minus U+2212 where CLDR writes a hyphen-minus: common typographic practice, and the sign aequa's English
 * pages always used), no negative zero, no exponent.
 *
 * <p>NaN policy: a value that is not finite is written {@value #NOT_A_NUMBER} (an en dash) by every method;
 * callers that show a status instead (a figure withheld, no data) test for it before calling. Downloads (CSV,
 * report.json) never go through this class: they keep full precision and a dot decimal.
 *
 * <p>Instances are immutable and thread-safe (ICU's {@link LocalizedNumberFormatter} is); each keeps its
 * formatters ({@link FormatterShelf}), so ICU compiles each once.
 */
public final class NumberWriter {

    /** What a missing or infinite value reads as. */
    public static final String NOT_A_NUMBER = "\u2013";

    /** Enough for any statistic aequa maps; figures are rarely known to more (common practice). */
    public static final int SIGNIFICANT_DIGITS = 6;

    /** Decimals beyond any double's significant digits: a value rounded to significant digits is zero only if it is. */
    private static final int ANY_SCALE = 400;

    private final boolean rightToLeft;
    private final String[] digits;
    private final FormatterShelf fixed;
    private final FormatterShelf percent;
    private final FormatterShelf degrees;
    private final FormatterShelf areaKm2;
    private final LocalizedNumberFormatter integer;
    private final LocalizedNumberFormatter significant;
    private final LocalizedNumberFormatter errorPercent;
    private final LocalizedNumberFormatter distanceKm;

    NumberWriter(ULocale locale) {
        this.rightToLeft = locale.isRightToLeft();
        this.digits = digitsOf(locale);
        LocalizedNumberFormatter plain = NumberFormatter.withLocale(locale).roundingMode(RoundingMode.HALF_EVEN);
        this.fixed = new FormatterShelf(decimals -> plain.precision(Precision.fixedFraction(decimals)));
        this.percent = new FormatterShelf(decimals -> plain.unit(NoUnit.PERCENT).precision(Precision.maxFraction(decimals)));
        this.degrees = new FormatterShelf(decimals -> plain.unit(MeasureUnit.DEGREE)
                .unitWidth(NumberFormatter.UnitWidth.NARROW).precision(Precision.maxFraction(decimals)));
        this.areaKm2 = new FormatterShelf(decimals -> plain.unit(MeasureUnit.SQUARE_KILOMETER)
                .unitWidth(NumberFormatter.UnitWidth.SHORT).precision(Precision.fixedFraction(decimals)));
        this.integer = plain.precision(Precision.integer());
        this.significant = plain.precision(Precision.maxSignificantDigits(SIGNIFICANT_DIGITS));
        this.errorPercent = plain.unit(NoUnit.PERCENT).precision(Precision.maxSignificantDigits(2));
        this.distanceKm = plain.unit(MeasureUnit.KILOMETER).unitWidth(NumberFormatter.UnitWidth.SHORT)
                .precision(Precision.integer());
    }

    /** The ten digits of the locale's default numbering system (CLDR), or the ASCII digits for an algorithmic one. */
    private static String[] digitsOf(ULocale locale) {
        NumberingSystem system = NumberingSystem.getInstance(locale);
        String description = system.getDescription();
        String[] digits = new String[10];
        boolean decimal = !system.isAlgorithmic() && system.getRadix() == 10
                && description.codePointCount(0, description.length()) == 10;
        for (int d = 0, i = 0; d < 10; d++) {
            if (decimal) {
                int cp = description.codePointAt(i);
                digits[d] = new String(Character.toChars(cp));
                i += Character.charCount(cp);
            } else {
                digits[d] = String.valueOf((char) ('0' + d));
            }
        }
        return digits;
    }

    /** {@code value} with exactly {@code decimals} decimals, grouped: "12,345.6" in English, "12 345,6" in French. */
    public String fixed(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return NOT_A_NUMBER;
        }
        return write(fixed.forDecimals(decimals), value, decimals);
    }

    /** A whole number, grouped as the language groups ("1,234"; Spanish "1234"). */
    public String integer(long value) {
        return write(integer, value, 0);
    }

    /**
     * A figure of unknown precision: at most {@value #SIGNIFICANT_DIGITS} significant digits, trailing zeros
     * dropped, grouped (projection parameters, figures as reported, multipliers).
     */
    public String significant(double value) {
        if (!Double.isFinite(value)) {
            return NOT_A_NUMBER;
        }
        return write(significant, value, ANY_SCALE);
    }

    /** A mapped figure: the decimals of {@link FigureText#figureDecimals}, so legend, tooltips and tables agree. */
    public String figure(double value, List<Double> limits) {
        if (!Double.isFinite(value)) {
            return NOT_A_NUMBER;
        }
        return fixed(value, FigureText.figureDecimals(value, limits));
    }

    /** A class limit: the decimals every limit of the map shares ({@link FigureText#limitDecimals}). */
    public String limit(double value, List<Double> limits) {
        return fixed(value, FigureText.limitDecimals(limits));
    }

    /** A percentage (of 100) with at most {@code maxDecimals} decimals: "12.5%", French "12,5 %". */
    public String percent(double percent, int maxDecimals) {
        if (!Double.isFinite(percent)) {
            return NOT_A_NUMBER;
        }
        return write(this.percent.forDecimals(maxDecimals), percent, maxDecimals);
    }

    /**
     * A small error bound as a percentage with two significant digits ("0.0039%", "1.2%"): all an error bound
     * needs.
     */
    public String errorPercent(double percent) {
        if (!Double.isFinite(percent)) {
            return NOT_A_NUMBER;
        }
        return write(errorPercent, percent, ANY_SCALE);
    }

    /** An angle in degrees with at most {@code maxDecimals} decimals, in CLDR's narrow form ("1.25°"). */
    public String degrees(double degrees, int maxDecimals) {
        if (!Double.isFinite(degrees)) {
            return NOT_A_NUMBER;
        }
        return write(this.degrees.forDecimals(maxDecimals), degrees, maxDecimals);
    }

    /** An area in km² with exactly {@code decimals} decimals, with the language's unit spacing ("1,234 km²"). */
    public String areaKm2(double areaKm2, int decimals) {
        if (!Double.isFinite(areaKm2)) {
            return NOT_A_NUMBER;
        }
        return write(this.areaKm2.forDecimals(decimals), areaKm2, decimals);
    }

    /** A distance in km, whole, with the language's unit spacing. */
    public String distanceKm(double km) {
        if (!Double.isFinite(km)) {
            return NOT_A_NUMBER;
        }
        return write(distanceKm, km, 0);
    }

    /**
     * A period or date label from the project: a label of ASCII digits and punctuation only (a year "2021", a
     * range "2021–2023", a month "2024-03") is written in the language's digits, digit for digit, so nothing is
     * grouped and leading zeros stay; a label with any letter ("Q1 2024", "spring") is the author's text, kept
     * as is.
     */
    public String period(String label) {
        boolean asciiDigits = label.chars().anyMatch(NumberWriter::isAsciiDigit);
        boolean otherLettersOrDigits = label.chars().anyMatch(c -> Character.isLetter(c) || Character.isDigit(c) && !isAsciiDigit(c));
        if (!asciiDigits || otherLettersOrDigits) {
            return label;
        }
        StringBuilder out = new StringBuilder(label.length());
        label.chars().forEach(c -> out.append(isAsciiDigit(c) ? digits[c - '0'] : String.valueOf((char) c)));
        return out.toString();
    }

    private static boolean isAsciiDigit(int c) {
        return c >= '0' && c <= '9';
    }

    /**
     * Formats after removing negative zero (a value that rounds to 0 at {@code decimals} is written as 0). In a
     * right-to-left language written with Latin digits, the figure itself (sign, digits, marks, percent sign) is
     * wrapped in a left-to-right embedding (U+202A ... U+202C, UAX #9): without it the bidirectional algorithm
     * moves the sign and the percent sign to the far side of the digits in right-to-left text (-98 shows as
     * 98-), while the words of a unit keep their right-to-left place.
     */
    private String write(LocalizedNumberFormatter formatter, double value, int decimals) {
        double shown = value;
        if (value < 0 && BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_EVEN).signum() == 0) {
            shown = 0;
        }
        String text = formatter.format(shown == 0 ? 0.0 : shown).toString().replace('-', '\u2212');
        return rightToLeft ? LATIN_FIGURE.matcher(text).replaceAll("\u202a$0\u202c") : text;
    }

    /** A figure in Latin digits with its sign, marks and percent sign (and the marks CLDR puts around them). */
    private static final java.util.regex.Pattern LATIN_FIGURE =
            java.util.regex.Pattern.compile("\u200e?[\u2212+]?[0-9](?:[0-9.,\u202f\u00a0]*[0-9])?(?:\u200e?%\u200e?)?");
}
