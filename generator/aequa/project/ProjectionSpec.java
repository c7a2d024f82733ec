package aequa.project;

import java.util.Map;

/**
 * Projection settings; every field empty means "choose automatically".
 *
 * @param family     a family's config name ({@code lambert-azimuthal}, {@code albers-conic}, ...) or {@code auto}
 * @param parameters forced parameter values by key (for example {@code centre-lat: 52}), in degrees
 */
public record ProjectionSpec(String family, Map<String, Double> parameters) {

    public static final ProjectionSpec AUTOMATIC = new ProjectionSpec(null, null);

    public ProjectionSpec {
        family = family == null ? "auto" : family;
        parameters = parameters == null ? Map.of() : java.util.Collections.unmodifiableMap(new java.util.TreeMap<>(parameters));
    }
}
