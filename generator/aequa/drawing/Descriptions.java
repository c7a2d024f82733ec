package aequa.drawing;

import java.util.List;

import aequa.atlas.MapModel;
import aequa.project.ClassMethod;
import aequa.project.MapDisplay;

/** The text alternative of a map: what it shows, how many regions, classes and periods, which projection. */
final class Descriptions {

    private Descriptions() {
    }

    static String of(MapModel model) {
        boolean circles = model.spec().display() == MapDisplay.CIRCLES;
        StringBuilder text = new StringBuilder();
        text.append(circles ? "Proportional-circle map of " : "Choropleth map of ").append(model.spec().title());
        if (!model.spec().unit().isBlank()) {
            text.append(" (").append(model.spec().unit()).append(')');
        }
        text.append(" for ").append(model.regions().size()).append(" regions");
        List<String> periods = model.periods();
        if (periods.size() > 1) {
            text.append(", one panel per period from ").append(periods.get(0)).append(" to ").append(periods.get(periods.size() - 1));
        } else if (periods.size() == 1) {
            text.append(", ").append(periods.get(0));
        }
        if (!circles) {
            if (model.classification().method() == ClassMethod.UNCLASSED) {
                text.append(", unclassed colour scale");
            } else {
                text.append(", ").append(model.classification().classCount()).append(" classes (")
                        .append(model.classification().method().configName()).append(')');
            }
        }
        text.append(". ").append(model.projection().projection().family().displayName()).append(" projection");
        if (model.composite()) {
            text.append(" for the main map, ").append(model.parts().size() - 1).append(" detached ")
                    .append(model.parts().size() == 2 ? "part" : "parts").append(" framed on their own projections");
        }
        text.append(model.mixedAreaScales() ? "; areas are true to scale within each part, and parts at another scale say so."
                : "; areas are true to scale.");
        return text.toString();
    }
}
