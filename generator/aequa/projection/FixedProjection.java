package aequa.projection;

import java.util.List;

import org.opengis.referencing.operation.OperationMethod;
import org.opengis.util.FactoryException;

/**
 * What every projection of aequa holds once its parameters are fixed: its family, the ellipsoid, the
 * parameter values in the order captions list them, its aspect frame and its WKT 2 (made on first use).
 * Subclasses add the kernel.
 */
abstract class FixedProjection implements EqualAreaProjection {

    private final ProjectionFamily family;
    private final EllipsoidAxes ellipsoid;
    private final List<ProjectionParameter> parameters;
    private final AuthalicFrame frame;
    private final LazyWkt wkt2 = new LazyWkt(() -> CrsDescription.wkt2(this));

    FixedProjection(ProjectionFamily family, EllipsoidAxes ellipsoid, List<ProjectionParameter> parameters,
                    AuthalicFrame frame) {
        this.family = family;
        this.ellipsoid = ellipsoid;
        this.parameters = List.copyOf(parameters);
        this.frame = frame;
    }

    @Override
    public final ProjectionFamily family() {
        return family;
    }

    @Override
    public final List<ProjectionParameter> parameters() {
        return parameters;
    }

    @Override
    public final AspectFrame frame() {
        return frame;
    }

    @Override
    public final String wkt2() {
        return wkt2.text();
    }

    @Override
    public final String projString() {
        return ProjStrings.of(this);
    }

    /** The operation method its WKT 2 names (see {@link CrsDescription}). */
    abstract OperationMethod operationMethod() throws FactoryException;

    final EllipsoidAxes ellipsoid() {
        return ellipsoid;
    }

    @Override
    public String toString() {
        return family.configName() + parameters;
    }
}
