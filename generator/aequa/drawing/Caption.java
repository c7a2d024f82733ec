package aequa.drawing;

import java.util.ArrayList;
import java.util.List;

import aequa.atlas.MapModel;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionParameter;

/**
 * The words under the map. The caption states the projection and its parameters, the datum, the angular
 * distortion (Tissot's omega, the largest angular deformation at a point) over the data, the area check and
 * the area scale; the credits state the source and the date of the figures, then any notices.
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
        text.append(", datum WGS 84. Angular distortion \u03c9 up to ").append(Numbers.trim(choice.omegaMaxDeg(), 1))
                .append('\u00b0');
        if (Math.abs(choice.worstLatDeg()) >= 89.9) {
            // on a world map the largest omega always sits at a pole, which says little about the data
            text.append(" (at the ").append(choice.worstLatDeg() > 0 ? "North" : "South").append(" Pole)");
        }
        text.append(", mean ").append(Numbers.trim(choice.omegaMeanDeg(), 1)).append("\u00b0.");
        if (model.composite()) {
            text.append(' ').append(PartSentences.parts(model));
        }
        if (model.areaAudit() != null) {
            double percent = model.areaAudit().maxRelativeError() * 100;
            text.append(" Areas are true: largest difference from the ellipsoid ")
                    .append(percent < 1e-4 ? "below 0.0001" : Numbers.trim(percent, 4)).append(" %.");
        }
        if (scale != null) {
            text.append(" The square shows ").append(scale.label())
                    .append(model.mixedAreaScales() ? " anywhere on the main map and in every part drawn at its scale" : " anywhere on the map")
                    .append("; distances are not to scale.");
        }
        return text.toString();
    }

    /** Source, date of the figures, then the notices, as one paragraph. */
    static String credits(MapModel model) {
        List<String> parts = new ArrayList<>();
        if (!model.spec().source().isBlank()) {
            parts.add("Source: " + model.spec().source().strip() + ".");
        }
        if (!model.spec().asOf().isBlank()) {
            parts.add("Figures: " + model.spec().asOf().strip() + ".");
        }
        for (String notice : model.notices()) {
            parts.add(notice.strip());
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
