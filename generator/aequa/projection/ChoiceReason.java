package aequa.projection;

import java.util.Locale;

/**
 * Why a projection was chosen, as facts rather than words: how the choice came about, what the data's shape
 * suggested, and how the chosen family compares with the best other candidate. The wording stage turns it
 * into a sentence in a reader's language; {@link #sentence} writes the English one that report.json and the
 * terminal show.
 *
 * @param basis      how the choice came about
 * @param setting    what the data's footprint looks like, which the chosen family suits
 * @param comparison what the sentence says about the best other candidate ({@code runnersUp().get(0)})
 */
public record ChoiceReason(Basis basis, Setting setting, Comparison comparison) {

    /** How the choice came about. */
    public enum Basis { AUTOMATIC, FORCED, KEPT_PREVIOUS }

    /** The shape of the data that the chosen family suits. */
    public enum Setting { AROUND_NORTH_POLE, AROUND_SOUTH_POLE, ROUND_AREA, EAST_WEST_ONE_SIDE, EQUATORIAL_BELT,
        NORTH_SOUTH_STRIP, SLANTED_BELT, MOST_OF_GLOBE }

    /** What is said about the best other candidate. */
    public enum Comparison {
        /** nothing: there was no other candidate */
        NONE,
        /** the other candidate distorts more */
        AGAINST_RUNNER_UP,
        /** the other candidate distorts less, but within {@link #PREFERENCE_MARGIN_PERCENT} of the chosen one */
        PREFERRED_WITHIN_MARGIN
    }

    /** The aspect of a Lambert azimuthal map, from its latitude of origin. */
    public enum Aspect { NONE, NORTH_POLAR, SOUTH_POLAR, EQUATORIAL, OBLIQUE }

    /** The margin, in percent, by which a more conventional family is preferred ({@code CONVENTIONAL_MARGIN}). */
    public static final long PREFERENCE_MARGIN_PERCENT = Math.round(100 * ProjectionChooser.CONVENTIONAL_MARGIN);

    /** The margin, in percent, a new candidate must beat the previous edition's projection by ({@code STABILITY_MARGIN}). */
    public static final long STABILITY_MARGIN_PERCENT = Math.round(100 * ProjectionChooser.STABILITY_MARGIN);

    /** The reason for {@code chosen} with the omega {@code omegaMaxDeg}, against the best other candidate (or null). */
    static ChoiceReason of(EqualAreaProjection chosen, double omegaMaxDeg, Footprint footprint, Basis basis,
                           ProjectionChoice.Candidate runnerUp) {
        Comparison comparison = runnerUp == null ? Comparison.NONE
                : basis == Basis.AUTOMATIC && runnerUp.omegaMaxDeg() < omegaMaxDeg ? Comparison.PREFERRED_WITHIN_MARGIN
                : Comparison.AGAINST_RUNNER_UP;
        return new ChoiceReason(basis, setting(chosen.family(), footprint), comparison);
    }

    /** The English sentence for {@code choice}, for example "Albers equal-area conic, because ...: ...". */
    public static String sentence(ProjectionChoice choice) {
        ChoiceReason why = choice.why();
        String name = describe(choice.projection());
        String figures = String.format(Locale.ROOT, "shapes are distorted by at most %s deg (%s deg on average) over the data",
                degrees(choice.omegaMaxDeg()), degrees(choice.omegaMeanDeg()));
        ProjectionChoice.Candidate runnerUp = choice.runnersUp().isEmpty() ? null : choice.runnersUp().get(0);
        String comparison = switch (runnerUp == null ? Comparison.NONE : why.comparison()) {
            case NONE -> "";
            case PREFERRED_WITHIN_MARGIN -> String.format(Locale.ROOT, "; the best %s reaches %s deg at most, within the %d %% "
                    + "by which the more conventional shape is preferred", runnerUp.family().displayName(),
                    degrees(runnerUp.omegaMaxDeg()), PREFERENCE_MARGIN_PERCENT);
            case AGAINST_RUNNER_UP -> String.format(Locale.ROOT, ", against %s deg for the best %s",
                    degrees(runnerUp.omegaMaxDeg()), runnerUp.family().displayName());
        };
        return switch (why.basis()) {
            case FORCED -> String.format(Locale.ROOT, "%s, as the project file asks; %s.", name, figures);
            case KEPT_PREVIOUS -> String.format(Locale.ROOT,
                    "%s, kept from the previous publish because no new candidate is at least %d%% better; %s%s.",
                    name, STABILITY_MARGIN_PERCENT, figures, comparison);
            case AUTOMATIC -> String.format(Locale.ROOT, "%s, because %s: %s%s.", name, english(why.setting()), figures, comparison);
        };
    }

    /** The aspect of {@code projection}: {@link Aspect#NONE} for every family but Lambert azimuthal. */
    public static Aspect aspect(EqualAreaProjection projection) {
        if (projection.family() != ProjectionFamily.LAMBERT_AZIMUTHAL) {
            return Aspect.NONE;
        }
        double lat = projection.parameters().get(1).value();
        return lat >= 89.999 ? Aspect.NORTH_POLAR : lat <= -89.999 ? Aspect.SOUTH_POLAR
                : Math.abs(lat) < 1e-9 ? Aspect.EQUATORIAL : Aspect.OBLIQUE;
    }

    /** Family and aspect in words, for example "Lambert azimuthal equal-area, north polar aspect". */
    static String describe(EqualAreaProjection projection) {
        String family = projection.family().displayName();
        return switch (aspect(projection)) {
            case NONE -> family;
            case NORTH_POLAR -> family + ", north polar aspect";
            case SOUTH_POLAR -> family + ", south polar aspect";
            case EQUATORIAL -> family + ", equatorial aspect";
            case OBLIQUE -> family + ", oblique aspect";
        };
    }

    private static Setting setting(ProjectionFamily chosen, Footprint footprint) {
        if ((footprint.containsNorthPole() || footprint.containsSouthPole()) && !chosen.world()) {
            return footprint.containsNorthPole() ? Setting.AROUND_NORTH_POLE : Setting.AROUND_SOUTH_POLE;
        }
        return switch (chosen) {
            case LAMBERT_AZIMUTHAL -> Setting.ROUND_AREA;
            case ALBERS_CONIC -> Setting.EAST_WEST_ONE_SIDE;
            case CYLINDRICAL -> Setting.EQUATORIAL_BELT;
            case CYLINDRICAL_TRANSVERSE -> Setting.NORTH_SOUTH_STRIP;
            case CYLINDRICAL_OBLIQUE -> Setting.SLANTED_BELT;
            default -> Setting.MOST_OF_GLOBE;
        };
    }

    private static String english(Setting setting) {
        return switch (setting) {
            case AROUND_NORTH_POLE -> "the data surround the North Pole";
            case AROUND_SOUTH_POLE -> "the data surround the South Pole";
            case ROUND_AREA -> "the data form a roughly round area";
            case EAST_WEST_ONE_SIDE -> "the data stretch east-west on one side of the equator";
            case EQUATORIAL_BELT -> "the data form an east-west belt near the equator";
            case NORTH_SOUTH_STRIP -> "the data form a long north-south strip";
            case SLANTED_BELT -> "the data form a long belt that runs slantwise across the meridians";
            case MOST_OF_GLOBE -> "the data span most of the globe";
        };
    }

    /**
     * The decimals an omega in a reason sentence is written with: none from 10 deg, one from 0.1 deg, else
     * two significant digits. The wording stage uses the same rule.
     */
    public static int degreeDecimals(double valueDeg) {
        if (valueDeg >= 10) {
            return 0;
        }
        if (valueDeg >= 0.1 || valueDeg <= 0) {
            return 1;
        }
        return 1 - (int) Math.floor(Math.log10(valueDeg));
    }

    private static String degrees(double value) {
        return String.format(Locale.ROOT, "%." + degreeDecimals(value) + "f", value);
    }
}
