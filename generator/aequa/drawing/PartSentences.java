package aequa.drawing;

import java.util.ArrayList;
import java.util.List;

import aequa.atlas.MapModel;
import aequa.atlas.MapPart;

/**
 * What the caption says about a composite map's parts: that the projection stated first is the main map's,
 * which parts are framed, that each has its own equal-area projection, and whether their areas compare with
 * the main map's. A map whose parts differ in area scale is never called equal-area without saying so.
 */
final class PartSentences {

    /** Most framed parts the caption names one by one. */
    private static final int MAX_NAMED = 3;

    private PartSentences() {
    }

    static String parts(MapModel model) {
        List<String> sameScale = new ArrayList<>();
        List<String> otherScale = new ArrayList<>();
        double worstOmegaDeg = 0;
        for (MapPart part : model.parts()) {
            if (part.main()) {
                continue;
            }
            worstOmegaDeg = Math.max(worstOmegaDeg, part.projection().omegaMaxDeg());
            if (part.areaScale() == 1) {
                sameScale.add(part.name());
            } else {
                otherScale.add(part.name() + " at " + part.areaScaleText() + " \u00d7");
            }
        }
        List<String> names = model.parts().stream().filter(p -> !p.main()).map(MapPart::name).toList();
        // a few short names read well in a sentence; descriptive default names ("29 regions, 820 km north-west") do not
        boolean byName = names.size() <= MAX_NAMED && names.stream().noneMatch(n -> n.contains(","));
        StringBuilder text = new StringBuilder("These figures are for the main map; ");
        text.append(byName ? list(names) : names.size() + " detached parts")
                .append(names.size() == 1 ? " is" : " are").append(" framed, each on its own equal-area projection (\u03c9 up to ")
                .append(Numbers.trim(worstOmegaDeg, worstOmegaDeg < 1 ? 2 : 1)).append("\u00b0)");
        if (otherScale.isEmpty()) {
            text.append(", at the main map's area scale, so areas compare across the whole map.");
        } else {
            text.append(". Areas compare only within a part: ").append(list(otherScale)).append(" the main map's area scale");
            if (!sameScale.isEmpty()) {
                text.append("; ").append(list(sameScale)).append(sameScale.size() == 1 ? " is" : " are").append(" at the main map's");
            }
            text.append('.');
        }
        return text.toString();
    }

    private static String list(List<String> items) {
        if (items.size() <= 1) {
            return String.join("", items);
        }
        return String.join(", ", items.subList(0, items.size() - 1)) + " and " + items.get(items.size() - 1);
    }
}
