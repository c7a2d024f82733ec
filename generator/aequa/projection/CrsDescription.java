package aequa.projection;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.apache.sis.io.wkt.Convention;
import org.apache.sis.io.wkt.WKTFormat;
import org.apache.sis.measure.Units;
import org.apache.sis.referencing.CommonCRS;
import org.apache.sis.referencing.factory.GeodeticObjectFactory;
import org.apache.sis.referencing.operation.DefaultCoordinateOperationFactory;
import org.opengis.parameter.ParameterValueGroup;
import org.opengis.referencing.IdentifiedObject;
import org.opengis.referencing.crs.ProjectedCRS;
import org.opengis.referencing.cs.AxisDirection;
import org.opengis.referencing.cs.CartesianCS;
import org.opengis.referencing.cs.CoordinateSystemAxis;
import org.opengis.referencing.operation.Conversion;
import org.opengis.referencing.operation.OperationMethod;
import org.opengis.util.FactoryException;

/**
 * ISO 19162:2019 (WKT 2) of an aequa projection's projected CRS on WGS 84, written by Apache SIS's
 * formatter. SIS-backed families use SIS's own EPSG method; aequa's families use {@link AuthalicMethods},
 * which SIS also reads back. Axes: easting, northing, metres. Only WGS 84 is described.
 */
final class CrsDescription {

    static {
        SisLogging.silence();
    }

    private CrsDescription() {
    }

    static String wkt2(FixedProjection projection) {
        requireWgs84(projection.ellipsoid());
        try {
            return format(projection, projection.operationMethod());
        } catch (FactoryException e) {
            throw new IllegalStateException("Apache SIS cannot describe " + projection, e);
        }
    }

    private static String format(EqualAreaProjection projection, OperationMethod method) throws FactoryException {
        ParameterValueGroup values = method.getParameters().createValue();
        StringBuilder summary = new StringBuilder();
        for (ProjectionParameter p : projection.parameters()) {
            values.parameter(p.name()).setValue(p.value(), Units.DEGREE);
            summary.append(summary.length() == 0 ? "" : ", ")
                    .append(p.key()).append('=').append(String.format(Locale.ROOT, "%s", p.value()));
        }
        String title = projection.family().displayName() + " (" + summary + ")";
        Conversion conversion = DefaultCoordinateOperationFactory.provider().createDefiningConversion(named(title), method, values);
        GeodeticObjectFactory objects = GeodeticObjectFactory.provider();
        CoordinateSystemAxis easting = objects.createCoordinateSystemAxis(named("Easting"), "E", AxisDirection.EAST, Units.METRE);
        CoordinateSystemAxis northing = objects.createCoordinateSystemAxis(named("Northing"), "N", AxisDirection.NORTH, Units.METRE);
        CartesianCS cs = objects.createCartesianCS(named("Cartesian 2D (E,N)"), easting, northing);
        ProjectedCRS crs = objects.createProjectedCRS(named("WGS 84 / aequa " + title), CommonCRS.WGS84.geographic(), conversion, cs);
        WKTFormat format = new WKTFormat(Locale.ROOT, (java.time.ZoneId) null);
        format.setConvention(Convention.WKT2_2019);
        return format.format(crs);
    }

    private static void requireWgs84(EllipsoidAxes ellipsoid) {
        if (!ellipsoid.equals(EllipsoidAxes.WGS84)) {
            throw new IllegalStateException("WKT is written for WGS 84 only, not " + ellipsoid);
        }
    }

    private static Map<String, Object> named(String name) {
        Map<String, Object> properties = new LinkedHashMap<>();
        properties.put(IdentifiedObject.NAME_KEY, name);
        return properties;
    }
}
