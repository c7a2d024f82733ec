package aequa.projection;

import java.util.Map;
import java.util.Optional;

/**
 * What the project file asks of the projection choice.
 *
 * @param family           a family the user forces, or empty for the automatic choice
 * @param forcedParameters parameter values the user forces, by {@link ProjectionParameter#key()} (degrees)
 * @param previous         the choice recorded by the previous publish of this map, kept unless a new one is
 *                         better by the stated margin (stability across rebuilds), or empty
 */
public record ProjectionRequest(Optional<ProjectionFamily> family, Map<String, Double> forcedParameters,
                                Optional<Previous> previous) {

    public ProjectionRequest {
        forcedParameters = Map.copyOf(forcedParameters);
    }

    public static ProjectionRequest automatic() {
        return new ProjectionRequest(Optional.empty(), Map.of(), Optional.empty());
    }

    /** A previously published choice, as report.json recorded it. */
    public record Previous(ProjectionFamily family, Map<String, Double> parameters) {
        public Previous {
            parameters = Map.copyOf(parameters);
        }
    }
}
