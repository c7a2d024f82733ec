package aequa.inputs.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The number grammar, case by case. Conventions: decimal comma with point or space grouping and decimal
 * point with comma grouping are common practice in different locales; the grouping of three digits is
 * the SI Brochure's rule (BIPM, The International System of Units, 9th ed. 2019, section 5.4.4: digits
 * "may be divided into groups of three").
 */
class NumberParserTest {

    @ParameterizedTest(name = "[{0}] decimal {1} thousands [{2}] -> {3}")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', value = {
            "12.5       | POINT | ''  | 12.5",
            "-0.25      | POINT | ''  | -0.25",
            "+3         | POINT | ''  | 3",
            "\u22124    | POINT | ''  | -4",
            ".5         | POINT | ''  | 0.5",
            "1e3        | POINT | ''  | 1000",
            "2.5E-2     | POINT | ''  | 0.025",
            "12,5       | COMMA | ''  | 12.5",
            "1.234,5    | COMMA | .   | 1234.5",
            "1 234 567  | COMMA | ' ' | 1234567",
            "1,234.5    | POINT | ,   | 1234.5",
            "1234.5     | POINT | ,   | 1234.5",
            "1'000      | POINT | \\' | 1000",
    })
    void accepted(String text, DecimalMark decimal, String thousands, double expected) {
        String separator = thousands.equals("\\'") ? "'" : thousands;
        assertEquals(expected, new NumberParser(decimal, separator).parse(text));
    }

    @ParameterizedTest(name = "[{0}] decimal {1} thousands [{2}] is not a number")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', value = {
            "12,5       | POINT | ''",
            "12abc      | POINT | ''",
            "1,23.5     | POINT | ,",
            "1,2345     | POINT | ,",
            "12%        | POINT | ''",
            "1e999      | POINT | ''",
            "NaN        | POINT | ''",
            "Infinity   | POINT | ''",
            "1.5.2      | POINT | ''",
            "'- 3'      | POINT | ''",
            "12.5       | COMMA | ''",
    })
    void refused(String text, DecimalMark decimal, String thousands) {
        assertTrue(Double.isNaN(new NumberParser(decimal, thousands).parse(text)));
    }

    @ParameterizedTest(name = "hint for [{0}] mentions [{2}]")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', value = {
            "12,5      | POINT | 'decimal: \",\"'",
            "1,234     | POINT | 'thousands: \",\"'",
            "12.5      | COMMA | 'decimal: \".\"'",
            "1 234     | POINT | 'thousands:'",
            "12%       | POINT | percent",
            "n/a       | POINT | marker",
    })
    void hints(String text, DecimalMark decimal, String mention) {
        String hint = new NumberParser(decimal, "").hint(text);
        assertTrue(hint.contains(mention), hint);
    }
}
