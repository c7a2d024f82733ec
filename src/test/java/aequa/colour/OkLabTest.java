package aequa.colour;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.junit.jupiter.api.Test;

/** OKLab against Ottosson's published reference pairs and round trips. */
class OkLabTest {

    /** Half a unit in the third decimal, the rounding of the published table, plus float slack. */
    private static final double TABLE_TOLERANCE = 6e-4;

    // Ottosson 2020, "A perceptual color space for image processing", section "Table of example XYZ and
    // Oklab pairs": X, Y, Z (D65) then L, a, b, rounded to 3 decimals. Verified against copies of the table
    // in several public test suites (found with the code search); the post itself was not opened here.
    private static final double[][] OTTOSSON_PAIRS = {
            {0.950, 1.000, 1.089, 1.000, 0.000, 0.000},
            {1.000, 0.000, 0.000, 0.450, 1.236, -0.019},
            {0.000, 1.000, 0.000, 0.922, -0.671, 0.263},
            {0.000, 0.000, 1.000, 0.153, -1.415, -0.449}};

    // IEC 61966-2-1:1999, section 5.2: linear sRGB to CIE XYZ (D65), the standard's 4-decimal matrix.
    private static final double[][] SRGB_TO_XYZ = {
            {0.4124, 0.3576, 0.1805},
            {0.2126, 0.7152, 0.0722},
            {0.0193, 0.1192, 0.9505}};

    @Test
    void xyzPairsFromOttossonsTable() {
        for (double[] row : OTTOSSON_PAIRS) {
            OkLab lab = OkLab.fromXyz(row[0], row[1], row[2]);
            assertEquals(row[3], lab.lightness(), TABLE_TOLERANCE, "L of " + row[0] + "," + row[1] + "," + row[2]);
            assertEquals(row[4], lab.a(), TABLE_TOLERANCE, "a");
            assertEquals(row[5], lab.b(), TABLE_TOLERANCE, "b");
        }
    }

    @Test
    void linearSrgbPathAgreesWithXyzPathThroughIecMatrix() {
        // The sRGB path uses Ottosson's pre-multiplied matrix; going through the IEC 61966-2-1 matrix and the
        // XYZ path must land on the same OKLab (to the 4 decimals of the IEC matrix).
        Random random = new Random(61966);
        for (int i = 0; i < 200; i++) {
            LinearRgb rgb = new LinearRgb(random.nextDouble(), random.nextDouble(), random.nextDouble());
            double[] xyz = OkLab.multiply(SRGB_TO_XYZ, rgb.red(), rgb.green(), rgb.blue());
            OkLab viaXyz = OkLab.fromXyz(xyz[0], xyz[1], xyz[2]);
            assertEquals(0, viaXyz.deltaE(OkLab.fromLinearSrgb(rgb)), 2e-4, rgb.toString());
        }
    }

    @Test
    void whiteAndBlack() {
        OkLab white = OkLab.fromRgb(new Rgb(255, 255, 255));
        assertEquals(1.0, white.lightness(), 1e-6);
        assertEquals(0.0, white.a(), 1e-6);
        assertEquals(0.0, white.b(), 1e-6);
        assertEquals(0.0, OkLab.fromRgb(new Rgb(0, 0, 0)).lightness(), 1e-12);
    }

    @Test
    void roundTripThroughLinearSrgb() {
        Random random = new Random(2020);
        for (int i = 0; i < 1000; i++) {
            LinearRgb rgb = new LinearRgb(random.nextDouble(), random.nextDouble(), random.nextDouble());
            LinearRgb back = OkLab.fromLinearSrgb(rgb).toLinearSrgb();
            assertEquals(rgb.red(), back.red(), 1e-6);
            assertEquals(rgb.green(), back.green(), 1e-6);
            assertEquals(rgb.blue(), back.blue(), 1e-6);
        }
    }

    @Test
    void lchIsThePolarForm() {
        OkLch lch = new OkLch(0.7, 0.1, 135);
        OkLab lab = lch.toOkLab();
        assertEquals(-0.1 / Math.sqrt(2), lab.a(), 1e-12);
        assertEquals(0.1 / Math.sqrt(2), lab.b(), 1e-12);
        OkLch back = OkLch.of(lab);
        assertEquals(135, back.hueDeg(), 1e-9);
        assertEquals(0.1, back.chroma(), 1e-12);
        assertEquals(270, OkLch.of(new OkLab(0.5, 0, -0.2)).hueDeg(), 1e-9); // hue in [0, 360)
    }
}
