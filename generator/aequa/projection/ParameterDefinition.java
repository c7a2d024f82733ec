package aequa.projection;

/**
 * The definition of one projection parameter: its project-file key, its readable (EPSG where one exists)
 * name, the EPSG parameter code or 0, the value used when nobody sets it, and its allowed range. Angles in
 * degrees.
 *
 * @param key          kebab-case key, as in {@link ProjectionParameter#key()}
 * @param name         readable name; for the SIS-backed families exactly the EPSG name SIS expects
 * @param epsgCode     EPSG parameter code (IOGP GN 7-2), or 0 for aequa's own parameters
 * @param defaultValue value used when the parameter is neither forced nor chosen
 * @param minValue     lowest allowed value
 * @param maxValue     highest allowed value
 */
record ParameterDefinition(String key, String name, int epsgCode, double defaultValue, double minValue, double maxValue) {

    ProjectionParameter withValue(double value) {
        return new ProjectionParameter(name, key, value, "deg");
    }

    /** Whether {@code value} is a number inside [min, max]. */
    boolean accepts(double value) {
        return value >= minValue && value <= maxValue;
    }
}
