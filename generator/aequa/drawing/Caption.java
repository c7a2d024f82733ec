package aequa.drawing;

import java.util.ArrayList;
import java.util.List;

import aequa.atlas.MapModel;
import aequa.projection.DistortionSpread;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionParameter;

/**
 * The words under the map. The caption states the projection and its parameters, the datum, the angular
 * distortion (Tissot's omega, the largest angular deformation at a point) over the data, the area check and
 * the area scale; the credits state the source and the date of the figures, then the author's notes. Findings
 * of the checks (join warnings, dropped islands) are for the author, never printed in the graphic: they go to
 * the terminal, report.json and the method page.
 */
final class Caption {

    private Caption() {
    }

    /** One paragraph; the area scale sentence is included when {@code scale} is not null. */
    static String caption(MapModel model, AreaScale scale) {
        ProjectionChoice choice = model.projection();
        StringBuilder text = new StringBuilder();
        text.append(choice.projection().family().displayName()).append(" projection");
        List<String> parameters = new ArrayList<>();
        for (ProjectionParameter p : choice.projection().parameters()) {
            parameters.add(p.name() + " " + parameterValue(p));
        }
        if (!parameters.isEmpty()) {
            text.append(" (").append(String.join(", ", parameters)).append(')');
        }
        text.append(", datum WGS 84. ");
        distortion(choice, text);
        if (model.composite()) {
            text.append(' ').append(PartSentences.parts(model));
        }
        if (model.areaAudit() != null) {
            double percent = model.areaAudit().maxRelativeError() * 100;
            // "true" only for a passed audit: every region drawn whole and within the tolerance
            text.append(model.areaAudit().passed() ? " Areas are true: largest difference from the ellipsoid "
                            : " Areas are not true: largest difference from the ellipsoid ")
                    .append(percent < 1e-4 ? "below 0.0001" : Numbers.trim(percent, 4)).append(" %.");
        }
        if (scale != null) {
            text.append(" The square shows ").append(scale.label())
                    .append(model.mixedAreaScales() ? " anywhere on the main map and in every part drawn at its scale" : " anywhere on the map")
                    .append("; distances are not to scale.");
        }
        return text.toString();
    }

    /**
     * The angular distortion (Tissot's omega) in words. A world map leads with the area-weighted figures, since
     * its largest omega always sits on the pole lines and says little about the rest (issue #16); a regional
     * map gives the largest, where it sits, and the mean.
     */
    private static void distortion(ProjectionChoice choice, StringBuilder text) {
        DistortionSpread spread = choice.spread();
        if (choice.projection().family().world() && Double.isFinite(spread.shareBelow10Deg())) {
            text.append("Angular distortion \u03c9: mean ").append(Numbers.trim(choice.omegaMeanDeg(), 1))
                    .append("\u00b0; below 10\u00b0 over ").append(Numbers.trim(100 * spread.shareBelow10Deg(), 0))
                    .append(" % of the mapped area, below 5\u00b0 over ").append(Numbers.trim(100 * spread.shareBelow5Deg(), 0))
                    .append(" %; largest, ").append(Numbers.trim(choice.omegaMaxDeg(), 1)).append("\u00b0, ")
                    .append(spread.worstPlace()).append('.');
            return;
        }
        text.append("Angular distortion \u03c9 up to ").append(Numbers.trim(choice.omegaMaxDeg(), 1)).append('\u00b0');
        if (!spread.worstPlace().isEmpty()) {
            text.append(" (").append(spread.worstPlace()).append(')');
        } else if (Math.abs(choice.worstLatDeg()) >= 89.9) {
            text.append(" (at the ").append(choice.worstLatDeg() > 0 ? "North" : "South").append(" Pole)");
        }
        text.append(", mean ").append(Numbers.trim(choice.omegaMeanDeg(), 1)).append("\u00b0.");
    }

    /** Source, date of the figures, then the map's notes, as one paragraph. */
    static String credits(MapModel model) {
        List<String> parts = new ArrayList<>();
        if (!model.spec().source().isBlank()) {
            parts.add("Source: " + model.spec().source().strip() + ".");
        }
        if (!model.spec().asOf().isBlank()) {
            parts.add("Figures: " + model.spec().asOf().strip() + ".");
        }
        if (!model.spec().notes().isBlank()) {
            parts.add(model.spec().notes().strip());
        }
        return String.join(" ", parts);
    }

    private static String parameterValue(ProjectionParameter p) {
        if (p.unit().equals("deg")) {
            return Numbers.trim(p.value(), 4) + "\u00b0";
        }
        return Numbers.trim(p.value(), 2) + " " + p.unit();
    }
}
