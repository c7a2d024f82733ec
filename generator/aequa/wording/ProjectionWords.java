package aequa.wording;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionFamily;
import aequa.projection.ProjectionParameter;

/**
 * Names of projection families and parameters in a reader's language. A family's message key is
 * {@code family.} plus its configuration name in camel case ({@code family.albersConic}); a parameter's is
 * {@code parameter.} plus its EPSG name in camel case ({@code parameter.latitudeOfNaturalOrigin}). A name
 * without a message (a parameter added later) is shown as the projection stage names it.
 */
public final class ProjectionWords {

    /** The forms of {@code DistortionSpread.worstPlace()}, which the projection stage writes in English. */
    private static final Pattern EDGE = Pattern.compile("at the data's ([a-z-]+) edge");
    private static final String POLE_LINES = "on the pole lines, the map's top and bottom edges";

    private ProjectionWords() {
    }

    /** "Albers equal-area conic projection (Longitude of false origin 10°, ...)": family and parameters. */
    public static String projection(ProjectionChoice choice, Wording w) {
        String family = family(choice.projection().family(), w);
        java.util.List<String> params = choice.projection().parameters().stream().map(p -> parameter(p, w))
                .toList();
        return params.isEmpty() ? w.text("caption.projection", "family", family)
                : w.text("caption.projectionWithParameters", "family", family, "parameters", w.unitList(params));
    }

    /** A parameter's name and value: angles with at most 4 decimals (about 10 m), lengths with 6 digits. */
    public static String parameter(ProjectionParameter p, Wording w) {
        String value = "deg".equals(p.unit()) ? w.numbers().degrees(p.value(), 4)
                : w.numbers().significant(p.value()) + " " + p.unit();
        return w.text("parameter.value", "name", parameter(p.name(), w), "value", value);
    }

    /**
     * Where the largest angular distortion sits, in the reader's language; a description the projection stage
     * words in a form this class does not know is kept as it is.
     */
    public static String place(String englishPlace, Wording w) {
        if (POLE_LINES.equals(englishPlace)) {
            return w.text("place.poleLines");
        }
        if (englishPlace.equals("at the North Pole") || englishPlace.equals("at the South Pole")) {
            return w.text("place.pole", "pole", englishPlace.contains("North") ? "north" : "south");
        }
        Matcher edge = EDGE.matcher(englishPlace);
        if (edge.matches()) {
            return w.text("place.edge", "wind", camel(edge.group(1).split("-")));
        }
        return englishPlace;
    }

    public static String family(ProjectionFamily family, Wording w) {
        String key = familyKey(family);
        return w.has(key) ? w.text(key) : family.displayName();
    }

    public static String parameter(String epsgName, Wording w) {
        String key = parameterKey(epsgName);
        return w.has(key) ? w.text(key) : epsgName;
    }

    static String familyKey(ProjectionFamily family) {
        return "family." + camel(family.configName().split("-"));
    }

    static String parameterKey(String epsgName) {
        return "parameter." + camel(epsgName.split(" "));
    }

    private static String camel(String[] words) {
        StringBuilder key = new StringBuilder(words[0].toLowerCase(Locale.ROOT));
        for (int i = 1; i < words.length; i++) {
            if (!words[i].isEmpty()) {
                key.append(Character.toUpperCase(words[i].charAt(0))).append(words[i].substring(1).toLowerCase(Locale.ROOT));
            }
        }
        return key.toString();
    }
}
