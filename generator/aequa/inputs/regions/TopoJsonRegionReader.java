package aequa.inputs.regions;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.RegionSourceSpec;

/**
 * Reads the regions of one object of a TopoJSON topology (TopoJSON Format Specification 1.0): the object named
 * by {@code object} (section 2.1.5 "objects"; the only one when the topology holds one), a GeometryCollection of
 * Polygon and MultiPolygon geometries (sections 2.2.4 and 2.2.5) or one such geometry. Arcs may be quantised
 * and delta-encoded ({@link TopologyArcs}). The key is a property, or the geometry's {@code id} for
 * {@value RegionSourceSpec#FEATURE_ID}; numbers are keys as written. Coordinates are taken as WGS 84 lon/lat, as
 * the specification's default (section 2.1.1 refers to GeoJSON's). The specification prescribes no winding
 * (topologies made from Shapefiles run outer rings clockwise), so rings are wound as RFC 7946 wants here
 * ({@link RingWinding}) rather than reported one by one by the validator.
 *
 * <p>The whole topology is parsed into a tree (a TopoJSON file is several times smaller than the GeoJSON of the
 * same regions, and arcs are referenced from anywhere, so it cannot be streamed feature by feature).
 */
final class TopoJsonRegionReader {

    private static final ObjectMapper JSON = new ObjectMapper();

    private final String file;
    private final RegionSourceSpec spec;
    private final Findings findings;

    TopoJsonRegionReader(String file, RegionSourceSpec spec, Findings findings) {
        this.file = file;
        this.spec = spec;
        this.findings = findings;
    }

    RegionReaders.RegionSource read(InputStream in) throws IOException {
        JsonNode topology;
        try {
            topology = JSON.readTree(in);
        } catch (JsonProcessingException e) {
            String place = e.getLocation() == null ? "" : "line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr();
            findings.add(Finding.error("topojson-malformed", file, place, "The file is not valid JSON: " + e.getOriginalMessage() + ".",
                    "Write the topology again with a TopoJSON writer."));
            return RegionReaders.RegionSource.of(List.of());
        }
        if (topology == null || !"Topology".equals(topology.path("type").asText())) {
            findings.add(Finding.error("topojson-not-topology", file, "",
                    "The file is not a TopoJSON topology (its \"type\" is not \"Topology\").",
                    "Give a TopoJSON file, or a GeoJSON file without 'object' in the project file."));
            return RegionReaders.RegionSource.of(List.of());
        }
        Optional<TopologyArcs> arcs = TopologyArcs.decode(topology.path("arcs"), topology.get("transform"));
        if (arcs.isEmpty()) {
            findings.add(Finding.error("topojson-malformed", file, "arcs",
                    "The topology's arcs or transform are malformed (arcs must be arrays of number pairs; a transform has a scale and a translate pair).",
                    "Write the topology again with a TopoJSON writer."));
            return RegionReaders.RegionSource.of(List.of());
        }
        JsonNode objects = topology.path("objects");
        List<String> names = new ArrayList<>();
        objects.fieldNames().forEachRemaining(names::add);
        String name = spec.object().isEmpty() && names.size() == 1 ? names.get(0) : spec.object();
        if (!objects.has(name)) {
            findings.add(Finding.error("topojson-object-missing", file, name.isEmpty() ? "" : "object \"" + name + "\"",
                    (name.isEmpty() ? "The topology holds several objects and none was named"
                            : "The topology has no object \"" + name + "\"") + "; its objects are " + names + ".",
                    "Set 'object' in the project file to one of these names."));
            return RegionReaders.RegionSource.of(List.of());
        }
        JsonNode object = objects.get(name);
        List<JsonNode> geometries = new ArrayList<>();
        if ("GeometryCollection".equals(object.path("type").asText())) {
            object.path("geometries").forEach(geometries::add);
        } else {
            geometries.add(object);
        }
        RingAssembler assembler = new RingAssembler(file, findings);
        List<Region> regions = new ArrayList<>(geometries.size());
        for (int g = 0; g < geometries.size(); g++) {
            region(geometries.get(g), g + 1, arcs.get(), assembler).ifPresent(regions::add);
            arcs.get().finishRegion();
        }
        return new RegionReaders.RegionSource(regions, arcs.get().usedAsCleanBorders());
    }

    private Optional<Region> region(JsonNode geometry, int number, TopologyArcs arcs, RingAssembler assembler) {
        JsonNode keyNode = RegionSourceSpec.FEATURE_ID.equals(spec.key()) ? geometry.path("id") : geometry.path("properties").path(spec.key());
        String place = "object \"" + (spec.object().isEmpty() ? "" : spec.object()) + "\", geometry " + number;
        if (!keyNode.isTextual() && !keyNode.isNumber()) {
            findings.add(Finding.error("region-key-missing", file, place,
                    "Its key (" + (RegionSourceSpec.FEATURE_ID.equals(spec.key()) ? "the id" : "property \"" + spec.key() + "\"")
                            + ") is missing or not text or a number, so the geometry was skipped.",
                    "Give every geometry a key, or name another key property in the project file."));
            return Optional.empty();
        }
        String key = keyNode.asText();
        String featurePlace = "feature \"" + key + "\"";
        JsonNode nameNode = spec.name().isEmpty() ? null : geometry.path("properties").path(spec.name());
        String name = nameNode != null && (nameNode.isTextual() || nameNode.isNumber()) ? nameNode.asText() : null;
        String type = geometry.path("type").asText("");
        List<JsonNode> polygons = new ArrayList<>();
        if ("Polygon".equals(type)) {
            polygons.add(geometry.path("arcs"));
        } else if ("MultiPolygon".equals(type)) {
            geometry.path("arcs").forEach(polygons::add);
        } else if (!geometry.path("type").isNull()) {
            findings.add(Finding.warning("geometry-unsupported", file, featurePlace,
                    "Its geometry is a " + type + "; aequa maps only Polygon and MultiPolygon regions, so it was skipped.",
                    "Convert points and lines to the areas they stand for, or leave them out of the object."));
            return Optional.empty();
        }
        List<List<DoubleList>> rings = new ArrayList<>(polygons.size());
        for (JsonNode polygon : polygons) {
            List<DoubleList> polygonRings = new ArrayList<>(polygon.size());
            for (JsonNode ringIndexes : polygon) {
                Optional<DoubleList> ring = ringIndexes.isArray() ? arcs.ring(ringIndexes) : Optional.empty();
                if (ring.isEmpty()) {
                    findings.add(Finding.error("topojson-malformed", file, featurePlace,
                            "A ring names an arc the topology does not have, so the geometry was skipped.",
                            "Write the topology again with a TopoJSON writer."));
                    return Optional.empty();
                }
                polygonRings.add(polygonRings.isEmpty() ? RingWinding.wound(ring.get(), true) : RingWinding.wound(ring.get(), false));
            }
            rings.add(polygonRings);
        }
        java.util.Map<String, String> attributes = new java.util.HashMap<>();
        geometry.path("properties").fields().forEachRemaining(p -> {
            if ((p.getValue().isTextual() || p.getValue().isNumber()) && !p.getKey().equals(spec.key()) && !p.getKey().equals(spec.name())) {
                Region.keep(attributes, p.getKey(), p.getValue().asText());
            }
        });
        return Optional.of(new Region(key, name, assembler.assemble(rings, featurePlace), attributes));
    }
}
