package aequa.publish;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * The {@code changes} section of report.json: what differs from the previous edition whose figures were
 * different, compared map by map (matched on id) from the two reports' {@code maps} sections.
 *
 * <p>Per map it lists: the date of the figures, a projection change (family or parameters), framed parts
 * added, removed or changed (projection family, parameters, largest omega, regions, area scale), class limits
 * that moved, regions whose class (in the latest period)
 * changed, regions whose figure changed within the same class ({@code valueChanged}: an edited figure must
 * show even when its colour did not), and regions added or removed. Maps
 * without change are counted, not listed. When the figures are identical to the previous edition
 * ({@code editionDigest} equal), the previous comparison is carried over unchanged, so republishing the same
 * inputs gives the same bytes and the page keeps showing what the last real update changed.
 */
final class EditionChanges {

    private EditionChanges() {
    }

    static JsonNode compare(Optional<JsonNode> previous, ArrayNode maps, String digest, ObjectMapper json) {
        if (previous.isPresent() && digest.equals(previous.get().path("editionDigest").asText())
                && previous.get().path("changes").isObject()) {
            return previous.get().get("changes").deepCopy();
        }
        ObjectNode changes = json.createObjectNode();
        if (previous.isEmpty()) {
            changes.putNull("comparedWith");
            changes.putArray("maps");
            changes.put("unchangedMaps", 0);
            return changes;
        }
        JsonNode before = previous.get();
        ObjectNode comparedWith = changes.putObject("comparedWith");
        comparedWith.put("editionDigest", before.path("editionDigest").asText());
        TreeSet<String> asOf = new TreeSet<>();
        before.path("maps").forEach(m -> asOf.add(m.path("asOf").asText()));
        asOf.forEach(comparedWith.putArray("asOf")::add);

        Map<String, JsonNode> old = byId(before.path("maps"));
        Map<String, JsonNode> now = byId(maps);
        ArrayNode listed = changes.putArray("maps");
        int unchanged = 0;
        for (Map.Entry<String, JsonNode> entry : now.entrySet()) {
            JsonNode was = old.get(entry.getKey());
            if (was == null) {
                listed.addObject().put("id", entry.getKey()).put("title", entry.getValue().path("title").asText())
                        .put("state", "added");
                continue;
            }
            ObjectNode diff = mapDiff(was, entry.getValue(), json);
            if (diff == null) {
                unchanged++;
            } else {
                listed.add(diff);
            }
        }
        for (Map.Entry<String, JsonNode> entry : old.entrySet()) {
            if (!now.containsKey(entry.getKey())) {
                listed.addObject().put("id", entry.getKey()).put("title", entry.getValue().path("title").asText())
                        .put("state", "removed");
            }
        }
        changes.put("unchangedMaps", unchanged);
        return changes;
    }

    /** The differences of one map, or null when there are none worth reporting. */
    private static ObjectNode mapDiff(JsonNode was, JsonNode now, ObjectMapper json) {
        ObjectNode diff = json.createObjectNode();
        diff.put("id", now.path("id").asText()).put("title", now.path("title").asText()).put("state", "changed");
        boolean any = false;
        if (!was.path("asOf").equals(now.path("asOf"))) {
            diff.putObject("asOf").put("from", was.path("asOf").asText()).put("to", now.path("asOf").asText());
            any = true;
        }
        JsonNode projWas = projectionKey(was.path("projection"), json);
        JsonNode projNow = projectionKey(now.path("projection"), json);
        if (!projWas.equals(projNow)) {
            ObjectNode p = diff.putObject("projection");
            p.set("from", projWas);
            p.set("to", projNow);
            any = true;
        }
        ArrayNode partChanges = partChanges(was.path("parts"), now.path("parts"), json);
        if (!partChanges.isEmpty()) {
            diff.set("parts", partChanges);
            any = true;
        }
        JsonNode breaksWas = was.path("classification").path("breaks");
        JsonNode breaksNow = now.path("classification").path("breaks");
        if (!breaksWas.equals(breaksNow)) {
            ObjectNode b = diff.putObject("breaks");
            b.set("from", breaksWas.deepCopy());
            b.set("to", breaksNow.deepCopy());
            any = true;
        }
        Map<String, JsonNode> regionsWas = byKey(was.path("regions"));
        Map<String, JsonNode> regionsNow = byKey(now.path("regions"));
        ArrayNode classChanged = diff.putArray("classChanged");
        ArrayNode valueChanged = diff.putArray("valueChanged");
        ArrayNode added = diff.putArray("regionsAdded");
        ArrayNode removed = diff.putArray("regionsRemoved");
        for (Map.Entry<String, JsonNode> r : regionsNow.entrySet()) {
            JsonNode before = regionsWas.get(r.getKey());
            if (before == null) {
                added.add(r.getKey());
            } else if (!before.path("class").equals(r.getValue().path("class"))) {
                ObjectNode c = classChanged.addObject().put("key", r.getKey()).put("name", r.getValue().path("name").asText());
                c.set("from", before.path("class").deepCopy());
                c.set("to", r.getValue().path("class").deepCopy());
            } else if (!before.path("normalisedValue").equals(r.getValue().path("normalisedValue"))) {
                ObjectNode c = valueChanged.addObject().put("key", r.getKey()).put("name", r.getValue().path("name").asText());
                c.set("from", before.path("normalisedValue").deepCopy());
                c.set("to", r.getValue().path("normalisedValue").deepCopy());
            }
        }
        regionsWas.keySet().stream().filter(k -> !regionsNow.containsKey(k)).forEach(removed::add);
        any |= classChanged.size() + valueChanged.size() + added.size() + removed.size() > 0;
        return any ? diff : null;
    }

    /** Below this difference (degrees) a part's largest omega counts as unchanged: the pages show it to 0.01 deg. */
    private static final double OMEGA_STEP_DEG = 0.005;

    /**
     * The parts added, removed or changed, matched by name (a map that gained or lost its parts altogether shows
     * as parts added or removed). A changed part says what changed, each as {@code from} and {@code to}:
     * {@code family} (the projection family's configuration name); else {@code parameters} (each parameter whose
     * value moved, by key and EPSG name, with its unit); {@code omegaMaxDeg} when its largest angular distortion
     * moved by {@value #OMEGA_STEP_DEG} deg or more; {@code regions} (their count) when its regions differ;
     * {@code areaScale}. The pages word these in the reader's language.
     */
    private static ArrayNode partChanges(JsonNode was, JsonNode now, ObjectMapper json) {
        Map<String, JsonNode> before = new LinkedHashMap<>();
        was.forEach(p -> before.put(p.path("name").asText(), p));
        Map<String, JsonNode> after = new LinkedHashMap<>();
        now.forEach(p -> after.put(p.path("name").asText(), p));
        ArrayNode changes = json.createArrayNode();
        for (Map.Entry<String, JsonNode> e : after.entrySet()) {
            JsonNode old = before.get(e.getKey());
            if (old == null) {
                changes.addObject().put("name", e.getKey()).put("change", "added");
                continue;
            }
            ObjectNode change = partChange(e.getKey(), old, e.getValue(), json);
            if (change != null) {
                changes.add(change);
            }
        }
        before.keySet().stream().filter(name -> !after.containsKey(name))
                .forEach(name -> changes.addObject().put("name", name).put("change", "removed"));
        return changes;
    }

    /** What changed in one part kept from the previous edition, or null when nothing did. */
    private static ObjectNode partChange(String name, JsonNode old, JsonNode part, ObjectMapper json) {
        ObjectNode change = json.createObjectNode().put("name", name).put("change", "changed");
        JsonNode projOld = old.path("projection");
        JsonNode projNow = part.path("projection");
        boolean any = false;
        if (!projOld.path("family").equals(projNow.path("family"))) {
            fromTo(change, "family", projOld.path("family"), projNow.path("family"));
            any = true;
        } else {
            ArrayNode moved = json.createArrayNode();
            Map<String, JsonNode> oldParameters = new LinkedHashMap<>();
            projOld.path("parameters").forEach(p -> oldParameters.put(p.path("key").asText(), p));
            for (JsonNode p : projNow.path("parameters")) {
                JsonNode o = oldParameters.get(p.path("key").asText());
                if (o == null || !o.path("value").equals(p.path("value"))) {
                    ObjectNode m = moved.addObject().put("key", p.path("key").asText()).put("name", p.path("name").asText())
                            .put("unit", p.path("unit").asText());
                    m.set("from", o == null ? json.nullNode() : o.path("value").deepCopy());
                    m.set("to", p.path("value").deepCopy());
                }
            }
            if (!moved.isEmpty()) {
                change.put("family", projNow.path("family").asText());
                change.set("parameters", moved);
                any = true;
            }
        }
        double omegaOld = old.path("omegaMaxDeg").asDouble(Double.NaN);
        double omegaNow = part.path("omegaMaxDeg").asDouble(Double.NaN);
        if (Math.abs(omegaNow - omegaOld) >= OMEGA_STEP_DEG) {
            fromTo(change, "omegaMaxDeg", old.path("omegaMaxDeg"), part.path("omegaMaxDeg"));
            any = true;
        }
        if (!old.path("regions").equals(part.path("regions"))) {
            change.putObject("regions").put("from", old.path("regions").size()).put("to", part.path("regions").size());
            any = true;
        }
        if (!old.path("areaScale").equals(part.path("areaScale"))) {
            fromTo(change, "areaScale", old.path("areaScale"), part.path("areaScale"));
            any = true;
        }
        return any ? change : null;
    }

    private static void fromTo(ObjectNode change, String field, JsonNode from, JsonNode to) {
        ObjectNode pair = change.putObject(field);
        pair.set("from", from.deepCopy());
        pair.set("to", to.deepCopy());
    }

    private static JsonNode projectionKey(JsonNode projection, ObjectMapper json) {
        ObjectNode key = json.createObjectNode();
        key.put("family", projection.path("family").asText());
        ArrayNode params = key.putArray("parameters");
        projection.path("parameters").forEach(p -> params.addObject().put("key", p.path("key").asText())
                .set("value", p.path("value").deepCopy()));
        return key;
    }

    private static Map<String, JsonNode> byId(JsonNode maps) {
        Map<String, JsonNode> out = new LinkedHashMap<>();
        maps.forEach(m -> out.put(m.path("id").asText(), m));
        return out;
    }

    private static Map<String, JsonNode> byKey(JsonNode regions) {
        Map<String, JsonNode> out = new LinkedHashMap<>();
        regions.forEach(r -> out.put(r.path("key").asText(), r));
        return out;
    }
}
