package aequa.classes;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

/** One way of writing figures for readers (grouping and signs as in CLDR's English patterns, "#,##0.###"). */
class FigureTextTest {

    @Test
    void groupsThousandsAndUsesATrueMinus() {
        assertEquals("12,345.6", FigureText.format(12345.6, 1));
        assertEquals("1,234,567", FigureText.format(1234567.4, 0));
        assertEquals("\u22123.50", FigureText.format(-3.5, 2)); // U+2212 MINUS SIGN, as typesetting asks
        assertEquals("0.0", FigureText.format(-0.04, 1), "a negative that rounds to zero is zero");
        assertEquals("\u2013", FigureText.format(Double.NaN, 2));
    }

    @Test
    void limitsShareTheirDecimalsAndFiguresTakeOneMore() {
        List<Double> limits = List.of(0.0, 0.6, 1.4, 4.2, 7.5, 9.1);
        assertEquals(1, FigureText.limitDecimals(limits));
        assertEquals(2, FigureText.valueDecimals(limits));
        assertEquals(0, FigureText.limitDecimals(List.of(0.0, 20.0, 40.0, 100.0)));
        assertEquals(1, FigureText.valueDecimals(List.of(0.0, 20.0, 40.0, 100.0)));
        assertEquals(6, FigureText.limitDecimals(List.of(0.1234567)), "capped");
        // figures: one decimal more than the limits, no trailing zeros
        assertEquals("43.91", FigureText.figure(43.9054, limits));
        assertEquals("75", FigureText.figure(75, limits));
        assertEquals("12.5", FigureText.figure(12.5, limits));
        assertEquals("1,000", FigureText.figure(999.996, limits));
    }
}
