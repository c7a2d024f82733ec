package aequa.projection;

/** Longitude arithmetic in degrees, kept in one place because its edge cases (+-180) are easy to get wrong. */
public final class Longitudes {

    private Longitudes() {
    }

    /** Wraps a longitude into [-180, 180); NaN stays NaN. */
    public static double normalize(double lonDeg) {
        double wrapped = Math.IEEEremainder(lonDeg, 360.0);
        return wrapped == 180.0 ? -180.0 : wrapped;
    }

    /** The signed difference {@code to - from} wrapped into [-180, 180). */
    public static double difference(double fromDeg, double toDeg) {
        return normalize(toDeg - fromDeg);
    }
}
