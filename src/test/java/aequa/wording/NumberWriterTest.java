package aequa.wording;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;

/**
 * Numbers as readers of each shipped language write them, checked against the conventions CLDR publishes
 * (the CLDR "Numbers" charts, cldr.unicode.org, by-type/numbers: symbols, patterns, minimum grouping digits;
 * the values below are written from those charts as we know them, from memory, and match CLDR 48 as ICU4J
 * 78.1 ships it). U+202F is NARROW NO-BREAK SPACE, U+00A0 NO-BREAK SPACE, U+2212 MINUS SIGN, U+200E
 * LEFT-TO-RIGHT MARK.
 */
class NumberWriterTest {

    private static NumberWriter writer(String tag) {
        return Wording.of(Language.parse(tag).orElseThrow()).numbers();
    }

    @Test
    void englishGroupsByThreesWithACommaAndUsesAPoint() {
        NumberWriter en = writer("en");
        assertEquals("12,345.6", en.fixed(12345.6, 1));
        assertEquals("1,234,567", en.fixed(1234567.4, 0));
        assertEquals("12.5%", en.percent(12.5, 1), "CLDR en percent pattern #,##0%: no space");
        assertEquals("1,234 km\u00b2", en.areaKm2(1234, 0), "CLDR en unit pattern {0} km²");
    }

    @Test
    void frenchGroupsWithANarrowNoBreakSpaceAndSpacesThePercentSign() {
        NumberWriter fr = writer("fr");
        // CLDR fr: decimal ",", group U+202F (since CLDR 34), percent pattern "#,##0 %" with U+00A0
        assertEquals("1\u202f234,5", fr.fixed(1234.5, 1));
        assertEquals("12\u202f345\u202f678", fr.fixed(12_345_678, 0));
        assertEquals("12,5\u00a0%", fr.percent(12.5, 1));
        assertEquals("1\u202f234\u202fkm\u00b2", fr.areaKm2(1234, 0));
    }

    @Test
    void spanishLeavesFourDigitsUngrouped() {
        NumberWriter es = writer("es");
        // CLDR es: decimal ",", group ".", minimumGroupingDigits 2, percent "#,##0 %" with U+00A0
        assertEquals("1234,5", es.fixed(1234.5, 1));
        assertEquals("12.345,5", es.fixed(12345.5, 1));
        assertEquals("12,5\u00a0%", es.percent(12.5, 1));
    }

    @Test
    void brazilianPortugueseUsesAPointToGroupAndNoPercentSpace() {
        NumberWriter ptBr = writer("pt-BR");
        // CLDR pt: decimal ",", group ".", percent "#,##0%"
        assertEquals("1.234,5", ptBr.fixed(1234.5, 1));
        assertEquals("12,5%", ptBr.percent(12.5, 1));
    }

    @Test
    void arabicFollowsItsLocalesDigits() {
        // CLDR ar: Latin digits by default, a left-to-right mark before the sign; aequa wraps a Latin figure in a
        // left-to-right embedding (U+202A ... U+202C) so its sign stays on the left inside Arabic text
        NumberWriter ar = writer("ar");
        assertEquals("\u202a1,234.5\u202c", ar.fixed(1234.5, 1));
        assertEquals("\u202a\u200e\u22123.5\u202c", ar.fixed(-3.5, 1));
        assertEquals("\u202a100,000\u202c \u0643\u0645\u00b2", ar.areaKm2(100_000, 0), "the unit's words stay outside");
        // CLDR ar-EG: Arabic-Indic digits, U+066B decimal and U+066C group separators, U+066A percent sign
        NumberWriter egypt = writer("ar-EG");
        assertEquals("\u0661\u066c\u0662\u0663\u0664\u066b\u0665", egypt.fixed(1234.5, 1));
        assertEquals("\u0661\u0662\u066b\u0665\u066a\u061c", egypt.percent(12.5, 1));
        assertEquals("\u0662\u0660\u0662\u0664", egypt.period("2024"), "a year in the language's digits, ungrouped");
        // CLDR's arab numbering system: U+0660..U+0669 stand for 0..9, digit for digit
        assertEquals("\u0662\u0660\u0662\u0663\u2013\u0662\u0660\u0662\u0665", egypt.period("2023\u20132025"), "a range of years");
        assertEquals("\u0662\u0660\u0662\u0664-\u0660\u0663", egypt.period("2024-03"), "a month keeps its leading zero");
        assertEquals("Q1 2024", egypt.period("Q1 2024"), "a label with words is the author's text");
        assertEquals("2023\u20132025", ar.period("2023\u20132025"), "CLDR ar writes Latin digits");
    }

    @Test
    void oneSignOneRoundingOneNotANumberForEveryLanguage() {
        for (String tag : List.of("en", "fr", "es", "pt-BR", "ar")) {
            NumberWriter numbers = writer(tag);
            assertEquals(NumberWriter.NOT_A_NUMBER, numbers.fixed(Double.NaN, 2), tag);
            assertEquals(NumberWriter.NOT_A_NUMBER, numbers.significant(Double.POSITIVE_INFINITY), tag);
            assertEquals(NumberWriter.NOT_A_NUMBER, numbers.percent(Double.NaN, 1), tag);
            assertEquals(numbers.fixed(0, 1), numbers.fixed(-0.04, 1), tag + ": a negative that rounds to zero is zero");
            // half to even (IEEE 754 roundTiesToEven, the rounding of java.math.RoundingMode.HALF_EVEN)
            assertEquals(numbers.fixed(2, 0), numbers.fixed(2.5, 0), tag);
        }
        assertEquals("\u22123.50", writer("en").fixed(-3.5, 2), "U+2212 MINUS SIGN, as typesetting asks");
    }

    @Test
    void figuresTakeTheMapsPrecisionInEveryLanguage() {
        List<Double> limits = List.of(0.0, 0.6, 1.4, 4.2, 7.5, 9.1);
        assertEquals("43.91", writer("en").figure(43.9054, limits));
        assertEquals("43,91", writer("fr").figure(43.9054, limits));
        assertEquals("75", writer("fr").figure(75, limits));
        assertEquals("1,000", writer("en").figure(999.996, limits));
        assertEquals("0.6", writer("en").limit(0.6, limits));
        assertEquals("0,0", writer("es").limit(0, limits));
    }

    @Test
    void theMachinesLocaleNeverLeaks() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertEquals("12,345.6", writer("en").fixed(12345.6, 1));
            Locale.setDefault(Locale.forLanguageTag("ar-SA"));
            assertEquals("1\u202f234,5", writer("fr").fixed(1234.5, 1));
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void significantFiguresAndSmallErrorBounds() {
        NumberWriter en = writer("en");
        assertEquals("1,234,570", en.significant(1_234_567.891));
        assertEquals("0.000123457", en.significant(0.0001234567));
        assertEquals("\u221212.5", en.significant(-12.5));
        assertEquals("0.0039%", en.errorPercent(0.00391));
        assertEquals("1.25\u00b0", en.degrees(1.25, 2), "CLDR en narrow degree: {0}°");
    }

    /**
     * A writer reuses its ICU formatters, which ICU compiles after a few calls: the thousands of figures of a page
     * must read exactly as the first one would. Checked against the JDK's own {@link java.text.DecimalFormat}
     * (pattern #,##0.0…, half-even, English symbols) on seeded random figures, where a tie is practically
     * impossible, and, for French, against the first call of a fresh writer.
     */
    @Test
    void reusedFormattersWriteEveryFigureAsAFreshOne() {
        NumberWriter en = writer("en");
        java.util.Random random = new java.util.Random(12);
        for (int decimals = 0; decimals <= 4; decimals++) {
            java.text.DecimalFormat reference = new java.text.DecimalFormat(
                    decimals == 0 ? "#,##0" : "#,##0." + "0".repeat(decimals),
                    java.text.DecimalFormatSymbols.getInstance(Locale.ENGLISH));
            reference.setRoundingMode(java.math.RoundingMode.HALF_EVEN);
            for (int i = 0; i < 200; i++) {
                double value = random.nextDouble() * Math.pow(10, random.nextInt(8));
                assertEquals(reference.format(value), en.fixed(value, decimals), value + " at " + decimals + " decimals");
            }
        }
        NumberWriter fr = writer("fr");
        for (int i = 0; i < 50; i++) {
            double value = -1234.5678 * (i + 1);
            assertEquals(writer("fr").fixed(value, 2), fr.fixed(value, 2), "call " + i + " of one writer");
            assertEquals(writer("fr").percent(value / 100, 1), fr.percent(value / 100, 1));
            assertEquals(writer("fr").areaKm2(-value, 0), fr.areaKm2(-value, 0));
            assertEquals(writer("fr").degrees(value / 1000, 3), fr.degrees(value / 1000, 3));
        }
    }
}
