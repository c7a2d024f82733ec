package aequa.projection;

/**
 * Lambert cylindrical equal-area on the unit sphere, normal aspect, with true scale along the parallels
 * +-phi_s: x = lon cos(phi_s), y = sin(lat) / cos(phi_s) (Snyder 1987, eqs. 10-1 and 10-2, with R = 1);
 * inverse lat = asin(y cos(phi_s)), lon = x / cos(phi_s) (eqs. 10-4 and 10-5). aequa feeds it the frame
 * coordinates of a rotated authalic sphere, which gives the transverse and oblique aspects.
 */
final class CylindricalKernel implements SphereKernel {

    private final double k0;

    /** @param standardLatRad the latitude phi_s of the two lines of true scale, |phi_s| < pi/2 */
    CylindricalKernel(double standardLatRad) {
        this.k0 = Math.cos(standardLatRad);
        if (!(k0 > 1e-6)) {
            throw new IllegalArgumentException("standard parallel too close to a pole: " + Math.toDegrees(standardLatRad));
        }
    }

    @Override
    public void forward(double lonRad, double latRad, double[] out) {
        out[0] = lonRad * k0;
        out[1] = Math.sin(latRad) / k0;
    }

    @Override
    public void inverse(double x, double y, double[] out) {
        double sinLat = y * k0;
        double lon = x / k0;
        if (Math.abs(sinLat) > 1.0 + 1e-12 || Math.abs(lon) > Math.PI * (1.0 + 1e-12)) {
            out[0] = Double.NaN;
            out[1] = Double.NaN;
            return;
        }
        out[0] = Math.max(-Math.PI, Math.min(Math.PI, lon));
        out[1] = Math.asin(Math.max(-1.0, Math.min(1.0, sinLat)));
    }
}
