package aequa.colour;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The sRGB transfer function per IEC 61966-2-1:1999, sections 5.2 and 5.3. */
class SrgbTransferTest {

    @Test
    void valuesFromTheStandardsFormulas() {
        // linear segment: V / 12.92 at and below 0.04045 (IEC 61966-2-1 section 5.2)
        assertEquals(0.04045 / 12.92, SrgbTransfer.toLinear(0.04045), 1e-15);
        // power segment ((V + 0.055) / 1.055)^2.4: 0.5 -> 0.214041 (worked by hand: 0.526066^2.4)
        assertEquals(0.214041, SrgbTransfer.toLinear(0.5), 1e-6);
        assertEquals(1.0, SrgbTransfer.toLinear(1.0), 1e-15);
        assertEquals(0.0, SrgbTransfer.toLinear(0.0), 0);
        // the two segments meet (nearly) continuously at the threshold
        assertEquals(SrgbTransfer.toLinear(0.04045), Math.pow((0.04045 + 0.055) / 1.055, 2.4), 1e-7);
        // encoding threshold 0.0031308 (section 5.3) maps to about 0.04045
        assertEquals(0.04045, SrgbTransfer.toEncoded(0.0031308), 1e-6);
    }

    @Test
    void everyEightBitCodeRoundTrips() {
        for (int code = 0; code <= 255; code++) {
            double encoded = code / 255.0;
            assertEquals(encoded, SrgbTransfer.toEncoded(SrgbTransfer.toLinear(encoded)), 1e-12, "code " + code);
            Rgb grey = new Rgb(code, code, code);
            assertEquals(grey, LinearRgb.of(grey).toRgb());
        }
    }
}
