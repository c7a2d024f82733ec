package aequa.project;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Finds the translation for a language among those a project gives, keyed by language tag (BCP 47): the tag
 * itself first, then its language subtag, so {@code fr} serves {@code fr-CA} and {@code pt-BR} is preferred to
 * {@code pt} for Brazilian pages. Tags compare without regard to case (BCP 47, section 2.1.1).
 */
public final class Translations {

    private Translations() {
    }

    /** The entry for {@code tag}, or empty when the project gives none for that language. */
    public static <T> Optional<T> of(Map<String, T> byTag, String tag) {
        Optional<T> exact = find(byTag, tag);
        if (exact.isPresent()) {
            return exact;
        }
        int dash = tag.indexOf('-');
        return dash < 0 ? Optional.empty() : find(byTag, tag.substring(0, dash));
    }

    /** Whether a translation keyed {@code key} serves one of {@code tags}. */
    public static boolean serves(String key, java.util.List<String> tags) {
        return tags.stream().anyMatch(tag -> of(Map.of(key, key), tag).isPresent());
    }

    private static <T> Optional<T> find(Map<String, T> byTag, String tag) {
        String wanted = tag.toLowerCase(Locale.ROOT);
        return byTag.entrySet().stream().filter(e -> e.getKey().toLowerCase(Locale.ROOT).equals(wanted))
                .map(Map.Entry::getValue).findFirst();
    }
}
