package aequa.colour;

/**
 * Normal colour vision and the three dichromacies, simulated with the severity-1.0 matrices of Machado,
 * Oliveira and Fernandes 2009 ("A physiologically-based model for simulation of color vision deficiency",
 * IEEE TVCG 15(6), 1291-1298; table of pre-computed matrices, severity 1.0 rows for protanomaly,
 * deuteranomaly and tritanomaly, which model protanopia, deuteranopia and tritanopia).
 *
 * <p>The matrices act on linear-light sRGB; results outside [0, 1] are clamped per channel, as the
 * simulated display cannot show them.
 */
public enum ColourVision {
    NORMAL(new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}}),
    PROTANOPIA(new double[][] {
            {0.152286, 1.052583, -0.204868},
            {0.114503, 0.786281, 0.099216},
            {-0.003882, -0.048116, 1.051998}}),
    DEUTERANOPIA(new double[][] {
            {0.367322, 0.860646, -0.227968},
            {0.280085, 0.672501, 0.047413},
            {-0.011820, 0.042940, 0.968881}}),
    TRITANOPIA(new double[][] {
            {1.255528, -0.076749, -0.178779},
            {-0.078411, 0.930809, 0.147602},
            {0.004733, 0.691367, 0.303900}});

    private final double[][] matrix;

    ColourVision(double[][] matrix) {
        this.matrix = matrix;
    }

    /** How a reader with this vision sees {@code colour}, in linear sRGB clamped to [0, 1]. */
    public LinearRgb simulate(LinearRgb colour) {
        double[] out = OkLab.multiply(matrix, colour.red(), colour.green(), colour.blue());
        return new LinearRgb(out[0], out[1], out[2]).clamped();
    }

    /** How a reader with this vision sees {@code colour}, in OKLab. */
    public OkLab seen(Rgb colour) {
        return OkLab.fromLinearSrgb(simulate(LinearRgb.of(colour)));
    }

    /** Lower-case name for check names and reports, for example {@code deuteranopia}. */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
