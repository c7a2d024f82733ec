package aequa.colour;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The Machado, Oliveira and Fernandes 2009 severity-1.0 matrices. */
class ColourVisionTest {

    // Machado et al. 2009, table of pre-computed matrices, severity 1.0, as reproduced in the open
    // colour-science library (colour/blindness/datasets/machado2010.py, CVD_MATRICES_MACHADO2010,
    // BSD licence), read with the code search. Rows of the matrix; column j = image of primary j.
    private static final double[][][] TABLE = {
            {{0.152286, 1.052583, -0.204868}, {0.114503, 0.786281, 0.099216}, {-0.003882, -0.048116, 1.051998}},
            {{0.367322, 0.860646, -0.227968}, {0.280085, 0.672501, 0.047413}, {-0.011820, 0.042940, 0.968881}},
            {{1.255528, -0.076749, -0.178779}, {-0.078411, 0.930809, 0.147602}, {0.004733, 0.691367, 0.303900}}};
    private static final ColourVision[] DEFICIENCIES = {
            ColourVision.PROTANOPIA, ColourVision.DEUTERANOPIA, ColourVision.TRITANOPIA};

    @Test
    void matricesMatchThePublishedTable() {
        // a linear colour with small positive channels stays inside [0, 1], so no clamping: M * v exactly
        double[] v = {0.30, 0.20, 0.25};
        for (int d = 0; d < DEFICIENCIES.length; d++) {
            LinearRgb out = DEFICIENCIES[d].simulate(new LinearRgb(v[0], v[1], v[2]));
            double[] expected = new double[3];
            for (int row = 0; row < 3; row++) {
                expected[row] = TABLE[d][row][0] * v[0] + TABLE[d][row][1] * v[1] + TABLE[d][row][2] * v[2];
            }
            assertEquals(expected[0], out.red(), 1e-12, DEFICIENCIES[d].name());
            assertEquals(expected[1], out.green(), 1e-12, DEFICIENCIES[d].name());
            assertEquals(expected[2], out.blue(), 1e-12, DEFICIENCIES[d].name());
        }
    }

    @Test
    void neutralsStayNeutralAndNormalVisionIsIdentity() {
        // every row of the published matrices sums to 1 (to 6 decimals): greys are seen unchanged
        for (ColourVision vision : ColourVision.values()) {
            LinearRgb grey = vision.simulate(new LinearRgb(0.4, 0.4, 0.4));
            assertEquals(0.4, grey.red(), 1e-5, vision.name());
            assertEquals(0.4, grey.green(), 1e-5, vision.name());
            assertEquals(0.4, grey.blue(), 1e-5, vision.name());
        }
        LinearRgb colour = new LinearRgb(0.9, 0.1, 0.3);
        assertEquals(colour, ColourVision.NORMAL.simulate(colour));
    }

    @Test
    void redAndGreenOfEqualLightnessCollapseForRedGreenDichromats() {
        // the defining confusion of protanopia and deuteranopia: a red and a green that differ strongly for
        // normal vision come much closer; for tritanopia they stay apart
        Rgb red = GamutMapping.toRgb(new OkLch(0.65, 0.15, 25));
        Rgb green = GamutMapping.toRgb(new OkLch(0.65, 0.15, 145));
        double normal = ColourVision.NORMAL.seen(red).deltaE(ColourVision.NORMAL.seen(green));
        double deutan = ColourVision.DEUTERANOPIA.seen(red).deltaE(ColourVision.DEUTERANOPIA.seen(green));
        double protan = ColourVision.PROTANOPIA.seen(red).deltaE(ColourVision.PROTANOPIA.seen(green));
        double tritan = ColourVision.TRITANOPIA.seen(red).deltaE(ColourVision.TRITANOPIA.seen(green));
        assertEquals(true, deutan < normal / 3, "deutan " + deutan + " normal " + normal);
        assertEquals(true, protan < normal / 2, "protan " + protan + " normal " + normal);
        assertEquals(true, tritan > normal / 2, "tritan " + tritan + " normal " + normal);
    }
}
