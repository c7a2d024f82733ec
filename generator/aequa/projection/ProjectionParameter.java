package aequa.projection;

/**
 * One named parameter of a projection, as shown in captions and report.json.
 *
 * @param name  a readable name, the EPSG parameter name where one exists (for example
 *              {@code Latitude of natural origin})
 * @param key   the kebab-case key used to force this parameter in a project file (for example {@code centre-lat})
 * @param value the value, in {@code unit}
 * @param unit  {@code deg} or {@code m}
 */
public record ProjectionParameter(String name, String key, double value, String unit) {
}
