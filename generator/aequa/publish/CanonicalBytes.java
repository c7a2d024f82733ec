package aequa.publish;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;

/**
 * The bytes a value enters a fingerprint with: compact JSON (RFC 8259) of its record components, properties
 * and map keys sorted, text as UTF-8, doubles in Java's shortest round-trip form (so equal bits give equal
 * text, and NaN is the text "NaN"), enums by name. Unlike {@code toString}, whose form no contract fixes and
 * which a readable override would change, this form changes only when a value's components change.
 */
final class CanonicalBytes {

    private static final ObjectMapper JSON = JsonMapper.builder()
            .enable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
            .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
            .disable(SerializationFeature.FAIL_ON_EMPTY_BEANS)
            .build();

    private CanonicalBytes() {
    }

    /** The canonical bytes of {@code value} (a record, list, map, text, number, enum or null). */
    static byte[] of(Object value) {
        try {
            return JSON.writeValueAsBytes(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a value of " + value.getClass() + " cannot enter a fingerprint", e);
        }
    }
}
