package aequa.projection;

import java.util.List;
import java.util.Map;

import org.opengis.referencing.operation.OperationMethod;

/**
 * aequa's own equal-area projections: Equal Earth, Mollweide, and the transverse and oblique aspects of the
 * cylindrical equal-area projection, which Apache SIS does not provide in an ellipsoidal, equal-area form.
 *
 * <p>Method (Snyder 1987, USGS PP 1395, chapter 3 and eqs. 5-7/5-8): geodetic latitude becomes authalic
 * latitude ({@link AuthalicLatitude}); the authalic sphere is rotated to the projection's aspect
 * ({@link SphereRotation}); the spherical formula ({@link SphereKernel}) is applied; the result is scaled by
 * the authalic radius Rq and, for the oblique aspects, turned so that the central line keeps its azimuth
 * on the page. Each step is equal-area, so the whole is exactly equal-area on the ellipsoid.
 *
 * <p>Numeric contract as in {@link EqualAreaProjection}: |lat| > 90 or NaN gives NaN. Immutable.
 */
final class AuthalicProjection extends FixedProjection {

    private final AuthalicLatitude authalic;
    private final SphereRotation rotation;
    private final SphereKernel kernel;
    private final double radiusM;
    private final double sinAzimuth;
    private final double cosAzimuth;
    private final double azimuthDeg;

    private AuthalicProjection(ProjectionFamily family, EllipsoidAxes ellipsoid, List<ProjectionParameter> parameters,
                               AuthalicLatitude authalic, SphereRotation rotation, SphereKernel kernel, double azimuthDeg) {
        super(family, ellipsoid, parameters, new AuthalicFrame(authalic, rotation, -90.0, true));
        this.authalic = authalic;
        this.rotation = rotation;
        this.kernel = kernel;
        this.radiusM = authalic.radiusM();
        this.sinAzimuth = Math.sin(Math.toRadians(azimuthDeg));
        this.cosAzimuth = Math.cos(Math.toRadians(azimuthDeg));
        this.azimuthDeg = azimuthDeg;
    }

    /**
     * Builds {@code family} (one of EQUAL_EARTH, MOLLWEIDE, CYLINDRICAL_TRANSVERSE, CYLINDRICAL_OBLIQUE) with
     * the values of {@link FamilyDefinitions#of}, in degrees, by key; every key must be present.
     *
     * <p>For the transverse and oblique aspects the centre's latitude and the azimuth are taken on the authalic
     * sphere (the centre's geodetic latitude is converted first); the central line is the great circle of
     * that sphere through the centre with that azimuth, and the lines of true scale run at
     * {@code standard-line-offset} on either side of it (scale cos(offset) along the central line).
     */
    static AuthalicProjection create(ProjectionFamily family, EllipsoidAxes ellipsoid, Map<String, Double> values) {
        AuthalicLatitude authalic = new AuthalicLatitude(ellipsoid);
        List<ProjectionParameter> parameters = FamilyDefinitions.values(family, values);   // centre-lon first
        double centreLon = values.get(FamilyDefinitions.CENTRE_LON);
        switch (family) {
            case EQUAL_EARTH:
                return new AuthalicProjection(family, ellipsoid, parameters, authalic,
                        SphereRotation.normal(centreLon), new EqualEarthKernel(), 90.0);
            case MOLLWEIDE:
                return new AuthalicProjection(family, ellipsoid, parameters, authalic,
                        SphereRotation.normal(centreLon), new MollweideKernel(), 90.0);
            case CYLINDRICAL_TRANSVERSE:
            case CYLINDRICAL_OBLIQUE:
                double centreBetaDeg = Math.toDegrees(authalic.toAuthalic(Math.toRadians(values.get(FamilyDefinitions.CENTRE_LAT))));
                double azimuth = family == ProjectionFamily.CYLINDRICAL_TRANSVERSE ? 0.0 : values.get(FamilyDefinitions.AZIMUTH);
                double offset = values.get(FamilyDefinitions.STANDARD_LINE_OFFSET);
                return new AuthalicProjection(family, ellipsoid, parameters, authalic,
                        SphereRotation.centredOn(centreLon, centreBetaDeg, azimuth),
                        new CylindricalKernel(Math.toRadians(offset)), azimuth);
            default:
                throw new IllegalArgumentException(family + " is not computed on the authalic sphere");
        }
    }

    @Override
    public void forward(double[] lonLatDeg, int srcOffset, double[] xyMetres, int dstOffset, int count) {
        double[] scratch = new double[2];
        for (int i = 0; i < count; i++) {
            double lonDeg = lonLatDeg[srcOffset + 2 * i];
            double latDeg = lonLatDeg[srcOffset + 2 * i + 1];
            int dst = dstOffset + 2 * i;
            if (!(Math.abs(latDeg) <= 90.0) || Double.isNaN(lonDeg)) {
                xyMetres[dst] = Double.NaN;
                xyMetres[dst + 1] = Double.NaN;
                continue;
            }
            rotation.forward(Math.toRadians(lonDeg), authalic.toAuthalic(Math.toRadians(latDeg)), scratch);
            kernel.forward(scratch[0], scratch[1], scratch);
            double along = scratch[0] * radiusM;
            double left = scratch[1] * radiusM;
            xyMetres[dst] = along * sinAzimuth - left * cosAzimuth;
            xyMetres[dst + 1] = along * cosAzimuth + left * sinAzimuth;
        }
    }

    @Override
    public void inverse(double[] xyMetres, int srcOffset, double[] lonLatDeg, int dstOffset, int count) {
        double[] scratch = new double[2];
        for (int i = 0; i < count; i++) {
            double x = xyMetres[srcOffset + 2 * i];
            double y = xyMetres[srcOffset + 2 * i + 1];
            int dst = dstOffset + 2 * i;
            double along = (x * sinAzimuth + y * cosAzimuth) / radiusM;
            double left = (-x * cosAzimuth + y * sinAzimuth) / radiusM;
            kernel.inverse(along, left, scratch);
            if (Double.isNaN(scratch[0]) || Double.isNaN(scratch[1])) {
                lonLatDeg[dst] = Double.NaN;
                lonLatDeg[dst + 1] = Double.NaN;
                continue;
            }
            rotation.inverse(scratch[0], scratch[1], scratch);
            lonLatDeg[dst] = Math.toDegrees(scratch[0]);
            lonLatDeg[dst + 1] = Math.toDegrees(authalic.toGeodetic(scratch[1]));
        }
    }

    /** The rotation of the authalic sphere to the aspect's frame. */
    SphereRotation rotation() {
        return rotation;
    }

    /** The azimuth of the central line on the page, degrees (90 for the normal aspect). */
    double azimuthDeg() {
        return azimuthDeg;
    }

    @Override
    OperationMethod operationMethod() {
        return AuthalicMethods.of(family());
    }
}
