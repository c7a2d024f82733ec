package aequa.inputs.regions;

import java.io.CharConversionException;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.core.exc.StreamReadException;

import aequa.findings.Excerpt;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.RegionSourceSpec;

/**
 * Reads the regions of a GeoJSON file (RFC 7946) as a stream of tokens, so the heap holds the regions
 * (16 bytes per vertex) but never a tree of the whole document. Accepts a FeatureCollection (section 3.3)
 * or a single Feature (section 3.2) whose geometries are Polygon (3.1.6), MultiPolygon (3.1.7) or null.
 * Members may come in any order, as JSON objects are unordered.
 *
 * <p>Every problem becomes a finding naming the feature (its key, or its position in the file when it has
 * none): a feature without a usable key or with an unsupported geometry type is skipped; malformed JSON
 * stops the read at the reported line and column and keeps the features read so far. The file is held to
 * its {@link ReadLimit}s: a feature with too many properties or too long a ring is skipped with a finding;
 * too deep nesting, too long a text or too many vertices in all stop the read with one.
 */
final class GeoJsonRegionReader {

    /**
     * Jackson's fast double parser (StreamReadFeature.USE_FAST_DOUBLE_PARSER): measured about 3 times faster
     * than the default on coordinate-heavy GeoJSON with Jackson 2.23 when this reader was written; nesting and
     * text length bounded by {@link ReadLimit}, read when the reader is made.
     */
    private final JsonFactory json = JsonFactory.builder()
            .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
            .streamReadConstraints(StreamReadConstraints.builder()
                    .maxNestingDepth(ReadLimit.NESTING_DEPTH.intValue())
                    .maxStringLength(ReadLimit.STRING_CHARS.intValue())
                    .maxNameLength(ReadLimit.STRING_CHARS.intValue())
                    .build())
            .build();

    private final String file;
    private final RegionSourceSpec spec;
    private final Findings findings;
    private final RingAssembler rings;
    private final List<Region> regions = new ArrayList<>();
    private final DoubleList ringScratch = new DoubleList(256);
    private final VertexBudget budget = new VertexBudget();
    private int featureCount;

    GeoJsonRegionReader(String file, RegionSourceSpec spec, Findings findings) {
        this.file = file;
        this.spec = spec;
        this.findings = findings;
        this.rings = new RingAssembler(file, findings);
    }

    List<Region> read(InputStream in) {
        try (JsonParser parser = json.createParser(in)) {
            readDocument(parser);
        } catch (StreamConstraintsException e) {
            findings.add(constraintFinding(e));
        } catch (LimitExceeded e) {
            findings.add(e.limit().finding(file, "feature " + (featureCount + 1), "reading stopped there"));
        } catch (StreamReadException e) {
            findings.add(Finding.error("geojson-malformed", file, location(e),
                    "The file is not valid JSON: " + Excerpt.quotedParts(e.getOriginalMessage().split("\n", 2)[0]) + ".",
                    "Check the file where shown; it may be truncated or hand-edited."));
        } catch (CharConversionException e) {
            findings.add(Finding.error("file-unreadable", file, "feature " + (featureCount + 1),
                    "The file's bytes are not Unicode text in the encoding its first bytes announce: " + e.getMessage() + ".",
                    "Save the file again as UTF-8 text (RFC 8259, section 8.1: JSON exchanged between systems is UTF-8)."));
        } catch (IOException e) {
            findings.add(Finding.error("file-unreadable", file, "", "The file could not be read: " + e.getMessage() + ".",
                    "Check that the file exists and is readable."));
        }
        return regions;
    }

    /** Which of Jackson's constraints the file broke, as a finding naming aequa's limit where it has one. */
    private Finding constraintFinding(StreamConstraintsException e) {
        String message = String.valueOf(e.getOriginalMessage());
        String place = "feature " + (featureCount + 1) + (e.getLocation() == null ? "" : ", " + location(e));
        if (message.contains("nesting depth")) {
            return ReadLimit.NESTING_DEPTH.finding(file, place, "reading stopped there");
        }
        if (message.contains("String value length") || message.contains("Name length")) {
            return ReadLimit.STRING_CHARS.finding(file, place, "reading stopped there");
        }
        return Finding.error("geojson-malformed", file, place, "The file goes beyond what its JSON parser reads: "
                + message.split("\n", 2)[0] + ".", "Check the file where shown; numbers of a thousand digits are not geography.");
    }

    private void readDocument(JsonParser parser) throws IOException, LimitExceeded {
        if (parser.nextToken() != JsonToken.START_OBJECT) {
            findings.add(Finding.error("geojson-not-features", file, "line 1",
                    "The file is not a GeoJSON object.", "Give a FeatureCollection (RFC 7946, section 3.3)."));
            return;
        }
        FeatureState top = new FeatureState(parser);
        String type = null;
        while (parser.nextToken() == JsonToken.FIELD_NAME) {
            String field = parser.currentName();
            JsonToken value = parser.nextToken();
            if ("type".equals(field) && value == JsonToken.VALUE_STRING) {
                type = parser.getText();
            } else if ("features".equals(field) && value == JsonToken.START_ARRAY) {
                while (parser.nextToken() == JsonToken.START_OBJECT) {
                    FeatureState feature = new FeatureState(parser);
                    while (parser.nextToken() == JsonToken.FIELD_NAME) {
                        String name = parser.currentName();
                        parser.nextToken();
                        readFeatureMember(parser, feature, name);
                    }
                    finish(feature);
                }
            } else if ("crs".equals(field)) {
                checkLegacyCrs(parser);
            } else {
                readFeatureMember(parser, top, field);
            }
        }
        if ("Feature".equals(type)) {
            finish(top);
        } else if (!"FeatureCollection".equals(type)) {
            findings.add(Finding.error("geojson-not-features", file, "",
                    "The top-level object has type " + (type == null ? "(none)" : "\"" + type + "\"")
                            + "; aequa reads a FeatureCollection or a Feature.",
                    "Wrap the geometries in features with properties that hold each region's key (RFC 7946, section 3.3)."));
        }
    }

    private void readFeatureMember(JsonParser parser, FeatureState feature, String name) throws IOException, LimitExceeded {
        JsonToken value = parser.currentToken();
        switch (name) {
            case "id":
                if (value == JsonToken.VALUE_STRING || value.isNumeric()) {
                    feature.id = parser.getText();
                } else {
                    parser.skipChildren();
                }
                break;
            case "properties":
                if (value == JsonToken.START_OBJECT) {
                    readProperties(parser, feature);
                } else if (value != JsonToken.VALUE_NULL) {
                    feature.problem("geojson-wrong-type", "its properties member is " + GeoJsonCoordinates.describe(value) + ", not an object");
                    parser.skipChildren();
                }
                break;
            case "geometry":
                if (value == JsonToken.START_OBJECT) {
                    readGeometry(parser, feature);
                } else if (value != JsonToken.VALUE_NULL) {
                    feature.problem("geojson-wrong-type", "its geometry is " + GeoJsonCoordinates.describe(value) + ", not an object or null");
                    parser.skipChildren();
                }
                break;
            default:
                parser.skipChildren();
        }
    }

    private void readProperties(JsonParser parser, FeatureState feature) throws IOException {
        long maxProperties = ReadLimit.PROPERTIES.value();
        long count = 0;
        while (parser.nextToken() == JsonToken.FIELD_NAME) {
            String name = parser.currentName();
            JsonToken value = parser.nextToken();
            if (++count > maxProperties && !feature.unusable) {
                feature.limit = ReadLimit.PROPERTIES;
                feature.unusable = true;
            }
            boolean isKey = name.equals(spec.key());
            boolean isName = name.equals(spec.name());
            boolean scalar = value == JsonToken.VALUE_STRING || value.isNumeric();
            if (scalar && !isKey && !isName) {
                Region.keep(feature.attributes, name, parser.getText());
            }
            if ((isKey || isName) && scalar) {
                if (isKey) {
                    feature.keyProperty = parser.getText();
                }
                if (isName) {
                    feature.name = parser.getText();
                }
            } else {
                if (isKey && value != JsonToken.VALUE_NULL) {
                    feature.keyWrongType = GeoJsonCoordinates.describe(value);
                }
                parser.skipChildren();
            }
        }
    }

    private void readGeometry(JsonParser parser, FeatureState feature) throws IOException, LimitExceeded {
        JsonStreamContext geometryContext = parser.getParsingContext();
        String type = null;
        Object coordinates = null;
        while (parser.nextToken() == JsonToken.FIELD_NAME) {
            String name = parser.currentName();
            JsonToken value = parser.nextToken();
            if ("type".equals(name) && value == JsonToken.VALUE_STRING) {
                type = parser.getText();
            } else if ("coordinates".equals(name) && value == JsonToken.START_ARRAY) {
                try {
                    coordinates = GeoJsonCoordinates.readArray(parser, ringScratch, budget);
                } catch (GeoJsonCoordinates.MalformedCoordinates | LimitExceeded e) {
                    if (e instanceof LimitExceeded limit) {
                        if (limit.limit() == ReadLimit.FILE_VERTICES) {
                            throw limit;
                        }
                        feature.limit = limit.limit();
                    } else {
                        feature.problem("geojson-wrong-type", e.getMessage());
                    }
                    feature.unusable = true;
                    while (parser.getParsingContext() != geometryContext) {
                        parser.nextToken();
                    }
                }
            } else {
                parser.skipChildren();
            }
        }
        if (feature.unusable) {
            return;
        }
        feature.geometryType = type;
        try {
            if ("Polygon".equals(type)) {
                feature.polygons = List.of(GeoJsonCoordinates.polygonRings(orEmpty(coordinates), parser));
            } else if ("MultiPolygon".equals(type)) {
                feature.polygons = GeoJsonCoordinates.multiPolygonRings(orEmpty(coordinates), parser);
            }
        } catch (GeoJsonCoordinates.MalformedCoordinates e) {
            feature.problem("geojson-wrong-type", e.getMessage());
            feature.unusable = true;
        }
    }

    private static Object orEmpty(Object coordinates) {
        return coordinates == null ? new ArrayList<>(0) : coordinates;
    }

    private void finish(FeatureState feature) {
        featureCount++;
        String key = RegionSourceSpec.FEATURE_ID.equals(spec.key()) ? feature.id : feature.keyProperty;
        String place = key == null
                ? String.format(Locale.ROOT, "feature %d (line %d)", featureCount, feature.line)
                : "feature \"" + key + "\"";
        if (feature.limit != null) {
            findings.add(feature.limit.finding(file, place, "the feature was skipped"));
        }
        for (String[] problem : feature.problems) {
            findings.add(Finding.error(problem[0], file, place, "The feature is unusable: " + problem[1] + ".",
                    "Fix the feature as RFC 7946 describes it (sections 3.1 and 3.2)."));
        }
        if (key == null) {
            String what = RegionSourceSpec.FEATURE_ID.equals(spec.key()) ? "feature id" : "property \"" + spec.key() + "\"";
            String why = feature.keyWrongType != null ? "is " + feature.keyWrongType + ", not text or a number" : "is missing";
            findings.add(Finding.error(feature.keyWrongType != null ? "region-key-wrong-type" : "region-key-missing", file, place,
                    "Its key (the " + what + ") " + why + ", so the feature was skipped.",
                    "Give every feature a key, or name another key property in the project file."));
            return;
        }
        if (feature.unusable) {
            return;
        }
        if (feature.geometryType != null && feature.polygons == null) {
            findings.add(Finding.warning("geometry-unsupported", file, place,
                    "Its geometry is a " + feature.geometryType + "; aequa maps only Polygon and MultiPolygon regions, so it was skipped.",
                    "Convert points and lines to the areas they stand for, or leave them out of the region file."));
            return;
        }
        var geometry = feature.polygons == null ? RegionGeometries.empty() : rings.assemble(feature.polygons, place);
        regions.add(new Region(key, feature.name, geometry, feature.attributes));
    }

    /** RFC 7946 (section 4) dropped the crs member; older files may still name a CRS other than WGS 84 lon/lat. */
    private void checkLegacyCrs(JsonParser parser) throws IOException {
        if (parser.currentToken() != JsonToken.START_OBJECT) {
            parser.skipChildren();
            return;
        }
        int line = parser.currentLocation().getLineNr();
        JsonStreamContext crsContext = parser.getParsingContext();
        String crsName = null;
        while (!(parser.nextToken() == JsonToken.END_OBJECT && parser.getParsingContext() == crsContext.getParent())) {
            if (parser.currentToken() == JsonToken.VALUE_STRING && "name".equals(parser.currentName())) {
                crsName = parser.getText();
            }
        }
        if (crsName != null && !crsName.contains("CRS84") && !crsName.matches(".*EPSG:+4326$")) {
            findings.add(Finding.error("crs-unsupported", file, "line " + line,
                    "The file declares the coordinate system \"" + crsName + "\"; GeoJSON must be WGS 84 longitude/latitude.",
                    "Reproject the file to WGS 84 longitude/latitude (RFC 7946, section 4), or supply a GeoPackage with its CRS."));
        }
    }

    private static String location(JsonProcessingException e) {
        if (e.getLocation() == null) {
            return "";
        }
        return "line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr();
    }

    /** What is known about one feature while its members stream past. */
    private static final class FeatureState {
        final int line;
        String id;
        String keyProperty;
        String keyWrongType;
        String name;
        final java.util.Map<String, String> attributes = new java.util.HashMap<>();
        String geometryType;
        List<List<DoubleList>> polygons;
        boolean unusable;
        ReadLimit limit;
        final List<String[]> problems = new ArrayList<>(0);

        FeatureState(JsonParser parser) {
            this.line = parser.currentLocation().getLineNr();
        }

        void problem(String code, String message) {
            problems.add(new String[] {code, message});
        }
    }
}
