package aequa.colour;

/**
 * The sRGB transfer function of IEC 61966-2-1:1999 (section 5.2 decoding, 5.3 encoding), on channels
 * scaled to [0, 1]. WCAG 2.2 uses the same curve with the same 0.04045 threshold in its definition of
 * relative luminance.
 */
public final class SrgbTransfer {

    private SrgbTransfer() {
    }

    /** Encoded (gamma) channel in [0, 1] to linear light; IEC 61966-2-1 section 5.2. */
    public static double toLinear(double encoded) {
        return encoded <= 0.04045 ? encoded / 12.92 : Math.pow((encoded + 0.055) / 1.055, 2.4);
    }

    /** Linear-light channel in [0, 1] to encoded; IEC 61966-2-1 section 5.3 (the inverse of {@link #toLinear}). */
    public static double toEncoded(double linear) {
        return linear <= 0.0031308 ? linear * 12.92 : 1.055 * Math.pow(linear, 1 / 2.4) - 0.055;
    }
}
