package aequa.project;

import java.util.Arrays;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * A constant of a mode the project file sets with a word ({@code display: circles}, {@code measure: count}).
 * The word tables live here, in {@code project}, so a word is turned into its constant once, where the
 * project file is read ({@link ProjectLoader}); later stages compare constants, never text.
 */
public interface ConfigWord {

    /** The word the project file uses for this constant; unique within its enum. */
    String configName();

    /** The constant of {@code type} whose word is {@code word} (exactly as written), or empty. */
    static <E extends Enum<E> & ConfigWord> Optional<E> parse(Class<E> type, String word) {
        return Arrays.stream(type.getEnumConstants()).filter(c -> c.configName().equals(word)).findFirst();
    }

    /** The words of {@code type}, in declaration order, quoted and separated by commas, for a hint. */
    static String choices(Class<? extends ConfigWord> type) {
        return Arrays.stream(type.getEnumConstants()).map(c -> "'" + c.configName() + "'").collect(Collectors.joining(", "));
    }

    /** The usual word of a constant: its name in lower case with {@code _} as {@code -}. */
    static String kebab(Enum<?> constant) {
        return constant.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
