package aequa.projection;

/**
 * The spherical formula of a projection on the unit sphere, in its normal aspect: longitude and latitude in
 * radians (longitude in [-pi, pi]) to (x, y) in units of the sphere's radius, and back. Every kernel is
 * equal-area on the unit sphere (dx dy = cos(lat) dlon dlat). Points off the map come out as NaN.
 * Implementations are immutable; {@code out} receives two values.
 */
interface SphereKernel {

    void forward(double lonRad, double latRad, double[] out);

    void inverse(double x, double y, double[] out);
}
