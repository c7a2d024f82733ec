package aequa.wording;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import aequa.projection.ChoiceReason;
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

    /**
     * The family's name with its aspect where the family has one ("Lambert azimuthal equal-area, north polar
     * aspect"), as the method page names a map's projection.
     */
    public static String familyWithAspect(ProjectionChoice choice, Wording w) {
        String family = family(choice.projection().family(), w);
        return switch (ChoiceReason.aspect(choice.projection())) {
            case NONE -> family;
            case NORTH_POLAR -> w.text("projection.aspect", "family", family, "aspect", "northPolar");
            case SOUTH_POLAR -> w.text("projection.aspect", "family", family, "aspect", "southPolar");
            case EQUATORIAL -> w.text("projection.aspect", "family", family, "aspect", "equatorial");
            case OBLIQUE -> w.text("projection.aspect", "family", family, "aspect", "oblique");
        };
    }

    /**
     * Why the projection was chosen, in the reader's language: the sentence that follows the projection's
     * name on the method page (the English one of report.json is {@link ProjectionChoice#reason()}). Omegas
     * with the decimals of {@link ChoiceReason#degreeDecimals}.
     */
    public static String reason(ProjectionChoice choice, Wording w) {
        ChoiceReason why = choice.why();
        NumberWriter numbers = w.numbers();
        String distortion = w.text("reason.distortion", "max", degrees(choice.omegaMaxDeg(), numbers),
                "mean", degrees(choice.omegaMeanDeg(), numbers));
        ProjectionChoice.Candidate other = choice.runnersUp().isEmpty() ? null : choice.runnersUp().get(0);
        ChoiceReason.Comparison comparison = other == null ? ChoiceReason.Comparison.NONE : why.comparison();
        String margin = numbers.percent(why.basis() == ChoiceReason.Basis.KEPT_PREVIOUS
                ? ChoiceReason.STABILITY_MARGIN_PERCENT : ChoiceReason.PREFERENCE_MARGIN_PERCENT, 0);
        String otherFamily = other == null ? "" : family(other.family(), w);
        String otherMax = other == null ? "" : degrees(other.omegaMaxDeg(), numbers);
        return switch (why.basis()) {
            case FORCED -> w.text("reason.forced", "distortion", distortion);
            case KEPT_PREVIOUS -> comparison == ChoiceReason.Comparison.NONE
                    ? w.text("reason.kept", "margin", margin, "distortion", distortion)
                    : w.text("reason.keptAgainst", "margin", margin, "distortion", distortion, "other", otherMax,
                    "family", otherFamily);
            case AUTOMATIC -> {
                String setting = w.text("reason.setting", "setting", settingWord(why.setting()));
                yield switch (comparison) {
                    case NONE -> w.text("reason.automatic", "setting", setting, "distortion", distortion);
                    case AGAINST_RUNNER_UP -> w.text("reason.automaticAgainst", "setting", setting,
                            "distortion", distortion, "other", otherMax, "family", otherFamily);
                    case PREFERRED_WITHIN_MARGIN -> w.text("reason.automaticPreferred", "setting", setting,
                            "distortion", distortion, "other", otherMax, "family", otherFamily, "margin", margin);
                };
            }
        };
    }

    private static String settingWord(ChoiceReason.Setting setting) {
        return camel(setting.name().split("_"));
    }

    private static String degrees(double valueDeg, NumberWriter numbers) {
        return numbers.degrees(valueDeg, ChoiceReason.degreeDecimals(valueDeg));
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
