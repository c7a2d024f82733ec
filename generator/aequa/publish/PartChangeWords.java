package aequa.publish;

import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;

import aequa.projection.ProjectionFamily;
import aequa.wording.NumberWriter;
import aequa.wording.ProjectionWords;
import aequa.wording.Wording;

/**
 * The changes page's sentences about a composite map's parts, in the reader's language, from the {@code parts}
 * entries of report.json's {@code changes} ({@link EditionChanges}): a part added or removed, or what changed in
 * a kept part (its projection family, else the parameters that moved, its largest angular distortion, its
 * number of regions, its area scale). A sentence that an older edition's report wrote as text is shown as
 * it was written.
 */
final class PartChangeWords {

    private PartChangeWords() {
    }

    static List<String> sentences(JsonNode partChanges, Wording w) {
        List<String> out = new ArrayList<>();
        for (JsonNode change : partChanges) {
            if (change.isTextual()) {
                out.add(change.asText());
                continue;
            }
            String name = change.path("name").asText();
            switch (change.path("change").asText()) {
                case "added" -> out.add(w.text("changes.partAdded", "name", name));
                case "removed" -> out.add(w.text("changes.partRemoved", "name", name));
                default -> out.add(w.text("changes.partChanged", "name", name, "changes", w.list(clauses(change, w))));
            }
        }
        return out;
    }

    private static List<String> clauses(JsonNode change, Wording w) {
        NumberWriter numbers = w.numbers();
        List<String> clauses = new ArrayList<>();
        JsonNode family = change.path("family");
        if (family.isObject()) {
            clauses.add(w.text("changes.partFamily", "from", familyName(family.path("from").asText(), w),
                    "to", familyName(family.path("to").asText(), w)));
        } else if (change.path("parameters").isArray()) {
            List<String> moved = new ArrayList<>();
            for (JsonNode p : change.path("parameters")) {
                moved.add(w.text("parameter.value", "name", ProjectionWords.parameter(p.path("name").asText(), w),
                        "value", value(p.path("from"), p.path("unit").asText(), numbers) + " → "
                                + value(p.path("to"), p.path("unit").asText(), numbers)));
            }
            clauses.add(w.text("changes.partParameters", "family", familyName(family.asText(), w), "parameters", w.unitList(moved)));
        }
        JsonNode omega = change.path("omegaMaxDeg");
        if (omega.isObject()) {
            clauses.add(w.text("changes.partOmega", "from", numbers.degrees(omega.path("from").asDouble(), 2),
                    "to", numbers.degrees(omega.path("to").asDouble(), 2)));
        }
        JsonNode regions = change.path("regions");
        if (regions.isObject()) {
            clauses.add(w.text("changes.partRegions", "count", regions.path("to").asInt(),
                    "before", numbers.integer(regions.path("from").asLong())));
        }
        JsonNode scale = change.path("areaScale");
        if (scale.isObject()) {
            clauses.add(w.text("changes.partScale", "from", numbers.significant(scale.path("from").asDouble()),
                    "to", numbers.significant(scale.path("to").asDouble())));
        }
        return clauses;
    }

    private static String familyName(String configName, Wording w) {
        return ProjectionFamily.fromConfigName(configName).map(f -> ProjectionWords.family(f, w)).orElse(configName);
    }

    /** A parameter's value as the caption writes it: angles with at most 4 decimals, other values with their unit. */
    private static String value(JsonNode value, String unit, NumberWriter numbers) {
        if (!value.isNumber()) {
            return NumberWriter.NOT_A_NUMBER;
        }
        return "deg".equals(unit) ? numbers.degrees(value.asDouble(), 4) : numbers.significant(value.asDouble()) + " " + unit;
    }
}
