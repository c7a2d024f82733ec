package aequa.projection;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/**
 * The equal-area projection families aequa can draw with. Every family is exactly equal-area on the
 * WGS 84 ellipsoid. {@link #configName()} is the name used in project files and report.json.
 */
public enum ProjectionFamily {
    LAMBERT_AZIMUTHAL("lambert-azimuthal", "Lambert azimuthal equal-area", false),
    ALBERS_CONIC("albers-conic", "Albers equal-area conic", false),
    CYLINDRICAL("cylindrical", "Lambert cylindrical equal-area", false),
    CYLINDRICAL_TRANSVERSE("cylindrical-transverse", "Transverse cylindrical equal-area", false),
    CYLINDRICAL_OBLIQUE("cylindrical-oblique", "Oblique cylindrical equal-area", false),
    EQUAL_EARTH("equal-earth", "Equal Earth", true),
    MOLLWEIDE("mollweide", "Mollweide", true);

    private final String configName;
    private final String displayName;
    private final boolean world;

    ProjectionFamily(String configName, String displayName, boolean world) {
        this.configName = configName;
        this.displayName = displayName;
        this.world = world;
    }

    /** True for the families made to show the whole globe in one piece (drawn with its outline). */
    public boolean world() {
        return world;
    }

    /** Kebab-case name used in project files, report.json and {@code explain --json}. */
    public String configName() {
        return configName;
    }

    /** The name readers see in captions. */
    public String displayName() {
        return displayName;
    }

    /**
     * The readable (EPSG) name of this family's parameter {@code key} ({@code centre-lat} of Lambert azimuthal:
     * "Latitude of natural origin"), or empty when the family has no such parameter.
     */
    public Optional<String> parameterName(String key) {
        return Optional.ofNullable(FamilyDefinitions.find(this, key)).map(ParameterDefinition::name);
    }

    public static Optional<ProjectionFamily> fromConfigName(String name) {
        String wanted = name.trim().toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(f -> f.configName.equals(wanted)).findFirst();
    }
}
