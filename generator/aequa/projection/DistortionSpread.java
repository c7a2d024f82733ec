package aequa.projection;

import java.util.Arrays;
import java.util.Locale;

/**
 * How the angular distortion of a projection is spread over the mapped area, for readers: the shares of the
 * area where Tissot's omega is below 1, 5 and 10 deg, the omega that 95 % of the area stays under, and where
 * the largest omega sits, in words. Shares and percentile are weighted by the area each interior sample of
 * the footprint stands for ({@link FootprintSamples}); boundary samples weigh nothing. Their accuracy is that
 * of the footprint's sampling (about 2000 interior points; ProjectionDistortionSpreadTest checks them against
 * an independent sampling).
 *
 * @param shareBelow1Deg  share (0 to 1) of the mapped area where omega is below 1 deg
 * @param shareBelow5Deg  share where omega is below 5 deg
 * @param shareBelow10Deg share where omega is below 10 deg
 * @param omegaP95Deg     the omega that 95 % of the mapped area stays at or below, degrees
 * @param worstPlace      where the largest omega sits, in words ("on the pole lines, the map's top and bottom
 *                        edges", "at the data's north-west edge"); empty when unknown
 */
public record DistortionSpread(double shareBelow1Deg, double shareBelow5Deg, double shareBelow10Deg,
                               double omegaP95Deg, String worstPlace) {

    /** Not measured (a choice built without its footprint). */
    public static final DistortionSpread UNKNOWN = new DistortionSpread(Double.NaN, Double.NaN, Double.NaN, Double.NaN, "");

    private static final String[] WINDS = {"north", "north-east", "east", "south-east", "south", "south-west", "west", "north-west"};

    /** The spread of {@code projection} over the footprint; the worst point as {@link OmegaScore} found it. */
    static DistortionSpread of(EqualAreaProjection projection, Footprint footprint, double worstLonDeg, double worstLatDeg) {
        FootprintSamples samples = footprint.samples();
        int n = samples.interiorCount();
        double[] omega = new double[n]; // the boundary samples weigh nothing: their omega is not needed here
        Distortion.omegaDeg(projection, samples.lonLatDeg(), n, omega);
        Integer[] order = new Integer[n];
        double total = 0;
        double[] below = new double[3];
        double[] limits = {1, 5, 10};
        for (int i = 0; i < n; i++) {
            order[i] = i;
            double w = Double.isNaN(omega[i]) ? 0 : samples.weight(i);
            total += w;
            for (int k = 0; k < limits.length; k++) {
                if (omega[i] < limits[k]) {
                    below[k] += w;
                }
            }
        }
        if (!(total > 0)) {
            return UNKNOWN;
        }
        Arrays.sort(order, (a, b) -> Double.compare(omega[a], omega[b]));
        double p95 = Double.NaN;
        double running = 0;
        for (int i : order) {
            if (Double.isNaN(omega[i])) {
                continue;
            }
            running += samples.weight(i);
            if (running >= 0.95 * total) {
                p95 = omega[i];
                break;
            }
        }
        return new DistortionSpread(below[0] / total, below[1] / total, below[2] / total, p95,
                place(projection, footprint, worstLonDeg, worstLatDeg));
    }

    /**
     * Where the largest omega sits: on the pole lines of a world family (the pole drawn as a line), at a pole,
     * else at the data's edge in the compass direction of the point seen from the data's spherical centre.
     */
    static String place(EqualAreaProjection projection, Footprint footprint, double lonDeg, double latDeg) {
        if (Double.isNaN(latDeg)) {
            return "";
        }
        boolean pole = Math.abs(latDeg) >= 89.9;
        if (pole && projection.family().world()) {
            return "on the pole lines, the map's top and bottom edges";
        }
        if (pole) {
            return "at the " + (latDeg > 0 ? "North" : "South") + " Pole";
        }
        // initial bearing from the centre to the point on the sphere (spherical trigonometry, e.g. Snyder 1987, eq. 5-4b)
        double lat1 = Math.toRadians(footprint.sphericalCentreLatDeg());
        double lat2 = Math.toRadians(latDeg);
        double dLon = Math.toRadians(lonDeg - footprint.sphericalCentreLonDeg());
        double bearing = Math.toDegrees(Math.atan2(Math.sin(dLon) * Math.cos(lat2),
                Math.cos(lat1) * Math.sin(lat2) - Math.sin(lat1) * Math.cos(lat2) * Math.cos(dLon)));
        int wind = (int) Math.floorMod(Math.round(bearing / 45.0), 8L);
        return String.format(Locale.ROOT, "at the data's %s edge", WINDS[wind]);
    }
}
