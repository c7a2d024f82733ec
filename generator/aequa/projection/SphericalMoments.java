package aequa.projection;

/**
 * The area-weighted centre, radius and second moments of a footprint's samples on the unit sphere. The
 * centre is the direction of the weighted mean of the samples' unit vectors; the spread is measured in the
 * azimuthal equidistant plane about that centre (coordinates: angular distance times the sine and cosine
 * of the azimuth), whose 2x2 covariance gives the main axis (the eigenvector of the larger eigenvalue) and
 * the elongation sqrt(lambda1 / lambda2). When the mean vector is shorter than 0.2 (data spread round the
 * globe) the centre is not meaningful: it is put on the equator at the longitude arc's centre.
 */
final class SphericalMoments {

    private static final double MEANINGFUL_MEAN_LENGTH = 0.2;
    private static final double MAX_ELONGATION = 1000.0;

    private final double centreLonDeg;
    private final double centreLatDeg;
    private final double radiusDeg;
    private final double elongation;
    private final double orientationDeg;
    private final boolean meaningful;

    private SphericalMoments(double centreLonDeg, double centreLatDeg, double radiusDeg, double elongation,
                             double orientationDeg, boolean meaningful) {
        this.centreLonDeg = centreLonDeg;
        this.centreLatDeg = centreLatDeg;
        this.radiusDeg = radiusDeg;
        this.elongation = elongation;
        this.orientationDeg = orientationDeg;
        this.meaningful = meaningful;
    }

    static SphericalMoments of(FootprintSamples samples) {
        boolean useWeights = samples.interiorCount() > 0;
        int n = useWeights ? samples.interiorCount() : samples.count();
        double mx = 0;
        double my = 0;
        double mz = 0;
        double total = 0;
        for (int i = 0; i < n; i++) {
            double w = useWeights ? samples.weight(i) : 1.0;
            double[] v = unit(samples.lonDeg(i), samples.latDeg(i));
            mx += w * v[0];
            my += w * v[1];
            mz += w * v[2];
            total += w;
        }
        double length = Math.sqrt(mx * mx + my * my + mz * mz) / total;
        double lon = Math.toDegrees(Math.atan2(my, mx));
        double lat = Math.toDegrees(Math.atan2(mz, Math.hypot(mx, my)));
        double[] c = unit(lon, lat);
        double[] east = {-Math.sin(Math.toRadians(lon)), Math.cos(Math.toRadians(lon)), 0};
        double[] north = {-c[2] * Math.cos(Math.toRadians(lon)), -c[2] * Math.sin(Math.toRadians(lon)), Math.hypot(c[0], c[1])};
        double radius = 0;
        double suu = 0;
        double suv = 0;
        double svv = 0;
        for (int i = 0; i < samples.count(); i++) {
            double[] v = unit(samples.lonDeg(i), samples.latDeg(i));
            double dot = v[0] * c[0] + v[1] * c[1] + v[2] * c[2];
            double e = v[0] * east[0] + v[1] * east[1] + v[2] * east[2];
            double nn = v[0] * north[0] + v[1] * north[1] + v[2] * north[2];
            double sideways = Math.hypot(e, nn);
            double distance = Math.atan2(sideways, dot);
            radius = Math.max(radius, distance);
            if (i < n && sideways > 0) {
                double w = useWeights ? samples.weight(i) : 1.0;
                double u = distance * e / sideways;
                double t = distance * nn / sideways;
                suu += w * u * u;
                suv += w * u * t;
                svv += w * t * t;
            }
        }
        double half = (suu + svv) / 2;
        double root = Math.sqrt((suu - svv) * (suu - svv) / 4 + suv * suv);
        double major = half + root;
        double minor = Math.max(half - root, 0);
        double elongation = minor > 0 ? Math.min(MAX_ELONGATION, Math.sqrt(major / minor)) : MAX_ELONGATION;
        if (major == 0) {
            elongation = 1.0;
        }
        // main axis at angle theta from east (counter-clockwise): azimuth from north = 90 - theta
        double thetaDeg = Math.toDegrees(0.5 * Math.atan2(2 * suv, suu - svv));
        double azimuth = 90.0 - thetaDeg;
        azimuth -= 180.0 * Math.floor(azimuth / 180.0);
        boolean meaningful = length >= MEANINGFUL_MEAN_LENGTH;
        return new SphericalMoments(lon, lat, Math.toDegrees(radius), elongation, azimuth, meaningful);
    }

    Footprint toFootprint(double arcCentreLonDeg, double lonSpanDeg, double minLatDeg,
                          double maxLatDeg, boolean northPole, boolean southPole, FootprintSamples samples) {
        double lon = meaningful ? this.centreLonDeg : arcCentreLonDeg;
        double lat = meaningful ? this.centreLatDeg : 0.0;
        double radius = meaningful ? this.radiusDeg : 180.0;
        return new Footprint(arcCentreLonDeg, lonSpanDeg, minLatDeg, maxLatDeg, northPole, southPole,
                lon, lat, radius, elongation, orientationDeg, samples);
    }

    private static double[] unit(double lonDeg, double latDeg) {
        double lon = Math.toRadians(lonDeg);
        double lat = Math.toRadians(latDeg);
        return new double[] {Math.cos(lat) * Math.cos(lon), Math.cos(lat) * Math.sin(lon), Math.sin(lat)};
    }
}
