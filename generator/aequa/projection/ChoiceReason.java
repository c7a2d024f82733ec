package aequa.projection;

import java.util.Locale;

/** The one plain-language sentence that says why a projection was chosen (for captions and report.json). */
final class ChoiceReason {

    /** How the choice came about. */
    enum Basis { AUTOMATIC, FORCED, KEPT_PREVIOUS }

    private ChoiceReason() {
    }

    static String sentence(EqualAreaProjection chosen, OmegaScore score, Footprint footprint, Basis basis,
                           ProjectionChoice.Candidate runnerUp) {
        String name = describe(chosen);
        String figures = String.format(Locale.ROOT, "shapes are distorted by at most %s deg (%s deg on average) over the data",
                degrees(score.omegaMaxDeg()), degrees(score.omegaMeanDeg()));
        String comparison = runnerUp == null ? "" : basis == Basis.AUTOMATIC && runnerUp.omegaMaxDeg() < score.omegaMaxDeg()
                ? String.format(Locale.ROOT, "; the best %s reaches %s deg at most, within the %d %% by which the more "
                        + "conventional shape is preferred", runnerUp.family().displayName(),
                        degrees(runnerUp.omegaMaxDeg()), Math.round(100 * ProjectionChooser.CONVENTIONAL_MARGIN))
                : String.format(Locale.ROOT, ", against %s deg for the best %s",
                        degrees(runnerUp.omegaMaxDeg()), runnerUp.family().displayName());
        switch (basis) {
            case FORCED:
                return String.format(Locale.ROOT, "%s, as the project file asks; %s.", name, figures);
            case KEPT_PREVIOUS:
                return String.format(Locale.ROOT,
                        "%s, kept from the previous publish because no new candidate is at least %d%% better; %s%s.",
                        name, Math.round(100 * ProjectionChooser.STABILITY_MARGIN), figures, comparison);
            default:
                return String.format(Locale.ROOT, "%s, because %s: %s%s.", name, why(chosen, footprint), figures, comparison);
        }
    }

    /** Family and aspect in words, for example "Lambert azimuthal equal-area, north polar aspect". */
    static String describe(EqualAreaProjection projection) {
        ProjectionFamily family = projection.family();
        if (family == ProjectionFamily.LAMBERT_AZIMUTHAL) {
            double lat = projection.parameters().get(1).value();
            String aspect = lat >= 89.999 ? "north polar" : lat <= -89.999 ? "south polar" : Math.abs(lat) < 1e-9 ? "equatorial" : "oblique";
            return family.displayName() + ", " + aspect + " aspect";
        }
        return family.displayName();
    }

    private static String why(EqualAreaProjection chosen, Footprint footprint) {
        if ((footprint.containsNorthPole() || footprint.containsSouthPole()) && !chosen.family().world()) {
            return "the data surround the " + (footprint.containsNorthPole() ? "North" : "South") + " Pole";
        }
        switch (chosen.family()) {
            case LAMBERT_AZIMUTHAL:
                return "the data form a roughly round area";
            case ALBERS_CONIC:
                return "the data stretch east-west on one side of the equator";
            case CYLINDRICAL:
                return "the data form an east-west belt near the equator";
            case CYLINDRICAL_TRANSVERSE:
                return "the data form a long north-south strip";
            case CYLINDRICAL_OBLIQUE:
                return "the data form a long belt that runs slantwise across the meridians";
            default:
                return "the data span most of the globe";
        }
    }

    private static String degrees(double value) {
        if (value >= 10) {
            return String.format(Locale.ROOT, "%.0f", value);
        }
        return value >= 0.1 ? String.format(Locale.ROOT, "%.1f", value) : String.format(Locale.ROOT, "%.2g", value);
    }
}
