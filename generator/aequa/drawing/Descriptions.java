package aequa.drawing;

import java.util.List;

import aequa.atlas.MapModel;
import aequa.project.ClassMethod;
import aequa.project.MapDisplay;
import aequa.wording.ProjectionWords;
import aequa.wording.Wording;

/**
 * The text alternative of a map, in the drawing's language: what it shows, how many regions, classes and
 * periods, which projection.
 */
final class Descriptions {

    private Descriptions() {
    }

    static String of(MapModel model, Wording w) {
        boolean circles = model.spec().display() == MapDisplay.CIRCLES;
        String text = w.text(circles ? "draw.describeCircles" : "draw.describeChoropleth", "title", model.spec().title());
        if (!model.spec().unit().isBlank()) {
            text = w.text("draw.describeUnit", "text", text, "unit", model.spec().unit());
        }
        text = w.text("draw.describeRegions", "text", text, "count", model.regions().size());
        List<String> periods = model.periods();
        if (periods.size() > 1) {
            text = w.text("draw.describePanels", "text", text, "first", w.numbers().period(periods.get(0)),
                    "last", w.numbers().period(periods.get(periods.size() - 1)));
        } else if (periods.size() == 1 && !periods.get(0).isEmpty()) {
            text = w.text("draw.describePeriod", "text", text, "period", w.numbers().period(periods.get(0)));
        }
        if (!circles) {
            text = model.classification().method() == ClassMethod.UNCLASSED ? w.text("draw.describeUnclassed", "text", text)
                    : w.text("draw.describeClasses", "text", text, "count", model.classification().classCount(),
                    "method", w.text("draw.methodName", "method", methodWord(model.classification().method())));
        }
        String projection = w.sentence(w.text("caption.projection", "family",
                ProjectionWords.family(model.projection().projection().family(), w)));
        if (!model.composite()) {
            return w.text("draw.describeEnd", "text", text, "projection", projection);
        }
        return w.text("draw.describeEndParts", "text", text, "projection", projection, "count", model.parts().size() - 1,
                "mixed", model.mixedAreaScales() ? "yes" : "no");
    }

    /** The {@code draw.methodName} select word of a classification method. */
    private static String methodWord(ClassMethod method) {
        return switch (method) {
            case QUANTILE -> "quantile";
            case EQUAL_INTERVAL -> "equalInterval";
            case NATURAL_BREAKS -> "naturalBreaks";
            case STANDARD_DEVIATION -> "standardDeviation";
            case DIVERGING -> "diverging";
            case MANUAL -> "manual";
            case UNCLASSED -> "unclassed";
        };
    }
}
