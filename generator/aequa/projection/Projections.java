package aequa.projection;

/** Front door for building projections by family. */
public final class Projections {

    private Projections() {
    }

    /** Lambert azimuthal equal-area on WGS 84, centred on the given point. */
    public static EqualAreaProjection lambertAzimuthal(double centreLonDeg, double centreLatDeg) {
        return SisProjection.lambertAzimuthal(centreLonDeg, centreLatDeg);
    }
}
