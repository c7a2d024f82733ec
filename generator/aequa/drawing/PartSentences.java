package aequa.drawing;

import java.util.ArrayList;
import java.util.List;

import aequa.atlas.MapModel;
import aequa.atlas.MapPart;
import aequa.wording.Wording;

/**
 * What a caption says about a composite map's parts: that the projection stated first is the main map's,
 * which parts are framed, that each has its own equal-area projection, and whether their areas compare with
 * the main map's. A map whose parts differ in area scale is never called equal-area without saying so. The
 * drawing's caption also gives the parts' largest omega ({@link #parts}); the web page's caption, which states
 * no distortion, does not ({@link #forPage}).
 */
public final class PartSentences {

    /** Most framed parts the caption names one by one. */
    private static final int MAX_NAMED = 3;

    private PartSentences() {
    }

    /** The drawing's sentence, after its distortion sentence: the parts' largest omega included. */
    static String parts(MapModel model, Wording w) {
        return sentence(model, w, true);
    }

    /** The web page caption's sentence, after its projection sentence. */
    public static String forPage(MapModel model, Wording w) {
        return sentence(model, w, false);
    }

    private static String sentence(MapModel model, Wording w, boolean withOmega) {
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
                otherScale.add(w.text("draw.partAtScale", "name", part.name(), "scale", part.areaScaleText(w.numbers())));
            }
        }
        List<String> names = model.parts().stream().filter(p -> !p.main()).map(MapPart::name).toList();
        // a few short names read well in a sentence; descriptive default names ("29 regions, 820 km north-west") do not
        boolean byName = names.size() <= MAX_NAMED && names.stream().noneMatch(n -> n.contains(","));
        String parts = byName ? w.list(names) : w.text("draw.detachedParts", "count", names.size());
        String framed = withOmega ? w.text("draw.partsFramed", "count", names.size(), "parts", parts,
                "max", w.numbers().degrees(worstOmegaDeg, worstOmegaDeg < 1 ? 2 : 1))
                : w.text("caption.partsFramed", "count", names.size(), "parts", parts);
        if (otherScale.isEmpty()) {
            return w.text("draw.partsSameScale", "framed", framed);
        }
        if (sameScale.isEmpty()) {
            return w.text("draw.partsOtherScale", "framed", framed, "others", w.list(otherScale));
        }
        return w.text("draw.partsMixedScale", "framed", framed, "others", w.list(otherScale),
                "same", w.list(sameScale), "count", sameScale.size());
    }
}
