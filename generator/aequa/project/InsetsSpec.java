package aequa.project;

import java.util.List;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.JsonDeserializer;
import com.fasterxml.jackson.databind.annotation.JsonDeserialize;

/**
 * How a map's detached parts are drawn (the {@code insets} setting of a map or a region source): {@code auto}
 * (the default: parts far from the main mass are found and drawn in frames, each on its own projection),
 * {@code off} (one projection for everything), or a list of the parts to frame.
 *
 * @param word  {@code auto} or {@code off} when the setting is a word (any other word is reported by the
 *              project checks); empty when it is a list
 * @param parts the listed parts, empty unless the setting is a list
 */
@JsonDeserialize(using = InsetsSpec.Reader.class)
public record InsetsSpec(String word, List<InsetPartSpec> parts) {

    public static final InsetsSpec AUTO = new InsetsSpec("auto", List.of());

    public InsetsSpec {
        word = word == null ? "" : word;
        parts = parts == null ? List.of() : List.copyOf(parts);
    }

    public boolean off() {
        return word.equals("off");
    }

    public boolean listed() {
        return word.isEmpty();
    }

    /**
     * One listed part: the regions given by key, or whose representative point lies in a lon/lat box, or both.
     *
     * @param name    the name on the part's frame; empty to name it after its largest region
     * @param regions region keys
     * @param box     {@code [west, south, east, north]} in degrees; west greater than east crosses 180 deg
     * @param scale   the part's area scale relative to the main map (1, the default, keeps areas comparable)
     * @param corner  where the part should go: {@code top-left}, {@code top-right}, {@code bottom-left},
     *                {@code bottom-right}, or empty to let the layout choose
     */
    public record InsetPartSpec(String name, List<String> regions, List<Double> box, Double scale, String corner) {

        public InsetPartSpec {
            name = name == null ? "" : name;
            regions = regions == null ? List.of() : List.copyOf(regions);
            box = box == null ? List.of() : List.copyOf(box);
            scale = scale == null ? 1.0 : scale;
            corner = corner == null ? "" : corner;
        }
    }

    /**
     * Reads the setting as a word or as a list of parts; the parts are bound by Jackson as every other section
     * is, so an unknown key or a wrong type inside them is reported with its line like anywhere else.
     */
    static final class Reader extends JsonDeserializer<InsetsSpec> {
        @Override
        public InsetsSpec deserialize(JsonParser parser, DeserializationContext context) throws java.io.IOException {
            if (parser.currentToken() == JsonToken.VALUE_STRING) {
                return new InsetsSpec(parser.getText(), List.of());
            }
            if (parser.currentToken() == JsonToken.VALUE_FALSE || parser.currentToken() == JsonToken.VALUE_TRUE) {
                // YAML 1.1 reads a bare 'off' (and 'no', 'false') as false, 'on' as true
                return new InsetsSpec(parser.currentToken() == JsonToken.VALUE_FALSE ? "off" : "auto", List.of());
            }
            if (parser.currentToken() == JsonToken.START_ARRAY) {
                List<InsetPartSpec> parts = context.readValue(parser,
                        context.getTypeFactory().constructCollectionType(List.class, InsetPartSpec.class));
                return new InsetsSpec("", parts);
            }
            return (InsetsSpec) context.handleUnexpectedToken(List.class, parser);
        }
    }
}
