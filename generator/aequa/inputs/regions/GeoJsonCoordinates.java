package aequa.inputs.regions;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;

/**
 * Streams the {@code coordinates} member of a GeoJSON geometry (RFC 7946, section 3.1.1) into nested lists
 * whose leaves are rings of interleaved (lon, lat) doubles, without building a JSON tree. Positions with a
 * third (altitude) or further number keep only the first two (RFC 7946, section 3.1.1 allows them; aequa
 * maps in two dimensions).
 *
 * <p>Result shapes: {@code double[2]} for a single position, {@link DoubleList} for an array of positions,
 * {@code List<Object>} for anything deeper (or an empty array).
 */
final class GeoJsonCoordinates {

    /** A coordinates member that is not nested arrays of numbers; carries the offending token's place. */
    static final class MalformedCoordinates extends Exception {
        private static final long serialVersionUID = 1L;

        MalformedCoordinates(String message, JsonParser parser) {
            super(message + " (line " + parser.currentLocation().getLineNr() + ", column "
                    + parser.currentLocation().getColumnNr() + ")");
        }
    }

    private GeoJsonCoordinates() {
    }

    /**
     * Reads the array whose START_ARRAY is the parser's current token, up to and including its END_ARRAY.
     * {@code scratch} collects one ring's numbers at a time (its contents are overwritten), so each ring
     * costs one array of exactly its size rather than a doubling buffer's garbage. Every ring is counted
     * against {@code budget}; nesting is bounded by the parser's constraints ({@link ReadLimit#NESTING_DEPTH}).
     *
     * @throws LimitExceeded when a ring or the file goes beyond its limit, with the parser inside the array
     */
    static Object readArray(JsonParser parser, DoubleList scratch, VertexBudget budget)
            throws IOException, MalformedCoordinates, LimitExceeded {
        JsonToken token = parser.nextToken();
        if (token == JsonToken.END_ARRAY) {
            return new ArrayList<>(0);
        }
        if (token != null && token.isNumeric()) {
            return readPositionTail(parser);
        }
        if (token != JsonToken.START_ARRAY) {
            throw new MalformedCoordinates("coordinates must be arrays of numbers, found " + describe(token), parser);
        }
        Object first = readArray(parser, scratch, budget);
        if (first instanceof double[]) {
            double[] position = (double[]) first;
            DoubleList ring = scratch;
            ring.clear();
            ring.add(position[0]);
            ring.add(position[1]);
            while ((token = parser.nextToken()) == JsonToken.START_ARRAY) {
                token = parser.nextToken();
                if (token == null || !token.isNumeric()) {
                    throw new MalformedCoordinates("each position must be an array of two numbers, found " + describe(token), parser);
                }
                double x = parser.getDoubleValue();
                token = parser.nextToken();
                if (token == null || !token.isNumeric()) {
                    throw new MalformedCoordinates("each position needs a longitude and a latitude", parser);
                }
                ring.add(x);
                ring.add(parser.getDoubleValue());
                skipExtraNumbers(parser);
                if (!budget.ringFits(ring.size() / 2)) {
                    throw new LimitExceeded(ReadLimit.RING_POSITIONS);
                }
            }
            expectEndArray(token, parser);
            budget.take(ring.size() / 2);
            return ring.exactCopy();
        }
        List<Object> list = new ArrayList<>();
        list.add(first);
        while ((token = parser.nextToken()) == JsonToken.START_ARRAY) {
            list.add(readArray(parser, scratch, budget));
        }
        expectEndArray(token, parser);
        return list;
    }

    private static double[] readPositionTail(JsonParser parser) throws IOException, MalformedCoordinates {
        double x = parser.getDoubleValue();
        JsonToken token = parser.nextToken();
        if (token == null || !token.isNumeric()) {
            throw new MalformedCoordinates("each position needs a longitude and a latitude", parser);
        }
        double y = parser.getDoubleValue();
        skipExtraNumbers(parser);
        return new double[] {x, y};
    }

    private static void skipExtraNumbers(JsonParser parser) throws IOException, MalformedCoordinates {
        JsonToken token;
        while ((token = parser.nextToken()) != null && token.isNumeric()) {
            // altitude and beyond: not used (see class comment)
        }
        expectEndArray(token, parser);
    }

    private static void expectEndArray(JsonToken token, JsonParser parser) throws MalformedCoordinates {
        if (token != JsonToken.END_ARRAY) {
            throw new MalformedCoordinates("coordinates must be arrays of numbers, found " + describe(token), parser);
        }
    }

    /** The rings of one polygon: an array of arrays of positions (RFC 7946, section 3.1.6). */
    static List<DoubleList> polygonRings(Object node, JsonParser parser) throws MalformedCoordinates {
        if (!(node instanceof List<?>)) {
            throw new MalformedCoordinates("polygon coordinates must be an array of rings, each an array of positions", parser);
        }
        List<DoubleList> rings = new ArrayList<>();
        for (Object ring : (List<?>) node) {
            if (ring instanceof DoubleList) {
                rings.add((DoubleList) ring);
            } else if (ring instanceof List<?> && ((List<?>) ring).isEmpty()) {
                rings.add(new DoubleList(0));
            } else {
                throw new MalformedCoordinates("polygon coordinates must be an array of rings, each an array of positions", parser);
            }
        }
        return rings;
    }

    /** The polygons of a MultiPolygon: an array of polygon coordinate arrays (RFC 7946, section 3.1.7). */
    static List<List<DoubleList>> multiPolygonRings(Object node, JsonParser parser) throws MalformedCoordinates {
        if (!(node instanceof List<?>)) {
            throw new MalformedCoordinates("multipolygon coordinates must be an array of polygons", parser);
        }
        List<List<DoubleList>> polygons = new ArrayList<>();
        for (Object polygon : (List<?>) node) {
            polygons.add(polygonRings(polygon, parser));
        }
        return polygons;
    }

    static String describe(JsonToken token) {
        if (token == null) {
            return "the end of the file";
        }
        switch (token) {
            case VALUE_STRING: return "a string";
            case VALUE_TRUE:
            case VALUE_FALSE: return "a boolean";
            case VALUE_NULL: return "null";
            case START_OBJECT: return "an object";
            case START_ARRAY: return "an array";
            case END_ARRAY: return "the end of an array";
            default: return token.isNumeric() ? "a number" : token.name().toLowerCase(java.util.Locale.ROOT);
        }
    }
}
