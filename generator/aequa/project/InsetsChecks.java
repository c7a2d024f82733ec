package aequa.project;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Checks an {@code insets} setting for what the project file alone can tell: the word, each listed part's
 * corner, scale and box, and a region key listed in two parts. Whether a listed part holds any region is
 * checked against the regions themselves, when the map is built.
 */
final class InsetsChecks {

    /** Where a finding goes: code, JSON Pointer of the value, message, hint. */
    interface Reporter {
        void error(String code, String pointer, String message, String hint);
    }

    static final List<String> CORNERS = List.of("top-left", "top-right", "bottom-left", "bottom-right");

    /** Largest and smallest area scale a part may ask for: beyond them a part is no longer comparable at all. */
    static final double MAX_SCALE = 16;
    static final double MIN_SCALE = 1.0 / 256;

    private InsetsChecks() {
    }

    static void check(String at, InsetsSpec insets, Reporter report) {
        if (!insets.listed()) {
            if (!insets.word().equals("auto") && !insets.off()) {
                report.error("project-unknown-value", at, "'" + insets.word() + "' is not a known value for 'insets'.",
                        "Use 'auto' (the default), 'off', or a list of parts such as [{ name: Islands, regions: [A1, A2] }].");
            }
            return;
        }
        if (insets.parts().isEmpty()) {
            report.error("insets-empty-list", at, "'insets' is an empty list.",
                    "List at least one part, or write 'insets: off' for one projection or 'insets: auto'.");
        }
        Map<String, Integer> partOfKey = new HashMap<>();
        for (int i = 0; i < insets.parts().size(); i++) {
            InsetsSpec.InsetPartSpec part = insets.parts().get(i);
            String partAt = at + "/" + i;
            if (part.regions().isEmpty() && part.box().isEmpty()) {
                report.error("insets-empty-part", partAt, "Inset part " + (i + 1) + " names no regions and no box.",
                        "Give the part 'regions: [KEY, ...]' or 'box: [west, south, east, north]' in degrees.");
            }
            if (!part.corner().isEmpty() && !CORNERS.contains(part.corner())) {
                report.error("project-unknown-value", partAt + "/corner", "'" + part.corner() + "' is not a known corner.",
                        "Use one of: " + String.join(", ", CORNERS) + ".");
            }
            if (!(part.scale() >= MIN_SCALE && part.scale() <= MAX_SCALE)) {
                report.error("project-bad-value", partAt + "/scale",
                        "The scale of inset part " + (i + 1) + " must be between 1/256 and 16.",
                        "1 (the default) draws the part's areas at the main map's scale; 0.25 draws them at a quarter.");
            }
            checkBox(partAt + "/box", part.box(), i, report);
            for (int k = 0; k < part.regions().size(); k++) {
                Integer other = partOfKey.putIfAbsent(part.regions().get(k), i);
                if (other != null) {
                    report.error("insets-key-twice", partAt + "/regions/" + k,
                            "The region '" + part.regions().get(k) + "' is listed in inset part " + (other + 1)
                                    + (other == i ? " twice." : " and in part " + (i + 1) + "."),
                            "A region belongs to one part only; remove it from all but one.");
                }
            }
        }
    }

    private static void checkBox(String at, List<Double> box, int part, Reporter report) {
        if (box.isEmpty()) {
            return;
        }
        boolean valid = box.size() == 4
                && box.get(0) >= -180 && box.get(0) <= 180 && box.get(2) >= -180 && box.get(2) <= 180
                && box.get(1) >= -90 && box.get(3) <= 90 && box.get(1) < box.get(3);
        if (!valid) {
            report.error("project-bad-value", at, "The box of inset part " + (part + 1) + " is not [west, south, east, north].",
                    "Four numbers in degrees, south below north, for example [-161, 18, -154, 23].");
        }
    }
}
