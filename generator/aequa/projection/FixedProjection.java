package aequa.projection;

import java.util.List;

/**
 * What every projection of aequa holds once its parameters are fixed: its family, the ellipsoid, the
 * parameter values in the order captions list them, and its aspect frame. Subclasses add the kernel.
 */
abstract class FixedProjection implements EqualAreaProjection {

    private final ProjectionFamily family;
    private final EllipsoidAxes ellipsoid;
    private final List<ProjectionParameter> parameters;
    private final AuthalicFrame frame;

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

    final EllipsoidAxes ellipsoid() {
        return ellipsoid;
    }

    @Override
    public String toString() {
        return family.configName() + parameters;
    }
}
