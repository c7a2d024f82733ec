package aequa.projection;

import java.util.HashMap;
import java.util.Map;

/**
 * Front door for building projections on WGS 84 by family and parameters.
 */
public final class Projections {

    private Projections() {
    }

    /**
     * Builds {@code family} on WGS 84. {@code parametersByKey} holds values in degrees by
     * {@link ProjectionParameter#key()} ({@code centre-lon}, {@code centre-lat}, {@code standard-parallel-1},
     * {@code standard-parallel-2}, {@code azimuth}, {@code standard-line-offset}); a parameter the family has
     * but the map lacks takes its default (0, except Albers' standard parallels 20 and 50 and the oblique
     * azimuth 90). Keys the family does not have are ignored.
     *
     * @throws IllegalArgumentException if a value is outside its range (for example a latitude beyond 90),
     *                                  or Albers' standard parallels are opposite (the cone degenerates) or
     *                                  both at a pole (one at a pole is allowed: the limiting conic)
     */
    public static EqualAreaProjection create(ProjectionFamily family, Map<String, Double> parametersByKey) {
        return create(family, EllipsoidAxes.WGS84, parametersByKey);
    }

    /** Lambert azimuthal equal-area on WGS 84, centred on the given point. */
    public static EqualAreaProjection lambertAzimuthal(double centreLonDeg, double centreLatDeg) {
        return create(ProjectionFamily.LAMBERT_AZIMUTHAL,
                Map.of(FamilyDefinitions.CENTRE_LON, centreLonDeg, FamilyDefinitions.CENTRE_LAT, centreLatDeg));
    }

    /** As {@link #create(ProjectionFamily, Map)} on another ellipsoid (for published worked examples). */
    static EqualAreaProjection create(ProjectionFamily family, EllipsoidAxes ellipsoid, Map<String, Double> parametersByKey) {
        Map<String, Double> values = new HashMap<>();
        for (ParameterDefinition d : FamilyDefinitions.of(family)) {
            Double given = parametersByKey.get(d.key());
            double value = given == null ? d.defaultValue() : given;
            if (!d.accepts(value)) {
                throw new IllegalArgumentException(d.key() + " = " + value + " is outside [" + d.minValue() + ", "
                        + d.maxValue() + "] for " + family.configName());
            }
            values.put(d.key(), value);
        }
        if (family == ProjectionFamily.ALBERS_CONIC) {
            double sum = values.get(FamilyDefinitions.STANDARD_PARALLEL_1) + values.get(FamilyDefinitions.STANDARD_PARALLEL_2);
            if (Math.abs(sum) < 1e-6) {
                throw new IllegalArgumentException("Albers standard parallels must not be opposite: " + values);
            }
            if (Math.abs(sum) == 180.0) {
                // the limit is the polar Lambert azimuthal, which SIS does not reach (measured: omega 1.37 deg
                // at 75 S where the azimuthal has 0.98 deg)
                throw new IllegalArgumentException("Albers standard parallels must not both lie at a pole: " + values
                        + "; use lambert-azimuthal centred on the pole");
            }
        }
        switch (family) {
            case LAMBERT_AZIMUTHAL:
            case ALBERS_CONIC:
            case CYLINDRICAL:
                return SisProjection.create(family, ellipsoid, values);
            default:
                return AuthalicProjection.create(family, ellipsoid, values);
        }
    }
}
