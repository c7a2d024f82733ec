package aequa.demo;

/**
 * A simple plane in which the demo's invented cells are drawn before they are placed on the globe, in
 * degrees. Not a map projection of aequa's: it only shapes invented geography.
 */
interface LocalPlane {

    /** Writes (lon, lat) for plane point (x, y) into out; lon may leave [-180, 180] (unwrapped). */
    void toLonLat(double x, double y, double[] out);

    void toPlane(double lonDeg, double latDeg, double[] out);

    /** Sinusoidal about a central meridian: x = (lon - lon0) cos(lat), y = lat. */
    static LocalPlane sinusoidal(double lon0Deg) {
        return new LocalPlane() {
            @Override
            public void toLonLat(double x, double y, double[] out) {
                out[0] = lon0Deg + x / Math.cos(Math.toRadians(y));
                out[1] = y;
            }

            @Override
            public void toPlane(double lonDeg, double latDeg, double[] out) {
                out[0] = (lonDeg - lon0Deg) * Math.cos(Math.toRadians(latDeg));
                out[1] = latDeg;
            }
        };
    }

    /** North polar azimuthal equidistant: distance from the plane's origin is the colatitude. */
    static LocalPlane northPolar() {
        return new LocalPlane() {
            @Override
            public void toLonLat(double x, double y, double[] out) {
                out[0] = Math.toDegrees(Math.atan2(x, -y));
                out[1] = 90.0 - Math.hypot(x, y);
            }

            @Override
            public void toPlane(double lonDeg, double latDeg, double[] out) {
                double colat = 90.0 - latDeg;
                out[0] = colat * Math.sin(Math.toRadians(lonDeg));
                out[1] = -colat * Math.cos(Math.toRadians(lonDeg));
            }
        };
    }
}
