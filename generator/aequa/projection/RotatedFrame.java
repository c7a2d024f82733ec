package aequa.projection;

/**
 * An {@link AspectFrame} obtained by rotating the sphere so that the frame's north pole sits at a given
 * geographic point (on the sphere of geodetic latitudes: the frame only decides where to cut and clip, so
 * it need not be exact on the ellipsoid). With the pole at (lon0, 90) it reduces to a shift by lon0.
 *
 * <p>Formulas: Snyder 1987, USGS Professional Paper 1395, eqs. 5-7 and 5-8 (transformation to an oblique
 * pole) and their inverses.
 */
final class RotatedFrame implements AspectFrame {

    private final double poleLonDeg;
    private final double sinPoleLat;
    private final double cosPoleLat;
    private final double minFrameLatDeg;
    private final double maxFrameLatDeg;

    RotatedFrame(double poleLonDeg, double poleLatDeg, double minFrameLatDeg, double maxFrameLatDeg) {
        this.poleLonDeg = poleLonDeg;
        double poleLat = Math.toRadians(poleLatDeg);
        this.sinPoleLat = Math.sin(poleLat);
        this.cosPoleLat = Math.cos(poleLat);
        this.minFrameLatDeg = minFrameLatDeg;
        this.maxFrameLatDeg = maxFrameLatDeg;
    }

    @Override
    public void toFrame(double lonDeg, double latDeg, double[] out) {
        double dLon = Math.toRadians(lonDeg - poleLonDeg);
        double lat = Math.toRadians(latDeg);
        double sinLat = Math.sin(lat);
        double cosLat = Math.cos(lat);
        // Snyder eq. 5-7: sin(frameLat) = sin(poleLat) sin(lat) + cos(poleLat) cos(lat) cos(dLon)
        double sinFrameLat = sinPoleLat * sinLat + cosPoleLat * cosLat * Math.cos(dLon);
        double frameLat = Math.asin(Math.max(-1.0, Math.min(1.0, sinFrameLat)));
        // Snyder eq. 5-8, written with atan2; frame longitude 0 points away from the geographic north pole side
        double frameLon = Math.atan2(cosLat * Math.sin(dLon),
                sinPoleLat * cosLat * Math.cos(dLon) - cosPoleLat * sinLat);
        out[0] = Longitudes.normalize(Math.toDegrees(frameLon));
        out[1] = Math.toDegrees(frameLat);
    }

    @Override
    public void fromFrame(double frameLonDeg, double frameLatDeg, double[] out) {
        double frameLon = Math.toRadians(frameLonDeg);
        double frameLat = Math.toRadians(frameLatDeg);
        double sinFrameLat = Math.sin(frameLat);
        double cosFrameLat = Math.cos(frameLat);
        double sinLat = sinPoleLat * sinFrameLat - cosPoleLat * cosFrameLat * Math.cos(frameLon);
        double lat = Math.asin(Math.max(-1.0, Math.min(1.0, sinLat)));
        double dLon = Math.atan2(cosFrameLat * Math.sin(frameLon),
                sinPoleLat * cosFrameLat * Math.cos(frameLon) + cosPoleLat * sinFrameLat);
        out[0] = Longitudes.normalize(poleLonDeg + Math.toDegrees(dLon));
        out[1] = Math.toDegrees(lat);
    }

    @Override
    public double minFrameLatDeg() {
        return minFrameLatDeg;
    }

    @Override
    public double maxFrameLatDeg() {
        return maxFrameLatDeg;
    }
}
