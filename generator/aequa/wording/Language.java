package aequa.wording;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import com.ibm.icu.util.ULocale;

/**
 * A language a site is published in: a BCP 47 tag ("fr", "pt-BR", "ar") whose first subtag names one of the
 * shipped message bundles, and whose whole tag picks the CLDR conventions for numbers (so "pt-BR" and "pt-PT"
 * share words and may differ in numbers). Writing direction comes from CLDR's script data.
 */
public record Language(String tag) {

    /** The languages aequa ships messages for, by bundle name. */
    public static final List<String> SHIPPED = List.of("en", "fr", "es", "pt", "ar");

    public static final Language ENGLISH = new Language("en");

    public Language {
        if (!SHIPPED.contains(bundleOf(tag))) {
            throw new IllegalArgumentException("not a shipped language: " + tag);
        }
    }

    /**
     * The language a project's tag asks for, normalised ("pt-br" becomes "pt-BR"), or empty when the tag is not
     * well formed or names a language aequa has no messages for.
     */
    public static Optional<Language> parse(String tag) {
        if (tag == null || !tag.matches("[A-Za-z]{2,3}(-[A-Za-z0-9]{2,8})*")) {
            return Optional.empty();
        }
        String normalised = Locale.forLanguageTag(tag).toLanguageTag();
        if ("und".equals(normalised) || !SHIPPED.contains(bundleOf(normalised))) {
            return Optional.empty();
        }
        return Optional.of(new Language(normalised));
    }

    /** The message bundle of this language: its first subtag. */
    public String bundleName() {
        return bundleOf(tag);
    }

    /** Whether the language is written right to left (Arabic): pages get {@code dir="rtl"}. */
    public boolean rightToLeft() {
        return ULocale.forLanguageTag(tag).isRightToLeft();
    }

    /** The language's name in itself ("français", "العربية"), as a link to its pages reads (CLDR display names). */
    public String nativeName() {
        ULocale locale = ULocale.forLanguageTag(tag);
        String name = locale.getDisplayName(locale);
        return name.substring(0, name.offsetByCodePoints(0, 1)).toUpperCase(locale.toLocale()) + name.substring(name.offsetByCodePoints(0, 1));
    }

    /** {@code "rtl"} or {@code "ltr"}, for the {@code dir} attribute. */
    public String direction() {
        return rightToLeft() ? "rtl" : "ltr";
    }

    private static String bundleOf(String tag) {
        int dash = tag.indexOf('-');
        return (dash < 0 ? tag : tag.substring(0, dash)).toLowerCase(Locale.ROOT);
    }
}
