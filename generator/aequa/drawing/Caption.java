package aequa.drawing;

import java.util.ArrayList;
import java.util.List;

import aequa.atlas.MapModel;
import aequa.projection.DistortionSpread;
import aequa.projection.ProjectionChoice;
import aequa.wording.NumberWriter;
import aequa.wording.ProjectionWords;
import aequa.wording.Wording;

/**
 * The words under the map. The caption states the projection and its parameters, the datum, the angular
 * distortion (Tissot's omega, the largest angular deformation at a point) over the data, the area check and
 * the area scale; the credits state the source and the date of the figures, then the author's notes. Findings
 * of the checks (join warnings, dropped islands) are for the author, never printed in the graphic: they go to
 * the terminal, report.json and the method page. Every word and number is in the drawing's language.
 */
final class Caption {

    /** Below this an area difference is written as "below 0.0001 %": the audit's own precision. */
    private static final double SMALLEST_PERCENT = 1e-4;

    private Caption() {
    }

    /** One paragraph; the area scale sentence is included when {@code scale} is not null. */
    static String caption(MapModel model, AreaScale scale, Wording w) {
        ProjectionChoice choice = model.projection();
        NumberWriter numbers = w.numbers();
        List<String> sentences = new ArrayList<>();
        sentences.add(w.sentence(w.text("draw.caption", "projection", ProjectionWords.projection(choice, w))));
        sentences.add(distortion(choice, w));
        if (model.composite()) {
            sentences.add(PartSentences.parts(model, w));
        }
        if (model.areaAudit() != null) {
            double percent = model.areaAudit().maxRelativeError() * 100;
            // "true" only for a passed audit: every region drawn whole and within the tolerance
            boolean passed = model.areaAudit().passed();
            if (percent < SMALLEST_PERCENT) {
                sentences.add(w.text(passed ? "draw.areasTrueBelow" : "draw.areasNotTrueBelow", "error",
                        numbers.percent(SMALLEST_PERCENT, 4)));
            } else {
                sentences.add(w.text(passed ? "draw.areasTrue" : "draw.areasNotTrue", "error", numbers.percent(percent, 4)));
            }
        }
        if (scale != null) {
            sentences.add(w.text(model.mixedAreaScales() ? "draw.squareShowsParts" : "draw.squareShows", "area", scale.label(numbers)));
        }
        return String.join(" ", sentences);
    }

    /**
     * The angular distortion (Tissot's omega) in words. A world map leads with the area-weighted figures, since
     * its largest omega always sits on the pole lines and says little about the rest (issue #16); a regional
     * map gives the largest, where it sits, and the mean.
     */
    private static String distortion(ProjectionChoice choice, Wording w) {
        NumberWriter numbers = w.numbers();
        DistortionSpread spread = choice.spread();
        String max = numbers.degrees(choice.omegaMaxDeg(), 1);
        String mean = numbers.degrees(choice.omegaMeanDeg(), 1);
        if (choice.projection().family().world() && Double.isFinite(spread.shareBelow10Deg())) {
            return w.text("draw.omegaWorld", "mean", mean, "share10", numbers.percent(100 * spread.shareBelow10Deg(), 0),
                    "share5", numbers.percent(100 * spread.shareBelow5Deg(), 0), "max", max,
                    "place", ProjectionWords.place(spread.worstPlace(), w));
        }
        String place = spread.worstPlace();
        if (place.isEmpty() && Math.abs(choice.worstLatDeg()) >= 89.9) {
            place = choice.worstLatDeg() > 0 ? "at the North Pole" : "at the South Pole";
        }
        return place.isEmpty() ? w.text("draw.omegaUpTo", "max", max, "mean", mean)
                : w.text("draw.omegaUpToAt", "max", max, "mean", mean, "place", ProjectionWords.place(place, w));
    }

    /** Source, date of the figures, then the map's notes, as one paragraph. */
    static String credits(MapModel model, Wording w) {
        List<String> parts = new ArrayList<>();
        if (!model.spec().source().isBlank()) {
            parts.add(w.text("draw.source", "source", model.spec().source().strip()));
        }
        if (!model.spec().asOf().isBlank()) {
            parts.add(w.text("draw.figures", "date", w.numbers().period(model.spec().asOf().strip())));
        }
        if (!model.spec().notes().isBlank()) {
            parts.add(model.spec().notes().strip());
        }
        return String.join(" ", parts);
    }
}
