package aequa.demo;

/**
 * A simple plane in which the demo's invented cells are drawn before they are placed on the globe, in
 * degrees. Not a map projection of aequa's: it only shapes invented geography.
 */
@FunctionalInterface
interface LocalPlane {

    /** Writes (lon, lat) for plane point (x, y) into out; lon may leave [-180, 180] (unwrapped). */
    void toLonLat(double x, double y, double[] out);

    /** Longitude and latitude themselves, for cells that tile the whole globe's lon/lat rectangle. */
    static LocalPlane lonLat() {
        return (x, y, out) -> {
            out[0] = x;
            out[1] = y;
        };
    }

    /** Sinusoidal about a central meridian: x = (lon - lon0) cos(lat), y = lat. */
    static LocalPlane sinusoidal(double lon0Deg) {
        return (x, y, out) -> {
            out[0] = lon0Deg + x / Math.cos(Math.toRadians(y));
            out[1] = y;
        };
    }

    /** North polar azimuthal equidistant: distance from the plane's origin is the colatitude. */
    static LocalPlane northPolar() {
        return (x, y, out) -> {
            out[0] = Math.toDegrees(Math.atan2(x, -y));
            out[1] = 90.0 - Math.hypot(x, y);
        };
    }
}
