package aequa.publish;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;
import aequa.atlas.MapPart;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.findings.Finding;
import aequa.project.ConfigWord;
import aequa.projection.DistortionSpread;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionParameter;

/**
 * {@value #FILE_NAME} at the output root: the machine-readable account of a publish.
 *
 * <p>Layout (keys in this order, always): {@code format}, {@code site}, {@code editionDigest} (SHA-256 of
 * the {@code maps} section, so scripts and the next publish can tell whether the figures changed; {@code site}
 * lists the {@code languages} published, first at the root),
 * {@code maps}, {@code findings} (at most {@value #FINDINGS_PER_KIND} of each code, then one entry per code
 * with the number {@code omitted}), {@code changes}. Per map: id, title, unit, asOf, periods, source, files,
 * projection (family, name, parameters, wkt2, omegaMaxDeg, omegaMeanDeg, worst point and where it is in words,
 * omegaAreaShares below 1, 5 and 10 deg, omegaP95Deg, reason, runnersUp),
 * areaAudit (maxRelativeError, worstKey, tolerance, passed), classification (method, breaks = the class
 * limits, counts), colours, notices and regions. Per region: key, name, geodesicAreaKm2, mapAreaRatio, drawn
 * (false when simplification left no shape to draw), the
 * latest period's period, status, value, normalisedValue, class, unreliable and marginOfError, then the
 * same for every period under {@code periods}. Classes count from 1 (the lowest), as on the pages;
 * {@code class} is null when there is nothing to classify. NaN is written as null.
 *
 * <p>Deterministic: no time stamps or timings, fixed key order, compact with one final '\n', numbers by Jackson's
 * shortest round-trip form of each double.
 */
final class SiteReport {

    static final String FILE_NAME = "report.json";
    static final int FORMAT = 1;
    /** Findings of one code written in full; our choice, well past what anyone reads one by one. */
    static final int FINDINGS_PER_KIND = 100;

    private SiteReport() {
    }

    /**
     * Jackson set up for byte-stable output. Compact (no indentation): a report of 15,000 regions is about
     * a third of the size and written several times faster; use a JSON viewer or {@code jq} to read it.
     */
    static ObjectMapper jsonMapper() {
        return new ObjectMapper();
    }

    /** The previous edition's report, if the output folder has a readable one. */
    static Optional<JsonNode> readPrevious(Path outDir, ObjectMapper json) {
        Path file = outDir.resolve(FILE_NAME);
        if (!Files.isRegularFile(file)) {
            return Optional.empty();
        }
        try {
            JsonNode node = json.readTree(file.toFile());
            return node != null && node.path("maps").isArray() ? Optional.of(node) : Optional.empty();
        } catch (IOException unreadable) {
            return Optional.empty(); // then this edition is compared with nothing, and says so
        }
    }

    static ArrayNode maps(Atlas atlas, List<MapFiles> files, ObjectMapper json) {
        ArrayNode maps = json.createArrayNode();
        for (int i = 0; i < atlas.maps().size(); i++) {
            maps.add(map(atlas.maps().get(i), files.get(i), json));
        }
        return maps;
    }

    static byte[] write(Atlas atlas, ArrayNode maps, String digest, List<Finding> findings, JsonNode changes,
                        ObjectMapper json) throws IOException {
        ObjectNode root = json.createObjectNode();
        root.put("format", FORMAT);
        ObjectNode site = root.putObject("site");
        site.put("title", atlas.project().site().title());
        site.put("publisher", atlas.project().site().publisher());
        site.put("notice", atlas.project().site().notice());
        // the languages published: the first at the root, each other in the folder named by its tag
        ArrayNode languages = site.putArray("languages");
        atlas.wordings().forEach(w -> languages.add(w.language().tag()));
        root.put("editionDigest", digest);
        root.set("maps", maps);
        writeFindings(root.putArray("findings"), findings);
        root.set("changes", changes);
        byte[] body = json.writeValueAsBytes(root);
        byte[] file = java.util.Arrays.copyOf(body, body.length + 1);
        file[body.length] = '\n';
        return file;
    }

    /**
     * The findings in order, at most {@value #FINDINGS_PER_KIND} of each code; for each code with more, a
     * last entry of that code and severity whose {@code omitted} says how many were left out (a million
     * unmatched keys would otherwise make a report of hundreds of megabytes). {@code aequa audit} lists all.
     */
    private static void writeFindings(ArrayNode found, List<Finding> findings) {
        Map<String, Integer> seen = new LinkedHashMap<>();
        Map<String, Finding> firstOmitted = new LinkedHashMap<>();
        for (Finding f : findings) {
            int count = seen.merge(f.code(), 1, Integer::sum);
            if (count <= FINDINGS_PER_KIND) {
                found.addObject().put("severity", f.severity().name().toLowerCase(Locale.ROOT)).put("code", f.code())
                        .put("file", f.file()).put("place", f.place()).put("message", f.message()).put("hint", f.hint());
            } else {
                firstOmitted.putIfAbsent(f.code(), f);
            }
        }
        firstOmitted.forEach((code, f) -> {
            int omitted = seen.get(code) - FINDINGS_PER_KIND;
            found.addObject().put("severity", f.severity().name().toLowerCase(Locale.ROOT)).put("code", code)
                    .put("file", f.file()).put("place", "")
                    .put("message", String.format(Locale.ROOT, "%,d more findings of this kind are not listed here.", omitted))
                    .put("hint", "Run aequa audit to list every one.").put("omitted", omitted);
        });
    }

    private static ObjectNode map(MapModel map, MapFiles files, ObjectMapper json) {
        ObjectNode node = json.createObjectNode();
        node.put("id", map.id());
        node.put("title", map.spec().title());
        node.put("unit", map.spec().unit());
        node.put("asOf", map.spec().asOf());
        map.periods().forEach(node.putArray("periods")::add);
        node.put("source", map.spec().source());
        ObjectNode links = node.putObject("files");
        links.put("page", files.page()).put("figures", files.figures()).put("printSvg", files.printSvg()).put("pdf", files.pdf())
                .put("webSvg", files.webSvg()).put("png", files.png()).put("pngDouble", files.pngDouble()).put("csv", files.csv())
                .put("embed", files.embed()).put("fragment", files.fragment());
        node.set("projection", projection(map.projection(), json));
        ObjectNode audit = node.putObject("areaAudit");
        number(audit, "maxRelativeError", map.areaAudit().maxRelativeError());
        audit.put("worstKey", map.areaAudit().worstKey());
        number(audit, "tolerance", map.areaAudit().tolerance());
        audit.put("passed", map.areaAudit().passed());
        ObjectNode classes = node.putObject("classification");
        classes.put("method", map.classification().method().configName());
        map.classification().limits().forEach(classes.putArray("breaks")::add);
        map.classification().counts().forEach(classes.putArray("counts")::add);
        ObjectNode colours = node.putObject("colours");
        colours.put("scheme", map.ramp().scheme().configName());
        map.ramp().fills().forEach(fill -> colours.withArray("fills").add(fill.hex()));
        colours.put("checksPassed", map.ramp().passes());
        map.notices().forEach(node.putArray("notices")::add);
        ArrayNode parts = node.putArray("parts");
        for (MapPart part : map.parts()) {
            parts.add(part(part, json));
        }
        ArrayNode regions = node.putArray("regions");
        for (MapRegion region : map.regions()) {
            regions.add(region(region, map.periods(), json));
        }
        return node;
    }

    static ObjectNode projection(ProjectionChoice choice, ObjectMapper json) {
        ObjectNode node = json.createObjectNode();
        node.put("family", choice.projection().family().configName());
        node.put("name", choice.projection().family().displayName());
        ArrayNode parameters = node.putArray("parameters");
        for (ProjectionParameter p : choice.projection().parameters()) {
            ObjectNode param = parameters.addObject().put("name", p.name()).put("key", p.key());
            number(param, "value", p.value());
            param.put("unit", p.unit());
        }
        node.put("wkt2", choice.projection().wkt2());
        node.put("projString", choice.projection().projString());
        number(node, "omegaMaxDeg", choice.omegaMaxDeg());
        number(node, "omegaMeanDeg", choice.omegaMeanDeg());
        ObjectNode worst = node.putObject("omegaWorstPoint");
        number(worst, "lonDeg", choice.worstLonDeg());
        number(worst, "latDeg", choice.worstLatDeg());
        DistortionSpread spread = choice.spread();
        worst.put("where", spread.worstPlace());
        ObjectNode shares = node.putObject("omegaAreaShares");
        number(shares, "below1Deg", spread.shareBelow1Deg());
        number(shares, "below5Deg", spread.shareBelow5Deg());
        number(shares, "below10Deg", spread.shareBelow10Deg());
        number(node, "omegaP95Deg", spread.omegaP95Deg());
        node.put("reason", choice.reason());
        ArrayNode runnersUp = node.putArray("runnersUp");
        for (ProjectionChoice.Candidate c : choice.runnersUp()) {
            ObjectNode cand = runnersUp.addObject().put("family", c.family().configName());
            ArrayNode cParams = cand.putArray("parameters");
            for (ProjectionParameter p : c.parameters()) {
                ObjectNode param = cParams.addObject().put("key", p.key());
                number(param, "value", p.value());
                param.put("unit", p.unit());
            }
            number(cand, "omegaMaxDeg", c.omegaMaxDeg());
            number(cand, "omegaMeanDeg", c.omegaMeanDeg());
        }
        return node;
    }

    /** One part of a composite map: its regions, projection, area scale and audit, and its frame in map metres. */
    private static ObjectNode part(MapPart part, ObjectMapper json) {
        ObjectNode node = json.createObjectNode();
        node.put("id", part.id());
        node.put("name", part.name());
        node.put("main", part.main());
        part.keys().forEach(node.putArray("regions")::add);
        number(node, "areaKm2", part.areaKm2());
        number(node, "gapKm", part.gapKm());
        number(node, "areaScale", part.areaScale());
        node.set("projection", projection(part.projection(), json));
        number(node, "omegaMaxDeg", part.projection().omegaMaxDeg());
        number(node, "omegaMeanDeg", part.projection().omegaMeanDeg());
        ObjectNode audit = node.putObject("areaAudit");
        number(audit, "maxRelativeError", part.areaAudit().maxRelativeError());
        audit.put("worstKey", part.areaAudit().worstKey());
        audit.put("passed", part.areaAudit().passed());
        ObjectNode frame = node.putObject("frameM");
        number(frame, "minX", part.frame().minXM());
        number(frame, "minY", part.frame().minYM());
        number(frame, "maxX", part.frame().maxXM());
        number(frame, "maxY", part.frame().maxYM());
        ObjectNode printFrame = node.putObject("printFrameM");
        number(printFrame, "minX", part.print().frame().minXM());
        number(printFrame, "minY", part.print().frame().minYM());
        number(printFrame, "maxX", part.print().frame().maxXM());
        number(printFrame, "maxY", part.print().frame().maxYM());
        return node;
    }

    private static ObjectNode region(MapRegion region, List<String> periods, ObjectMapper json) {
        ObjectNode node = json.createObjectNode();
        node.put("key", region.key());
        node.put("name", region.name());
        number(node, "geodesicAreaKm2", region.geodesicAreaKm2());
        number(node, "mapAreaRatio", region.mapAreaRatio());
        node.put("drawn", !region.planarM().isEmpty());
        int count = Math.min(periods.size(), region.values().size());
        if (count > 0) {
            figure(node, periods.get(count - 1), region.values().get(count - 1));
        }
        ArrayNode all = node.putArray("periods");
        for (int p = 0; p < count; p++) {
            figure(all.addObject(), periods.get(p), region.values().get(p));
        }
        return node;
    }

    private static void figure(ObjectNode node, String period, RegionValue v) {
        node.put("period", period);
        node.put("status", ConfigWord.kebab(v.status()));
        number(node, "value", v.value());
        number(node, "normalisedValue", v.normalisedValue());
        if (v.classIndex() < 0) {
            node.putNull("class");
        } else {
            node.put("class", v.classIndex() + 1);
        }
        node.put("unreliable", v.unreliable());
        number(node, "marginOfError", v.marginOfError());
    }

    private static void number(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }
}
