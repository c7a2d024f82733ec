package aequa.projection;

/**
 * The {@link AspectFrame} of an aequa projection: geodetic latitude is first converted to authalic latitude
 * (Snyder 1987, eq. 3-11), then the authalic sphere is rotated by a {@link SphereRotation}. Working on the
 * authalic sphere makes the frame exact for every family: the cut of a cylindrical or world projection is
 * exactly the frame antimeridian, and the domain of the azimuthal one is exactly a cap around its centre.
 * Frame latitudes are therefore authalic-sphere latitudes (they differ from geodetic ones by at most 0.13 deg).
 */
final class AuthalicFrame implements AspectFrame {

    private final AuthalicLatitude authalic;
    private final SphereRotation rotation;
    private final double minFrameLatDeg;
    private final boolean hasCut;

    /**
     * @param minFrameLatDeg lowest frame latitude of the domain (-90 for the whole sphere)
     * @param hasCut         whether the frame antimeridian is a discontinuity of the projection
     */
    AuthalicFrame(AuthalicLatitude authalic, SphereRotation rotation, double minFrameLatDeg, boolean hasCut) {
        this.authalic = authalic;
        this.rotation = rotation;
        this.minFrameLatDeg = minFrameLatDeg;
        this.hasCut = hasCut;
    }

    @Override
    public void toFrame(double lonDeg, double latDeg, double[] out) {
        rotation.forward(Math.toRadians(lonDeg), authalic.toAuthalic(Math.toRadians(latDeg)), out);
        out[0] = Math.toDegrees(out[0]);
        out[1] = Math.toDegrees(out[1]);
    }

    @Override
    public void fromFrame(double frameLonDeg, double frameLatDeg, double[] out) {
        rotation.inverse(Math.toRadians(frameLonDeg), Math.toRadians(frameLatDeg), out);
        out[0] = Math.toDegrees(out[0]);
        out[1] = Math.toDegrees(authalic.toGeodetic(out[1]));
    }

    @Override
    public double minFrameLatDeg() {
        return minFrameLatDeg;
    }

    @Override
    public double maxFrameLatDeg() {
        return 90.0;
    }

    @Override
    public boolean hasCut() {
        return hasCut;
    }
}
