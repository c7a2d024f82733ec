package aequa.inputs.figures;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.ProjectFile;

/**
 * Turns the words of the project file into enum constants, once, where a spec record is read. An enum
 * constant's word is its name in lower case with {@code _} as {@code -} ({@code NOT_APPLICABLE} is
 * {@code not-applicable}). Unknown words become an error finding on the project file, never an exception.
 */
public final class SpecWords {

    private SpecWords() {
    }

    /** The project-file word for {@code constant}. */
    public static String of(Enum<?> constant) {
        return constant.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /**
     * @param type     the enum to choose from
     * @param word     the text the user wrote (compared ignoring case and surrounding whitespace)
     * @param fallback returned, after an error finding, when {@code word} names no constant
     * @param place    where the word sits in the project file, for example {@code map "births", measure}
     */
    public static <E extends Enum<E>> E parse(Class<E> type, String word, E fallback, String place,
                                              Findings findings) {
        String wanted = word.strip().toLowerCase(Locale.ROOT);
        for (E constant : type.getEnumConstants()) {
            if (of(constant).equals(wanted)) {
                return constant;
            }
        }
        String choices = Arrays.stream(type.getEnumConstants()).map(SpecWords::of)
                .collect(Collectors.joining(", "));
        findings.add(Finding.error("project-unknown-value", ProjectFile.FILE_NAME, place,
                "Unknown value \"" + word + "\".", "Use one of: " + choices + "."));
        return fallback;
    }
}
