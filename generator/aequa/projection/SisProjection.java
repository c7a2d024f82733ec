package aequa.projection;

import java.util.List;
import java.util.Map;

import org.apache.sis.referencing.operation.transform.DefaultMathTransformFactory;
import org.apache.sis.referencing.operation.transform.MathTransforms;
import org.opengis.parameter.ParameterValueGroup;
import org.opengis.referencing.operation.MathTransform;
import org.opengis.referencing.operation.Matrix;
import org.opengis.referencing.operation.OperationMethod;
import org.opengis.referencing.operation.NoninvertibleTransformException;
import org.opengis.referencing.operation.TransformException;
import org.opengis.util.FactoryException;

/**
 * A projection whose ellipsoidal formulas Apache SIS provides: Lambert azimuthal equal-area (EPSG method
 * 9820), Albers equal-area (9822) and the normal aspect of Lambert cylindrical equal-area (9835). SIS is
 * given the EPSG method and parameter names; its transforms take (lon, lat) in degrees and return metres.
 * False easting and northing stay zero: aequa fits the map to the page with one uniform scale later.
 *
 * <p>This wrapper adds only what SIS leaves to the caller: latitudes beyond +-90 (which SIS accepts
 * silently) and, for the azimuthal family, points outside the domain cap come out as NaN. Immutable.
 */
final class SisProjection extends FixedProjection {

    static {
        SisLogging.silence();
    }

    /**
     * Lowest frame latitude of the azimuthal domain: points up to 135 deg from the centre. There omega
     * reaches about 100 deg (LAEA on the sphere: omega = 2 asin(sin^2(c/2) / (1 + cos^2(c/2))), from Snyder 1987
     * eqs. 24-2 and 4-13), beyond which shapes are unrecognisable; the antipode itself is singular.
     */
    static final double MIN_AZIMUTHAL_FRAME_LAT_DEG = -45.0;

    private final MathTransform forward;
    private final double centralLonDeg;
    private final double domainD;
    private final double domainRadiusM;
    private volatile MathTransform inverse;

    private SisProjection(ProjectionFamily family, EllipsoidAxes ellipsoid, List<ProjectionParameter> parameters,
                          AuthalicFrame frame, double domainD, double domainRadiusM) {
        super(family, ellipsoid, parameters, frame);
        this.centralLonDeg = parameters.get(0).value();
        this.domainD = domainD;
        this.domainRadiusM = domainRadiusM;
        try {
            this.forward = buildTransform();
        } catch (FactoryException e) {
            throw new IllegalArgumentException("Apache SIS refused " + family + " with " + parameters, e);
        }
    }

    /**
     * Builds {@code family} (LAMBERT_AZIMUTHAL, ALBERS_CONIC or CYLINDRICAL) on {@code ellipsoid} with the
     * values of {@link FamilyDefinitions#of}, in degrees, by key; every key must be present.
     */
    static SisProjection create(ProjectionFamily family, EllipsoidAxes ellipsoid, Map<String, Double> values) {
        List<ProjectionParameter> parameters = FamilyDefinitions.values(family, values);   // centre-lon first
        AuthalicLatitude authalic = new AuthalicLatitude(ellipsoid);
        double lon0 = values.get(FamilyDefinitions.CENTRE_LON);
        if (family != ProjectionFamily.LAMBERT_AZIMUTHAL) {
            AuthalicFrame frame = new AuthalicFrame(authalic, SphereRotation.normal(lon0), -90.0, true);
            return new SisProjection(family, ellipsoid, parameters, frame, 1.0, Double.POSITIVE_INFINITY);
        }
        double lat0 = Math.toRadians(values.get(FamilyDefinitions.CENTRE_LAT));
        double beta0 = authalic.toAuthalic(lat0);
        AuthalicFrame frame = new AuthalicFrame(authalic, SphereRotation.poleAt(lon0, Math.toDegrees(beta0)),
                MIN_AZIMUTHAL_FRAME_LAT_DEG, false);
        // Snyder 1987 eq. 24-20: D = a m1 / (Rq cos beta1), m1 = cos phi1 / sqrt(1 - e^2 sin^2 phi1) (eq. 14-15);
        // D = 1 in the polar aspect (eq. 24-13 has no D). With it, (x/D)^2 + (y D)^2 = (2 Rq sin(c/2))^2 where
        // c is the angular distance from the centre on the authalic sphere (from eqs. 24-17 to 24-19).
        double d = 1.0;
        if (Math.abs(Math.cos(beta0)) > 1e-12) {
            double s = Math.sin(lat0);
            double m1 = Math.cos(lat0) / Math.sqrt(1.0 - ellipsoid.eccentricitySquared() * s * s);
            d = ellipsoid.semiMajorM() * m1 / (authalic.radiusM() * Math.cos(beta0));
        }
        double maxDistanceRad = Math.toRadians(90.0 - MIN_AZIMUTHAL_FRAME_LAT_DEG);
        double radiusM = 2.0 * authalic.radiusM() * Math.sin(maxDistanceRad / 2.0);
        return new SisProjection(family, ellipsoid, parameters, frame, d, radiusM);
    }

    /** The SIS transform itself, (lon, lat) degrees to metres, for benchmarks and tests. */
    MathTransform sisTransform() {
        return forward;
    }

    /**
     * {@inheritDoc}
     *
     * <p>SIS does not wrap lon - lon0 into [-180, 180] (measured: Albers with lon0 = 132 E maps 168 W as if it
     * lay 300 deg west of the centre), so the points are first copied to the destination with their
     * longitude moved by whole turns to within 180 deg of the central meridian, and latitudes beyond +-90
     * replaced by NaN; SIS then transforms the destination in place. When every point is already fit (the
     * common case, checked by one read-only pass) SIS reads the source directly.
     */
    @Override
    public void forward(double[] lonLatDeg, int srcOffset, double[] xyMetres, int dstOffset, int count) {
        if (allReady(lonLatDeg, srcOffset, count)) {
            transformAndClip(lonLatDeg, srcOffset, xyMetres, dstOffset, count);
            return;
        }
        for (int i = 0; i < count; i++) {
            double lon = lonLatDeg[srcOffset + 2 * i];
            double lat = lonLatDeg[srcOffset + 2 * i + 1];
            double offset = lon - centralLonDeg;
            if (offset > 180.0) {
                lon -= 360.0 * Math.ceil((offset - 180.0) / 360.0);
            } else if (offset < -180.0) {
                lon += 360.0 * Math.ceil((-180.0 - offset) / 360.0);
            }
            boolean valid = Math.abs(lat) <= 90.0 && !Double.isNaN(lon);
            xyMetres[dstOffset + 2 * i] = valid ? lon : Double.NaN;
            xyMetres[dstOffset + 2 * i + 1] = valid ? lat : Double.NaN;
        }
        transformAndClip(xyMetres, dstOffset, xyMetres, dstOffset, count);
    }

    /** Whether every point already has |lat| <= 90 and a longitude within 180 deg of the central meridian. */
    private boolean allReady(double[] lonLatDeg, int srcOffset, int count) {
        for (int i = 0; i < count; i++) {
            double offset = lonLatDeg[srcOffset + 2 * i] - centralLonDeg;
            if (!(Math.abs(offset) <= 180.0) || !(Math.abs(lonLatDeg[srcOffset + 2 * i + 1]) <= 90.0)) {
                return false;
            }
        }
        return true;
    }

    private void transformAndClip(double[] source, int srcOffset, double[] xyMetres, int dstOffset, int count) {
        try {
            forward.transform(source, srcOffset, xyMetres, dstOffset, count);
        } catch (TransformException e) {
            // SIS writes NaN for the points it cannot transform and reports the last failure; the NaNs are our contract.
        }
        if (domainRadiusM != Double.POSITIVE_INFINITY) {
            double limit = domainRadiusM * domainRadiusM;
            for (int i = 0; i < count; i++) {
                int k = dstOffset + 2 * i;
                double u = xyMetres[k] / domainD;
                double v = xyMetres[k + 1] * domainD;
                if (u * u + v * v > limit) {
                    xyMetres[k] = Double.NaN;
                    xyMetres[k + 1] = Double.NaN;
                }
            }
        }
    }

    /**
     * {@inheritDoc}
     *
     * <p>SIS's inverses are good to about 1e-8 deg (measured: 1.1e-8 deg for polar LAEA at 32 S), short of the
     * 1e-9 deg aequa promises, so each point gets one Newton step with SIS's own Jacobian:
     * p1 = p0 + J(p0)^-1 ((x, y) - forward(p0)), which squares the error. Points beyond the azimuthal domain
     * come out as NaN.
     */
    @Override
    public void inverse(double[] xyMetres, int srcOffset, double[] lonLatDeg, int dstOffset, int count) {
        double[] xy = java.util.Arrays.copyOfRange(xyMetres, srcOffset, srcOffset + 2 * count);
        try {
            inverseTransform().transform(xy, 0, lonLatDeg, dstOffset, count);
        } catch (TransformException e) {
            // as in forward: failed points are NaN
        }
        double[] projected = new double[2];
        double limit = domainRadiusM * domainRadiusM;
        for (int i = 0; i < count; i++) {
            int k = dstOffset + 2 * i;
            double x = xy[2 * i];
            double y = xy[2 * i + 1];
            double u = x / domainD;
            double v = y * domainD;
            if (!(u * u + v * v <= limit) || Double.isNaN(lonLatDeg[k]) || Double.isNaN(lonLatDeg[k + 1])) {
                lonLatDeg[k] = Double.NaN;
                lonLatDeg[k + 1] = Double.NaN;
                continue;
            }
            refine(x, y, lonLatDeg, k, projected);
        }
    }

    /** One Newton step on the inverse at lonLatDeg[k..k+1] towards (x, y); leaves the point alone if SIS cannot. */
    private void refine(double x, double y, double[] lonLatDeg, int k, double[] projected) {
        try {
            Matrix j = MathTransforms.derivativeAndTransform(forward, lonLatDeg, k, projected, 0);
            double a = j.getElement(0, 0);
            double b = j.getElement(0, 1);
            double c = j.getElement(1, 0);
            double d = j.getElement(1, 1);
            double det = a * d - b * c;
            double dx = x - projected[0];
            double dy = y - projected[1];
            double dLon = (d * dx - b * dy) / det;
            double dLat = (a * dy - c * dx) / det;
            if (Double.isFinite(dLon) && Double.isFinite(dLat)) {
                lonLatDeg[k] = Longitudes.normalize(lonLatDeg[k] + dLon);
                lonLatDeg[k + 1] = Math.max(-90.0, Math.min(90.0, lonLatDeg[k + 1] + dLat));
            }
        } catch (TransformException e) {
            // at a singular point (a pole, the apex) the SIS inverse is kept as it is
        }
    }

    /** The EPSG method name SIS knows the family by. */
    @Override
    OperationMethod operationMethod() throws FactoryException {
        return DefaultMathTransformFactory.provider().getOperationMethod(epsgMethodName(family()));
    }

    private static String epsgMethodName(ProjectionFamily family) {
        switch (family) {
            case LAMBERT_AZIMUTHAL:
                return "Lambert Azimuthal Equal Area";
            case ALBERS_CONIC:
                return "Albers Equal Area";
            case CYLINDRICAL:
                return "Lambert Cylindrical Equal Area";
            default:
                throw new IllegalArgumentException(family + " is not provided by Apache SIS");
        }
    }

    private MathTransform inverseTransform() {
        MathTransform t = inverse;
        if (t == null) {
            try {
                t = forward.inverse();
            } catch (NoninvertibleTransformException e) {
                throw new IllegalStateException("Apache SIS gave no inverse for " + this, e);
            }
            inverse = t;
        }
        return t;
    }

    private MathTransform buildTransform() throws FactoryException {
        var builder = DefaultMathTransformFactory.provider().builder(epsgMethodName(family()));
        ParameterValueGroup values = builder.parameters();
        values.parameter("semi_major").setValue(ellipsoid().semiMajorM());
        values.parameter("semi_minor").setValue(ellipsoid().semiMinorM());
        for (ProjectionParameter p : parameters()) {
            values.parameter(p.name()).setValue(p.value());
        }
        return builder.create();
    }
}
