package aequa.projection;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.logging.Level;
import java.util.logging.Logger;

import org.apache.sis.io.wkt.Convention;
import org.apache.sis.io.wkt.WKTFormat;
import org.apache.sis.measure.Units;
import org.apache.sis.referencing.CommonCRS;
import org.apache.sis.referencing.factory.GeodeticObjectFactory;
import org.apache.sis.referencing.operation.DefaultCoordinateOperationFactory;
import org.apache.sis.referencing.operation.transform.DefaultMathTransformFactory;
import org.opengis.parameter.ParameterValueGroup;
import org.opengis.referencing.IdentifiedObject;
import org.opengis.referencing.crs.ProjectedCRS;
import org.opengis.referencing.cs.AxisDirection;
import org.opengis.referencing.cs.CartesianCS;
import org.opengis.referencing.cs.CoordinateSystemAxis;
import org.opengis.referencing.operation.Conversion;
import org.opengis.referencing.operation.MathTransform;
import org.opengis.referencing.operation.OperationMethod;
import org.opengis.referencing.operation.TransformException;
import org.opengis.util.FactoryException;

/**
 * A projection whose ellipsoidal formulas Apache SIS provides (Lambert azimuthal equal-area, Albers,
 * normal-aspect Lambert cylindrical equal-area). SIS is given the EPSG method name and parameter names;
 * its transforms take (lon, lat) in degrees and return metres. False easting and northing stay zero:
 * aequa fits the map to the page with one uniform scale later.
 */
final class SisProjection implements EqualAreaProjection {

    /** SIS logs one warning about its optional EPSG database on the first WKT; aequa needs no database. */
    private static final Logger SIS_LOG = Logger.getLogger("org.apache.sis");

    static {
        SIS_LOG.setLevel(Level.SEVERE);
    }

    private static final double WGS84_SEMI_MAJOR_M = 6378137.0;
    private static final double WGS84_SEMI_MINOR_M = 6356752.314245179;

    private final ProjectionFamily family;
    private final String epsgMethod;
    private final List<ProjectionParameter> parameters;
    private final AspectFrame frame;
    private final MathTransform forward;
    private final MathTransform inverse;
    private final String wkt2;

    private SisProjection(ProjectionFamily family, String epsgMethod, List<ProjectionParameter> parameters,
                          AspectFrame frame) {
        this.family = family;
        this.epsgMethod = epsgMethod;
        this.parameters = List.copyOf(parameters);
        this.frame = frame;
        try {
            this.forward = buildTransform();
            this.inverse = forward.inverse();
            this.wkt2 = buildWkt2();
        } catch (FactoryException | org.opengis.referencing.operation.NoninvertibleTransformException e) {
            throw new IllegalArgumentException("Apache SIS refused " + epsgMethod + " with " + parameters, e);
        }
    }

    /** Lambert azimuthal equal-area (EPSG method 9820) centred on (centreLonDeg, centreLatDeg). */
    static SisProjection lambertAzimuthal(double centreLonDeg, double centreLatDeg) {
        return new SisProjection(ProjectionFamily.LAMBERT_AZIMUTHAL, "Lambert Azimuthal Equal Area",
                List.of(new ProjectionParameter("Latitude of natural origin", "centre-lat", centreLatDeg, "deg"),
                        new ProjectionParameter("Longitude of natural origin", "centre-lon", centreLonDeg, "deg")),
                new RotatedFrame(centreLonDeg, centreLatDeg, -60.0, 90.0));
    }

    @Override
    public ProjectionFamily family() {
        return family;
    }

    @Override
    public List<ProjectionParameter> parameters() {
        return parameters;
    }

    @Override
    public void forward(double[] lonLatDeg, int srcOffset, double[] xyMetres, int dstOffset, int count) {
        try {
            forward.transform(lonLatDeg, srcOffset, xyMetres, dstOffset, count);
        } catch (TransformException e) {
            // SIS writes NaN for the points it cannot transform and reports the last failure; the NaNs are our contract.
        }
    }

    @Override
    public void inverse(double[] xyMetres, int srcOffset, double[] lonLatDeg, int dstOffset, int count) {
        try {
            inverse.transform(xyMetres, srcOffset, lonLatDeg, dstOffset, count);
        } catch (TransformException e) {
            // as in forward: failed points are NaN
        }
    }

    @Override
    public AspectFrame frame() {
        return frame;
    }

    @Override
    public String wkt2() {
        return wkt2;
    }

    private MathTransform buildTransform() throws FactoryException {
        DefaultMathTransformFactory factory = DefaultMathTransformFactory.provider();
        var builder = factory.builder(epsgMethod);
        ParameterValueGroup values = builder.parameters();
        values.parameter("semi_major").setValue(WGS84_SEMI_MAJOR_M);
        values.parameter("semi_minor").setValue(WGS84_SEMI_MINOR_M);
        for (ProjectionParameter p : parameters) {
            values.parameter(p.name()).setValue(p.value());
        }
        return builder.create();
    }

    private String buildWkt2() throws FactoryException {
        DefaultMathTransformFactory mtFactory = DefaultMathTransformFactory.provider();
        OperationMethod method = mtFactory.getOperationMethod(epsgMethod);
        ParameterValueGroup values = method.getParameters().createValue();
        for (ProjectionParameter p : parameters) {
            values.parameter(p.name()).setValue(p.value());
        }
        String name = "WGS 84 / aequa " + family.displayName();
        Conversion conversion = DefaultCoordinateOperationFactory.provider()
                .createDefiningConversion(named(family.displayName() + " " + parameterSummary()), method, values);
        GeodeticObjectFactory objects = GeodeticObjectFactory.provider();
        CoordinateSystemAxis easting = objects.createCoordinateSystemAxis(named("Easting"), "E", AxisDirection.EAST, Units.METRE);
        CoordinateSystemAxis northing = objects.createCoordinateSystemAxis(named("Northing"), "N", AxisDirection.NORTH, Units.METRE);
        CartesianCS cs = objects.createCartesianCS(named("Cartesian 2D (E,N)"), easting, northing);
        ProjectedCRS crs = objects.createProjectedCRS(named(name), CommonCRS.WGS84.geographic(), conversion, cs);
        WKTFormat format = new WKTFormat(Locale.ROOT, (java.time.ZoneId) null);
        format.setConvention(Convention.WKT2_2019);
        return format.format(crs);
    }

    private String parameterSummary() {
        StringBuilder s = new StringBuilder();
        for (ProjectionParameter p : parameters) {
            if (s.length() > 0) {
                s.append(", ");
            }
            s.append(p.key()).append('=').append(p.value());
        }
        return s.toString();
    }

    private static Map<String, Object> named(String name) {
        Map<String, Object> properties = new LinkedHashMap<>();
        properties.put(IdentifiedObject.NAME_KEY, name);
        return properties;
    }
}
