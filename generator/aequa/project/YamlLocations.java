package aequa.project;

import java.io.IOException;
import java.util.HashMap;
import java.util.Map;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonPointer;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;

/**
 * Where each value of a YAML document stands (line and column), by JSON Pointer ({@code /maps/2/file}).
 * Jackson's tree model carries no locations, so semantic checks made after binding (a missing file, an
 * unknown region source) look their place up here to point the user at the right line.
 */
final class YamlLocations implements ProjectPlaces {

    private final Map<String, JsonLocation> byPointer;

    private YamlLocations(Map<String, JsonLocation> byPointer) {
        this.byPointer = byPointer;
    }

    static YamlLocations scan(String yaml) throws IOException {
        Map<String, JsonLocation> locations = new HashMap<>();
        try (JsonParser parser = new YAMLFactory().createParser(yaml)) {
            JsonToken token;
            while ((token = parser.nextToken()) != null) {
                // a key's own place comes first (its value may start on a later line); the value's is kept
                // only where there is no key (list items, the root)
                JsonPointer pointer = parser.getParsingContext().pathAsPointer();
                if (token == JsonToken.END_OBJECT || token == JsonToken.END_ARRAY) {
                    continue;
                }
                locations.putIfAbsent(pointer.toString(), parser.currentTokenLocation());
            }
        }
        return new YamlLocations(locations);
    }

    @Override
    public String place(String pointer) {
        String p = pointer;
        while (true) {
            JsonLocation location = byPointer.get(p);
            if (location != null) {
                return describe(location);
            }
            int slash = p.lastIndexOf('/');
            if (slash < 0) {
                return "";
            }
            p = p.substring(0, slash);
        }
    }

    static String describe(JsonLocation location) {
        return "line " + location.getLineNr() + ", column " + location.getColumnNr();
    }
}
