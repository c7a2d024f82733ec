package aequa.classes;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

/** One precision for a map's figures: limits share their decimals, figures take one more (common practice). */
class FigureTextTest {

    @Test
    void limitsShareTheirDecimalsAndFiguresTakeOneMore() {
        List<Double> limits = List.of(0.0, 0.6, 1.4, 4.2, 7.5, 9.1);
        assertEquals(1, FigureText.limitDecimals(limits));
        assertEquals(2, FigureText.valueDecimals(limits));
        assertEquals(0, FigureText.limitDecimals(List.of(0.0, 20.0, 40.0, 100.0)));
        assertEquals(1, FigureText.valueDecimals(List.of(0.0, 20.0, 40.0, 100.0)));
        assertEquals(6, FigureText.limitDecimals(List.of(0.1234567)), "capped");
        // figures: one decimal more than the limits, no trailing zeros
        assertEquals(2, FigureText.figureDecimals(43.9054, limits));
        assertEquals(0, FigureText.figureDecimals(75, limits));
        assertEquals(1, FigureText.figureDecimals(12.5, limits));
        assertEquals(0, FigureText.figureDecimals(999.996, limits), "rounds up to 1000.00, written 1000");
        assertEquals(0, FigureText.figureDecimals(Double.NaN, limits));
    }

    @Test
    void limitsAlongABarTakeTheFewestDecimalsThatKeepThemExactAndDistinct() {
        assertEquals(0, FigureText.distinctDecimals(List.of(0.0, 10.0, 20.0)));
        assertEquals(1, FigureText.distinctDecimals(List.of(0.0, 2.5, 5.0)));
        assertEquals(2, FigureText.distinctDecimals(List.of(0.25, 0.5, Double.NaN)));
        assertEquals(4, FigureText.distinctDecimals(List.of(0.123456)), "capped at four");
    }
}
