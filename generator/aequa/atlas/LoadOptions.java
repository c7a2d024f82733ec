package aequa.atlas;

import java.util.Map;

import aequa.colour.Rgb;
import aequa.projection.ProjectionRequest;

/**
 * What the load step needs from outside the project file.
 *
 * @param pageBackground     the theme's page colour; ramps, borders and no-data hatches are checked against it
 * @param previousProjections the projection each map had at the previous publish (from its report.json), by
 *                           map id, so a monthly update does not shift a map unless the gain is real
 */
public record LoadOptions(Rgb pageBackground, Map<String, ProjectionRequest.Previous> previousProjections) {

    public LoadOptions {
        previousProjections = Map.copyOf(previousProjections);
    }

    public static LoadOptions defaults() {
        return new LoadOptions(new Rgb(255, 255, 255), Map.of());
    }
}
