package aequa.projection;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The parameters of each {@link ProjectionFamily}, in the order captions and report.json list them, with
 * defaults and ranges. EPSG names and codes are those of IOGP GN 7-2 (methods 9820, 9822, 9835, 1078);
 * aequa's own parameters (transverse and oblique cylindrical) have code 0.
 */
final class FamilyDefinitions {

    static final String CENTRE_LON = "centre-lon";
    static final String CENTRE_LAT = "centre-lat";
    static final String STANDARD_PARALLEL_1 = "standard-parallel-1";
    static final String STANDARD_PARALLEL_2 = "standard-parallel-2";
    static final String AZIMUTH = "azimuth";
    static final String STANDARD_LINE_OFFSET = "standard-line-offset";

    /** Longest allowed distance of a line of true scale from the central line: beyond it k0 < cos(80 deg). */
    private static final double MAX_OFFSET_DEG = 80.0;

    private static final ParameterDefinition NATURAL_LON =
            new ParameterDefinition(CENTRE_LON, "Longitude of natural origin", 8802, 0, -180, 180);
    private static final ParameterDefinition NATURAL_LAT =
            new ParameterDefinition(CENTRE_LAT, "Latitude of natural origin", 8801, 0, -90, 90);
    private static final ParameterDefinition FALSE_ORIGIN_LON =
            new ParameterDefinition(CENTRE_LON, "Longitude of false origin", 8822, 0, -180, 180);
    private static final ParameterDefinition FALSE_ORIGIN_LAT =
            new ParameterDefinition(CENTRE_LAT, "Latitude of false origin", 8821, 0, -90, 90);
    private static final ParameterDefinition ALBERS_PARALLEL_1 =
            new ParameterDefinition(STANDARD_PARALLEL_1, "Latitude of 1st standard parallel", 8823, 20, -90, 90);
    private static final ParameterDefinition ALBERS_PARALLEL_2 =
            new ParameterDefinition(STANDARD_PARALLEL_2, "Latitude of 2nd standard parallel", 8824, 50, -90, 90);
    private static final ParameterDefinition CYLINDER_PARALLEL =
            new ParameterDefinition(STANDARD_PARALLEL_1, "Latitude of 1st standard parallel", 8823, 0, -MAX_OFFSET_DEG, MAX_OFFSET_DEG);
    private static final ParameterDefinition CENTRE_LINE_LON =
            new ParameterDefinition(CENTRE_LON, "Longitude of projection centre", 0, 0, -180, 180);
    private static final ParameterDefinition CENTRE_LINE_LAT =
            new ParameterDefinition(CENTRE_LAT, "Latitude of projection centre", 0, 0, -90, 90);
    private static final ParameterDefinition CENTRE_LINE_AZIMUTH =
            new ParameterDefinition(AZIMUTH, "Azimuth of central line", 0, 90, -180, 180);
    private static final ParameterDefinition LINE_OFFSET = new ParameterDefinition(STANDARD_LINE_OFFSET,
            "Angular distance of the lines of true scale from the central line", 0, 0, 0, MAX_OFFSET_DEG);

    private static final Map<ProjectionFamily, List<ParameterDefinition>> DEFINITIONS = Map.of(
            ProjectionFamily.LAMBERT_AZIMUTHAL, List.of(NATURAL_LON, NATURAL_LAT),
            ProjectionFamily.ALBERS_CONIC, List.of(FALSE_ORIGIN_LON, FALSE_ORIGIN_LAT, ALBERS_PARALLEL_1, ALBERS_PARALLEL_2),
            ProjectionFamily.CYLINDRICAL, List.of(NATURAL_LON, CYLINDER_PARALLEL),
            ProjectionFamily.CYLINDRICAL_TRANSVERSE, List.of(CENTRE_LINE_LON, CENTRE_LINE_LAT, LINE_OFFSET),
            ProjectionFamily.CYLINDRICAL_OBLIQUE, List.of(CENTRE_LINE_LON, CENTRE_LINE_LAT, CENTRE_LINE_AZIMUTH, LINE_OFFSET),
            ProjectionFamily.EQUAL_EARTH, List.of(NATURAL_LON),
            ProjectionFamily.MOLLWEIDE, List.of(NATURAL_LON));

    private FamilyDefinitions() {
    }

    /** The parameters of {@code family}, in caption order. */
    static List<ParameterDefinition> of(ProjectionFamily family) {
        return DEFINITIONS.get(family);
    }

    /** The definition of {@code key} in {@code family}, or null when the family has no such parameter. */
    static ParameterDefinition find(ProjectionFamily family, String key) {
        for (ParameterDefinition d : of(family)) {
            if (d.key().equals(key)) {
                return d;
            }
        }
        return null;
    }

    /** The family's parameters with the given values (degrees, by key), in caption order; every key must be present. */
    static List<ProjectionParameter> values(ProjectionFamily family, Map<String, Double> valuesByKey) {
        List<ProjectionParameter> parameters = new ArrayList<>();
        for (ParameterDefinition d : of(family)) {
            parameters.add(d.withValue(valuesByKey.get(d.key())));
        }
        return parameters;
    }
}
