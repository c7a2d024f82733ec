package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** FixedDecimal against java.math.BigDecimal (HALF_UP on the exact binary value) as the reference. */
class FixedDecimalTest {

    @Test
    void matchesBigDecimalOnSeededRandomValues() {
        Random random = new Random(20241);
        for (int decimals = 0; decimals <= 4; decimals++) {
            FixedDecimal fixed = new FixedDecimal(decimals);
            for (int i = 0; i < 20_000; i++) {
                double v = (random.nextDouble() - 0.5) * Math.pow(10, random.nextInt(8));
                String expected = new BigDecimal(v).setScale(decimals, RoundingMode.HALF_UP).stripTrailingZeros().toPlainString();
                if (expected.equals("-0") || new BigDecimal(expected).signum() == 0) {
                    expected = "0";
                }
                String actual = fixed.apply(v);
                // the fast path rounds the double-scaled value; it may differ from exact decimal rounding only at a
                // tie that binary scaling moved, so compare numerically within half a unit in the last place
                double tolerance = fixed.quantum() * 1.000001;
                assertEquals(Double.parseDouble(expected), Double.parseDouble(actual), tolerance, v + " at " + decimals);
                if (Math.abs(Double.parseDouble(expected) - Double.parseDouble(actual)) > 0) {
                    assertEquals(0.5, Math.abs(v * Math.pow(10, decimals) % 1), 1e-6, "only ties may differ: " + v);
                }
            }
        }
    }

    @Test
    void writesPlainNumbers() {
        FixedDecimal two = new FixedDecimal(2);
        assertEquals("0", two.apply(-0.0));
        assertEquals("0", two.apply(-0.001));
        assertEquals("12.5", two.apply(12.5));
        assertEquals("-3.05", two.apply(-3.049999));
        assertEquals("1000000000000000000000", two.apply(1e21));
        assertEquals("0.01", two.apply(0.005));
        assertEquals("7", new FixedDecimal(0).apply(6.5));
    }
}
