package aequa.projection;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.apache.sis.measure.Units;
import org.apache.sis.metadata.iso.citation.Citations;
import org.apache.sis.parameter.ParameterBuilder;
import org.apache.sis.referencing.operation.DefaultOperationMethod;
import org.apache.sis.referencing.operation.matrix.Matrix2;
import org.apache.sis.referencing.operation.transform.AbstractMathTransform2D;
import org.apache.sis.referencing.operation.transform.MathTransformProvider;
import org.apache.sis.util.ComparisonMode;
import org.opengis.parameter.GeneralParameterDescriptor;
import org.opengis.parameter.ParameterDescriptorGroup;
import org.opengis.parameter.ParameterValueGroup;
import org.opengis.referencing.IdentifiedObject;
import org.opengis.referencing.datum.Ellipsoid;
import org.opengis.referencing.operation.Conversion;
import org.opengis.referencing.operation.MathTransform;
import org.opengis.referencing.operation.MathTransform2D;
import org.opengis.referencing.operation.Matrix;
import org.opengis.referencing.operation.SingleOperation;

/**
 * Apache SIS operation methods for aequa's own families, so that the WKT 2 aequa writes for them parses
 * with SIS ({@code CRS.fromWKT}) and transforms exactly as aequa does. SIS finds them through
 * {@code META-INF/services/org.opengis.referencing.operation.OperationMethod}, which lists the nested
 * classes; without that file SIS refuses unknown methods ("No operation method found").
 *
 * <p>Equal Earth keeps its EPSG name and code (method 1078, IOGP GN 7-2), which SIS 1.7 lacks. The others
 * carry names of aequa's own, ending "on the authalic sphere", so that they are never mistaken for SIS's
 * spherical Mollweide, which is not equal-area on the ellipsoid.
 */
public final class AuthalicMethods {

    static {
        SisLogging.silence();
    }

    private AuthalicMethods() {
    }

    /** The method for {@code family}, for writing WKT. */
    static Provider of(ProjectionFamily family) {
        switch (family) {
            case EQUAL_EARTH:
                return new EqualEarth();
            case MOLLWEIDE:
                return new Mollweide();
            case CYLINDRICAL_TRANSVERSE:
                return new TransverseCylindrical();
            case CYLINDRICAL_OBLIQUE:
                return new ObliqueCylindrical();
            default:
                throw new IllegalArgumentException(family + " is provided by Apache SIS itself");
        }
    }

    /** Equal Earth, EPSG method 1078, on the authalic sphere as IOGP GN 7-2 defines it. */
    public static final class EqualEarth extends Provider {
        public EqualEarth() {
            super(ProjectionFamily.EQUAL_EARTH, "Equal Earth", 1078);
        }
    }

    /** Mollweide applied to authalic latitude with the authalic radius (equal-area on the ellipsoid). */
    public static final class Mollweide extends Provider {
        public Mollweide() {
            super(ProjectionFamily.MOLLWEIDE, "Mollweide on the authalic sphere", 0);
        }
    }

    /** Transverse cylindrical equal-area on the authalic sphere. */
    public static final class TransverseCylindrical extends Provider {
        public TransverseCylindrical() {
            super(ProjectionFamily.CYLINDRICAL_TRANSVERSE, "Transverse cylindrical equal-area on the authalic sphere", 0);
        }
    }

    /** Oblique cylindrical equal-area on the authalic sphere. */
    public static final class ObliqueCylindrical extends Provider {
        public ObliqueCylindrical() {
            super(ProjectionFamily.CYLINDRICAL_OBLIQUE, "Oblique cylindrical equal-area on the authalic sphere", 0);
        }
    }

    /** An operation method whose parameters are those of {@link FamilyDefinitions}, in degrees. */
    public abstract static class Provider extends DefaultOperationMethod implements MathTransformProvider {

        private static final long serialVersionUID = 1L;

        private final ProjectionFamily family;

        Provider(ProjectionFamily family, String name, int epsgCode) {
            super(properties(name, epsgCode), descriptors(family, name, epsgCode));
            this.family = family;
        }

        @Override
        public Class<? extends SingleOperation> getOperationType() {
            return Conversion.class;
        }

        @Override
        public MathTransform createMathTransform(Context context) {
            ParameterValueGroup given = context.getCompletedParameters();
            Map<String, Double> values = new HashMap<>();
            for (ParameterDefinition d : FamilyDefinitions.of(family)) {
                values.put(d.key(), given.parameter(d.name()).doubleValue(Units.DEGREE));
            }
            EllipsoidAxes axes = context.getSourceEllipsoid().map(Provider::axes).orElse(EllipsoidAxes.WGS84);
            return new KernelTransform(AuthalicProjection.create(family, axes, values));
        }

        private static EllipsoidAxes axes(Ellipsoid e) {
            var toMetre = e.getAxisUnit().asType(javax.measure.quantity.Length.class).getConverterTo(Units.METRE);
            return new EllipsoidAxes(toMetre.convert(e.getSemiMajorAxis()), toMetre.convert(e.getSemiMinorAxis()));
        }

        private static Map<String, Object> properties(String name, int epsgCode) {
            Map<String, Object> properties = new HashMap<>();
            properties.put(IdentifiedObject.NAME_KEY, name);
            if (epsgCode != 0) {
                properties.put(IdentifiedObject.IDENTIFIERS_KEY,
                        new org.apache.sis.referencing.ImmutableIdentifier(Citations.EPSG, "EPSG", Integer.toString(epsgCode)));
            }
            return properties;
        }

        private static ParameterDescriptorGroup descriptors(ProjectionFamily family, String name, int epsgCode) {
            List<GeneralParameterDescriptor> list = new ArrayList<>();
            for (ParameterDefinition d : FamilyDefinitions.of(family)) {
                ParameterBuilder b = new ParameterBuilder();
                if (d.epsgCode() != 0) {
                    b.setCodeSpace(Citations.EPSG, "EPSG").addIdentifier(Integer.toString(d.epsgCode()));
                }
                list.add(b.addName(d.name()).createBounded(d.minValue(), d.maxValue(), d.defaultValue(), Units.DEGREE));
            }
            ParameterBuilder group = new ParameterBuilder();
            if (epsgCode != 0) {
                group.setCodeSpace(Citations.EPSG, "EPSG").addIdentifier(Integer.toString(epsgCode));
            }
            return group.addName(name).createGroup(list.toArray(GeneralParameterDescriptor[]::new));
        }
    }

    /** An {@link AuthalicProjection} seen as an SIS transform: (lon, lat) in degrees to metres. */
    static final class KernelTransform extends AbstractMathTransform2D {

        /** Step of the numeric Jacobian, in degrees (central differences; see {@link Distortion}). */
        private static final double STEP_DEG = 1e-6;

        private final AuthalicProjection projection;

        KernelTransform(AuthalicProjection projection) {
            this.projection = projection;
        }

        @Override
        public Matrix transform(double[] srcPts, int srcOff, double[] dstPts, int dstOff, boolean derivate) {
            Matrix jacobian = null;
            if (derivate) {
                double lon = srcPts[srcOff];
                double lat = srcPts[srcOff + 1];
                double[] p = {lon + STEP_DEG, lat, lon - STEP_DEG, lat, lon, lat + STEP_DEG, lon, lat - STEP_DEG};
                projection.forward(p, 0, p, 0, 4);
                double h2 = 2 * STEP_DEG;
                jacobian = new Matrix2((p[0] - p[2]) / h2, (p[4] - p[6]) / h2, (p[1] - p[3]) / h2, (p[5] - p[7]) / h2);
            }
            if (dstPts != null) {
                projection.forward(srcPts, srcOff, dstPts, dstOff, 1);
            }
            return jacobian;
        }

        @Override
        public void transform(double[] srcPts, int srcOff, double[] dstPts, int dstOff, int numPts) {
            projection.forward(srcPts, srcOff, dstPts, dstOff, numPts);
        }

        @Override
        public MathTransform2D inverse() {
            return new Inverse();
        }

        @Override
        protected int computeHashCode() {
            return super.computeHashCode() * 31 + projection.parameters().hashCode();
        }

        @Override
        public boolean equals(Object other, ComparisonMode mode) {
            return other instanceof KernelTransform
                    && ((KernelTransform) other).projection.family() == projection.family()
                    && ((KernelTransform) other).projection.parameters().equals(projection.parameters())
                    && ((KernelTransform) other).projection.ellipsoid().equals(projection.ellipsoid());
        }

        private final class Inverse extends AbstractMathTransform2D.Inverse {
            @Override
            public MathTransform2D inverse() {
                return KernelTransform.this;
            }

            @Override
            public Matrix transform(double[] srcPts, int srcOff, double[] dstPts, int dstOff, boolean derivate)
                    throws org.opengis.referencing.operation.TransformException {
                double[] lonLat = new double[2];
                projection.inverse(srcPts, srcOff, lonLat, 0, 1);
                Matrix forwardJacobian = derivate ? KernelTransform.this.transform(lonLat, 0, null, 0, true) : null;
                if (dstPts != null) {
                    dstPts[dstOff] = lonLat[0];
                    dstPts[dstOff + 1] = lonLat[1];
                }
                return forwardJacobian == null ? null : org.apache.sis.referencing.operation.matrix.Matrices.inverse(forwardJacobian);
            }

            @Override
            public void transform(double[] srcPts, int srcOff, double[] dstPts, int dstOff, int numPts) {
                projection.inverse(srcPts, srcOff, dstPts, dstOff, numPts);
            }
        }
    }
}
