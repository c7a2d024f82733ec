package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import aequa.findings.Finding;

/** The bytes values enter fingerprints with: fixed by the values alone, not by insertion order or toString. */
class CanonicalBytesTest {

    private record Sample(String name, double value, Map<String, Double> parameters) {
        @Override
        public String toString() {
            return "a readable form that drops the parameters: " + name;
        }
    }

    @Test
    void mapOrderDoesNotMatterButEveryComponentDoes() {
        Map<String, Double> ab = new LinkedHashMap<>();
        ab.put("a", 1.0);
        ab.put("b", 2.0);
        Map<String, Double> ba = new LinkedHashMap<>();
        ba.put("b", 2.0);
        ba.put("a", 1.0);
        assertArrayEquals(CanonicalBytes.of(new Sample("x", 0.1, ab)), CanonicalBytes.of(new Sample("x", 0.1, ba)));
        // two samples with the same toString differ in their bytes
        Map<String, Double> other = Map.of("a", 1.0, "b", 2.5);
        assertEquals(new Sample("x", 0.1, ab).toString(), new Sample("x", 0.1, other).toString());
        assertFalse(Arrays.equals(CanonicalBytes.of(new Sample("x", 0.1, ab)), CanonicalBytes.of(new Sample("x", 0.1, other))));
    }

    @Test
    void theFormIsCompactJsonWithSortedNamesAndShortestDoubles() {
        // RFC 8259 JSON; 0.1 in Java's shortest round-trip form (Double.toString), NaN as text
        assertEquals("{\"name\":\"x\",\"parameters\":{\"a\":1.0},\"value\":0.1}",
                new String(CanonicalBytes.of(new Sample("x", 0.1, Map.of("a", 1.0))), StandardCharsets.UTF_8));
        assertEquals("[\"NaN\",-0.0]", new String(CanonicalBytes.of(List.of(Double.NaN, -0.0)), StandardCharsets.UTF_8));
    }

    @Test
    void findingsEnterWithEveryField() {
        Finding a = Finding.warning("join-key-unmatched", "f.csv", "row 2", "No region.", "");
        Finding b = Finding.warning("join-key-unmatched", "f.csv", "row 3", "No region.", "");
        assertFalse(Arrays.equals(CanonicalBytes.of(List.of(a)), CanonicalBytes.of(List.of(b))));
    }
}
