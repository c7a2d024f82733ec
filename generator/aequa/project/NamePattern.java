package aequa.project;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;

/**
 * A region source's {@code name} written as a pattern of properties, for example {@code "{name}, {state}"}:
 * text in braces names a property of the region, everything else is copied as it is. A {@code name} without
 * braces is a plain property name, as before.
 *
 * @param literals   the text before, between and after the properties ({@code properties.size() + 1} pieces)
 * @param properties the properties named, in order
 */
public record NamePattern(List<String> literals, List<String> properties) {

    public NamePattern {
        literals = List.copyOf(literals);
        properties = List.copyOf(properties);
    }

    /** Whether a {@code name} setting is a pattern rather than a property name. */
    public static boolean isPattern(String setting) {
        return setting.indexOf('{') >= 0 || setting.indexOf('}') >= 0;
    }

    /** The pattern, or empty when the braces do not pair up or enclose no property name. */
    public static Optional<NamePattern> parse(String setting) {
        List<String> literals = new ArrayList<>();
        List<String> properties = new ArrayList<>();
        StringBuilder literal = new StringBuilder();
        int i = 0;
        while (i < setting.length()) {
            char c = setting.charAt(i);
            if (c == '}') {
                return Optional.empty();
            }
            if (c != '{') {
                literal.append(c);
                i++;
                continue;
            }
            int close = setting.indexOf('}', i + 1);
            String property = close < 0 ? "" : setting.substring(i + 1, close).strip();
            if (property.isEmpty() || property.indexOf('{') >= 0) {
                return Optional.empty();
            }
            literals.add(literal.toString());
            literal.setLength(0);
            properties.add(property);
            i = close + 1;
        }
        literals.add(literal.toString());
        return properties.isEmpty() ? Optional.empty() : Optional.of(new NamePattern(literals, properties));
    }

    /**
     * The name for one region, or empty when a property it names has no value there.
     *
     * @param valueOf a property's value for the region, or null
     */
    public Optional<String> apply(Function<String, String> valueOf) {
        StringBuilder name = new StringBuilder(literals.get(0));
        for (int p = 0; p < properties.size(); p++) {
            String value = valueOf.apply(properties.get(p));
            if (value == null || value.isBlank()) {
                return Optional.empty();
            }
            name.append(value).append(literals.get(p + 1));
        }
        return Optional.of(name.toString());
    }

    /** As {@link #apply(Function)} with the values of a map. */
    public Optional<String> apply(Map<String, String> values) {
        return apply(values::get);
    }
}
